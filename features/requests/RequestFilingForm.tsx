// The filing form for every request type, in five steps. It checks with the shared schema as the
// person types, lets a step be left only when its own boxes are right, runs the engineering check
// live for the typed requests, and hands the screen a complete request body; saving and sending
// are the screen's job.
import { useEffect, useReducer, useRef, useState, type ReactNode } from 'react';
import { get, useForm, useWatch, type FieldErrors, type FieldPath } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { StyleSheet, View } from 'react-native';
import { loadCheckPlots } from '../engineering/lazyCheckPlots';
import type { RequestBody, RequestDraft, RequestType } from '../../shared/requests/requestBody';
import type { AttachmentSummary, ProjectSummary } from '../../shared/requests/types';
import { FieldError } from '../ui/Choice';
import { space } from '../ui/theme';
import type { PickedFile } from './api';
import { ScheduleAndCost, TheChange, WhatAndWhere } from './filing/CommonFields';
import { ConstructionJointFields } from './filing/ConstructionJointFields';
import { DeckPlacementFields } from './filing/DeckPlacementFields';
import { resubmitCommentProblem } from './filing/editRequest';
import { FilesSection } from './filing/FilesSection';
import { fieldFor, filingSchema } from './filing/formSchema';
import type { FilingFormValues } from './filing/formValues';
import { LiveEngineeringCheck } from './filing/LiveEngineeringCheck';
import { ResubmitReview } from './filing/ResubmitReview';
import { ReviewStep } from './filing/ReviewStep';
import { SealSubstitutionFields } from './filing/SealSubstitutionFields';
import { StepIndicator } from './filing/StepIndicator';
import { StepNav } from './filing/StepNav';
import { earliestStep, firstStep, stepFields, stepOfField, stepReducer, type FilingStep } from './filing/steps';
import { TypeChooser } from './filing/TypeChooser';
import type { DraftNotice } from './filing/useFilingDraft';

type Props = {
  projects: ProjectSummary[];
  initialValues: FilingFormValues;
  initialStep: FilingStep;
  busy: boolean;
  // What is happening now, while busy ("Storing the files…").
  progress?: string | null;
  // Once a draft exists its project and type are fixed, and files already stored with it stay.
  projectLocked: boolean;
  files: PickedFile[];
  onFilesChange: (files: PickedFile[]) => void;
  savedFiles: ReadonlySet<PickedFile>;
  offline: boolean;
  pickAgain: readonly string[];
  serverFieldErrors?: Record<string, string>;
  // Shown above the buttons on every step: uploads under way and what went wrong the last time.
  status?: ReactNode;
  saving: boolean;
  draftNotice: DraftNotice | null;
  onKeep: (values: FilingFormValues, step: FilingStep) => void;
  onSaveDraft: (values: FilingFormValues, step: FilingStep) => void;
  // The comment is given only when resubmitting.
  onSubmit: (body: RequestBody, comment?: string) => void;
  // A request already on Spanrelay: the files filed with the revision being prepared.
  storedFiles?: readonly AttachmentSummary[];
  // A returned request being prepared as `revision`; `before` is the body of the one returned.
  resubmit?: { revision: number; before: RequestDraft | undefined };
  fileLabel?: string;
};

const dataSheetMissing = 'Attach the substitute seal’s data sheet: a seal substitution cannot be filed without it.';

// The boxes the resolver complained about, by path ("deck.spansFt").
function errorPaths(errors: FieldErrors, prefix = ''): string[] {
  const out: string[] = [];
  for (const [key, value] of Object.entries(errors)) {
    if (key === 'root' || !value || typeof value !== 'object') continue;
    const path = prefix ? `${prefix}.${key}` : key;
    if (typeof (value as { type?: unknown }).type === 'string') out.push(path);
    else out.push(...errorPaths(value as FieldErrors, path));
  }
  return out;
}

export function RequestFilingForm(props: Props) {
  const { projects, initialValues, initialStep, busy, progress, projectLocked, files, onFilesChange, savedFiles, offline, pickAgain } = props;
  const { serverFieldErrors, status, saving, draftNotice, onKeep, onSaveDraft, onSubmit, storedFiles = [], resubmit, fileLabel } = props;
  const { control, handleSubmit, formState, setError, setValue, clearErrors, trigger, getValues, watch, setFocus } = useForm<FilingFormValues, unknown, RequestBody>({
    resolver: zodResolver(filingSchema),
    mode: 'onTouched',
    defaultValues: initialValues,
  });
  const [steps, dispatch] = useReducer(stepReducer, initialStep, (step) => (step === 'kind' ? firstStep : { step, reached: step }));
  const [refused, setRefused] = useState(false);
  const [filesMissing, setFilesMissing] = useState<string | null>(null);
  const [comment, setComment] = useState('');
  const [commentError, setCommentError] = useState<string | undefined>(undefined);
  const focusAfterMove = useRef<string | null>(null);
  const top = useRef<View>(null);
  const stepNow = useRef(steps.step);
  stepNow.current = steps.step;
  const type = useWatch({ control, name: 'type' });
  const errors = formState.errors;
  const needsDataSheet = type === 'joint_seal_substitution';

  // The check's plots load apart from the first screen: fetch them as the form opens, so they are
  // on hand for the live check even if the connection goes while the figures are typed.
  useEffect(() => {
    void loadCheckPlots();
  }, []);

  // Every change is offered to the device copy; the screen decides when to write it.
  useEffect(() => {
    const sub = watch(() => onKeep(getValues(), stepNow.current));
    return () => sub.unsubscribe();
  }, [watch, getValues, onKeep]);

  // A new step starts at its heading, not wherever the last one was scrolled to.
  useEffect(() => {
    onKeep(getValues(), steps.step);
    const el = top.current as unknown as { scrollIntoView?: (o?: object) => void } | null;
    el?.scrollIntoView?.({ block: 'start' });
    const field = focusAfterMove.current;
    focusAfterMove.current = null;
    if (field) setTimeout(() => { try { setFocus(field as FieldPath<FilingFormValues>); } catch { /* a choice, not a box that takes focus */ } }, 0);
  }, [steps.step, getValues, onKeep, setFocus]);

  // A refusal from the server lands on the box it names, and the person is taken to its step.
  useEffect(() => {
    const placed: string[] = [];
    for (const [path, message] of Object.entries(serverFieldErrors ?? {})) {
      const field = fieldFor(path.split('.'));
      if (!field) continue;
      setError(field as FieldPath<FilingFormValues>, { type: 'server', message });
      setValue(field as FieldPath<FilingFormValues>, getValues(field as FieldPath<FilingFormValues>), { shouldTouch: true });
      placed.push(field);
    }
    const kind = getValues('type');
    const step = earliestStep(placed, kind);
    if (step) {
      focusAfterMove.current = placed.find((f) => stepOfField(f, kind) === step) ?? null;
      setRefused(true);
      dispatch({ type: 'goTo', step });
    }
  }, [serverFieldErrors, setError, setValue, getValues]);

  // A box named in a refusal is checked again as it is typed in, not only when it loses focus, so
  // its message is gone before the person presses Next again (a message vanishing on that press
  // would move the button out from under the pointer).
  function touchRefused(names: readonly string[]) {
    for (const name of names) {
      const field = name as FieldPath<FilingFormValues>;
      setValue(field, getValues(field), { shouldTouch: true });
    }
  }

  function goTo(step: FilingStep) {
    setRefused(false);
    dispatch({ type: 'goTo', step });
  }

  function chooseType(next: RequestType) {
    setValue('type', next);
    // Complaints about the other type's boxes no longer apply.
    clearErrors();
    setFilesMissing(null);
  }

  // Said at every press, not only once the rest is right, so the missing sheet is not a surprise at the end.
  const dataSheetLacking = () => getValues('type') === 'joint_seal_substitution' && files.length + storedFiles.length === 0;

  function changeComment(text: string) {
    setComment(text);
    // Once refused, the message follows the typing so it is gone before the next press.
    if (commentError) setCommentError(resubmitCommentProblem(text) ?? undefined);
  }

  async function next() {
    const step = steps.step;
    const names = stepFields(step, getValues('type'));
    let ok = names.length === 0 || (await trigger(names as FieldPath<FilingFormValues>[], { shouldFocus: true }));
    if (!ok) touchRefused(names);
    if (step === 'files') {
      const lacking = dataSheetLacking();
      setFilesMissing(lacking ? dataSheetMissing : null);
      ok = ok && !lacking;
    }
    setRefused(!ok);
    if (ok) dispatch({ type: 'next' });
  }

  const file = handleSubmit(
    (body) => {
      if (dataSheetLacking()) {
        setFilesMissing(dataSheetMissing);
        setRefused(true);
        dispatch({ type: 'goTo', step: 'files' });
        return;
      }
      setFilesMissing(null);
      if (resubmit) {
        const problem = resubmitCommentProblem(comment);
        setCommentError(problem ?? undefined);
        if (problem) {
          setRefused(true);
          return;
        }
      }
      setRefused(false);
      onSubmit(body, resubmit ? comment.trim() : undefined);
    },
    (found) => {
      setRefused(true);
      setFilesMissing(dataSheetLacking() ? dataSheetMissing : null);
      // Every refusal at once, so the comment is not a second surprise once the boxes are right.
      if (resubmit) setCommentError(resubmitCommentProblem(comment) ?? undefined);
      const kind = getValues('type');
      const paths = errorPaths(found);
      const step = earliestStep(paths, kind);
      if (step && step !== 'review') {
        focusAfterMove.current = paths.find((f) => stepOfField(f, kind) === step) ?? null;
        dispatch({ type: 'goTo', step });
      }
    },
  );

  const shown = stepFields(steps.step, type);
  const stepHasErrors = shown.some((name) => get(errors, name)) || (steps.step === 'review' && Object.keys(errors).length > 0);
  const needsAttention = refused && (stepHasErrors || (filesMissing !== null && files.length + storedFiles.length === 0) || (steps.step === 'review' && commentError !== undefined));

  return (
    <View style={styles.form}>
      <StepIndicator ref={top} step={steps.step} />

      {steps.step === 'kind' ? <TypeChooser value={type} onChange={chooseType} locked={projectLocked} /> : null}
      {steps.step === 'where' ? <WhatAndWhere control={control} projects={projects} projectLocked={projectLocked} /> : null}
      {steps.step === 'departure' ? (
        <>
          {type === 'deck_placement_change' ? <DeckPlacementFields control={control} /> : null}
          {type === 'construction_joint_relocation' ? <ConstructionJointFields control={control} /> : null}
          {type === 'joint_seal_substitution' ? <SealSubstitutionFields control={control} /> : null}
          <LiveEngineeringCheck control={control} />
          <TheChange control={control} />
          <ScheduleAndCost control={control} />
        </>
      ) : null}
      {steps.step === 'files' ? (
        <FilesSection
          files={files}
          onChange={onFilesChange}
          savedFiles={savedFiles}
          needsDataSheet={needsDataSheet}
          missing={filesMissing}
          offline={offline}
          pickAgain={pickAgain}
          stored={storedFiles}
          revision={resubmit?.revision}
        />
      ) : null}
      {steps.step === 'review' ? (
        <>
          <ReviewStep control={control} projects={projects} files={files} stored={storedFiles} onChange={goTo} />
          <LiveEngineeringCheck control={control} />
          {resubmit ? (
            <ResubmitReview
              control={control}
              revision={resubmit.revision}
              before={resubmit.before}
              newFiles={files.filter((f) => !savedFiles.has(f)).length}
              comment={comment}
              onComment={changeComment}
              error={commentError}
            />
          ) : null}
        </>
      ) : null}

      {errors.root?.message && steps.step === 'review' ? <FieldError message={errors.root.message} /> : null}
      {status}
      <StepNav
        first={steps.step === 'kind'}
        last={steps.step === 'review'}
        busy={busy}
        progress={progress}
        saving={saving}
        draftNotice={draftNotice}
        onBack={() => {
          setRefused(false);
          dispatch({ type: 'back' });
        }}
        onNext={() => void next()}
        onFile={() => void file()}
        onSaveDraft={() => onSaveDraft(getValues(), steps.step)}
        fileLabel={fileLabel}
        attention={needsAttention ? <FieldError message="Some fields need attention; they are marked in red above." testID="filing-needs-attention" /> : null}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.xl },
});
