// Plots draw at the width they are given; this reads the width their box actually has, so the
// same plot fits a 390-px phone and a side column on a wide screen.
import { useState } from 'react';
import type { LayoutChangeEvent } from 'react-native';

/** Past this a plot only grows its lettering, not its information. */
const MAX_PLOT_WIDTH = 600;

export function useMeasuredWidth(): [number, (e: LayoutChangeEvent) => void] {
  const [width, setWidth] = useState(0);
  const onLayout = (e: LayoutChangeEvent) => {
    const next = Math.min(MAX_PLOT_WIDTH, Math.floor(e.nativeEvent.layout.width));
    if (next !== width) setWidth(next);
  };
  return [width, onLayout];
}
