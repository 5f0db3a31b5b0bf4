// What a list shows before its data: grey bars while loading, and the error with a way to retry.
import { StyleSheet, View } from 'react-native';
import { Button } from '../ui/Button';
import { Notice } from '../ui/Notice';
import { Panel } from '../ui/Panel';
import { colors, radius, space } from '../ui/theme';

type Query = { isPending: boolean; error: Error | null; isFetching: boolean; refetch: () => unknown };

export function LoadState({ query, what, testID }: { query: Query; what: string; testID: string }) {
  if (query.error) {
    return (
      <View style={styles.gap}>
        <Notice tone="error" testID={`${testID}-error`}>{`${what} could not be loaded: ${query.error.message}`}</Notice>
        <View style={styles.row}>
          <Button kind="secondary" label="Try again" busy={query.isFetching} onPress={() => void query.refetch()} testID={`${testID}-retry`} />
        </View>
      </View>
    );
  }
  if (!query.isPending) return null;
  return (
    <View accessibilityLabel={`Loading ${what.toLowerCase()}`} testID={`${testID}-loading`} style={styles.gap}>
      {[0, 1, 2].map((i) => (
        <Panel key={i}>
          <View style={[styles.bar, { width: '40%' }]} />
          <View style={[styles.bar, { width: '70%' }]} />
        </Panel>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  gap: { gap: space.md },
  row: { flexDirection: 'row' },
  bar: { height: 14, borderRadius: radius, backgroundColor: colors.line },
});
