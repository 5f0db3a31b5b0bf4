// Shapes the API returns for requests; the client renders them, the server builds them.
import type { Role } from '../roles';

export type AttachmentSummary = {
  id: string;
  fileName: string;
  contentType: string;
  sizeBytes: number;
  sha256: string;
  uploadedAt: string;
};

export type TrailEntry = {
  seq: number;
  eventType: string;
  stateBefore: string | null;
  stateAfter: string;
  actorName: string;
  actorRole: Role;
  comment: string | null;
  at: string;
};

export type RequestSummary = {
  id: string;
  number: string;
  title: string;
  state: string;
  version: number;
  project: { id: string; code: string; name: string; structureNumber: string };
  filedBy: { name: string; organization: string | null };
  createdAt: string;
  updatedAt: string;
};

export type RequestDetail = RequestSummary & {
  reason: string;
  attachments: AttachmentSummary[];
  trail: TrailEntry[];
};

export type ProjectSummary = {
  id: string;
  code: string;
  name: string;
  structureNumber: string;
  featureCarried: string;
  featureCrossed: string;
  county: string;
};

export type Actor = { id: string; name: string; email: string; role: Role; organization: string | null };
