/**
 * The key a form or a phone makes once for a thing it sends (a progress mark, a payment), so the same
 * thing sent again — a retry after a lost answer, a phone back online — is recorded once: the API finds
 * the first by its key. A random (version 4) UUID; `crypto.randomUUID` only exists on secure pages,
 * `getRandomValues` everywhere.
 */
export function newClientKey(random: (bytes: Uint8Array) => Uint8Array = (bytes) => crypto.getRandomValues(bytes)): string {
  const b = random(new Uint8Array(16));
  b[6] = (b[6] & 0x0f) | 0x40;
  b[8] = (b[8] & 0x3f) | 0x80;
  const hex = Array.from(b, (x) => x.toString(16).padStart(2, '0')).join('');
  return `${hex.slice(0, 8)}-${hex.slice(8, 12)}-${hex.slice(12, 16)}-${hex.slice(16, 20)}-${hex.slice(20)}`;
}
