// The filing form wired to its draft (device copy, Save draft) and to the filing run (save, files,
// the move that sends it on): the same for a new request and for one opened again.
import type { ComponentProps } from 'react';
import type { ProjectSummary } from '../../../shared/requests/types';
import { UploadProgressList } from '../../uploads/UploadProgressList';
import type { PickedFile } from '../api';
import { RequestFilingForm } from '../RequestFilingForm';
import { FilingFailureNotice } from './FilingFailureNotice';
import type { FilingFormValues } from './formValues';
import type { useFilingDraft } from './useFilingDraft';
import type { useFilingRun } from './useFilingRun';

type FormProps = ComponentProps<typeof RequestFilingForm>;

type Props = {
  draft: ReturnType<typeof useFilingDraft>;
  run: ReturnType<typeof useFilingRun>;
  projects: ProjectSummary[];
  // Where the form starts when neither the device nor a clash gave it anything.
  blank: FilingFormValues;
  projectLocked: boolean;
  fileLabel: string;
  // The files the form lists as picked; all of the run's unless the screen lists stored ones apart.
  files?: PickedFile[];
} & Pick<FormProps, 'storedFiles' | 'resubmit'>;

export function DraftFilingForm({ draft, run, projects, blank, projectLocked, fileLabel, files, storedFiles, resubmit }: Props) {
  return (
    <RequestFilingForm
      key={draft.seed.key}
      projects={projects}
      initialValues={draft.seed.values ?? blank}
      initialStep={draft.seed.step}
      busy={run.phase !== null}
      progress={run.progress}
      projectLocked={projectLocked}
      files={files ?? run.files}
      onFilesChange={run.changeFiles}
      savedFiles={run.savedFiles}
      storedFiles={storedFiles}
      offline={!draft.online}
      pickAgain={draft.seed.pickAgain}
      serverFieldErrors={run.failure?.error.fields}
      resubmit={resubmit}
      fileLabel={fileLabel}
      status={
        <>
          <UploadProgressList items={run.uploads.items} onCancel={run.uploads.cancel} />
          <FilingFailureNotice failure={run.failure} server={draft.server} fileLabel={fileLabel} />
        </>
      }
      saving={draft.saving}
      draftNotice={draft.notice}
      onKeep={draft.keep}
      onSaveDraft={(values, step) => void draft.save(values, step)}
      onSubmit={(body, comment) => void run.file(body, comment)}
    />
  );
}
