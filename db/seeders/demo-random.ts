/** Seeded randomness for the demo data, so the demo network is the same on every machine. */

export type Random = () => number;

/** A tiny seeded generator (mulberry32). */
export function mulberry32(seed: number): Random {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** A whole number from low to high, both included. */
export const between = (random: Random, low: number, high: number) =>
  low + Math.floor(random() * (high - low + 1));
export const pick = <T>(random: Random, items: readonly T[]): T =>
  items[between(random, 0, items.length - 1)];
export const chance = (random: Random, p: number) => random() < p;
/** A number from low to high. */
export const uniform = (random: Random, low: number, high: number) => low + random() * (high - low);

/** `n` of the items, each as likely as any other, in a random order. */
export function sample<T>(random: Random, items: readonly T[], n: number): T[] {
  const keyed = items.map((item) => [random(), item] as const);
  return keyed
    .sort((a, b) => a[0] - b[0])
    .slice(0, n)
    .map(([, item]) => item);
}

/** One of the items, each as likely as its weight; null when no weight is above 0. */
export function pickWeighted<T>(
  random: Random,
  items: ReadonlyArray<readonly [T, number]>,
): T | null {
  const total = items.reduce((sum, [, weight]) => sum + Math.max(0, weight), 0);
  if (total <= 0) return null;
  let left = random() * total;
  for (const [item, weight] of items) {
    left -= Math.max(0, weight);
    if (left < 0 && weight > 0) return item;
  }
  return items.filter(([, weight]) => weight > 0).at(-1)![0];
}
