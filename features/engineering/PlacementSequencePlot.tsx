// The deck as a bar along the girder, cut into its placements and numbered in the order they go
// in: slate for positive-moment segments, amber for the negative-moment ones over the piers.
import { View } from 'react-native';
import Svg, { Line, Rect, G, Circle } from 'react-native-svg';
import { scaleLinear } from 'd3-scale';
import type { DeckPlacementPlan } from '../../shared/engineering';
import { fontSize, heightFor, plotColors, VIEW_WIDTH, viewBoxFor } from './plotStyle';
import { Label, PlotSummary, SupportTriangle, Swatch } from './PlotParts';
import { ft } from './format';
import { placementSequenceSummary } from './summaries';

type Props = {
  plan: DeckPlacementPlan;
  width: number;
  /** Draw the stretches where an emergency joint may go in a single placement. */
  showEmergencyJointZones?: boolean;
  showSummary?: boolean;
  testID?: string;
};

const VIEW_HEIGHT = 170;
const margin = { left: 14, right: 14 };
const deckTop = 46;
const deckHeight = 24;
/** Narrower than this, a segment's number moves above the deck, on alternating rows. */
const MIN_INSIDE_LABEL = 18;

export function PlacementSequencePlot({ plan, width, showEmergencyJointZones = false, showSummary = true, testID }: Props) {
  const summary = placementSequenceSummary(plan);
  const lengthFt = plan.supportsFt[plan.supportsFt.length - 1] ?? 0;
  const x = scaleLinear().domain([0, lengthFt]).range([margin.left, VIEW_WIDTH - margin.right]);
  const girderY = deckTop + deckHeight + 4;
  const zoneY = girderY + 24;

  return (
    <View testID={testID} accessible accessibilityRole="image" accessibilityLabel={summary}>
      <Svg width={width} height={heightFor(width, VIEW_HEIGHT)} viewBox={viewBoxFor(VIEW_HEIGHT)}>
        {plan.segments.map((s, i) => {
          const x0 = x(s.fromFt);
          const w = Math.max(0.5, x(s.toFt) - x0);
          const color = s.sign === 'negative' ? plotColors.caution : plotColors.line;
          const inside = w >= MIN_INSIDE_LABEL;
          const cx = x0 + w / 2;
          const labelY = inside ? deckTop + deckHeight / 2 + 4 : deckTop - 8 - (s.segmentNumber % 2) * 14;
          return (
            <G key={`seg-${s.segmentNumber}-${i}`}>
              <Rect x={x0} y={deckTop} width={w} height={deckHeight} fill={color} stroke={plotColors.surface} strokeWidth={1} />
              {inside ? (
                <Circle cx={cx} cy={deckTop + deckHeight / 2} r={8} fill={plotColors.surface} />
              ) : (
                <Line x1={cx} x2={cx} y1={deckTop} y2={labelY + 3} stroke={color} strokeWidth={0.75} />
              )}
              <Label x={cx} y={labelY} color={color} size={inside ? fontSize.label : fontSize.small}>
                {String(s.order)}
              </Label>
            </G>
          );
        })}

        <Line x1={x(0)} x2={x(lengthFt)} y1={girderY} y2={girderY} stroke={plotColors.line} strokeWidth={2} />
        {plan.supportsFt.map((s) => (
          <SupportTriangle key={`sup-${s}`} x={x(s)} y={girderY + 1} />
        ))}

        {showEmergencyJointZones
          ? plan.emergencyJointZones.map((z) => (
              <Line
                key={`zone-${z.fromFt}`}
                x1={x(z.fromFt)}
                x2={x(z.toFt)}
                y1={zoneY}
                y2={zoneY}
                stroke={plotColors.line}
                strokeWidth={2}
                strokeDasharray="5 3"
              />
            ))
          : null}

        <Label x={x(0)} y={zoneY + 18} anchor="start" size={fontSize.small}>
          0
        </Label>
        <Label x={x(lengthFt)} y={zoneY + 18} anchor="end" size={fontSize.small}>
          {ft(lengthFt, 0)}
        </Label>
        {showEmergencyJointZones ? (
          <Label x={VIEW_WIDTH / 2} y={zoneY + 18} size={fontSize.small}>
            Dashed: emergency joint zones
          </Label>
        ) : null}

        <Swatch x={margin.left} y={VIEW_HEIGHT - 14} color={plotColors.line} label="Positive moment" />
        <Swatch x={margin.left + 120} y={VIEW_HEIGHT - 14} color={plotColors.caution} label="Negative moment (placed last)" />
      </Svg>
      {showSummary ? <PlotSummary>{summary}</PlotSummary> : null}
    </View>
  );
}
