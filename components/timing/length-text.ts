import type { UnitSystem } from '@/components/system/system-context';
import { metresToFeet } from '@/lib/units';

/** The same rounding as NumberField's (two decimals), so the table and the field agree: `lengthText(3.456, 'metric')` → "3.46 m". */
export const lengthText = (m: number, units: UnitSystem) => (units === 'imperial' ? `${Number(metresToFeet(m).toFixed(2))} ft` : `${Number(m.toFixed(2))} m`);
