// Expansion-joint opening against deck temperature, falling as the deck warms, with the
// installation temperature and the opening to set marked. Openings below zero (a joint that
// would close) are drawn in amber below a zero line.
import { View } from 'react-native';
import Svg, { Path, Line, Rect, G, Circle } from 'react-native-svg';
import { scaleLinear } from 'd3-scale';
import { line } from 'd3-shape';
import type { InstallationGap, OpeningRow } from '../../shared/engineering';
import { fontSize, heightFor, plotColors, VIEW_WIDTH, viewBoxFor } from './plotStyle';
import { Label, PlotSummary } from './PlotParts';
import { degF, inches } from './format';
import { openingTemperatureSummary } from './summaries';

type Props = {
  gap: InstallationGap;
  width: number;
  showSummary?: boolean;
  testID?: string;
};

const VIEW_HEIGHT = 230;
const margin = { left: 48, right: 16, top: 24, bottom: 40 };

export function OpeningTemperaturePlot({ gap, width, showSummary = true, testID }: Props) {
  const summary = openingTemperatureSummary(gap);
  const rows = gap.table;
  const tMin = Math.min(gap.tMinF, gap.installTempF);
  const tMax = Math.max(gap.tMaxF, gap.installTempF);
  const openings = [...rows.map((r) => r.openingIn), gap.openingIn];
  const lo = Math.min(0, ...openings);
  const hi = Math.max(...openings);
  const plotBottom = VIEW_HEIGHT - margin.bottom;
  const x = scaleLinear().domain([tMin, tMax]).range([margin.left, VIEW_WIDTH - margin.right]);
  const y = scaleLinear().domain([lo, hi * 1.08 || 1]).range([plotBottom, margin.top]).nice();
  const path = line<OpeningRow>()
    .x((r) => x(r.tempF))
    .y((r) => y(r.openingIn))(rows);
  const closes = rows.some((r) => r.closed);
  const ix = x(gap.installTempF);
  const iy = y(gap.openingIn);

  return (
    <View testID={testID} accessible accessibilityRole="image" accessibilityLabel={summary}>
      <Svg width={width} height={heightFor(width, VIEW_HEIGHT)} viewBox={viewBoxFor(VIEW_HEIGHT)}>
        {closes ? (
          <Rect x={margin.left} y={y(0)} width={VIEW_WIDTH - margin.left - margin.right} height={plotBottom - y(0)} fill={plotColors.cautionBg} />
        ) : null}
        {y.ticks(4).map((t) => (
          <G key={`y-${t}`}>
            <Line x1={margin.left} x2={VIEW_WIDTH - margin.right} y1={y(t)} y2={y(t)} stroke={plotColors.grid} strokeWidth={t === 0 ? 1.5 : 0.75} />
            <Label x={margin.left - 6} y={y(t) + 4} anchor="end" size={fontSize.small}>
              {t.toFixed(t % 1 === 0 ? 0 : 1)}
            </Label>
          </G>
        ))}
        {x.ticks(5).map((t) => (
          <Label key={`x-${t}`} x={x(t)} y={plotBottom + 14} size={fontSize.small}>
            {`${t}`}
          </Label>
        ))}
        <Label x={(margin.left + VIEW_WIDTH - margin.right) / 2} y={plotBottom + 30} size={fontSize.small}>
          Deck temperature (°F)
        </Label>
        <Label x={6} y={margin.top - 10} anchor="start" size={fontSize.small}>
          Opening (in)
        </Label>

        {path ? <Path d={path} stroke={plotColors.line} strokeWidth={2} fill="none" /> : null}
        {rows
          .filter((r) => r.closed)
          .map((r) => (
            <Circle key={`closed-${r.tempF}`} cx={x(r.tempF)} cy={y(r.openingIn)} r={3} fill={plotColors.caution} />
          ))}

        <Line x1={ix} x2={ix} y1={margin.top} y2={plotBottom} stroke={plotColors.caution} strokeWidth={1.5} strokeDasharray="4 3" />
        <Circle cx={ix} cy={iy} r={4.5} fill={plotColors.caution} stroke={plotColors.surface} strokeWidth={1.5} />
        {/* The label goes in whichever half of the plot the line leaves clear at that temperature. */}
        <Label
          x={ix + (ix > VIEW_WIDTH * 0.6 ? -6 : 6)}
          y={iy > (margin.top + plotBottom) / 2 ? margin.top + 12 : plotBottom - 8}
          anchor={ix > VIEW_WIDTH * 0.6 ? 'end' : 'start'}
          color={plotColors.caution}
        >
          {`Set ${inches(gap.openingIn)} at ${degF(gap.installTempF)}`}
        </Label>
      </Svg>
      {showSummary ? <PlotSummary>{summary}</PlotSummary> : null}
    </View>
  );
}
