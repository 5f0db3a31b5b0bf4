// The conditions of one request under its number and title, with who approved it and when, and
// the way to the request itself.
import { Link } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';
import { stateLabel } from '../../shared/requests/states';
import type { ConditionListItem } from '../../shared/conditions/types';
import type { RequestDetail } from '../../shared/requests/types';
import { formatWhen } from '../requests/format';
import { Panel } from '../ui/Panel';
import { Text } from '../ui/Text';
import { colors, space } from '../ui/theme';
import { ConditionCard, type CardNotice } from './ConditionCard';
import type { RequestGroup } from './grouping';

type Props = {
  group: RequestGroup;
  maySatisfy: boolean;
  notices: Record<string, CardNotice>;
  onMet: (item: ConditionListItem, detail: RequestDetail) => void;
  onConflict: (item: ConditionListItem, message: string) => void;
};

export function RequestConditions({ group, maySatisfy, notices, onMet, onConflict }: Props) {
  const r = group.request;
  const open = group.items.filter((i) => !i.condition.satisfied).length;
  return (
    <Panel testID="condition-request">
      <View style={styles.head}>
        <Text variant="label">{r.number} · {open === 0 ? 'every condition met' : `${open} open`}</Text>
        <Text variant="heading" accessibilityRole="header">{r.title}</Text>
        <Text variant="muted">{r.projectName} · structure {r.structureNumber}</Text>
        <Text variant="muted">
          Approved with conditions{group.approvedBy ? ` by ${group.approvedBy.name}` : ''}{group.approvedAt ? `, ${formatWhen(group.approvedAt)}` : ''}
          {r.state !== 'conditions_open' ? ` · now ${stateLabel(r.state).toLowerCase()}` : ''}
        </Text>
        <Link href={`/requests/${r.id}`} asChild>
          <Pressable accessibilityRole="link" accessibilityLabel={`Open request ${r.number}`} style={styles.link} testID="condition-request-link">
            <Text style={styles.linkText}>Open request {r.number}</Text>
          </Pressable>
        </Link>
      </View>
      {group.items.map((item) => (
        <ConditionCard
          key={item.condition.id}
          item={item}
          version={r.version}
          maySatisfy={maySatisfy && r.state === 'conditions_open'}
          notice={notices[item.condition.id]}
          onMet={onMet}
          onConflict={onConflict}
        />
      ))}
    </Panel>
  );
}

const styles = StyleSheet.create({
  head: { gap: space.xs },
  link: { minHeight: 44, justifyContent: 'center', alignSelf: 'flex-start' },
  linkText: { color: colors.slate, textDecorationLine: 'underline', fontSize: 16 },
});
