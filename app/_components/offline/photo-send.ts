'use client';
// One photo's way up, shared by the photo line (online) and the outbox (a photo taken without
// signal): announce under the phone's own photo id → presigned PUT → completion. The phone's id
// makes each step safe to repeat: announced again, the server answers the same photo.

/** A photo shrunk and hashed on the phone, ready to leave (kept with its bytes in IndexedDB). */
export type PreparedPhoto = {
  photoId: string;
  trailerId: string;
  itemKey: string;
  contentType: string;
  byteSize: number;
  sha256: string;
  capturedAt: string | null;
  bytes: ArrayBuffer;
};

/** The server looked at the photo and said no: trying again later will not help. */
export class PhotoRefused extends Error {}

/** Answers worth another try later: no answer, the server down, signed out meanwhile, too many. */
const isRetryable = (status: number) => status >= 500 || [401, 408, 429].includes(status);

async function post(url: string, body: unknown, fallback: string) {
  const res = await fetch(url, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify(body),
  });
  const answer = (await res.json().catch(() => ({}))) as Record<string, unknown>;
  if (res.ok) return answer;
  if (isRetryable(res.status)) throw new Error(`status ${res.status}`);
  throw new PhotoRefused(typeof answer.message === 'string' ? answer.message : fallback);
}

/** The presigned PUT, through XMLHttpRequest: fetch cannot report upload progress. */
function put(url: string, headers: Record<string, string>, body: Blob, onProgress: (f: number) => void) {
  return new Promise<void>((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('PUT', url);
    for (const [k, v] of Object.entries(headers)) xhr.setRequestHeader(k, v);
    xhr.upload.onprogress = (e) => e.lengthComputable && onProgress(e.loaded / e.total);
    xhr.onload = () => (xhr.status < 300 ? resolve() : reject(new Error(`upload ${xhr.status}`)));
    xhr.onerror = () => reject(new Error('network'));
    xhr.ontimeout = () => reject(new Error('timeout'));
    xhr.timeout = 120_000;
    xhr.send(body);
  });
}

/**
 * Sends one prepared photo. Throws PhotoRefused when the server refuses it, any other error when
 * the signal or the server failed (the caller keeps the photo and tries again).
 */
export async function sendPhoto(
  p: PreparedPhoto,
  words: { announce: string; refused: string },
  onProgress: (fraction: number) => void = () => undefined,
): Promise<void> {
  const { bytes: _bytes, capturedAt, ...announcement } = p;
  const answer = await post('/api/uploads', announcement, words.announce);
  if (typeof answer.uploadUrl === 'string') {
    const headers = (answer.headers ?? {}) as Record<string, string>;
    await put(answer.uploadUrl, headers, new Blob([p.bytes], { type: p.contentType }), onProgress);
  }
  onProgress(1);
  await post(`/api/uploads/${p.photoId}/complete`, { capturedAt }, words.refused);
}
