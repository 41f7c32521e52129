import { json, parseJson, route } from '@/lib/http';
import { computeRoomModes } from '@/lib/system-model/room-modes';
import { roomModesRequestSchema } from '@/lib/validations/compute-room';

/** POST /api/v1/room-modes — documented in lib/openapi/operations (the API page /docs/api). No sign-in needed. */
export const POST = route(async (request) => {
  const input = await parseJson(request, roomModesRequestSchema);
  return json(computeRoomModes(input));
});
