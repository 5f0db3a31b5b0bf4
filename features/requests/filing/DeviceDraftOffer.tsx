// Drafts this device kept from an earlier visit (a closed tab, a lost connection): offered for
// carrying on before the person starts a second copy of the same request.
import { StyleSheet, View } from 'react-native';
import { requestTypeLabels } from '../../../shared/requests/requestBody';
import { Button } from '../../ui/Button';
import { Text } from '../../ui/Text';
import { colors, radius, space } from '../../ui/theme';
import { formatWhen } from '../format';
import type { KeptDraft } from './useFilingDraft';

function state(d: KeptDraft): string {
  if (d.refused) return `Not saved to Spanrelay: ${d.refused}`;
  if (d.queued) return 'Kept on this device only; it will be sent when the connection returns.';
  if (d.server) return `Also saved to Spanrelay as ${d.server.number}; this device has the latest typing.`;
  return 'Kept on this device only; not saved to Spanrelay yet.';
}

export function DeviceDraftOffer({ drafts, onCarryOn, onDiscard }: { drafts: KeptDraft[]; onCarryOn: (d: KeptDraft) => void; onDiscard: (d: KeptDraft) => void }) {
  if (drafts.length === 0) return null;
  return (
    <View style={styles.box} testID="device-draft-offer">
      <Text variant="heading" accessibilityRole="header">{drafts.length === 1 ? 'A draft kept on this device' : `${drafts.length} drafts kept on this device`}</Text>
      <Text variant="muted">Carry on where you left off, or start a new request below.</Text>
      {drafts.map((d) => {
        const title = d.values.title?.trim() || 'Untitled request';
        return (
          <View key={d.localId} style={styles.item} testID="device-draft">
            <Text style={styles.title}>{title}</Text>
            <Text variant="muted">{requestTypeLabels[d.values.type] ?? ''} · changed {formatWhen(d.updatedAt)}</Text>
            <Text variant="muted">{state(d)}</Text>
            <View style={styles.row}>
              <Button label="Continue this draft" onPress={() => onCarryOn(d)} testID="device-draft-continue" />
              <Button
                kind="quiet"
                label={d.server ? 'Remove from this device' : 'Throw this draft away'}
                onPress={() => onDiscard(d)}
                testID="device-draft-discard"
              />
            </View>
          </View>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.md, borderWidth: 1, borderColor: colors.slate, borderRadius: radius, padding: space.md, backgroundColor: colors.slateLight },
  item: { gap: space.xs, backgroundColor: colors.surface, borderRadius: radius, padding: space.md },
  title: { fontWeight: '600' },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, marginTop: space.xs },
});
