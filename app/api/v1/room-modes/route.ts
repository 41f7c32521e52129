import { json, parseJson, parseQuery, route } from '@/lib/http';
import { computeRoomModes } from '@/lib/system-model/room-modes';
import { roomModesRequestSchema } from '@/lib/validations/compute-room';
import { ANSWER_SHAPES } from '@/lib/openapi/answer-shapes';

/** POST /api/v1/room-modes — documented in lib/openapi/operations (the API page /docs/api). No sign-in needed. */
export const POST = route(async (request) => {
  const shape = parseQuery(request, ANSWER_SHAPES.roomModes.query);
  const input = await parseJson(request, roomModesRequestSchema);
  return json(ANSWER_SHAPES.roomModes.apply(computeRoomModes(input), shape));
});
