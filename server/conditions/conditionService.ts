// The conditions a person may see: those on requests of their projects (auditors: every project),
// the same reading rule as the requests themselves.
import type { Database } from '../../db/client';
import { recentlyMetDays, type ConditionListQuery } from '../../shared/conditions/listQuery';
import type { ConditionList } from '../../shared/conditions/types';
import type { Actor } from '../../shared/requests/types';
import { readableProjectIds } from '../requests/access';
import { listConditions } from './conditionRepository';

// Open conditions are few by nature; the cap only guards a long "all" list.
const maxItems = 500;

export async function conditionsFor(db: Database, actor: Actor, q: ConditionListQuery): Promise<ConditionList> {
  const metSince = q.status === 'all' ? new Date(Date.now() - recentlyMetDays * 24 * 3600 * 1000) : undefined;
  const items = await listConditions(db, {
    projectIds: await readableProjectIds(db, actor),
    projectId: q.projectId,
    metSince,
    limit: maxItems + 1,
  });
  return { items: items.slice(0, maxItems), truncated: items.length > maxItems };
}
