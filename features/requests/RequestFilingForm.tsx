// The filing form for an "other deviation". It checks with the shared schema as the person types,
// and hands the screen a complete request body; sending it is the screen's job.
import { useEffect, useState, type ReactNode } from 'react';
import { Controller, useForm, type FieldErrors } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { StyleSheet, View } from 'react-native';
import { uploadLimits } from '../../shared/requests/filing';
import type { RequestBody } from '../../shared/requests/requestBody';
import type { ProjectSummary } from '../../shared/requests/types';
import { Button } from '../ui/Button';
import { Choice, FieldError } from '../ui/Choice';
import { Text } from '../ui/Text';
import { TextField } from '../ui/TextField';
import { colors, radius, space } from '../ui/theme';
import type { PickedFile } from './api';
import { formatBytes } from './format';
import {
  costKindLabels,
  costKinds,
  emptyOtherDeviation,
  fieldFor,
  otherDeviationSchema,
  type OtherDeviationFieldName,
  type OtherDeviationFormValues,
} from './otherDeviationForm';
import { pickFiles } from './pickFiles';

type Props = {
  projects: ProjectSummary[];
  busy: boolean;
  // What is happening now, while busy ("Uploading 2 files…").
  progress?: string | null;
  // Once a draft exists its project is fixed, and files already stored with it stay.
  projectLocked: boolean;
  savedFiles: ReadonlySet<PickedFile>;
  serverFieldErrors?: Record<string, string>;
  // Shown just above the submit button: what went wrong the last time it was pressed.
  beforeSubmit?: ReactNode;
  onSubmit: (body: RequestBody, files: PickedFile[]) => void;
};

function errorAt(errors: FieldErrors<OtherDeviationFormValues>, name: OtherDeviationFieldName): string | undefined {
  const [head, tail] = name.split('.') as [keyof OtherDeviationFormValues, string | undefined];
  const node = errors[head] as Record<string, { message?: string } | undefined> & { message?: string } | undefined;
  return tail ? node?.[tail]?.message : node?.message;
}

export function RequestFilingForm({ projects, busy, progress, projectLocked, savedFiles, serverFieldErrors, beforeSubmit, onSubmit }: Props) {
  const { control, handleSubmit, formState, setError, watch } = useForm({
    resolver: zodResolver(otherDeviationSchema),
    mode: 'onTouched',
    defaultValues: emptyOtherDeviation(projects.length === 1 ? projects[0]!.id : ''),
  });
  const [files, setFiles] = useState<PickedFile[]>([]);
  const [fileError, setFileError] = useState<string | null>(null);
  const errors = formState.errors;
  const err = (name: OtherDeviationFieldName) => errorAt(errors, name);
  const costKind = watch('costImpact.kind');

  // A refusal from the server lands on the field it names.
  useEffect(() => {
    for (const [path, message] of Object.entries(serverFieldErrors ?? {})) {
      const field = fieldFor(path.split('.'));
      if (field) setError(field, { type: 'server', message });
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

  const hasErrors = Object.keys(errors).length > 0 && formState.isSubmitted;

  return (
    <View style={styles.form}>
      <View style={styles.section}>
        <Text variant="heading" accessibilityRole="header">What and where</Text>
        <Controller
          control={control}
          name="projectId"
          render={({ field }) => (
            <View style={styles.group} accessibilityRole="radiogroup" accessibilityLabel="Project">
              <Text variant="label">Project</Text>
              {projects
                .filter((p) => !projectLocked || p.id === field.value)
                .map((p) => (
                  <Choice
                    key={p.id}
                    label={`${p.code} · ${p.name}`}
                    detail={`Structure ${p.structureNumber}, ${p.featureCarried} over ${p.featureCrossed}, ${p.county}`}
                    chosen={field.value === p.id}
                    onPress={() => (projectLocked ? undefined : field.onChange(p.id))}
                    testID="filing-project"
                  />
                ))}
              <FieldError message={err('projectId')} />
            </View>
          )}
        />
        <Controller
          control={control}
          name="title"
          render={({ field }) => (
            <TextField
              ref={field.ref}
              label="Title"
              hint="What departs from the plans, in a line: e.g. “Move deck drain outlet at pier 2”."
              value={field.value}
              onChangeText={field.onChange}
              onBlur={field.onBlur}
              error={err('title')}
              testID="filing-title"
            />
          )}
        />
        <Controller
          control={control}
          name="location.description"
          render={({ field }) => (
            <TextField
              ref={field.ref}
              label="Where on the structure"
              hint="The element and its place, e.g. “Deck drain over pier 2, north fascia”."
              value={field.value}
              onChangeText={field.onChange}
              onBlur={field.onBlur}
              error={err('location.description')}
              testID="filing-location"
            />
          )}
        />
        <View style={styles.pair}>
          <View style={styles.pairItem}>
            <Controller
              control={control}
              name="location.span"
              render={({ field }) => (
                <TextField
                  ref={field.ref}
                  label="Span (optional)"
                  value={field.value}
                  onChangeText={field.onChange}
                  onBlur={field.onBlur}
                  error={err('location.span')}
                  testID="filing-span"
                />
              )}
            />
          </View>
          <View style={styles.pairItem}>
            <Controller
              control={control}
              name="location.station"
              render={({ field }) => (
                <TextField
                  ref={field.ref}
                  label="Station (optional)"
                  placeholder="e.g. 12+40"
                  value={field.value}
                  onChangeText={field.onChange}
                  onBlur={field.onBlur}
                  error={err('location.station')}
                  testID="filing-station"
                />
              )}
            />
          </View>
        </View>
        <Controller
          control={control}
          name="planSheets"
          render={({ field }) => (
            <TextField
              ref={field.ref}
              label="Plan sheets affected"
              hint="Sheet numbers separated by commas, e.g. S-12, D-3. Leave empty if none."
              value={field.value}
              onChangeText={field.onChange}
              onBlur={field.onBlur}
              autoCapitalize="characters"
              error={err('planSheets')}
              testID="filing-plan-sheets"
            />
          )}
        />
      </View>

      <View style={styles.section}>
        <Text variant="heading" accessibilityRole="header">The change</Text>
        <Controller
          control={control}
          name="reason"
          render={({ field }) => (
            <TextField
              ref={field.ref}
              label="Reason"
              hint="Why the change is needed and what the plans show today."
              value={field.value}
              onChangeText={field.onChange}
              onBlur={field.onBlur}
              multiline
              error={err('reason')}
              testID="filing-reason"
            />
          )}
        />
        <Controller
          control={control}
          name="proposedChange"
          render={({ field }) => (
            <TextField
              ref={field.ref}
              label="Proposed change"
              hint="What you would build instead, with dimensions and materials."
              value={field.value}
              onChangeText={field.onChange}
              onBlur={field.onBlur}
              multiline
              error={err('proposedChange')}
              testID="filing-proposed-change"
            />
          )}
        />
      </View>

      <View style={styles.section}>
        <Text variant="heading" accessibilityRole="header">Schedule and cost</Text>
        <Controller
          control={control}
          name="neededBy"
          render={({ field }) => (
            <TextField
              ref={field.ref}
              label="Decision needed by"
              hint="The latest date an answer keeps the work on schedule, as YYYY-MM-DD."
              placeholder="YYYY-MM-DD"
              value={field.value}
              onChangeText={field.onChange}
              onBlur={field.onBlur}
              keyboardType="numbers-and-punctuation"
              error={err('neededBy')}
              testID="filing-needed-by"
            />
          )}
        />
        <Controller
          control={control}
          name="costImpact.kind"
          render={({ field }) => (
            <View style={styles.group} accessibilityRole="radiogroup" accessibilityLabel="Cost impact">
              <Text variant="label">Cost impact</Text>
              <View style={styles.choices}>
                {costKinds.map((kind) => (
                  <View key={kind} style={styles.choiceItem}>
                    <Choice
                      compact
                      label={costKindLabels[kind]}
                      chosen={field.value === kind}
                      onPress={() => {
                        field.onChange(kind);
                        field.onBlur();
                      }}
                      testID={`filing-cost-${kind}`}
                    />
                  </View>
                ))}
              </View>
              <FieldError message={err('costImpact.kind')} />
            </View>
          )}
        />
        {costKind === 'credit' || costKind === 'added_cost' ? (
          <Controller
            control={control}
            name="costImpact.amountUsd"
            render={({ field }) => (
              <TextField
                ref={field.ref}
                label={costKind === 'credit' ? 'Credit, in dollars' : 'Added cost, in dollars'}
                hint="Your estimate; the final figure is settled by the contract’s change procedure."
                placeholder="e.g. 1850"
                value={field.value}
                onChangeText={field.onChange}
                onBlur={field.onBlur}
                keyboardType="decimal-pad"
                error={err('costImpact.amountUsd')}
                testID="filing-cost-amount"
              />
            )}
          />
        ) : null}
        <Controller
          control={control}
          name="contractTimeImpactDays"
          render={({ field }) => (
            <TextField
              ref={field.ref}
              label="Contract-time impact, in days"
              hint="Whole days: 0 if none, negative if the change saves time."
              value={field.value}
              onChangeText={field.onChange}
              onBlur={field.onBlur}
              keyboardType="numbers-and-punctuation"
              error={err('contractTimeImpactDays')}
              testID="filing-time-impact"
            />
          )}
        />
      </View>

      <View style={styles.section}>
        <Text variant="heading" accessibilityRole="header">Drawings, photos and documents</Text>
        <Text variant="muted">
          Marked-up plan sheets, sketches or photos that show the change. Up to {uploadLimits.maxFilesPerRequest} files, {formatBytes(uploadLimits.maxFileBytes)} each.
        </Text>
        {files.map((f, i) => (
          <View key={`${f.name}-${i}`} style={styles.fileRow} testID="filing-file">
            <Text style={styles.fileName} numberOfLines={1}>{f.name}</Text>
            <Text variant="muted">{formatBytes(f.size)}</Text>
            {savedFiles.has(f) ? (
              <Text variant="muted" style={styles.saved}>Saved with the draft</Text>
            ) : (
              <Button kind="quiet" label="Remove" onPress={() => setFiles(files.filter((_, j) => j !== i))} />
            )}
          </View>
        ))}
        <FieldError message={fileError ?? undefined} />
        <Button kind="secondary" label="Add files" onPress={addFiles} testID="filing-add-files" />
      </View>

      {errors.root?.message ? <FieldError message={errors.root.message} /> : null}
      {hasErrors ? <FieldError message="Some fields need attention; they are marked in red above." testID="filing-needs-attention" /> : null}
      {beforeSubmit}
      <View style={styles.group}>
        <Button label="File the request" busy={busy} onPress={handleSubmit((body) => onSubmit(body, files))} testID="filing-submit" />
        {busy && progress ? <Text variant="muted" style={styles.progress} accessibilityLiveRegion="polite">{progress}</Text> : null}
        <Text variant="muted" style={styles.progress}>It goes to the section engineer of the project, who is told by e-mail.</Text>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.xl },
  section: { gap: space.lg },
  group: { gap: space.sm },
  pair: { flexDirection: 'row', gap: space.md, flexWrap: 'wrap' },
  pairItem: { flexGrow: 1, flexBasis: 140 },
  choices: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  choiceItem: { flexGrow: 1, flexBasis: 180 },
  fileRow: { flexDirection: 'row', alignItems: 'center', gap: space.md, backgroundColor: colors.surface, borderRadius: radius, paddingLeft: space.md, minHeight: 44 },
  fileName: { flex: 1 },
  saved: { paddingRight: space.md },
  progress: { textAlign: 'center' },
});
