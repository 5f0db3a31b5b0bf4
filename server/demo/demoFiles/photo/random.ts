// A small seeded generator (mulberry32) so a photo is the same bytes for the same seed on every
// machine; Math.random would make every seed run a new picture.
export type Random = {
  next(): number;
  range(min: number, max: number): number;
  int(min: number, max: number): number;
  pick<T>(items: readonly T[]): T;
  // Roughly normal, mean 0 and deviation 1 (sum of three uniforms, good enough for grain and jitter).
  normal(): number;
};

export function seededRandom(seed: number): Random {
  let state = (Math.floor(seed) ^ 0x9e3779b9) >>> 0;
  const next = () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  return {
    next,
    range: (min, max) => min + (max - min) * next(),
    int: (min, max) => Math.floor(min + (max - min + 1) * next()),
    pick: (items) => items[Math.floor(next() * items.length)]!,
    normal: () => (next() + next() + next() - 1.5) * 2,
  };
}
