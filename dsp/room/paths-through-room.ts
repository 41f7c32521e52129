/** A complex curve on a grid: a transfer from one source to one receiver (modal, or measured with phase). */
export interface ComplexCurve {
  readonly re: ArrayLike<number>;
  readonly im: ArrayLike<number>;
}

/**
 * The power at each receiver of several sources through the room: Σ over sources of transfer[s][r] × path[s], each a
 * complex curve on the same grid (the transfer holds the room and the air path; the path holds what the processor and
 * the speaker do to that source), |Σ|² per point. The one place where a System's sub paths meet the room's transfers.
 * @example pathsThroughRoomPower([[{ re: [1], im: [0] }]], [{ re: [0.5], im: [0] }])[0][0] // 0.25
 */
export function pathsThroughRoomPower(transfers: readonly (readonly ComplexCurve[])[], paths: readonly ComplexCurve[]): Float64Array[] {
  if (transfers.length !== paths.length) throw new RangeError(`transfers must hold one row per path (got ${transfers.length} rows for ${paths.length} paths)`);
  const receivers = transfers[0]?.length ?? 0;
  const n = paths[0]?.re.length ?? 0;
  const out: Float64Array[] = [];
  for (let r = 0; r < receivers; r++) {
    const sr = new Float64Array(n);
    const si = new Float64Array(n);
    paths.forEach((p, s) => {
      const t = transfers[s]?.[r];
      if (!t || t.re.length !== n || p.re.length !== n) throw new RangeError(`transfers[${s}][${r}] and paths[${s}] must hold the same ${n} grid points`);
      for (let i = 0; i < n; i++) {
        const tr = t.re[i] as number;
        const ti = t.im[i] as number;
        const pr = p.re[i] as number;
        const pi = p.im[i] as number;
        sr[i] = (sr[i] as number) + tr * pr - ti * pi;
        si[i] = (si[i] as number) + tr * pi + ti * pr;
      }
    });
    out.push(Float64Array.from(sr, (x, i) => x * x + (si[i] as number) * (si[i] as number)));
  }
  return out;
}
