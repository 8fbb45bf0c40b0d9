import { z } from 'zod';
import { refuse } from '@/lib/result';
import { route } from '@/lib/server/api';
import { checkReceipt } from '@/lib/server/handoffs/verify';
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

/**
 * Public: whether the record still matches what was receipted (recomputed from what is stored
 * now), and only when it does, what the receipt shows (photo count but no photos).
 */
export const GET = route(
  { access: 'public', params: paramsSchema, notFound: 'No receipt has this code.' },
  async ({ params }) => {
    const checked = await checkReceipt(params.code);
    if (!checked) return refuse('not_found', 'No receipt has this code.');
    if (checked.status !== 'genuine')
      return Response.json({ status: checked.status, message: checked.message });
    const r = checked.receipt;
    return Response.json({
      status: 'genuine',
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
