import type { SweepPlayer } from './use-sweep-player';

/** "Play sweep" / "Pause sweep" and "Restart" for a Step's sweep (Presenter view and the shared Lesson). */
export function SweepButtons({ player }: { player: SweepPlayer }) {
  return (
    <>
      <button type="button" onClick={player.toggle} className="rounded-md border border-line px-3 py-1.5" data-testid="sweep-toggle">
        {player.playing ? 'Pause sweep' : 'Play sweep'}
      </button>
      <button type="button" onClick={player.restart} className="rounded-md border border-line px-3 py-1.5">
        Restart
      </button>
    </>
  );
}
