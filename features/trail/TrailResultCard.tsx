// One request found by its trail: which it is, where it stands, how it was decided, and how much
// and how lately its trail has moved. Opens the request's trail.
import { Link } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';
import { stateLabel } from '../../shared/requests/states';
import { trailDecisionLabels, type TrailSearchHit } from '../../shared/trail/trailSearch';
import { formatWhen } from '../requests/format';
import { Text } from '../ui/Text';
import { colors, radius, space } from '../ui/theme';

export function TrailResultCard({ hit }: { hit: TrailSearchHit }) {
  const decision = trailDecisionLabels[hit.decision ?? 'undecided'];
  return (
    <Link href={`/trail/${hit.id}`} asChild>
      <Pressable
        // One style object: a Link handing its child a style array fails on the web.
        style={styles.card}
        accessibilityRole="link"
        accessibilityLabel={`${hit.number}, ${hit.title}. ${decision}. Open its trail.`}
        testID="trail-result"
      >
        <View style={styles.top}>
          <Text variant="label">{hit.number}</Text>
          <Text variant="label" style={[styles.decision, hit.decision === 'rejected' ? styles.rejected : hit.decision ? styles.approved : null]}>
            {decision}
          </Text>
        </View>
        <Text variant="heading">{hit.title}</Text>
        <Text variant="muted">
          {hit.project.name} · structure {hit.project.structureNumber} · {stateLabel(hit.state)}
        </Text>
        <Text variant="muted">
          Last event {formatWhen(hit.lastEventAt)} · {hit.events} {hit.events === 1 ? 'event' : 'events'}
        </Text>
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  card: { backgroundColor: colors.surface, borderRadius: radius, borderWidth: 1, borderColor: colors.line, padding: space.lg, gap: space.xs, minHeight: 44 },
  top: { flexDirection: 'row', justifyContent: 'space-between', gap: space.md, flexWrap: 'wrap' },
  decision: { color: colors.slate },
  approved: { color: colors.ok },
  rejected: { color: colors.danger },
});
