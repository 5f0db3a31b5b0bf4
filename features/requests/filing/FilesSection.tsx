// The files that go with the request. A seal substitution cannot be filed without the
// substitute's data sheet, so the form says so here and before it sends anything.
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { uploadLimits } from '../../../shared/requests/filing';
import type { AttachmentSummary } from '../../../shared/requests/types';
import { Button } from '../../ui/Button';
import { FieldError } from '../../ui/Choice';
import { Notice } from '../../ui/Notice';
import { Text } from '../../ui/Text';
import { colors, radius, space } from '../../ui/theme';
import type { PickedFile } from '../api';
import { formatBytes } from '../format';
import { pickFiles } from '../pickFiles';

type Props = {
  files: PickedFile[];
  onChange: (files: PickedFile[]) => void;
  savedFiles: ReadonlySet<PickedFile>;
  needsDataSheet: boolean;
  // Set by the form when it refused to file for want of a file.
  missing?: string | null;
  // Files cannot be uploaded without a connection; they wait here until the request is filed.
  offline?: boolean;
  // Names of files picked before the page was closed: the files themselves are not kept on the device.
  pickAgain?: readonly string[];
  // A request already on Spanrelay: the files filed with the revision being prepared, and its number.
  stored?: readonly AttachmentSummary[];
  revision?: number;
};

const offlineWords =
  'You are offline, so files cannot be uploaded now. The files you add stay listed here and are uploaded when you file the request with the connection back. If this page is closed or reloaded before then, you will need to pick them again.';

export function FilesSection({ files, onChange, savedFiles, needsDataSheet, missing, offline, pickAgain = [], stored = [], revision }: Props) {
  const [fileError, setFileError] = useState<string | null>(null);
  const stillToPick = pickAgain.filter((name) => !files.some((f) => f.name === name) && !stored.some((a) => a.fileName === name));
  const room = uploadLimits.maxFilesPerRequest - stored.length;

  async function addFiles() {
    const picked = await pickFiles();
    const tooBig = picked.filter((f) => f.size > uploadLimits.maxFileBytes);
    const empty = picked.filter((f) => f.size === 0);
    const accepted = picked.filter((f) => f.size > 0 && f.size <= uploadLimits.maxFileBytes);
    onChange([...files, ...accepted].slice(0, Math.max(room, 0)));
    const problems = [
      ...tooBig.map((f) => `"${f.name}" is over the ${formatBytes(uploadLimits.maxFileBytes)} limit.`),
      ...empty.map((f) => `"${f.name}" is empty.`),
      files.length + accepted.length > room ? `At most ${uploadLimits.maxFilesPerRequest} files per request.` : '',
    ].filter(Boolean);
    setFileError(problems.length ? problems.join(' ') : null);
  }

  return (
    <View style={styles.section}>
      <Text variant="heading" accessibilityRole="header">Drawings, photos and documents</Text>
      <Text variant="muted">
        {needsDataSheet ? 'The substitute seal’s data sheet is required. ' : ''}
        Marked-up plan sheets, sketches or photos that show the change. Up to {uploadLimits.maxFilesPerRequest} files, {formatBytes(uploadLimits.maxFileBytes)} each. They are uploaded when you file the request.
      </Text>
      {offline ? <Notice tone="caution" testID="filing-files-offline">{offlineWords}</Notice> : null}
      {stillToPick.length > 0 ? (
        <Notice tone="caution" testID="filing-files-pick-again">
          {`Before the page was closed you had picked ${stillToPick.map((n) => `“${n}”`).join(', ')}. Files are not kept on this device; add ${stillToPick.length === 1 ? 'it' : 'them'} again.`}
        </Notice>
      ) : null}
      {revision !== undefined && revision > 1 ? (
        <Text variant="muted">{`Files filed with earlier revisions stay with them. Add what revision ${revision} needs.`}</Text>
      ) : null}
      {stored.map((a) => (
        <View key={a.id} style={styles.fileRow} testID="filing-stored-file">
          <Text style={styles.fileName} numberOfLines={1}>{a.fileName}</Text>
          <Text variant="muted">{formatBytes(a.sizeBytes)}</Text>
          <Text variant="muted" style={styles.saved}>{revision !== undefined ? `On revision ${revision}` : 'Saved with the draft'}</Text>
        </View>
      ))}
      {files.map((f, i) => (
        <View key={`${f.name}-${i}`} style={styles.fileRow} testID="filing-file">
          <Text style={styles.fileName} numberOfLines={1}>{f.name}</Text>
          <Text variant="muted">{formatBytes(f.size)}</Text>
          {savedFiles.has(f) ? (
            <Text variant="muted" style={styles.saved}>Saved with the draft</Text>
          ) : (
            <Button kind="quiet" label="Remove" onPress={() => onChange(files.filter((_, j) => j !== i))} />
          )}
        </View>
      ))}
      <FieldError message={fileError ?? (files.length + stored.length === 0 ? (missing ?? undefined) : undefined)} testID="filing-files-error" />
      <Button kind="secondary" label="Add files" onPress={addFiles} testID="filing-add-files" />
    </View>
  );
}

const styles = StyleSheet.create({
  section: { gap: space.lg },
  fileRow: { flexDirection: 'row', alignItems: 'center', gap: space.md, backgroundColor: colors.surface, borderRadius: radius, paddingLeft: space.md, minHeight: 44 },
  fileName: { flex: 1 },
  saved: { paddingRight: space.md },
});
