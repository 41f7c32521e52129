import { requireCaller } from '@/lib/auth';
import { exportWorkspaceFile } from '@/lib/data/workspace-export';
import { transferResponse } from '@/lib/data/workspace-export-package';
import { route } from '@/lib/http';

type Ctx = { params: Promise<{ id: string }> };

/** The whole workspace as a transfer file (JSON, or a zip when large); owners only. */
export const GET = route<Ctx>(async (_request, { params }) => {
  const caller = await requireCaller();
  const { id } = await params;
  return transferResponse(await exportWorkspaceFile(caller, id));
});
