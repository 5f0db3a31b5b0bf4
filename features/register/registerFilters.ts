// The register's filters live in the address, so the back button, a reload and a shared link all
// keep them. Anything unknown in the address is dropped rather than sent to the server.
import { requestSorts, type RequestSort } from '../../shared/requests/listQuery';
import { requestTypes, type RequestType } from '../../shared/requests/requestBody';
import { requestStates, type RequestState } from '../../shared/requests/states';
import { deskRoles, type DeskRole } from '../../shared/workflow/desks';

export type RegisterFilters = {
  state?: RequestState;
  type?: RequestType;
  projectId?: string;
  atDesk?: DeskRole | 'settled';
  q?: string;
  sort: RequestSort;
};

const oneOf = <T extends string>(allowed: readonly T[], value: unknown): T | undefined =>
  typeof value === 'string' && (allowed as readonly string[]).includes(value) ? (value as T) : undefined;

const uuidShape = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export function filtersFromParams(params: Record<string, string | string[] | undefined>): RegisterFilters {
  const text = typeof params.q === 'string' ? params.q.trim().slice(0, 200) : '';
  return {
    state: oneOf(requestStates, params.state),
    type: oneOf(requestTypes, params.type),
    projectId: typeof params.projectId === 'string' && uuidShape.test(params.projectId) ? params.projectId : undefined,
    atDesk: oneOf([...deskRoles, 'settled'] as const, params.atDesk),
    q: text || undefined,
    sort: oneOf(requestSorts, params.sort) ?? 'updated',
  };
}

export function activeFilterCount(f: RegisterFilters): number {
  return [f.state, f.type, f.projectId, f.atDesk, f.q].filter((v) => v !== undefined).length;
}
