// One condition: what must be done and by when; if met, who confirmed it, when, their note and a
// thumbnail of the evidence; if open, the way to confirm it for a field inspector.
import { useState } from 'react';
import { Linking, Pressable, StyleSheet, View } from 'react-native';
import type { ConditionListItem } from '../../shared/conditions/types';
import type { RequestDetail } from '../../shared/requests/types';
import { attachmentUrl } from '../requests/api';
import { formatWhen } from '../requests/format';
import { Button } from '../ui/Button';
import { Notice } from '../ui/Notice';
import { Text } from '../ui/Text';
import { colors, radius, space } from '../ui/theme';
import { AttachmentThumbnail } from '../uploads/AttachmentThumbnail';
import { SatisfyConditionForm } from './SatisfyConditionForm';

export type CardNotice = { tone: 'ok' | 'caution'; text: string };

type Props = {
  item: ConditionListItem;
  version: number;
  maySatisfy: boolean;
  notice?: CardNotice;
  onMet: (item: ConditionListItem, detail: RequestDetail) => void;
  onConflict: (item: ConditionListItem, message: string) => void;
};

function Evidence({ evidence }: { evidence: NonNullable<ConditionListItem['condition']['evidence']> }) {
  return (
    <Pressable
      accessibilityRole="button"
      accessibilityLabel={`Open the evidence, ${evidence.fileName}`}
      onPress={() => void Linking.openURL(attachmentUrl(evidence.id))}
      style={styles.evidence}
      testID="condition-evidence-link"
    >
      <AttachmentThumbnail id={evidence.id} contentType={evidence.contentType} fileName={evidence.fileName} />
      <Text style={styles.grow} numberOfLines={2}>{evidence.fileName}</Text>
    </Pressable>
  );
}

export function ConditionCard({ item, version, maySatisfy, notice, onMet, onConflict }: Props) {
  const [open, setOpen] = useState(false);
  const c = item.condition;
  return (
    <View style={[styles.card, c.satisfied && styles.met]} testID="condition-card" accessibilityLabel={`Condition ${c.seq}, ${c.satisfied ? 'met' : 'open'}`}>
      <View style={styles.top}>
        <Text variant="label" style={styles.grow}>Condition {c.seq}</Text>
        <Text variant="label" style={c.satisfied ? styles.okText : styles.openText} testID="condition-status">{c.satisfied ? 'Met' : 'Open'}</Text>
      </View>
      <Text>{c.text}</Text>
      <Text variant="muted">Due {c.dueBefore}</Text>
      {notice ? <Notice tone={notice.tone} testID="condition-notice">{notice.text}</Notice> : null}
      {c.satisfied ? (
        <View style={styles.record} testID="condition-met">
          <Text variant="muted">
            Confirmed by {c.satisfiedBy?.name ?? 'someone no longer listed'}{c.satisfiedAt ? `, ${formatWhen(c.satisfiedAt)}` : ''}
          </Text>
          {c.note ? <Text testID="condition-met-note">“{c.note}”</Text> : null}
          {c.evidence ? <Evidence evidence={c.evidence} /> : null}
        </View>
      ) : maySatisfy ? (
        open ? (
          <SatisfyConditionForm
            item={item}
            version={version}
            onMet={(detail) => {
              setOpen(false);
              onMet(item, detail);
            }}
            onConflict={(message) => onConflict(item, message)}
            onClose={() => setOpen(false)}
          />
        ) : (
          <View style={styles.actions}>
            <Button kind="secondary" label="Mark satisfied" onPress={() => setOpen(true)} testID="condition-satisfy" />
          </View>
        )
      ) : (
        <Text variant="muted">Waiting for the field inspector to confirm it on site.</Text>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  card: { gap: space.xs, borderWidth: 1, borderColor: colors.line, borderLeftWidth: 4, borderLeftColor: colors.caution, borderRadius: radius, padding: space.md, backgroundColor: colors.surface },
  met: { borderLeftColor: colors.ok },
  top: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  grow: { flex: 1 },
  okText: { color: colors.ok },
  openText: { color: colors.caution },
  record: { gap: space.xs, marginTop: space.xs },
  evidence: { flexDirection: 'row', alignItems: 'center', gap: space.md, minHeight: 44 },
  actions: { flexDirection: 'row', marginTop: space.xs },
});
