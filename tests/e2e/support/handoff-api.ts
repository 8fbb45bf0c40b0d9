// Records handoffs through the gate's real API (uploads to the fake S3, POST /api/handoffs) with a
// signed-in page's cookies, so the desk's e2e starts from a case the gate itself opened.
import { createHash, randomUUID } from 'node:crypto';
import { expect, type APIRequestContext } from '@playwright/test';
import { PNG } from 'pngjs';
import { Pool } from 'pg';
import { buildChecklist } from '../../../lib/engine';
import { databaseUrl } from '../../../db/url';

/** A small solid-colour PNG, so the before and after photos differ. */
export function solidPng(rgb: [number, number, number], size = 48): Buffer {
  const png = new PNG({ width: size, height: size });
  for (let i = 0; i < size * size; i++) png.data.set([...rgb, 255], i * 4);
  return PNG.sync.write(png);
}

type TrailerShape = {
  id: string;
  unitNumber: string;
  hingesPerDoor: number;
  axleCount: number;
  tireLayout: 'dual' | 'wide_single';
};

/** A reefer on the road that no handoff has touched yet, and a carrier's id, straight from the e2e database. */
export async function untouchedTrailer(scac: string): Promise<{ trailer: TrailerShape; carrierId: string }> {
  const pool = new Pool({ connectionString: databaseUrl() });
  try {
    const { rows } = await pool.query(
      `select id, unit_number as "unitNumber", hinges_per_door as "hingesPerDoor", axle_count as "axleCount", tire_layout as "tireLayout"
         from trailers t where status = 'on_road' and kind = 'reefer' and unit_number like 'R53%'
          and not exists (select 1 from handoffs h where h.trailer_id = t.id) order by unit_number limit 1`,
    );
    const carrier = await pool.query('select id from carriers where scac = $1', [scac]);
    return { trailer: rows[0], carrierId: carrier.rows[0].id };
  } finally {
    await pool.end();
  }
}

export async function uploadPhoto(
  api: APIRequestContext,
  trailerId: string,
  itemKey: string,
  bytes: Buffer,
  /** When the phone says it was taken (as the camera's EXIF tells the upload); none by default. */
  capturedAt?: Date,
): Promise<string> {
  const sha256 = createHash('sha256').update(bytes).digest('hex');
  const started = await api.post('/api/uploads', {
    data: { trailerId, itemKey, contentType: 'image/png', byteSize: bytes.length, sha256 },
  });
  expect(started.status(), await started.text()).toBe(201);
  const { photoId, uploadUrl, headers } = await started.json();
  const put = await api.put(uploadUrl, { data: bytes, headers });
  expect(put.ok()).toBe(true);
  const done = await api.post(`/api/uploads/${photoId}/complete`, {
    ...(capturedAt ? { data: { capturedAt: capturedAt.toISOString() } } : {}),
  });
  expect((await done.json()).status).toBe('stored');
  return photoId;
}

type Obs = Record<string, unknown> & { condition: string };

export function allOkItems(t: {
  hingesPerDoor: number;
  axleCount: number;
  tireLayout: 'dual' | 'wide_single';
}): Record<string, Obs> {
  const out: Record<string, Obs> = {};
  for (const i of buildChecklist({
    kind: 'reefer',
    hingesPerDoor: t.hingesPerDoor === 5 ? 5 : 4,
    axles: t.axleCount,
    tireLayout: t.tireLayout,
  }).items) {
    if (i.kind === 'reading') continue;
    const o: Obs = { condition: 'ok' };
    if (i.kind === 'pin') o.isEngaged = true;
    if (i.kind === 'hinge') o.isLocking = true;
    if (i.kind === 'leak') o.isLeaking = false;
    if (i.kind === 'spare') Object.assign(o, { isMounted: true, isHoldingAir: true });
    if (i.kind === 'tire') Object.assign(o, { treadThirtySeconds: 12, isHoldingAir: true });
    out[i.key] = o;
  }
  return out;
}

export async function submitHandoff(
  api: APIRequestContext,
  trailerId: string,
  carrierId: string,
  kind: 'drop' | 'hook',
  items: Record<string, Obs>,
) {
  const response = await api.post('/api/handoffs', {
    data: {
      idempotencyKey: `e2e-desk-${randomUUID()}`,
      trailerId,
      kind,
      carrierId,
      driverName: 'Lev Marchetti',
      tractorNumber: 'OS-118',
      isLoaded: false,
      sealNumber: null,
      fuelEighths: 8,
      reefer: {
        isUnitOn: true,
        setpointF: 34,
        returnAirF: 35,
        engineHours: 5120,
        preTripResult: 'pass',
        preTripAt: new Date(Date.now() - 3_600_000).toISOString(),
      },
      items,
      spotId: null,
      note: null,
    },
  });
  expect(response.status(), await response.text()).toBe(201);
  return (await response.json()).handoff.id as string;
}
