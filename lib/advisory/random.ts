/**
 * Seeded pseudo-random numbers for reproducible Monte Carlo runs.
 *
 * - Generator: xoshiro128** (Blackman & Vigna 2021, "Scrambled linear pseudorandom number generators",
 *   ACM Trans. Math. Softw. 47(4), 36), 128-bit state, 32-bit output, period 2^128 − 1.
 * - Seeding: the 128-bit state is filled from SplitMix64 (Steele, Lea & Flood 2014, "Fast splittable
 *   pseudorandom number generators", OOPSLA '14, 453), as Blackman & Vigna recommend, so that nearby
 *   seeds give unrelated streams and the state is never all zero.
 * - Normal deviates: Box–Muller transform (Box & Muller 1958, Ann. Math. Stat. 29, 610).
 */

export interface Rng {
  /** Uniform on [0, 1), 32 bits of resolution. */
  uniform(): number;
  /** Uniform 32-bit unsigned integer. */
  nextUint32(): number;
  /** Normal deviate with the given mean and standard deviation (defaults 0 and 1). */
  normal(mean?: number, standardDeviation?: number): number;
}

const MASK64 = (1n << 64n) - 1n;

/** One SplitMix64 step: returns [output, next state]; 64-bit arithmetic done in BigInt. */
export function splitMix64(state: bigint): [bigint, bigint] {
  const next = (state + 0x9e3779b97f4a7c15n) & MASK64;
  let z = next;
  z = ((z ^ (z >> 30n)) * 0xbf58476d1ce4e5b9n) & MASK64;
  z = ((z ^ (z >> 27n)) * 0x94d049bb133111ebn) & MASK64;
  z = z ^ (z >> 31n);
  return [z, next];
}

const rotl = (x: number, k: number): number => ((x << k) | (x >>> (32 - k))) >>> 0;

/**
 * A generator for `seed` (any safe integer) and an optional `stream` index. Each (seed, stream) pair is
 * its own reproducible sequence; Monte Carlo sample i uses stream i so its draws do not depend on how many
 * other samples ran before it.
 */
export function createRng(seed: number, stream = 0): Rng {
  if (!Number.isSafeInteger(seed)) throw new RangeError(`seed must be a safe integer, got ${seed}`);
  if (!Number.isSafeInteger(stream) || stream < 0) throw new RangeError(`stream must be a non-negative safe integer, got ${stream}`);
  // SplitMix64 starting state: the seed hashed once, then offset by stream × a second odd constant, so that
  // every (seed, stream) pair starts from its own state.
  const [seedHash] = splitMix64(BigInt.asUintN(64, BigInt(seed)));
  let sm = (seedHash + BigInt(stream) * 0xd1b54a32d192ed03n) & MASK64;
  const words: number[] = [];
  for (let i = 0; i < 2; i++) {
    const [out, next] = splitMix64(sm);
    sm = next;
    words.push(Number(out & 0xffffffffn), Number(out >> 32n));
  }
  const s = Uint32Array.from(words);
  if ((s[0] | s[1] | s[2] | s[3]) === 0) s[0] = 1; // the all-zero state is the one fixed point; never reached in practice

  const nextUint32 = (): number => {
    const result = Math.imul(rotl(Math.imul(s[1], 5) >>> 0, 7), 9) >>> 0;
    const t = (s[1] << 9) >>> 0;
    s[2] ^= s[0];
    s[3] ^= s[1];
    s[1] ^= s[2];
    s[0] ^= s[3];
    s[2] ^= t;
    s[3] = rotl(s[3], 11);
    return result;
  };
  const uniform = (): number => nextUint32() / 4294967296;

  let spare: number | undefined;
  const normal = (mean = 0, standardDeviation = 1): number => {
    let z: number;
    if (spare !== undefined) {
      z = spare;
      spare = undefined;
    } else {
      // Box–Muller: z0 = sqrt(−2 ln u1) cos(2π u2), z1 = sqrt(−2 ln u1) sin(2π u2); u1 in (0, 1] avoids ln 0.
      const u1 = 1 - uniform();
      const u2 = uniform();
      const radius = Math.sqrt(-2 * Math.log(u1));
      z = radius * Math.cos(2 * Math.PI * u2);
      spare = radius * Math.sin(2 * Math.PI * u2);
    }
    return mean + standardDeviation * z;
  };

  return { uniform, nextUint32, normal };
}
