import { getReceiptByCode } from '@/db/queries/handoffs';
import { apiError, invalid } from '@/lib/server/api';
import { verificationCodeSchema } from '@/lib/validation/handoffs';

/** Public: what the receipt with this verification code shows, photo count but no photos. */
export async function GET(_request: Request, ctx: RouteContext<'/api/verify/[code]'>) {
  const code = verificationCodeSchema.safeParse(decodeURIComponent((await ctx.params).code));
  if (!code.success) return invalid(code.error, 'That is not a verification code.');
  const r = await getReceiptByCode(code.data);
  if (!r) return apiError('not_found', 'No receipt has this code.');
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
}
