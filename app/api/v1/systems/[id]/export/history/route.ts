import { requireCaller } from '@/lib/auth';
import { exportSystemFile } from '@/lib/data/workspace-export';
import { transferResponse } from '@/lib/data/workspace-export-package';
import { route } from '@/lib/http';

type Ctx = { params: Promise<{ id: string }> };

/** One System with every revision, its Library profiles and its measurements, as a transfer file; editors and owners. */
export const GET = route<Ctx>(async (_request, { params }) => {
  const caller = await requireCaller();
  const { id } = await params;
  return transferResponse(await exportSystemFile(caller, id));
});
