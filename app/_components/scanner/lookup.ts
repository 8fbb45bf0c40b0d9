// Client side of GET /api/trailers/lookup. Every answer, good or bad, becomes a value to show.
export interface ScannedTrailer {
  id: string;
  unitNumber: string;
  vin: string;
  kind: 'reefer' | 'dry_van';
  ownerScac: string;
  status: 'in_yard' | 'on_road' | 'gone';
}

export type LookupQuery = { token: string } | { unit: string } | { vin: string };
export type LookupResult =
  { ok: true; trailer: ScannedTrailer } | { ok: false; status: number; message: string };

export async function lookupTrailer(query: LookupQuery, signal?: AbortSignal): Promise<LookupResult> {
  const params = new URLSearchParams(query as Record<string, string>);
  let response: Response;
  try {
    response = await fetch(`/api/trailers/lookup?${params}`, {
      signal,
      headers: { accept: 'application/json' },
    });
  } catch {
    return { ok: false, status: 0, message: 'No connection to Hitchmark. Check the signal and try again.' };
  }
  const body = (await response.json().catch(() => null)) as {
    trailer?: ScannedTrailer;
    message?: string;
  } | null;
  if (response.ok && body?.trailer) return { ok: true, trailer: body.trailer };
  if (response.status === 401)
    return { ok: false, status: 401, message: 'Your session ended. Sign in again.' };
  return {
    ok: false,
    status: response.status,
    message: body?.message ?? 'Hitchmark could not look that trailer up. Try again.',
  };
}
