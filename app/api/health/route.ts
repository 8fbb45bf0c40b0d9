import { pingDatabase } from '@/db/queries/health';
import { route } from '@/lib/server/api';

export const dynamic = 'force-dynamic';

export const GET = route({ access: 'public' }, async () => {
  await pingDatabase();
  return Response.json({ ok: true });
});
