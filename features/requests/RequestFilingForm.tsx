// The filing form for every request type. It checks with the shared schema as the person types,
// runs the engineering check live for the typed requests, and hands the screen a complete request
// body; sending it is the screen's job.
import { useEffect, useState, type ReactNode } from 'react';
import { useForm, useWatch, type FieldPath } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { StyleSheet, View } from 'react-native';
import type { RequestBody, RequestType } from '../../shared/requests/requestBody';
import type { ProjectSummary } from '../../shared/requests/types';
import { Button } from '../ui/Button';
import { FieldError } from '../ui/Choice';
import { Text } from '../ui/Text';
import { space } from '../ui/theme';
import type { PickedFile } from './api';
import { ScheduleAndCost, TheChange, WhatAndWhere } from './filing/CommonFields';
import { ConstructionJointFields } from './filing/ConstructionJointFields';
import { DeckPlacementFields } from './filing/DeckPlacementFields';
import { FilesSection } from './filing/FilesSection';
import { fieldFor, filingSchema } from './filing/formSchema';
import { emptyFiling, type FilingFormValues } from './filing/formValues';
import { LiveEngineeringCheck } from './filing/LiveEngineeringCheck';
import { SealSubstitutionFields } from './filing/SealSubstitutionFields';
import { TypeChooser } from './filing/TypeChooser';

type Props = {
  projects: ProjectSummary[];
  busy: boolean;
  // What is happening now, while busy ("Uploading 2 files…").
  progress?: string | null;
  // Once a draft exists its project and type are fixed, and files already stored with it stay.
  projectLocked: boolean;
  savedFiles: ReadonlySet<PickedFile>;
  serverFieldErrors?: Record<string, string>;
  // Shown just above the submit button: what went wrong the last time it was pressed.
  beforeSubmit?: ReactNode;
  onSubmit: (body: RequestBody, files: PickedFile[]) => void;
};

const dataSheetMissing = 'Attach the substitute seal’s data sheet: a seal substitution cannot be filed without it.';

export function RequestFilingForm({ projects, busy, progress, projectLocked, savedFiles, serverFieldErrors, beforeSubmit, onSubmit }: Props) {
  const { control, handleSubmit, formState, setError, setValue, clearErrors } = useForm<FilingFormValues, unknown, RequestBody>({
    resolver: zodResolver(filingSchema),
    mode: 'onTouched',
    defaultValues: emptyFiling('other_deviation', projects.length === 1 ? projects[0]!.id : ''),
  });
  const [files, setFiles] = useState<PickedFile[]>([]);
  const [filesMissing, setFilesMissing] = useState<string | null>(null);
  const type = useWatch({ control, name: 'type' });
  const errors = formState.errors;
  const needsDataSheet = type === 'joint_seal_substitution';

  // A refusal from the server lands on the field it names.
  useEffect(() => {
    for (const [path, message] of Object.entries(serverFieldErrors ?? {})) {
      const field = fieldFor(path.split('.'));
      if (field) setError(field as FieldPath<FilingFormValues>, { type: 'server', message });
    }
  }, [serverFieldErrors, setError]);

  function chooseType(next: RequestType) {
    setValue('type', next);
    // Complaints about the other type's boxes no longer apply.
    clearErrors();
    setFilesMissing(null);
  }

  // Said at every press, not only once the rest is right, so the missing sheet is not a surprise at the end.
  const dataSheetLacking = () => type === 'joint_seal_substitution' && files.length === 0;
  const submit = handleSubmit(
    (body) => {
      if (dataSheetLacking()) {
        setFilesMissing(dataSheetMissing);
        return;
      }
      setFilesMissing(null);
      onSubmit(body, files);
    },
    () => setFilesMissing(dataSheetLacking() ? dataSheetMissing : null),
  );

  const hasErrors = (Object.keys(errors).length > 0 && formState.isSubmitted) || filesMissing !== null;

  return (
    <View style={styles.form}>
      <TypeChooser value={type} onChange={chooseType} locked={projectLocked} />
      <WhatAndWhere control={control} projects={projects} projectLocked={projectLocked} />
      {type === 'deck_placement_change' ? <DeckPlacementFields control={control} /> : null}
      {type === 'construction_joint_relocation' ? <ConstructionJointFields control={control} /> : null}
      {type === 'joint_seal_substitution' ? <SealSubstitutionFields control={control} /> : null}
      <LiveEngineeringCheck control={control} />
      <TheChange control={control} />
      <ScheduleAndCost control={control} />
      <FilesSection files={files} onChange={setFiles} savedFiles={savedFiles} needsDataSheet={needsDataSheet} missing={filesMissing} />

      {errors.root?.message ? <FieldError message={errors.root.message} /> : null}
      {hasErrors ? <FieldError message="Some fields need attention; they are marked in red above." testID="filing-needs-attention" /> : null}
      {beforeSubmit}
      <View style={styles.group}>
        <Button label="File the request" busy={busy} onPress={submit} testID="filing-submit" />
        {busy && progress ? <Text variant="muted" style={styles.progress} accessibilityLiveRegion="polite">{progress}</Text> : null}
        <Text variant="muted" style={styles.progress}>It goes to the section engineer of the project, who is told by e-mail.</Text>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.xl },
  group: { gap: space.sm },
  progress: { textAlign: 'center' },
});
