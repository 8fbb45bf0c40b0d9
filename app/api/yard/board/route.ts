import { createHash } from 'node:crypto';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { route } from '@/lib/server/api';
import { readBoard } from '@/lib/server/yard/board';

// The board for SWR, refreshed every few seconds. `no-cache` (not `no-store`): the browser keeps
// the last answer and asks again with If-None-Match; when nothing on the board moved, the answer
// is a bodiless 304 instead of the whole board again.
export const dynamic = 'force-dynamic';

export const GET = route({ access: SECTION_ROLES.yard }, async ({ user, request }) => {
  const board = await readBoard(user);
  if (!board.ok) return board;
  const { generatedAt: _at, ...content } = board.value;
  const body = JSON.stringify(board.value);
  // the validator covers everything but the time of the answer itself
  const etag = `W/"${createHash('sha256').update(JSON.stringify(content)).digest('base64url').slice(0, 27)}"`;
  const headers = { 'Cache-Control': 'private, no-cache', ETag: etag };
  if (request.headers.get('if-none-match') === etag) return new Response(null, { status: 304, headers });
  return new Response(body, { headers: { ...headers, 'Content-Type': 'application/json' } });
});
