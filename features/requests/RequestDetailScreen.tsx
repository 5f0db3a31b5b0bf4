import { useLocalSearchParams } from 'expo-router';
import { ActivityIndicator, Linking, Platform, StyleSheet, View } from 'react-native';
import { roleLabels } from '../../shared/roles';
import { stateLabel } from '../../shared/requests/states';
import { Button } from '../ui/Button';
import { Notice } from '../ui/Notice';
import { Screen } from '../ui/Screen';
import { Text } from '../ui/Text';
import { colors, radius, space } from '../ui/theme';
import { attachmentUrl, useRequestDetail } from './api';
import { formatBytes, formatWhen } from './format';

function openAttachment(id: string) {
  const url = attachmentUrl(id);
  if (Platform.OS === 'web') window.open(url, '_blank', 'noopener');
  else void Linking.openURL(url);
}

export function RequestDetailScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const request = useRequestDetail(String(id));

  if (request.isPending) return <Screen><ActivityIndicator /></Screen>;
  if (request.error) return <Screen><Notice tone="error">{request.error.message}</Notice></Screen>;
  const r = request.data;

  return (
    <Screen>
      <View style={styles.block} testID="request-detail">
        <Text variant="label">{r.number} · {stateLabel(r.state)}</Text>
        <Text variant="title">{r.title}</Text>
        <Text variant="muted">{r.project.name} · structure {r.project.structureNumber}</Text>
        <Text variant="muted">Filed {formatWhen(r.createdAt)} by {r.filedBy.name}{r.filedBy.organization ? `, ${r.filedBy.organization}` : ''}</Text>
      </View>

      <View style={styles.section}>
        <Text variant="heading">Reason</Text>
        <Text>{r.reason}</Text>
      </View>

      <View style={styles.section}>
        <Text variant="heading">Attachments ({r.attachments.length})</Text>
        {r.attachments.length === 0 ? <Text variant="muted">None.</Text> : null}
        {r.attachments.map((a) => (
          <View key={a.id} style={styles.row}>
            <View style={styles.grow}>
              <Text>{a.fileName}</Text>
              <Text variant="muted">{formatBytes(a.sizeBytes)} · SHA-256 {a.sha256.slice(0, 12)}…</Text>
            </View>
            <Button kind="secondary" label="Open" onPress={() => openAttachment(a.id)} />
          </View>
        ))}
      </View>

      <View style={styles.section}>
        <Text variant="heading">Trail</Text>
        {r.trail.map((e) => (
          <View key={e.seq} style={styles.event}>
            <Text variant="label">{formatWhen(e.at)} · {e.actorName} ({roleLabels[e.actorRole]})</Text>
            <Text>{e.eventType === 'filed' ? 'Filed the request' : e.eventType} → {stateLabel(e.stateAfter)}</Text>
            {e.comment ? <Text variant="muted">“{e.comment}”</Text> : null}
          </View>
        ))}
      </View>
    </Screen>
  );
}

const styles = StyleSheet.create({
  block: { gap: space.xs },
  section: { backgroundColor: colors.surface, borderRadius: radius, borderWidth: 1, borderColor: colors.line, padding: space.lg, gap: space.md },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.md },
  grow: { flex: 1 },
  event: { borderLeftWidth: 3, borderLeftColor: colors.slate, paddingLeft: space.md, gap: 2 },
});
