import { z } from 'zod';
import { listTrailers } from '@/db/queries/trailers';
import { SECTION_ROLES } from '@/lib/roles';
import { invalid } from '@/lib/server/api';
import { apiUser } from '@/lib/server/auth';

const querySchema = z.object({
  q: z.string().trim().max(40).optional(),
  limit: z.coerce.number().int().min(1).max(200).default(50),
  offset: z.coerce.number().int().min(0).default(0),
});

export async function GET(request: Request) {
  const user = await apiUser(SECTION_ROLES.trailers);
  if (user instanceof Response) return user;
  const parsed = querySchema.safeParse(Object.fromEntries(new URL(request.url).searchParams));
  if (!parsed.success) return invalid(parsed.error);
  return Response.json({ trailers: await listTrailers(parsed.data) });
}
