import { z } from 'zod';
import { getReceiptByCode } from '@/db/queries/handoffs';
import { refuse } from '@/lib/result';
import { route } from '@/lib/server/api';
import { verificationCodeSchema } from '@/lib/validation/handoffs';

const paramsSchema = z.object({
  code: z
    .string()
    // a stray % in the path (found by the fuzz suite) is not a code, not a 500
    .transform((c, ctx) => {
      try {
        return decodeURIComponent(c);
      } catch {
        ctx.addIssue({ code: 'custom', message: 'Not a verification code.' });
        return z.NEVER;
      }
    })
    .pipe(verificationCodeSchema),
});

/** Public: what the receipt with this verification code shows, photo count but no photos. */
export const GET = route(
  { access: 'public', params: paramsSchema, notFound: 'No receipt has this code.' },
  async ({ params }) => {
    const r = await getReceiptByCode(params.code);
    if (!r) return refuse('not_found', 'No receipt has this code.');
    return Response.json({
      receipt: {
        unitNumber: r.unitNumber,
        kind: r.kind,
        occurredAt: r.occurredAt,
        terminalName: r.terminalName,
        carrierName: r.carrierName,
        driverName: r.driverName,
        tractorNumber: r.tractorNumber,
        isLoaded: r.isLoaded,
        sealNumber: r.sealNumber,
        fuelEighths: r.fuelEighths,
        verificationCode: r.verificationCode,
        contentHash: r.contentHash,
        findings: r.findings.map((f) => ({ kind: f.kind, reason: f.reason })),
        holds: r.holds,
        photoCount: r.photos.length,
      },
    });
  },
);
