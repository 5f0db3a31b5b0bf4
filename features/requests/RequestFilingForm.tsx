// The filing form: the shared zod schema validates as the user types; the screen sends it.
import { useEffect, useState } from 'react';
import { Controller, useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Pressable, StyleSheet, View } from 'react-native';
import { requestFilingFields, uploadLimits, type RequestFilingFields } from '../../shared/requests/filing';
import type { ProjectSummary } from '../../shared/requests/types';
import { Button } from '../ui/Button';
import { Text } from '../ui/Text';
import { TextField } from '../ui/TextField';
import { colors, radius, space } from '../ui/theme';
import type { PickedFile } from './api';
import { formatBytes } from './format';
import { pickFiles } from './pickFiles';

type Props = {
  projects: ProjectSummary[];
  busy: boolean;
  serverFieldErrors?: Record<string, string>;
  onSubmit: (fields: RequestFilingFields, files: PickedFile[]) => void;
};

export function RequestFilingForm({ projects, busy, serverFieldErrors, onSubmit }: Props) {
  const { control, handleSubmit, formState, setError } = useForm<RequestFilingFields>({
    resolver: zodResolver(requestFilingFields),
    mode: 'onTouched',
    defaultValues: { projectId: projects.length === 1 ? projects[0]!.id : '', title: '', reason: '' },
  });
  const [files, setFiles] = useState<PickedFile[]>([]);
  const [fileError, setFileError] = useState<string | null>(null);

  // A refusal from the server lands on the field it names.
  useEffect(() => {
    for (const [name, message] of Object.entries(serverFieldErrors ?? {})) {
      if (name === 'projectId' || name === 'title' || name === 'reason') setError(name, { message });
    }
  }, [serverFieldErrors, setError]);

  async function addFiles() {
    const picked = await pickFiles();
    const tooBig = picked.filter((f) => f.size > uploadLimits.maxFileBytes);
    const empty = picked.filter((f) => f.size === 0);
    const accepted = picked.filter((f) => f.size > 0 && f.size <= uploadLimits.maxFileBytes);
    const next = [...files, ...accepted].slice(0, uploadLimits.maxFilesPerRequest);
    setFiles(next);
    const problems = [
      ...tooBig.map((f) => `"${f.name}" is over the ${formatBytes(uploadLimits.maxFileBytes)} limit.`),
      ...empty.map((f) => `"${f.name}" is empty.`),
      files.length + accepted.length > uploadLimits.maxFilesPerRequest ? `At most ${uploadLimits.maxFilesPerRequest} files per request.` : '',
    ].filter(Boolean);
    setFileError(problems.length ? problems.join(' ') : null);
  }

  return (
    <View style={styles.form}>
      <Controller
        control={control}
        name="projectId"
        render={({ field }) => (
          <View style={styles.group}>
            <Text variant="label">Project</Text>
            {projects.map((p) => {
              const chosen = field.value === p.id;
              return (
                <Pressable
                  key={p.id}
                  accessibilityRole="radio"
                  accessibilityState={{ checked: chosen }}
                  onPress={() => field.onChange(p.id)}
                  style={[styles.choice, chosen && styles.choiceOn]}
                >
                  <Text variant="label">{p.code} · {p.name}</Text>
                  <Text variant="muted">Structure {p.structureNumber}, {p.featureCarried} over {p.featureCrossed}, {p.county}</Text>
                </Pressable>
              );
            })}
            {formState.errors.projectId ? <Text style={styles.error}>{formState.errors.projectId.message}</Text> : null}
          </View>
        )}
      />
      <Controller
        control={control}
        name="title"
        render={({ field }) => (
          <TextField
            label="Title"
            hint="What departs from the plans, in a line: e.g. “Place span 2 deck in one pour”."
            value={field.value}
            onChangeText={field.onChange}
            onBlur={field.onBlur}
            error={formState.errors.title?.message}
            testID="filing-title"
          />
        )}
      />
      <Controller
        control={control}
        name="reason"
        render={({ field }) => (
          <TextField
            label="Reason"
            hint="Why the change is needed and what the plans show today."
            value={field.value}
            onChangeText={field.onChange}
            onBlur={field.onBlur}
            multiline
            error={formState.errors.reason?.message}
            testID="filing-reason"
          />
        )}
      />
      <View style={styles.group}>
        <Text variant="label">Drawings, photos and documents</Text>
        {files.map((f, i) => (
          <View key={`${f.name}-${i}`} style={styles.fileRow} testID="filing-file">
            <Text style={styles.fileName} numberOfLines={1}>{f.name}</Text>
            <Text variant="muted">{formatBytes(f.size)}</Text>
            <Button kind="quiet" label="Remove" onPress={() => setFiles(files.filter((_, j) => j !== i))} />
          </View>
        ))}
        {fileError ? <Text style={styles.error}>{fileError}</Text> : null}
        <Button kind="secondary" label="Add files" onPress={addFiles} testID="filing-add-files" />
      </View>
      <Button label="File the request" busy={busy} onPress={handleSubmit((fields) => onSubmit(fields, files))} testID="filing-submit" />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.xl },
  group: { gap: space.sm },
  choice: { borderWidth: 1, borderColor: colors.line, borderRadius: radius, padding: space.md, backgroundColor: colors.surface },
  choiceOn: { borderColor: colors.slate, borderWidth: 2, backgroundColor: colors.slateLight },
  fileRow: { flexDirection: 'row', alignItems: 'center', gap: space.md, backgroundColor: colors.surface, borderRadius: radius, paddingLeft: space.md },
  fileName: { flex: 1 },
  error: { color: colors.danger },
});
