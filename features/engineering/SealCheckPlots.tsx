// A seal substitution check drawn: the joint opening across the design temperatures with the
// installation temperature marked, and the joint family the movement calls for.
import { StyleSheet, View } from 'react-native';
import { sealKindLabels } from '../../shared/engineering';
import { Text } from '../ui/Text';
import { space } from '../ui/theme';
import type { SealFigures } from './checkFigures';
import { Facts } from './Facts';
import { inches, listOf } from './format';
import { Inset } from './Inset';
import { OpeningTemperaturePlot } from './OpeningTemperaturePlot';
import { PlotSummary } from './PlotParts';
import { openingTemperatureSummary } from './summaries';

export function SealCheckPlots({ figures, width }: { figures: SealFigures; width: number }) {
  const rows: [string, string][] = [];
  if (figures.movementRangeIn !== undefined) rows.push(['Thermal movement range', inches(figures.movementRangeIn)]);
  if (figures.substituteCapacityIn !== undefined) rows.push(['Substitute’s opening range', inches(figures.substituteCapacityIn)]);
  if (figures.suggestedFamily) {
    rows.push(['Joint family the movement calls for', sealKindLabels[figures.suggestedFamily] ?? figures.suggestedFamily]);
  }
  if (figures.modularCells !== undefined) rows.push(['Modular joint cells', String(figures.modularCells)]);
  return (
    <View style={styles.wrap}>
      {figures.gap ? (
        <View style={styles.plot}>
          <Inset>
            <Text variant="label">Opening against deck temperature</Text>
          </Inset>
          <OpeningTemperaturePlot gap={figures.gap} width={width} showSummary={false} testID="engineering-opening-plot" />
          <Inset>
            <PlotSummary>{openingTemperatureSummary(figures.gap)}</PlotSummary>
          </Inset>
        </View>
      ) : (
        <Inset>
          <Text variant="muted">Give the opening on the plans and its temperature to see the opening to set at installation.</Text>
        </Inset>
      )}
      <Inset>
        <Facts rows={rows} testID="engineering-seal-facts" />
        {figures.suitableFamilies.length > 0 ? (
          <Text variant="muted">Families that suit this movement: {listOf(figures.suitableFamilies.map((k) => sealKindLabels[k] ?? k))}.</Text>
        ) : null}
      </Inset>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.lg },
  plot: { gap: space.xs },
});
