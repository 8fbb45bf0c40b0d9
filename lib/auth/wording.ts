// Hitchmark's words for sign-in refusals. A wrong name and a wrong secret read the same, so the
// message never tells whether an account exists.
export function wrongSecretMessage(method: 'driver' | 'staff'): string {
  return method === 'staff'
    ? 'That e-mail and password do not match.'
    : 'That driver number and PIN do not match.';
}

export function lockedMessage(seconds: number): string {
  return `Too many failed attempts. Try again in ${seconds} seconds.`;
}
