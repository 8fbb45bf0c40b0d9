import { getTrailerById, getTrailerByUnit, getTrailerByVin } from '@/db/queries/trailer-lookup';
import { ROLES } from '@/lib/auth/roles';
import { NOT_OUR_LABEL, replacedMessage } from '@/lib/labels/wording';
import { refuse } from '@/lib/result';
import { route } from '@/lib/server/api';
import { requestLocale } from '@/lib/server/i18n/request';
import { resolveLabelToken } from '@/lib/server/labels';
import { trailerLookupSchema } from '@/lib/validation/labels';

// Drivers, jockeys, clerks and admins all look trailers up (gate, moves, walks). Any trailer:
// a driver may hook equipment of another carrier, and the answer holds nothing private.
export const GET = route({ access: ROLES, query: trailerLookupSchema }, async ({ user, query: q }) => {
  if (q.token !== undefined) {
    const label = await resolveLabelToken(q.token);
    if (!label.ok && label.error === 'revoked')
      return refuse(
        'gone',
        replacedMessage(label.replacedAt, user.terminalTimeZone ?? 'UTC', await requestLocale()),
      );
    if (!label.ok) return refuse('invalid', NOT_OUR_LABEL, { token: [NOT_OUR_LABEL] });
    const trailer = await getTrailerById(label.trailerId);
    if (!trailer) return refuse('not_found', 'This label belongs to a trailer Hitchmark no longer knows.');
    return Response.json({ trailer, via: 'token' });
  }
  if (q.unit !== undefined) {
    const trailer = await getTrailerByUnit(q.unit);
    if (!trailer)
      return refuse(
        'not_found',
        `No trailer with unit number ${q.unit}. Check the number on the nose or the doors.`,
      );
    return Response.json({ trailer, via: 'unit' });
  }
  const trailer = await getTrailerByVin(q.vin!);
  if (!trailer) return refuse('not_found', `No trailer with VIN ${q.vin}. Try the unit number instead.`);
  return Response.json({ trailer, via: 'vin' });
});
