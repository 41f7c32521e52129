import { answerShape } from '@/lib/answer-shape';
import { blendAnswerSchema, crossoverSweepAnswerSchema, timingAnswerSchema } from './answers/compute-blend';
import { eqDesignAnswerSchema } from './answers/compute-eq-design';
import { processorFiltersAnswerSchema } from './answers/compute-processor-filters';
import { headroomAnswerSchema, layoutAnswerSchema, roomModesAnswerSchema, roomResponseAnswerSchema } from './answers/compute-room';
import { seatBalanceAnswerSchema } from './answers/compute-seat-balance';
import { compareAnswerSchema, extensionAnswerSchema, predictAnswerSchema } from './answers/measured';

/**
 * `?fields=&precision=` of each compute route (lib/answer-shape.ts), built from the route's answer schema so the names it
 * accepts are the names it answers. The handler parses `.query` and applies `.apply`; the operation documents `.query`.
 */
export const ANSWER_SHAPES = {
  blend: answerShape(blendAnswerSchema),
  crossoverSweep: answerShape(crossoverSweepAnswerSchema),
  timing: answerShape(timingAnswerSchema),
  eqDesign: answerShape(eqDesignAnswerSchema, { exactKeys: ['sections'] }),
  processorFilters: answerShape(processorFiltersAnswerSchema, { exactKeys: ['sections'] }),
  headroom: answerShape(headroomAnswerSchema),
  layout: answerShape(layoutAnswerSchema),
  roomModes: answerShape(roomModesAnswerSchema),
  roomResponse: answerShape(roomResponseAnswerSchema),
  seatBalance: answerShape(seatBalanceAnswerSchema),
  measuredCompare: answerShape(compareAnswerSchema),
  measuredExtension: answerShape(extensionAnswerSchema),
  measuredPredict: answerShape(predictAnswerSchema),
} as const;
