/** A version-4-shaped UUID from a seeded generator, so the demo's ids are the same on every machine. */
export function seededUuid(uniform: () => number): string {
  const bytes = Array.from({ length: 16 }, () => Math.floor(uniform() * 256));
  bytes[6] = (bytes[6] & 0x0f) | 0x40;
  bytes[8] = (bytes[8] & 0x3f) | 0x80;
  const hex = bytes.map((b) => b.toString(16).padStart(2, '0')).join('');
  return `${hex.slice(0, 8)}-${hex.slice(8, 12)}-${hex.slice(12, 16)}-${hex.slice(16, 20)}-${hex.slice(20)}`;
}
