import seedrandom from 'seedrandom';

/** Patches per random stream. Part of the result's definition: changing it changes every run. */
export const BLOCK_SIZE = 4096;

/**
 * Seed words for the stream of one block of patches in one replicate.
 *
 * Derivation (stable; documented for developers): the ARC4-based generator of seedrandom is keyed
 * with the string `patchcast:v1|<run seed>|replicate <r>|block <b>` (r and b 0-based, b = patch
 * index ÷ 4096), and its first four `int32()` outputs, as unsigned words, are the xoshiro128**
 * state s0…s3 (an all-zero state, probability 2⁻¹²⁸, becomes s0 = 1). Each block's stream is
 * therefore a function of (run seed, replicate, block) only, so a run gives the same result however
 * its patches are split over shards, workers or threads.
 */
export function blockSeed(runSeed: string, replicate: number, block: number): Uint32Array {
  return seedWords(`${runSeed}|replicate ${replicate}|block ${block}`);
}

/** Four xoshiro128** state words from seedrandom keyed with `patchcast:v1|<key>`. */
function seedWords(key: string): Uint32Array {
  const keyed = seedrandom(`patchcast:v1|${key}`);
  const words = new Uint32Array(4);
  for (let i = 0; i < 4; i++) words[i] = keyed.int32() >>> 0;
  if ((words[0] | words[1] | words[2] | words[3]) === 0) words[0] = 1;
  return words;
}

/**
 * xoshiro128** 1.1 (Blackman & Vigna, "Scrambled linear pseudorandom number generators", 2021;
 * reference C at https://prng.di.unimi.it/xoshiro128starstar.c): 32-bit output, period 2¹²⁸ − 1.
 * The simulation kernel inlines these same lines in its hot loop; a test checks they agree.
 */
export class Xoshiro128 {
  private s0: number;
  private s1: number;
  private s2: number;
  private s3: number;

  constructor(seed: Uint32Array) {
    this.s0 = seed[0] | 0;
    this.s1 = seed[1] | 0;
    this.s2 = seed[2] | 0;
    this.s3 = seed[3] | 0;
  }

  /** Next raw 32-bit draw as an unsigned integer. */
  nextUint32(): number {
    const m = Math.imul(this.s1, 5);
    const result = Math.imul((m << 7) | (m >>> 25), 9) >>> 0;
    const t = this.s1 << 9;
    this.s2 ^= this.s0;
    this.s3 ^= this.s1;
    this.s1 ^= this.s2;
    this.s0 ^= this.s3;
    this.s2 ^= t;
    this.s3 = (this.s3 << 11) | (this.s3 >>> 21);
    return result;
  }

  /** Uniform on [0, 1) with 53 random bits (two draws). */
  nextFloat(): number {
    return ((this.nextUint32() >>> 5) * 67108864 + (this.nextUint32() >>> 6)) / 9007199254740992;
  }
}

/** A seeded stream for work outside the kernel (start states, posterior draws), keyed by a label. */
export function createStream(runSeed: string, label: string): Xoshiro128 {
  return new Xoshiro128(seedWords(`${runSeed}|${label}`));
}
