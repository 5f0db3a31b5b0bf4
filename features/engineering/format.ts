// Numbers as the plots and their spoken summaries show them. Hyphen-minus, not the typographic
// minus, so screen readers say "minus".
export function ft(x: number, digits = 1): string {
  return `${x.toFixed(digits)} ft`;
}

export function kipFt(m: number): string {
  return `${Math.round(m)} kip-ft`;
}

export function inches(x: number, digits = 2): string {
  return `${x.toFixed(digits)} in`;
}

export function degF(t: number): string {
  return `${Number(t.toFixed(1))} °F`;
}

export function listOf(items: string[]): string {
  if (items.length <= 1) return items.join('');
  return `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`;
}
