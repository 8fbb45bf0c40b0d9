import { getTrailerById, getTrailerByUnit, getTrailerByVin } from '@/db/queries/trailer-lookup';
import { NOT_OUR_LABEL, replacedMessage } from '@/lib/labels/wording';
import { ROLES } from '@/lib/roles';
import { apiError, invalid } from '@/lib/server/api';
import { apiUser } from '@/lib/server/auth';
import { resolveLabelToken } from '@/lib/server/labels';
import { trailerLookupSchema } from '@/lib/validation/labels';

// Drivers, jockeys, clerks and admins all look trailers up (gate, moves, walks). Any trailer:
// a driver may hook equipment of another carrier, and the answer holds nothing private.
export async function GET(request: Request) {
  const user = await apiUser(ROLES);
  if (user instanceof Response) return user;
  const parsed = trailerLookupSchema.safeParse(Object.fromEntries(new URL(request.url).searchParams));
  // the first problem is the message (say, a VIN's wrong check digit); all of them are in fieldErrors
  if (!parsed.success) return invalid(parsed.error, parsed.error.issues[0]?.message);
  const q = parsed.data;

  if (q.token !== undefined) {
    const label = await resolveLabelToken(q.token);
    if (!label.ok && label.error === 'revoked')
      return apiError('gone', replacedMessage(label.replacedAt, user.terminalTimeZone ?? 'UTC'));
    if (!label.ok) return apiError('invalid', NOT_OUR_LABEL, { token: [NOT_OUR_LABEL] });
    const trailer = await getTrailerById(label.trailerId);
    if (!trailer) return apiError('not_found', 'This label belongs to a trailer Hitchmark no longer knows.');
    return Response.json({ trailer, via: 'token' });
  }
  if (q.unit !== undefined) {
    const trailer = await getTrailerByUnit(q.unit);
    if (!trailer)
      return apiError(
        'not_found',
        `No trailer with unit number ${q.unit}. Check the number on the nose or the doors.`,
      );
    return Response.json({ trailer, via: 'unit' });
  }
  const trailer = await getTrailerByVin(q.vin!);
  if (!trailer) return apiError('not_found', `No trailer with VIN ${q.vin}. Try the unit number instead.`);
  return Response.json({ trailer, via: 'vin' });
}
