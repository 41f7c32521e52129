import { json, parseJson, route } from '@/lib/http';
import { computeRoomResponse } from '@/lib/system-model/room-response';
import { roomResponseRequestSchema } from '@/lib/validations/compute-room';

/** POST /api/v1/room-response — documented in lib/openapi/operations (the API page /docs/api). No sign-in needed. */
export const POST = route(async (request) => {
  const input = await parseJson(request, roomResponseRequestSchema);
  return json(computeRoomResponse(input));
});
