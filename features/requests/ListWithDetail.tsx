// A list of requests and, on a wide screen, the chosen one beside it; each side scrolls on its own.
// Narrower, only the list shows and a request opens as a page of its own. The chosen request is
// kept in the address (?selected=…), so reloading or sharing the link keeps it.
import type { ReactNode } from 'react';
import { useLocalSearchParams, useRouter } from 'expo-router';
import { ScrollView, StyleSheet, View } from 'react-native';
import { useBreakpoint } from '../ui/breakpoints';
import { Screen } from '../ui/Screen';
import { Text } from '../ui/Text';
import { colors, space } from '../ui/theme';
import { RequestDetailView } from './RequestDetailScreen';

export function useSelectedRequest() {
  const { selected } = useLocalSearchParams<{ selected?: string }>();
  const router = useRouter();
  const { isWide } = useBreakpoint();
  return {
    selectedId: isWide && typeof selected === 'string' && selected ? selected : null,
    // Only on a wide screen does a card select in place; elsewhere it links to the request's page.
    onSelect: isWide ? (id: string) => router.setParams({ selected: id }) : undefined,
  };
}

export function ListWithDetail({ list, selectedId, emptyHint }: { list: ReactNode; selectedId: string | null; emptyHint: string }) {
  const { isWide } = useBreakpoint();
  if (!isWide) return <Screen>{list}</Screen>;
  return (
    <View style={styles.row}>
      <ScrollView style={styles.list} contentContainerStyle={styles.listContent} keyboardShouldPersistTaps="handled" testID="list-pane">
        {list}
      </ScrollView>
      <ScrollView style={styles.detail} contentContainerStyle={styles.detailContent} keyboardShouldPersistTaps="handled" testID="detail-pane">
        {selectedId ? (
          <RequestDetailView key={selectedId} id={selectedId} inPane />
        ) : (
          <View style={styles.empty}>
            <Text variant="heading">No request chosen</Text>
            <Text variant="muted">{emptyHint}</Text>
          </View>
        )}
      </ScrollView>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flex: 1, flexDirection: 'row', backgroundColor: colors.concrete },
  list: { width: 440, flexGrow: 0, borderRightWidth: 1, borderRightColor: colors.line },
  listContent: { padding: space.lg, gap: space.lg },
  detail: { flex: 1 },
  detailContent: { padding: space.lg, maxWidth: 900, width: '100%' },
  empty: { gap: space.sm, padding: space.xl, alignItems: 'center' },
});
