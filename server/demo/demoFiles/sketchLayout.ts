// Layout decisions of the submittal sketch that are worth testing on their own: which plan scale
// the elevation is drawn at, and where each joint's label goes so that no two labels and no leader
// line cross.

// Engineer's scales a plan sheet uses, in feet per inch (common practice).
const planScalesFtPerIn = [5, 10, 20, 30, 40, 50, 60, 80, 100, 150, 200, 300, 400, 500];

// The largest drawing (smallest feet per inch) whose length fits the width available.
export function chooseScale(lengthFt: number, availableIn: number): number {
  const fits = planScalesFtPerIn.find((s) => lengthFt / s <= availableIn);
  if (fits === undefined) throw new Error(`submittalSketch: ${lengthFt} ft does not fit a plan sheet at 1" = 500'`);
  return fits;
}

export type LabelBox = { x: number; width: number };
export type PlacedLabel = { level: number; left: number; right: number; anchorX: number };

// Two labels get along if, on one level, they do not overlap, and, on different levels, the
// leader of the higher one (rising from the deck at its anchor) does not pass through the lower
// one. Marks at one station share their leader, their labels stacked.
function compatible(a: PlacedLabel, b: PlacedLabel, gap: number): boolean {
  if (a.level === b.level) return a.right + gap <= b.left || b.right + gap <= a.left;
  const [low, high] = a.level < b.level ? [a, b] : [b, a];
  if (Math.abs(low.anchorX - high.anchorX) <= 1) return true;
  return high.anchorX < low.left - 2 || high.anchorX > low.right + 2;
}

// Levels above the deck for the joint labels: a depth-first search, right to left, trying each
// label at the lowest level first and its text to the right of its leader before the left, so
// marks close together form a staircase. The search is capped; past the cap the rest go to the
// top level (a pile-up no real sketch should reach).
export function packLabels(labels: LabelBox[], pageLeft: number, pageRight: number, gap = 6, maxLevel = 7): PlacedLabel[] {
  const order = labels.map((l, i) => ({ ...l, i })).sort((a, b) => b.x - a.x || a.i - b.i);
  const clamp = (left: number, width: number) => Math.min(Math.max(pageLeft, left), pageRight - width);
  const candidates = order.map((label) => {
    const sides = [...new Set([clamp(label.x + 2, label.width), clamp(label.x - 2 - label.width, label.width)])];
    const out: PlacedLabel[] = [];
    for (let level = 0; level <= maxLevel; level++) for (const left of sides) out.push({ level, left, right: left + label.width, anchorX: label.x });
    return out;
  });
  const chosen: PlacedLabel[] = [];
  let steps = 0;
  const search = (k: number): boolean => {
    if (k === order.length) return true;
    for (const c of candidates[k]!) {
      if (++steps > 50_000) return false;
      if (chosen.every((p) => compatible(p, c, gap))) {
        chosen.push(c);
        if (search(k + 1)) return true;
        chosen.pop();
      }
    }
    return false;
  };
  if (!search(0)) for (let k = chosen.length; k < order.length; k++) chosen.push({ ...candidates[k]![0]!, level: maxLevel });
  const result: PlacedLabel[] = new Array(labels.length);
  order.forEach((label, k) => (result[label.i] = chosen[k]!));
  return result;
}
