/** Display conversions between SI (stored) and feet/inches (shown when the user chooses). */
export const M_PER_FT = 0.3048;

export function metresToFeetInches(m: number): { feet: number; inches: number } {
  const totalIn = m / 0.0254;
  let feet = Math.floor(totalIn / 12);
  let inches = Math.round((totalIn - feet * 12) * 10) / 10;
  if (inches >= 12) {
    feet += 1;
    inches -= 12;
  }
  return { feet, inches };
}

export function formatLength(m: number, units: 'metric' | 'imperial', digits = 2): string {
  if (units === 'metric') return `${m.toFixed(digits)} m`;
  const { feet, inches } = metresToFeetInches(m);
  return `${feet}′ ${inches.toFixed(1)}″`;
}

export const metresToFeet = (m: number) => m / M_PER_FT;
export const feetToMetres = (ft: number) => ft * M_PER_FT;
