/**
 * One key per checkout attempt (8–100 characters of A–Z, a–z, 0–9, _ and -). A repeated submission of the
 * same attempt sends the same key, so the server charges once.
 */
export function newCheckoutKey(): string {
  if (typeof crypto.randomUUID === 'function') return crypto.randomUUID();
  // randomUUID needs a secure page (https or localhost); getRandomValues does not.
  return Array.from(crypto.getRandomValues(new Uint8Array(16)), (byte) => byte.toString(16).padStart(2, '0')).join('');
}
