import type { SeatBalanceAnswer, SeatBalanceExtras } from '@/lib/system-model/seat-balance';
import type { SeatBalanceModelRequest } from '@/lib/validations/compute-seat-balance';

/**
 * The messages between the Seat balance panel and its Web Worker. The page posts one run; the worker answers with
 * progress (0…1), then the answer or the reason it failed. `runId` ties each message to its run.
 */
export interface SeatBalanceRunMessage {
  runId: number;
  request: SeatBalanceModelRequest;
  /** Everything but the progress callback (the worker adds its own). */
  extras: Omit<SeatBalanceExtras, 'onProgress'>;
}

export type SeatBalanceWorkerMessage =
  | { runId: number; kind: 'progress'; fraction: number }
  | { runId: number; kind: 'answer'; answer: SeatBalanceAnswer }
  | { runId: number; kind: 'failed'; message: string };
