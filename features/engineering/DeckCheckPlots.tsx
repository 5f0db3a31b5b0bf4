// A deck placement check drawn: the dead-load moment diagram with its negative regions, and the
// placements in order along the deck.
import { View, StyleSheet } from 'react-native';
import { Text } from '../ui/Text';
import { space } from '../ui/theme';
import type { DeckFigures } from './checkFigures';
import { Facts } from './Facts';
import { ft } from './format';
import { MomentDiagram } from './MomentDiagram';
import { PlacementSequencePlot } from './PlacementSequencePlot';
import { Inset } from './Inset';
import { PlotSummary } from './PlotParts';
import { momentDiagramSummary } from './summaries';

export function DeckCheckPlots({ figures, width }: { figures: DeckFigures; width: number }) {
  const { plan, beam, emergencyJointAtFt } = figures;
  const single = plan.singlePlacement;
  return (
    <View style={styles.wrap}>
      {beam ? (
        <View style={styles.plot}>
          <Inset>
            <Text variant="label">Moment under the wet deck concrete ({plan.deadLoadKipPerFt.toFixed(2)} kip/ft)</Text>
          </Inset>
          <MomentDiagram beam={beam} width={width} proposedJointFt={emergencyJointAtFt} jointLabel="Emergency joint" showSummary={false} testID="engineering-moment-diagram" />
          <Inset>
            <PlotSummary>{momentDiagramSummary(beam, emergencyJointAtFt)}</PlotSummary>
          </Inset>
        </View>
      ) : null}
      <View style={styles.plot}>
        <Inset>
          <Text variant="label">Staged placement order</Text>
        </Inset>
        <PlacementSequencePlot plan={plan} width={width} showEmergencyJointZones showSummary={false} testID="engineering-placement-plot" />
      </View>
      <Inset>
      <Facts rows={plan.segments.map((seg) => [`${seg.order}. ${seg.sign === 'negative' ? 'Over a pier' : 'Positive moment'}`, `${seg.fromFt.toFixed(0)}–${ft(seg.toFt, 0)} · ${seg.volumeCy.toFixed(0)} cy · ${seg.durationHr.toFixed(1)} h`])} testID="engineering-placements" />
      <Facts
        rows={[
          ['Placements if staged', String(plan.segments.length)],
          ['Whole deck in one placement', `${single.volumeCy.toFixed(0)} cy in ${single.durationHr.toFixed(1)} h`],
          ['Initial set needed for one placement', `${single.minInitialSetHr.toFixed(1)} h or more`],
          ...(emergencyJointAtFt !== undefined ? ([['Emergency joint', ft(emergencyJointAtFt)]] as [string, string][]) : []),
        ]}
      />
      </Inset>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.lg },
  plot: { gap: space.xs },
});
