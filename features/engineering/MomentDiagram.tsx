// Moment along the girder, sagging drawn upward. Negative-moment regions are shaded amber: they
// are where a reviewer looks first, since joints and early placements must stay out of them.
import { View } from 'react-native';
import Svg, { Path, Line, Rect, G, Circle } from 'react-native-svg';
import { scaleLinear } from 'd3-scale';
import { area, line } from 'd3-shape';
import type { ContinuousBeamResult } from '../../shared/engineering';
import { fontSize, heightFor, plotColors, VIEW_WIDTH, viewBoxFor } from './plotStyle';
import { Label, PlotSummary, SupportTriangle } from './PlotParts';
import { ft } from './format';
import { momentDiagramSummary } from './summaries';

type Props = {
  beam: ContinuousBeamResult;
  /** Rendered width in px; the drawing scales to it. */
  width: number;
  proposedJointFt?: number;
  /** What the proposed mark is called ("Joint", "Emergency joint"). */
  jointLabel?: string;
  /** The joint where the plans put it, drawn lighter on its own label row. */
  plannedJointFt?: number;
  showSummary?: boolean;
  testID?: string;
};

const VIEW_HEIGHT = 250;
const baseMargin = { left: 52, right: 14, top: 22, bottom: 52 };
type Point = { x: number; m: number };

// Near an end a centred label would run off the drawing, so it hangs inward instead.
function anchorFor(px: number): 'start' | 'middle' | 'end' {
  return px < VIEW_WIDTH * 0.2 ? 'start' : px > VIEW_WIDTH * 0.8 ? 'end' : 'middle';
}

export function MomentDiagram({ beam, width, proposedJointFt, jointLabel = 'Joint', plannedJointFt, showSummary = true, testID }: Props) {
  const margin = plannedJointFt !== undefined ? { ...baseMargin, top: 36 } : baseMargin;
  const summary =
    momentDiagramSummary(beam, proposedJointFt) + (plannedJointFt !== undefined ? ` The plans put the joint at ${ft(plannedJointFt)}.` : '');
  const plotBottom = VIEW_HEIGHT - margin.bottom;
  const x = scaleLinear().domain([0, beam.totalLengthFt]).range([margin.left, VIEW_WIDTH - margin.right]);
  const top = Math.max(beam.maxPositive.momentKipFt, 0);
  const bottom = Math.min(beam.maxNegative.momentKipFt, 0);
  const pad = (top - bottom || 1) * 0.08;
  const y = scaleLinear().domain([bottom - pad, top + pad]).range([plotBottom, margin.top]);

  const points: Point[] = beam.stations.map((s) => ({ x: s.xFt, m: s.momentKipFt }));
  const curve = line<Point>()
    .x((p) => x(p.x))
    .y((p) => y(p.m))(points);
  const fill = area<Point>()
    .x((p) => x(p.x))
    .y0(y(0))
    .y1((p) => y(p.m));

  // Each negative region is closed at its inflection points, where the moment is zero.
  const negativeAreas = beam.regions
    .filter((r) => r.sign === 'negative')
    .map((r) => ({
      region: r,
      d: fill([{ x: r.fromFt, m: 0 }, ...points.filter((p) => p.x > r.fromFt && p.x < r.toFt), { x: r.toFt, m: 0 }]),
    }));

  const girderY = plotBottom + 12;
  const jointInNegative =
    proposedJointFt !== undefined &&
    beam.regions.some((r) => r.sign === 'negative' && proposedJointFt > r.fromFt && proposedJointFt < r.toFt);
  const labelInflections = beam.inflectionPointsFt.length <= 8;
  // An inflection point's label sits below the zero line on the side away from the negative
  // region it bounds, where the curve is above the line, so the label never crosses the curve.
  const opensNegative = (ip: number) => beam.regions.some((r) => r.sign === 'negative' && Math.abs(r.fromFt - ip) <= 1e-6 * beam.totalLengthFt);

  return (
    <View testID={testID} accessible accessibilityRole="image" accessibilityLabel={summary}>
      <Svg width={width} height={heightFor(width, VIEW_HEIGHT)} viewBox={viewBoxFor(VIEW_HEIGHT)}>
        {negativeAreas.map(({ region, d }) => (
          <G key={`neg-${region.fromFt}`}>
            <Rect
              x={x(region.fromFt)}
              y={margin.top}
              width={Math.max(0, x(region.toFt) - x(region.fromFt))}
              height={plotBottom - margin.top}
              fill={plotColors.cautionBg}
            />
            {d ? <Path d={d} fill={plotColors.caution} fillOpacity={0.35} /> : null}
          </G>
        ))}

        <Line x1={margin.left} x2={VIEW_WIDTH - margin.right} y1={y(0)} y2={y(0)} stroke={plotColors.grid} strokeWidth={1} />
        {curve ? <Path d={curve} stroke={plotColors.line} strokeWidth={2} fill="none" /> : null}

        <Label x={margin.left - 6} y={y(top) + 4} anchor="end" size={fontSize.small}>
          {String(Math.round(top))}
        </Label>
        <Label x={margin.left - 6} y={y(0) + 4} anchor="end" size={fontSize.small}>
          0
        </Label>
        {bottom < 0 ? (
          <Label x={margin.left - 6} y={y(bottom) + 4} anchor="end" size={fontSize.small} color={plotColors.caution}>
            {String(Math.round(bottom))}
          </Label>
        ) : null}

        {beam.inflectionPointsFt.map((ip) => (
          <G key={`ip-${ip}`}>
            <Circle cx={x(ip)} cy={y(0)} r={3} fill={plotColors.surface} stroke={plotColors.caution} strokeWidth={1.5} />
            {labelInflections ? (
              <Label
                x={x(ip) + (opensNegative(ip) ? -5 : 5)}
                y={y(0) + 14}
                anchor={opensNegative(ip) ? 'end' : 'start'}
                size={fontSize.small}
                color={plotColors.caution}
              >
                {ip.toFixed(0)}
              </Label>
            ) : null}
          </G>
        ))}

        {proposedJointFt !== undefined ? (
          <G>
            <Line
              x1={x(proposedJointFt)}
              x2={x(proposedJointFt)}
              y1={margin.top - 6}
              y2={girderY}
              stroke={jointInNegative ? plotColors.caution : plotColors.line}
              strokeWidth={1.5}
              strokeDasharray="4 3"
            />
            <Label x={x(proposedJointFt)} y={13} anchor={anchorFor(x(proposedJointFt))} color={jointInNegative ? plotColors.caution : plotColors.line}>
              {`${jointLabel} ${ft(proposedJointFt)}`}
            </Label>
          </G>
        ) : null}
        {plannedJointFt !== undefined ? (
          <G>
            <Line
              x1={x(plannedJointFt)}
              x2={x(plannedJointFt)}
              y1={margin.top - 6}
              y2={girderY}
              stroke={plotColors.muted}
              strokeWidth={1}
              strokeDasharray="2 3"
            />
            <Label x={x(plannedJointFt)} y={27} anchor={anchorFor(x(plannedJointFt))} size={fontSize.small} color={plotColors.muted}>
              {`On the plans ${ft(plannedJointFt)}`}
            </Label>
          </G>
        ) : null}

        <Line x1={x(0)} x2={x(beam.totalLengthFt)} y1={girderY} y2={girderY} stroke={plotColors.line} strokeWidth={3} />
        {beam.supportsFt.map((s) => (
          <SupportTriangle key={`sup-${s}`} x={x(s)} y={girderY + 1.5} />
        ))}
        <Label x={x(0)} y={girderY + 26} anchor="start" size={fontSize.small}>
          0
        </Label>
        <Label x={x(beam.totalLengthFt)} y={girderY + 26} anchor="end" size={fontSize.small}>
          {ft(beam.totalLengthFt, 0)}
        </Label>
        <Label x={VIEW_WIDTH / 2} y={girderY + 26} size={fontSize.small}>
          Moment, sagging up (kip-ft)
        </Label>
      </Svg>
      {showSummary ? <PlotSummary>{summary}</PlotSummary> : null}
    </View>
  );
}
