import { json, parseJson, parseQuery, route } from '@/lib/http';
import { computeRoomResponse } from '@/lib/system-model/room-response';
import { roomResponseRequestSchema } from '@/lib/validations/compute-room';
import { ANSWER_SHAPES } from '@/lib/openapi/answer-shapes';

/** POST /api/v1/room-response — documented in lib/openapi/operations (the API page /docs/api). No sign-in needed. */
export const POST = route(async (request) => {
  const shape = parseQuery(request, ANSWER_SHAPES.roomResponse.query);
  const input = await parseJson(request, roomResponseRequestSchema);
  return json(ANSWER_SHAPES.roomResponse.apply(computeRoomResponse(input), shape));
});
