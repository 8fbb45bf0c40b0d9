import { z } from 'zod';
import { addWalkScan } from '@/db/queries/yard-walks';
import { SECTION_ROLES } from '@/lib/roles';
import { apiError, invalid, readJson } from '@/lib/server/api';
import { apiUser } from '@/lib/server/auth';
import { noTerminal, refusalResponse } from '@/lib/server/yard-api';
import { walkScanSchema } from '@/lib/validation/yard';

/** One walk scan from the device queue; a re-send with the same clientKey answers 200 with the stored scan. */
export async function POST(request: Request, { params }: { params: Promise<{ id: string }> }) {
  const user = await apiUser(SECTION_ROLES.yard);
  if (user instanceof Response) return user;
  const { id } = await params;
  if (!z.uuid().safeParse(id).success) return apiError('not_found', 'No such walk.');
  const body = await readJson(request);
  if (!body.ok) return body.response;
  const parsed = walkScanSchema.safeParse(body.body);
  if (!parsed.success) return invalid(parsed.error);
  if (!user.terminalId) return noTerminal();
  const result = await addWalkScan(id, user.terminalId, parsed.data);
  if (!result.ok) return refusalResponse(result);
  return Response.json(result, { status: result.isRepeat ? 200 : 201 });
}
