import { z } from 'zod';
import { listTrailers } from '@/db/queries/trailers';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { route } from '@/lib/server/api';
import { plainText } from '@/lib/validation/text';

const querySchema = z.object({
  q: plainText(40).optional(),
  limit: z.coerce.number().int().min(1).max(200).default(50),
  offset: z.coerce.number().int().min(0).default(0),
});

export const GET = route({ access: SECTION_ROLES.trailers, query: querySchema }, async ({ query }) =>
  Response.json({ trailers: await listTrailers(query) }),
);
