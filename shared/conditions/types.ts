// What GET /api/conditions returns: one row per condition, carrying the request it belongs to and
// the approval that set it, so a list can be grouped by request without a second call.
import type { ConditionView, PersonRef } from '../requests/types';

export type ConditionEvidence = { id: string; fileName: string; contentType: string };

export type ConditionListItem = {
  condition: ConditionView & { evidence: ConditionEvidence | null };
  request: {
    id: string;
    number: string;
    title: string;
    state: string;
    // The version a satisfy_condition move must name.
    version: number;
    projectId: string;
    projectName: string;
    structureNumber: string;
  };
  // The engineer of record's approve_with_conditions move.
  approvedAt: string | null;
  approvedBy: PersonRef | null;
};

export type ConditionList = { items: ConditionListItem[]; truncated: boolean };
