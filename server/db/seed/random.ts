// A small seeded random source for the invented history: the same seed gives the same shop, row for row.
import { v7 as uuidv7 } from "uuid";

export interface Random {
  /** A number in [0, 1). */
  next(): number;
  /** A whole number from lo to hi, both included. */
  int(lo: number, hi: number): number;
  /** A number in [lo, hi). */
  between(lo: number, hi: number): number;
  chance(p: number): boolean;
  pick<T>(items: readonly T[]): T;
  /** One item, each as likely as its weight. */
  weighted<T>(entries: readonly (readonly [T, number])[]): T;
  /** A uuid v7 for the given time, its random part from this source. */
  uuid(msecs: number): string;
}

/** mulberry32 (Tommy Ettinger's public-domain 32-bit generator): tiny, fast and good enough for made-up data. */
export function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4_294_967_296;
  };
}

export function createRandom(seed: number): Random {
  const next = mulberry32(seed);
  const bytes = new Uint8Array(16);
  const random: Random = {
    next,
    int: (lo, hi) => lo + Math.floor(next() * (hi - lo + 1)),
    between: (lo, hi) => lo + next() * (hi - lo),
    chance: (p) => next() < p,
    pick: (items) => {
      if (items.length === 0) throw new Error("nothing to pick from");
      return items[Math.floor(next() * items.length)]!;
    },
    weighted: (entries) => {
      let total = 0;
      for (const [, w] of entries) total += w;
      if (!(total > 0)) throw new Error("no positive weight to pick by");
      let left = next() * total;
      for (const [item, w] of entries) {
        left -= w;
        if (left < 0) return item;
      }
      return entries[entries.length - 1]![0];
    },
    uuid: (msecs) => {
      for (let i = 0; i < 16; i += 4) {
        const word = Math.floor(next() * 4_294_967_296);
        bytes[i] = word & 0xff;
        bytes[i + 1] = (word >>> 8) & 0xff;
        bytes[i + 2] = (word >>> 16) & 0xff;
        bytes[i + 3] = (word >>> 24) & 0xff;
      }
      return uuidv7({ msecs: Math.floor(msecs), random: bytes });
    },
  };
  return random;
}
