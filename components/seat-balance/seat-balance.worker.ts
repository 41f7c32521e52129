// The Seat balance search off the page's thread: one message in (the request and the System's present settings),
// progress messages and the answer out. The page terminates the worker to cancel a run.
import { computeSeatBalance } from '@/lib/system-model/seat-balance';
import type { SeatBalanceRunMessage, SeatBalanceWorkerMessage } from './seat-balance-messages';

const post = (message: SeatBalanceWorkerMessage) => (self as unknown as { postMessage: (m: SeatBalanceWorkerMessage) => void }).postMessage(message);

self.addEventListener('message', (event: MessageEvent<SeatBalanceRunMessage>) => {
  const { runId, request, extras } = event.data;
  // At most one progress message per whole percent: enough for the bar, few enough to keep the page idle.
  let shownPercent = -1;
  try {
    const answer = computeSeatBalance(request, {
      ...extras,
      onProgress: (fraction) => {
        const percent = Math.floor(fraction * 100);
        if (percent <= shownPercent) return;
        shownPercent = percent;
        post({ runId, kind: 'progress', fraction });
      },
    });
    post({ runId, kind: 'answer', answer });
  } catch (e) {
    post({ runId, kind: 'failed', message: e instanceof Error ? e.message : 'The search failed.' });
  }
});
