// Small pieces every plot draws the same way.
import { StyleSheet, Text } from 'react-native';
import { G, Path, Text as SvgText } from 'react-native-svg';
import { fontSize, plotColors, plotFont } from './plotStyle';

/** A support: a triangle with its apex on the girder line. */
export function SupportTriangle({ x, y, size = 9 }: { x: number; y: number; size?: number }) {
  const half = size * 0.6;
  return <Path d={`M ${x} ${y} L ${x - half} ${y + size} L ${x + half} ${y + size} Z`} fill={plotColors.line} />;
}

export function Label({
  x,
  y,
  children,
  anchor = 'middle',
  color = plotColors.line,
  size = fontSize.label,
}: {
  x: number;
  y: number;
  children: string;
  anchor?: 'start' | 'middle' | 'end';
  color?: string;
  size?: number;
}) {
  return (
    <SvgText x={x} y={y} fill={color} fontSize={size} fontFamily={plotFont} textAnchor={anchor}>
      {children}
    </SvgText>
  );
}

export function Swatch({ x, y, color, label }: { x: number; y: number; color: string; label: string }) {
  return (
    <G>
      <Path d={`M ${x} ${y - 8} h 10 v 10 h -10 Z`} fill={color} />
      <Label x={x + 14} y={y} anchor="start" size={fontSize.small}>
        {label}
      </Label>
    </G>
  );
}

/** The plot's words under the drawing; the same text is the plot's accessible label. */
export function PlotSummary({ children }: { children: string }) {
  return (
    <Text style={styles.summary} importantForAccessibility="no" accessibilityElementsHidden>
      {children}
    </Text>
  );
}

const styles = StyleSheet.create({
  summary: { color: plotColors.muted, fontFamily: plotFont, fontSize: 13, lineHeight: 18, marginTop: 4 },
});
