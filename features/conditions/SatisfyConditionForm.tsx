// Confirming one condition on site: a note, then one photo or document sent with its own progress
// bar and cancel, then the move. A file already stored is not sent again when the move is retried.
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { ConditionListItem } from '../../shared/conditions/types';
import type { AttachmentSummary, RequestDetail } from '../../shared/requests/types';
import { workflowEventSchema } from '../../shared/workflow/events';
import { ApiError } from '../api/http';
import type { PickedFile } from '../requests/api';
import { formatBytes } from '../requests/format';
import { pickFiles } from '../requests/pickFiles';
import { Button } from '../ui/Button';
import { FieldError } from '../ui/Choice';
import { Notice } from '../ui/Notice';
import { Text } from '../ui/Text';
import { TextField } from '../ui/TextField';
import { colors, radius, space } from '../ui/theme';
import { UploadProgressList } from '../uploads/UploadProgressList';
import { useFileUploads } from '../uploads/useFileUploads';
import { evidenceUploadUrl, useSatisfyCondition } from './api';

// The note's rule is the move's own, so the form refuses exactly what the server would.
const satisfyMove = workflowEventSchema.options.find((o) => o.shape.type.value === 'satisfy_condition');
function noteError(note: string): string | undefined {
  const parsed = satisfyMove?.shape.comment.safeParse(note);
  return parsed && !parsed.success ? parsed.error.issues[0]?.message : undefined;
}

type Props = {
  item: ConditionListItem;
  // The version to send: the newest the screen has seen for this request.
  version: number;
  onMet: (detail: RequestDetail) => void;
  onConflict: (message: string) => void;
  onClose: () => void;
};

export function SatisfyConditionForm({ item, version, onMet, onConflict, onClose }: Props) {
  const [note, setNote] = useState('');
  const [file, setFile] = useState<PickedFile | null>(null);
  const [stored, setStored] = useState<AttachmentSummary | null>(null);
  const [errors, setErrors] = useState<{ note?: string; file?: string }>({});
  const [failure, setFailure] = useState<string | null>(null);
  const [sending, setSending] = useState(false);
  const uploads = useFileUploads();
  const { satisfy, isPending } = useSatisfyCondition();

  async function choose() {
    const picked = await pickFiles();
    if (picked.length === 0) return;
    setFile(picked[0]!);
    setStored(null);
    uploads.reset();
    setErrors((e) => ({ ...e, file: undefined }));
  }

  async function submit() {
    setFailure(null);
    const problems = { note: noteError(note.trim()), file: file ? undefined : 'Choose a photo or document that shows the condition met.' };
    setErrors(problems);
    if (problems.note || problems.file || !file) return;
    setSending(true);
    try {
      let evidence = stored;
      if (!evidence) {
        const [sent] = await uploads.sendAll(evidenceUploadUrl(item.request.id), [file]);
        if (!sent) {
          setFailure('The upload was cancelled, so nothing was marked. Press the button again to send the file.');
          return;
        }
        evidence = sent;
        setStored(sent);
      }
      const detail = await satisfy({ requestId: item.request.id, version, conditionId: item.condition.id, note: note.trim(), evidenceAttachmentId: evidence.id });
      onMet(detail);
    } catch (err) {
      const e = err instanceof ApiError ? err : null;
      if (e?.status === 409) {
        onConflict(e.message);
        return;
      }
      if (e?.fields?.comment) setErrors((x) => ({ ...x, note: e.fields.comment }));
      setFailure(`${e?.message ?? 'Something went wrong.'} Nothing was marked; try again.`);
    } finally {
      setSending(false);
    }
  }

  const busy = sending || isPending;
  return (
    <View style={styles.form} testID="condition-form">
      <TextField
        label="How was it met on site? (required)"
        hint="What you saw or checked, and when. It goes on the request's trail."
        value={note}
        onChangeText={(text) => {
          setNote(text);
          // A refusal stays only while it is still true.
          if (errors.note && !noteError(text.trim())) setErrors((e) => ({ ...e, note: undefined }));
        }}
        multiline
        error={errors.note}
        editable={!busy}
        testID="condition-note"
      />
      <View style={styles.evidence}>
        <Text variant="label">Evidence (required)</Text>
        {file ? (
          <Text testID="condition-evidence-file">
            {file.name} · {formatBytes(file.size)}{stored ? ' · stored' : ''}
          </Text>
        ) : (
          <Text variant="muted">A photo from site or a document such as a test report.</Text>
        )}
        <View style={styles.row}>
          <Button kind="secondary" label={file ? 'Choose another file' : 'Choose a photo or document'} onPress={() => void choose()} disabled={busy} testID="condition-evidence" />
        </View>
        <FieldError message={errors.file} />
      </View>
      <UploadProgressList items={uploads.items} onCancel={uploads.cancel} />
      {failure ? <Notice tone="error" testID="condition-failure">{failure}</Notice> : null}
      <View style={styles.row}>
        <Button label="Mark this condition satisfied" busy={busy} onPress={() => void submit()} testID="condition-submit" />
        <Button kind="quiet" label="Close" onPress={onClose} disabled={busy} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.md, borderWidth: 1, borderColor: colors.line, borderRadius: radius, padding: space.md, backgroundColor: colors.concrete },
  evidence: { gap: space.xs },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, alignItems: 'center' },
});
