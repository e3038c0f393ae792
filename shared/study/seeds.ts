import type { Road } from '../schemas/road.ts';

/**
 * Road seeds of a seed ensemble. Seed index 0 is the road's own seed, so a one-seed study is
 * exactly the study it always was; index k > 0 is a 32-bit mix of (seed, k) — the finaliser of
 * MurmurHash3 (Appleby's public-domain hash, from memory) over the seed plus k times the golden
 * ratio constant — so every machine derives the same seeds, neighbouring seeds and indices give
 * unrelated profiles, and no list of seeds has to be stored.
 */
export function ensembleSeed(roadSeed: number, seedIndex: number): number {
  if (seedIndex === 0) return roadSeed;
  let h = (roadSeed + Math.imul(seedIndex, 0x9e3779b9)) >>> 0;
  h ^= h >>> 16;
  h = Math.imul(h, 0x85ebca6b);
  h ^= h >>> 13;
  h = Math.imul(h, 0xc2b2ae35);
  h ^= h >>> 16;
  return h >>> 0;
}

/** Only ISO 8608 roads are drawn from a seed; event and measured roads are the same for every seed. */
export function roadTakesSeeds(road: Pick<Road, 'kind'>): boolean {
  return road.kind === 'iso8608';
}
