// The one place that decides how wide the window is. Phone below 768 px (bottom tabs, one column);
// wide from 1024 px (side navigation, list and detail side by side); between, side navigation
// with one column.
import { useWindowDimensions } from 'react-native';

export const breakpoints = { sideNavigation: 768, listBesideDetail: 1024 } as const;

export type WindowClass = 'phone' | 'tablet' | 'wide';

export function windowClassOf(width: number): WindowClass {
  if (width >= breakpoints.listBesideDetail) return 'wide';
  if (width >= breakpoints.sideNavigation) return 'tablet';
  return 'phone';
}

export function useBreakpoint() {
  const { width } = useWindowDimensions();
  const windowClass = windowClassOf(width);
  return { width, windowClass, isPhone: windowClass === 'phone', isWide: windowClass === 'wide' };
}
