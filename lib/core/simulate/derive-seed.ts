/**
 * deriveSeed: an independent 32-bit seed for one named random stream, from a parent seed.
 *
 * The label is hashed with 32-bit FNV-1a (Fowler, Noll & Vo; offset basis 2166136261, prime 16777619),
 * combined with the parent seed and passed through the MurmurHash3 32-bit finaliser (Appleby, 2011)
 * so that nearby parents and labels give unrelated streams. Giving each concern (throughput, noise,
 * gaps...) its own stream keeps the draws of one concern unchanged when another changes.
 *
 * @param seed parent seed (reduced to unsigned 32 bits).
 * @param label stream name, e.g. "throughput" or "E-1101/noise".
 * @returns unsigned 32-bit integer.
 * @example deriveSeed(20240901, "E-1101") // a fixed number
 */
export function deriveSeed(seed: number, label: string): number {
  let hash = 2166136261;
  for (let index = 0; index < label.length; index += 1) {
    hash ^= label.charCodeAt(index);
    hash = Math.imul(hash, 16777619);
  }
  let mixed = (hash ^ Math.imul((Math.trunc(seed) >>> 0) ^ 0x9e3779b9, 0x85ebca6b)) >>> 0;
  mixed ^= mixed >>> 16;
  mixed = Math.imul(mixed, 0x85ebca6b);
  mixed ^= mixed >>> 13;
  mixed = Math.imul(mixed, 0xc2b2ae35);
  mixed ^= mixed >>> 16;
  return mixed >>> 0;
}
