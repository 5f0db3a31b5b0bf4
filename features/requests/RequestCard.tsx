import { Link } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';
import { requestStateInfo, isRequestState, stateLabel } from '../../shared/requests/states';
import type { RequestSummary } from '../../shared/requests/types';
import { Text } from '../ui/Text';
import { colors, radius, space } from '../ui/theme';
import { formatWhen, isRequestType, requestTypeLabel } from './format';

export function RequestCard({ request }: { request: RequestSummary }) {
  const settled = isRequestState(request.state) && requestStateInfo[request.state].settled;
  const when =
    request.state === 'drafting'
      ? `started ${formatWhen(request.createdAt)} by ${request.filedBy.name}`
      : settled
        ? `filed by ${request.filedBy.name}, settled ${formatWhen(request.deskSince)}`
        : `filed by ${request.filedBy.name} · at this desk since ${formatWhen(request.deskSince)}`;
  return (
    <Link href={`/requests/${request.id}`} asChild>
      <Pressable style={styles.card} accessibilityRole="link" testID="request-card">
        <View style={styles.top}>
          <Text variant="label">{request.number}{isRequestType(request.type) ? ` · ${requestTypeLabel(request.type)}` : ''}</Text>
          <Text variant="label" style={styles.state}>{stateLabel(request.state)}</Text>
        </View>
        <Text variant="heading">{request.title}</Text>
        <Text variant="muted">
          {request.project.name} · structure {request.project.structureNumber} · {when}
        </Text>
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  card: { backgroundColor: colors.surface, borderRadius: radius, borderWidth: 1, borderColor: colors.line, padding: space.lg, gap: space.xs },
  top: { flexDirection: 'row', justifyContent: 'space-between', gap: space.md, flexWrap: 'wrap' },
  state: { color: colors.slate },
});
