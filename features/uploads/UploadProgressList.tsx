// A bar per file while it is sent, with a cancel button until it is stored.
import { StyleSheet, View } from 'react-native';
import { Button } from '../ui/Button';
import { Text } from '../ui/Text';
import { colors, radius, space } from '../ui/theme';
import type { UploadItem } from './useFileUploads';

const statusWords: Record<UploadItem['status'], string> = {
  waiting: 'waiting',
  sending: 'sending',
  stored: 'stored',
  cancelled: 'cancelled',
  failed: 'not stored',
};

export function UploadProgressList({ items, onCancel }: { items: UploadItem[]; onCancel: (key: string) => void }) {
  if (items.length === 0) return null;
  return (
    <View style={styles.list} testID="upload-progress">
      {items.map((item) => {
        const share = item.size > 0 ? Math.min(1, item.sent / item.size) : 0;
        const busy = item.status === 'waiting' || item.status === 'sending';
        return (
          <View key={item.key} style={styles.row} accessibilityLabel={`${item.name}: ${statusWords[item.status]}, ${Math.round(share * 100)} percent`}>
            <View style={styles.text}>
              <Text numberOfLines={1}>{item.name}</Text>
              <Text variant="muted">
                {statusWords[item.status]} · {Math.round(share * 100)}%{item.error ? ` · ${item.error}` : ''}
              </Text>
              <View style={styles.track}>
                <View style={[styles.bar, { width: `${share * 100}%` }, item.status === 'failed' && styles.failed]} />
              </View>
            </View>
            {busy ? <Button kind="quiet" label="Cancel" onPress={() => onCancel(item.key)} testID="upload-cancel" /> : null}
          </View>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.md, backgroundColor: colors.surface, borderRadius: radius, padding: space.sm },
  text: { flex: 1, gap: 2 },
  track: { height: 6, borderRadius: 3, backgroundColor: colors.slateLight, overflow: 'hidden' },
  bar: { height: 6, backgroundColor: colors.slate },
  failed: { backgroundColor: colors.danger },
});
