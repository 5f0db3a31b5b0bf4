// Spanrelay's own line icons, drawn on a 24-unit grid with one stroke weight so they read alike at
// tab-bar size. Each is decorative: the control beside it carries the label.
import Svg, { Circle, Path, Rect } from 'react-native-svg';

export type IconName = 'desk' | 'register' | 'newRequest' | 'conditions' | 'trail' | 'people' | 'signOut';

const shapes: Record<IconName, (color: string) => React.ReactNode> = {
  // A tray with a sheet dropping into it: work arriving at a desk.
  desk: (c) => (
    <>
      <Path d="M3 14h5l1.5 3h5l1.5-3h5v6H3z" stroke={c} strokeWidth={2} strokeLinejoin="round" fill="none" />
      <Path d="M7 10V4h10v6" stroke={c} strokeWidth={2} strokeLinejoin="round" fill="none" />
      <Path d="M10 7h4" stroke={c} strokeWidth={2} strokeLinecap="round" />
    </>
  ),
  // A ledger: ruled lines with numbered margin ticks.
  register: (c) => (
    <>
      <Rect x={4} y={3} width={16} height={18} rx={2} stroke={c} strokeWidth={2} fill="none" />
      <Path d="M8 8h8M8 12h8M8 16h5" stroke={c} strokeWidth={2} strokeLinecap="round" />
    </>
  ),
  // A sheet with a plus: a new request.
  newRequest: (c) => (
    <>
      <Path d="M6 3h8l4 4v14H6z" stroke={c} strokeWidth={2} strokeLinejoin="round" fill="none" />
      <Path d="M12 10v7M8.5 13.5h7" stroke={c} strokeWidth={2} strokeLinecap="round" />
    </>
  ),
  // A level with its bubble centred: conditions confirmed on site.
  conditions: (c) => (
    <>
      <Rect x={2} y={8} width={20} height={8} rx={2} stroke={c} strokeWidth={2} fill="none" />
      <Circle cx={12} cy={12} r={2} stroke={c} strokeWidth={2} fill="none" />
      <Path d="M8 10v4M16 10v4" stroke={c} strokeWidth={2} strokeLinecap="round" />
    </>
  ),
  // Two linked rings: the hash-chained trail.
  trail: (c) => (
    <>
      <Rect x={2} y={8} width={11} height={8} rx={4} stroke={c} strokeWidth={2} fill="none" />
      <Rect x={11} y={8} width={11} height={8} rx={4} stroke={c} strokeWidth={2} fill="none" />
    </>
  ),
  // Two hard hats side by side.
  people: (c) => (
    <>
      <Path d="M2 15a5 5 0 0 1 10 0z" stroke={c} strokeWidth={2} strokeLinejoin="round" fill="none" />
      <Path d="M12 15a5 5 0 0 1 10 0z" stroke={c} strokeWidth={2} strokeLinejoin="round" fill="none" />
      <Path d="M1 18h22" stroke={c} strokeWidth={2} strokeLinecap="round" />
    </>
  ),
  signOut: (c) => (
    <>
      <Path d="M10 4H5v16h5" stroke={c} strokeWidth={2} strokeLinejoin="round" fill="none" />
      <Path d="M14 8l4 4-4 4M18 12H9" stroke={c} strokeWidth={2} strokeLinecap="round" strokeLinejoin="round" fill="none" />
    </>
  ),
};

export function Icon({ name, color, size = 24 }: { name: IconName; color: string; size?: number }) {
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" accessibilityElementsHidden importantForAccessibility="no-hide-descendants">
      {shapes[name](color)}
    </Svg>
  );
}
