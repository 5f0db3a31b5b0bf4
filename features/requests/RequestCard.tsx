// One request in a list: its number, kind, structure and where it stands on the desk clock. On a
// wide screen it selects the request beside the list; otherwise it opens the request.
import { Link } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';
import { stateLabel } from '../../shared/requests/states';
import type { RequestSummary } from '../../shared/requests/types';
import { Text } from '../ui/Text';
import { ariaCurrent } from '../ui/webAria';
import { colors, radius, space } from '../ui/theme';
import { deskClockText, formatWhen, requestTypeLabel } from './format';

type Props = { request: RequestSummary; selected?: boolean; onSelect?: (id: string) => void };

export function RequestCard({ request: r, selected = false, onSelect }: Props) {
  const clock = deskClockText(r);
  const card = (
    <Pressable
      // Flattened: a Link passing its child a style array fails on the web.
      style={StyleSheet.flatten([styles.card, r.overdue && styles.overdue, selected && styles.selected])}
      // Beside the list it shows the request in the pane, which is a button's job; a link without
      // an address would ignore Enter on the web.
      accessibilityRole={onSelect ? 'button' : 'link'}
      {...ariaCurrent(selected, 'true')}
      accessibilityLabel={`${r.number}, ${r.title}, ${stateLabel(r.state)}${r.overdue ? ', overdue' : ''}`}
      onPress={onSelect ? () => onSelect(r.id) : undefined}
      testID="request-card"
    >
      <View style={styles.top}>
        <Text variant="label">{r.number} · {requestTypeLabel(r.type)}</Text>
        <Text variant="label" style={styles.state}>{stateLabel(r.state)}</Text>
      </View>
      <Text variant="heading">{r.title}</Text>
      <Text variant="muted">{r.project.name} · structure {r.project.structureNumber} · filed by {r.filedBy.name}</Text>
      {r.desk ? (
        <View style={styles.clock}>
          <Text variant="muted">{clock.waited}</Text>
          {clock.due ? (
            <Text variant="label" style={r.overdue ? styles.overdueText : styles.dueText} testID={r.overdue ? 'request-card-overdue' : undefined}>
              {clock.due}
            </Text>
          ) : null}
        </View>
      ) : (
        <Text variant="muted">Settled {formatWhen(r.deskSince)}</Text>
      )}
    </Pressable>
  );
  if (onSelect) return card;
  return (
    <Link href={`/requests/${r.id}`} asChild>
      {card}
    </Link>
  );
}

const styles = StyleSheet.create({
  card: { backgroundColor: colors.surface, borderRadius: radius, borderWidth: 1, borderColor: colors.line, padding: space.lg, gap: space.xs },
  overdue: { borderLeftWidth: 4, borderLeftColor: colors.danger },
  selected: { borderColor: colors.slate, borderWidth: 2, backgroundColor: '#F5F9FB' },
  top: { flexDirection: 'row', justifyContent: 'space-between', gap: space.md, flexWrap: 'wrap' },
  state: { color: colors.slate },
  clock: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.md, rowGap: 2 },
  overdueText: { color: colors.danger },
  dueText: { color: colors.ink },
});
