import type { RoomResponseAnswer } from '@/lib/hooks/use-room';

/** Front-wall quarter-wave notches of every source, and whether each falls in the source's own band. */
export function QuarterWave({ r, crossoverHz, subNames, units, left }: { r: RoomResponseAnswer; crossoverHz: number; subNames: ReadonlySet<string>; units: 'metric' | 'imperial'; left: string[] }) {
  if (r.quarterWave.length === 0 && left.length === 0) return null;
  return (
    <section aria-labelledby="modes-quarter" className="flex flex-col gap-2">
      <h3 id="modes-quarter" className="text-base font-semibold">
        Front-wall cancellation (quarter wave)
      </h3>
      <p className="text-xs text-ink-soft">
        The reflection from the wall behind a source cancels its output at f = c / (4d) (Allison, JAES 1974), d measured from the acoustic centre to the front wall. Keep the notch out of the source’s own band: subs close to the wall (notch above
        the crossover), mains either close or well away.
      </p>
      <div className="relative overflow-x-auto">
        <table className="w-full max-w-2xl text-sm">
          <thead className="text-ink-soft">
            <tr>
              <th scope="col" className="px-2 py-1 text-left font-medium">Source</th>
              <th scope="col" className="px-2 py-1 text-right font-medium">To front wall</th>
              <th scope="col" className="px-2 py-1 text-right font-medium">Notch</th>
              <th scope="col" className="px-2 py-1 text-left font-medium">In its band?</th>
            </tr>
          </thead>
          <tbody>
            {r.quarterWave.map((q) => {
              const isSub = subNames.has(q.name);
              // A sub works below about an octave above the crossover; the mains above about an octave below it.
              const inBand = isSub ? q.notchHz < 2 * crossoverHz : q.notchHz > crossoverHz / 2;
              return (
                <tr key={q.name} className="border-t border-line">
                  <td className="px-2 py-1">{q.name}</td>
                  <td className="num px-2 py-1 text-right">{units === 'imperial' ? `${(q.distanceM / 0.3048).toFixed(2)} ft` : `${q.distanceM.toFixed(2)} m`}</td>
                  <td className="num px-2 py-1 text-right">{q.notchHz.toFixed(0)} Hz</td>
                  <td className={`px-2 py-1 ${inBand ? 'text-warn' : 'text-ok'}`}>{inBand ? (isSub ? 'yes — below 2 × crossover' : 'yes — in the mains’ band') : 'no'}</td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
      {left.length ? (
        <p className="text-xs text-fail" role="alert">
          No notch for a speaker outside the room: {left.join('; ')}.
        </p>
      ) : null}
    </section>
  );
}
