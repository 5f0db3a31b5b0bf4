// Before a returned request goes back: what changed since the revision the reviewer returned, and
// the comment the resubmit move requires, saying what was done about their comment.
import { useWatch } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import type { RequestDraft } from '../../../shared/requests/requestBody';
import { Notice } from '../../ui/Notice';
import { Text } from '../../ui/Text';
import { TextField } from '../../ui/TextField';
import { colors, radius, space } from '../../ui/theme';
import { draftBodyFrom } from './draftBody';
import { changesSince } from './editRequest';
import type { FilingControl, FilingFormValues } from './formValues';

type Props = {
  control: FilingControl;
  // The revision being prepared, and the body of the one returned.
  revision: number;
  before: RequestDraft | undefined;
  newFiles: number;
  comment: string;
  onComment: (text: string) => void;
  error?: string;
};

export function ResubmitReview({ control, revision, before, newFiles, comment, onComment, error }: Props) {
  const values = useWatch({ control }) as FilingFormValues;
  const changes = changesSince(before ?? {}, draftBodyFrom(values) ?? {});
  const previous = revision - 1;
  return (
    <View style={styles.wrap}>
      <View style={styles.section} testID="filing-changes">
        <Text variant="label" style={styles.title}>What changed since revision {previous}</Text>
        {changes.length === 0 ? (
          <Notice tone="caution" testID="filing-no-changes">
            {`Nothing in the request differs from revision ${previous} yet${newFiles > 0 ? ' (only files are added)' : ''}. Change what the comment returning it asked for before resubmitting.`}
          </Notice>
        ) : (
          changes.map((c) => (
            <Text key={c.path} testID="filing-change">
              <Text variant="label">{c.name}: </Text>
              <Text variant="muted">{c.before} → {c.after}</Text>
            </Text>
          ))
        )}
        {newFiles > 0 && changes.length > 0 ? <Text variant="muted">{`And ${newFiles === 1 ? 'one file' : `${newFiles} files`} added to revision ${revision}.`}</Text> : null}
      </View>
      <TextField
        label="What you changed (required)"
        hint="It goes on the trail and in the e-mail to the section engineer; answer the comment that returned it."
        value={comment}
        onChangeText={onComment}
        multiline
        error={error}
        testID="filing-resubmit-comment"
      />
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.lg },
  section: { gap: space.sm, backgroundColor: colors.surface, borderRadius: radius, borderWidth: 1, borderColor: colors.line, padding: space.md },
  title: { fontSize: 16 },
});
