// Turns the flat conditions list into one group per request, oldest approval first, and keeps in
// view the conditions this person has just settled (an "open" list would otherwise drop them the
// moment they are met, before the person has seen the result).
import type { ConditionListItem } from '../../shared/conditions/types';
import type { RequestDetail } from '../../shared/requests/types';

export type RequestGroup = { request: ConditionListItem['request']; approvedAt: string | null; approvedBy: ConditionListItem['approvedBy']; items: ConditionListItem[] };

export function groupByRequest(fetched: ConditionListItem[], kept: ConditionListItem[]): RequestGroup[] {
  const byCondition = new Map(fetched.map((i) => [i.condition.id, i]));
  // Whichever copy saw the later version of its request is the truer one.
  for (const k of kept) {
    const f = byCondition.get(k.condition.id);
    if (!f || k.request.version > f.request.version) byCondition.set(k.condition.id, k);
  }
  const groups = new Map<string, RequestGroup>();
  for (const item of byCondition.values()) {
    const g = groups.get(item.request.id);
    if (g) {
      g.items.push(item);
      // The newest version seen wins, so a move is sent with what the server last said.
      if (item.request.version > g.request.version) g.request = item.request;
    } else {
      groups.set(item.request.id, { request: item.request, approvedAt: item.approvedAt, approvedBy: item.approvedBy, items: [item] });
    }
  }
  const list = [...groups.values()];
  for (const g of list) g.items.sort((a, b) => a.condition.seq - b.condition.seq);
  return list.sort((a, b) => (a.approvedAt ?? '~').localeCompare(b.approvedAt ?? '~') || a.request.number.localeCompare(b.request.number));
}

// The condition as the request now stands, from the request the server sent back or reloaded.
export function itemFromDetail(detail: RequestDetail, prior: ConditionListItem): ConditionListItem {
  const c = detail.conditions.find((x) => x.id === prior.condition.id);
  if (!c) return prior;
  const file = c.evidenceAttachmentId ? detail.attachments.find((a) => a.id === c.evidenceAttachmentId) : undefined;
  return {
    ...prior,
    condition: { ...c, evidence: file ? { id: file.id, fileName: file.fileName, contentType: file.contentType } : null },
    request: { ...prior.request, state: detail.state, version: detail.version },
  };
}
