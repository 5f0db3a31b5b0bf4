// A construction joint check drawn: the girder's moment diagram with the proposed joint, and the
// joint on the plans beside it, so the move can be seen against the negative regions.
import { StyleSheet, View } from 'react-native';
import { Text } from '../ui/Text';
import { space } from '../ui/theme';
import type { JointFigures } from './checkFigures';
import { Facts } from './Facts';
import { ft, kipFt } from './format';
import { Inset } from './Inset';
import { MomentDiagram } from './MomentDiagram';
import { PlotSummary } from './PlotParts';
import { momentDiagramSummary } from './summaries';

export function JointCheckPlots({ figures, width }: { figures: JointFigures; width: number }) {
  const rows: [string, string][] = [['Proposed joint', ft(figures.jointAtFt)]];
  if (figures.plannedAtFt !== undefined) rows.push(['Joint on the plans', ft(figures.plannedAtFt)]);
  if (figures.distanceToInflectionFt !== undefined) rows.push(['From the nearest inflection point', ft(figures.distanceToInflectionFt)]);
  if (figures.momentAtJointKipFt !== undefined) rows.push(['Moment at the joint, per kip/ft of load', kipFt(figures.momentAtJointKipFt)]);
  return (
    <View style={styles.wrap}>
      {figures.beam ? (
        <View style={styles.plot}>
          <Inset>
            <Text variant="label">Where the joint falls on the moment diagram</Text>
          </Inset>
          <MomentDiagram
            beam={figures.beam}
            width={width}
            proposedJointFt={figures.jointAtFt}
            plannedJointFt={figures.plannedAtFt}
            showSummary={false}
            testID="engineering-moment-diagram"
          />
          <Inset>
            <PlotSummary>{momentDiagramSummary(figures.beam, figures.jointAtFt) + (figures.plannedAtFt !== undefined ? ` The plans put the joint at ${ft(figures.plannedAtFt)}.` : '')}</PlotSummary>
            <Text variant="muted">Drawn for a uniform load of 1 kip/ft: the regions do not depend on the size of the load.</Text>
          </Inset>
        </View>
      ) : null}
      <Inset>
        <Facts rows={rows} />
      </Inset>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.lg },
  plot: { gap: space.xs },
});
