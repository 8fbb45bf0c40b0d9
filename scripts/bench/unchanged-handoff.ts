// The input of an unchanged handoff — every item ok, the reefer unit off after a passed pre-trip,
// the tank full, empty and unsealed — that the load benchmark posts (measure.ts) and the
// query-plan test submits (tests/unit/db/query-plans.test.ts): one shape for both.
import { allOkObservations } from '@/lib/handoffs/all-ok';
import { checklistOf, type TrailerShape } from '@/lib/trailers/checklist';
import type { HandoffSubmitInput } from '@/lib/validation/handoffs';

export function unchangedHandoff(o: {
  idempotencyKey: string;
  trailerId: string;
  trailer: TrailerShape;
  kind: 'drop' | 'hook';
  carrierId: string;
  driverName: string;
}): HandoffSubmitInput {
  const isReefer = o.trailer.kind === 'reefer';
  return {
    idempotencyKey: o.idempotencyKey,
    trailerId: o.trailerId,
    kind: o.kind,
    carrierId: o.carrierId,
    driverName: o.driverName,
    tractorNumber: 'T4242',
    isLoaded: false,
    sealNumber: null,
    fuelEighths: isReefer ? 8 : null,
    reefer: isReefer
      ? {
          isUnitOn: false,
          setpointF: null,
          returnAirF: null,
          engineHours: 9000,
          preTripResult: 'pass',
          preTripAt: new Date(Date.now() - 3_600_000).toISOString(),
        }
      : null,
    items: allOkObservations(checklistOf(o.trailer)),
    spotId: null,
    note: null,
  };
}
