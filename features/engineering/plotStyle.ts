// One look for every engineering plot: slate for structure and lines, amber only where the
// reader should be careful (negative moment, closing joints). Plots draw in a fixed 390-unit-wide
// coordinate space and scale to the width they are given, so text stays readable on a phone.
import { colors, fonts } from '../ui/theme';

export const plotColors = {
  line: '#1F3A4D',
  caution: '#8A5A00',
  cautionBg: '#FFF4DA',
  grid: colors.line,
  muted: colors.inkMuted,
  surface: colors.surface,
  positiveFill: colors.slateLight,
} as const;

export const plotFont = 'WorkSans_400Regular' satisfies (typeof fonts)['regular'];

/** Width of the drawing coordinate space; a 390-px phone shows it at one unit per pixel. */
export const VIEW_WIDTH = 390;

// Sized for a plot drawn about 330 px wide inside a panel on a phone, where it shrinks by a sixth.
export const fontSize = { label: 13, small: 11.5, title: 14 } as const;

export function viewBoxFor(viewHeight: number): string {
  return `0 0 ${VIEW_WIDTH} ${viewHeight}`;
}

/** Rendered height for a given width, keeping the drawing's proportions. */
export function heightFor(width: number, viewHeight: number): number {
  return (width * viewHeight) / VIEW_WIDTH;
}
