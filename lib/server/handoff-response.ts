import 'server-only';
import { CAUTIONS } from '@/app/_components/caution';
import { HandoffError } from '@/lib/handoff-errors';
import { apiError } from './api';

/** A HandoffError as the API's `{ code, message, fieldErrors }`; a refused hook adds its holds and the cautions. */
export function handoffErrorResponse(error: HandoffError): Response {
  if (error.holds?.length) {
    return Response.json(
      {
        code: error.code,
        message: error.message,
        holds: error.holds.map((h) => ({ reason: h.reason, severity: h.severity })),
        cautions: [CAUTIONS.outOfService, CAUTIONS.inspection],
      },
      { status: 409 },
    );
  }
  return apiError(error.code, error.message, error.fieldErrors);
}
