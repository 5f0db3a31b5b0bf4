// A small picture of a photo attachment, from the server's resized preview; other files show
// their kind instead, so a reviewer sees at a glance what evidence is there.
import { useState } from 'react';
import { Image, StyleSheet, View } from 'react-native';
import { Text } from '../ui/Text';
import { colors, radius } from '../ui/theme';

const previewable = new Set(['image/png', 'image/jpeg', 'image/webp']);

const kindWords: Record<string, string> = {
  'application/pdf': 'PDF',
  'image/heic': 'HEIC',
  'image/heif': 'HEIF',
};

export function AttachmentThumbnail({ id, contentType, fileName }: { id: string; contentType: string; fileName: string }) {
  const [failed, setFailed] = useState(false);
  if (previewable.has(contentType) && !failed) {
    return (
      <Image
        source={{ uri: `/api/attachments/${encodeURIComponent(id)}/preview` }}
        style={styles.box}
        resizeMode="cover"
        accessibilityLabel={`Preview of ${fileName}`}
        onError={() => setFailed(true)}
        testID="attachment-preview"
      />
    );
  }
  return (
    <View style={[styles.box, styles.kind]}>
      <Text variant="label" style={styles.kindText}>{kindWords[contentType] ?? 'FILE'}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { width: 56, height: 56, borderRadius: radius, backgroundColor: colors.slateLight },
  kind: { alignItems: 'center', justifyContent: 'center' },
  kindText: { color: colors.slate },
});
