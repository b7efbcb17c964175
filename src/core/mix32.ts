/**
 * One 32-bit integer hash finaliser, shared by the seeded generators and the row hashes.
 */

/**
 * The 32-bit integer finaliser of diagnostics/random.ts's `seededRandom` and of the streamed sample's
 * generator (data/row-source.ts) ("lowbias32", C. Wellons, "Prospecting for
 * hash functions", 2018): xor-shift, multiply, xor-shift, multiply, xor-shift; every input bit
 * reaches every output bit. Returns an unsigned 32-bit integer. Leakage hashes rows with it too.
 */
export function mix32(z: number): number {
  z ^= z >>> 16;
  z = Math.imul(z, 0x7feb352d);
  z ^= z >>> 15;
  z = Math.imul(z, 0x846ca68b);
  z ^= z >>> 16;
  return z >>> 0;
}
