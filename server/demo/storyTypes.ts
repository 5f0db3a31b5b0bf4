// A demo request's story: its body and the moves people made on it, each on a day before the
// seed ran. The runner (storyRunner.ts) replays them through the real services, so every check,
// trail event, mail and decision record is what the product itself would have made.
import type { RequestBody, RequestDraft } from '../../shared/requests/requestBody';
import type { WorkflowEventInput } from '../../shared/workflow/events';
import type { UploadPurpose } from '../requests/attachmentService';
import type { DemoPersonKey, DemoProjectKey } from './demoCast';
import type { LetterSpec, SealSheetSpec, SitePhotoSubject, SketchSpec } from './demoFiles';

// Agency local time, "HH:MM", so the history reads as a working week.
export type When = { daysAgo: number; at: string };

// What a story says of a file; the runner adds what the real document would carry of its
// context (project, structure, spans, day, author).
type SketchRecipe = { make: 'sketch' } & Omit<SketchSpec, 'agency' | 'projectName' | 'structureNumber' | 'preparedBy' | 'date' | 'spansFt'>;
type DataSheetRecipe = { make: 'dataSheet' } & SealSheetSpec;
type LetterRecipe = { make: 'letter' } & Omit<LetterSpec, 'date'>;
type PhotoRecipe = { make: 'photo'; fileName: string; subject: SitePhotoSubject; seed: number };
export type FileRecipe = SketchRecipe | DataSheetRecipe | LetterRecipe | PhotoRecipe;

type PlainMove = Exclude<WorkflowEventInput, { type: 'route' | 'reassign' | 'satisfy_condition' | 'record_federal_concurrence' }>;
type DistributiveOmit<T, K extends keyof never> = T extends unknown ? Omit<T, K> : never;

export type StoryAction =
  | { attach: FileRecipe; purpose?: UploadPurpose }
  | { move: DistributiveOmit<PlainMove, 'version'> }
  | { route: DemoPersonKey; comment?: string }
  | { reassign: DemoPersonKey; comment: string }
  | { comment: string }
  // The contractor edits the current revision (after a return) before resubmitting it.
  | { revise: (body: RequestBody) => RequestBody }
  | { satisfy: { seq: number; note: string; evidence: FileRecipe } }
  | { concurrence: { letter: FileRecipe; comment?: string } };

export type StoryStep = { on: When; by: DemoPersonKey } & StoryAction;

type BodyWithoutProject<T> = T extends unknown ? Omit<T, 'projectId'> : never;

export type RequestStory = {
  project: DemoProjectKey;
  filedBy: DemoPersonKey;
  filedOn: When;
  // A submitted request's body is complete; a draft's may still be missing fields.
  body: BodyWithoutProject<RequestBody> | BodyWithoutProject<RequestDraft>;
  steps: StoryStep[];
};

// Dates the stories need, relative to the day the seed runs.
export type StoryCalendar = {
  // 'YYYY-MM-DD', n days after the seed's day (negative: before).
  date(daysFromToday: number): string;
};
