import { requireMembership } from '@/lib/access';
import { requireCaller } from '@/lib/auth';
import { assertUuid } from '@/lib/data/ids';
import { importSystemFile } from '@/lib/data/workspace-import';
import { readTransferFile } from '@/lib/data/workspace-import-package';
import { json, route } from '@/lib/http';

type Ctx = { params: Promise<{ id: string }> };

/** A System transfer file as the body (application/json or application/zip), into this workspace (editors and owners). */
export const POST = route<Ctx>(async (request, { params }) => {
  const caller = await requireCaller();
  const { id } = await params;
  assertUuid(id, 'That workspace');
  // The caller's rights first, so an outsider learns nothing from how the file is read.
  await requireMembership(caller, id, 'editor', 'That workspace');
  const file = await readTransferFile(request);
  return json(await importSystemFile(caller, id, file), 201);
});
