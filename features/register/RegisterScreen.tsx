// Every request the person may see, narrowed by state, kind, project, desk and text, in the order
// they choose, a page at a time. On a wide screen the chosen request opens beside the list.
import { useEffect, useState } from 'react';
import { useLocalSearchParams, useRouter } from 'expo-router';
import { ActivityIndicator, StyleSheet, View } from 'react-native';
import { requestSortLabels, requestSorts } from '../../shared/requests/listQuery';
import { requestTypeLabels, requestTypes } from '../../shared/requests/requestBody';
import { requestStates, stateLabel } from '../../shared/requests/states';
import { roleLabels } from '../../shared/roles';
import { deskRoles } from '../../shared/workflow/desks';
import { useMyProjects, useRequestCounts, useRequestList } from '../requests/api';
import { ListWithDetail, useSelectedRequest } from '../requests/ListWithDetail';
import { RequestCard } from '../requests/RequestCard';
import { Button } from '../ui/Button';
import { ChipGroup } from '../ui/ChipGroup';
import { Notice } from '../ui/Notice';
import { Text } from '../ui/Text';
import { TextField } from '../ui/TextField';
import { space } from '../ui/theme';
import { activeFilterCount, filtersFromParams, type RegisterFilters } from './registerFilters';

const stateOptions = requestStates.map((s) => ({ value: s, label: stateLabel(s) }));
const typeOptions = requestTypes.map((t) => ({ value: t, label: requestTypeLabels[t] }));
const deskOptions = [...deskRoles.map((d) => ({ value: d, label: roleLabels[d] })), { value: 'settled' as const, label: 'Settled (no desk)' }];
const sortOptions = requestSorts.map((s) => ({ value: s, label: requestSortLabels[s] }));

// Typing waits a moment before it becomes a search, so each keystroke is not a request.
function useSearchBox(current: string | undefined, apply: (q: string | undefined) => void) {
  const [text, setText] = useState(current ?? '');
  useEffect(() => setText(current ?? ''), [current]);
  useEffect(() => {
    const wanted = text.trim() || undefined;
    if (wanted === current) return;
    const timer = setTimeout(() => apply(wanted), 350);
    return () => clearTimeout(timer);
  }, [text, current, apply]);
  return [text, setText] as const;
}

// Search and sort are always in view; the narrowing filters fold away so the list starts high.
function Filters({ filters, set, open }: { filters: RegisterFilters; set: (patch: Partial<RegisterFilters>) => void; open: boolean }) {
  const projects = useMyProjects();
  const [search, setSearch] = useSearchBox(filters.q, (q) => set({ q }));
  return (
    <View style={styles.filters} testID="register-filters">
      <TextField
        label="Search"
        placeholder="Number, title, structure or project"
        value={search}
        onChangeText={setSearch}
        autoCapitalize="none"
        returnKeyType="search"
        testID="register-search"
      />
      <ChipGroup label="Sort" options={sortOptions} value={filters.sort} onChange={(sort) => set({ sort: sort ?? 'updated' })} allowAny={false} testID="register-sort" />
      {open ? (
        <>
          <ChipGroup label="At desk" options={deskOptions} value={filters.atDesk} onChange={(atDesk) => set({ atDesk })} testID="register-desk" />
          <ChipGroup label="State" options={stateOptions} value={filters.state} onChange={(state) => set({ state })} testID="register-state" />
          <ChipGroup label="Kind of request" options={typeOptions} value={filters.type} onChange={(type) => set({ type })} testID="register-type" />
          {projects.data && projects.data.length > 1 ? (
            <ChipGroup
              label="Project"
              options={projects.data.map((p) => ({ value: p.id, label: `${p.name} (${p.structureNumber})` }))}
              value={filters.projectId}
              onChange={(projectId) => set({ projectId })}
              testID="register-project"
            />
          ) : null}
        </>
      ) : null}
    </View>
  );
}

export function RegisterScreen() {
  const params = useLocalSearchParams<Record<string, string>>();
  const router = useRouter();
  const { selectedId, onSelect } = useSelectedRequest();
  const filters = filtersFromParams(params);
  const { sort, ...matching } = filters;
  const list = useRequestList({ ...matching, sort, limit: 20 });
  const counts = useRequestCounts(matching);
  const active = activeFilterCount(filters);
  // Open at first only when the address already narrows the list, so what narrows it is in view.
  const [filtersOpen, setFiltersOpen] = useState(() => [filters.state, filters.type, filters.projectId, filters.atDesk].some((v) => v !== undefined));

  // Unset values leave the address rather than lingering as empty parameters.
  const set = (patch: Partial<RegisterFilters>) => {
    const next: Record<string, string | undefined> = {};
    for (const [key, value] of Object.entries(patch)) next[key] = value === undefined || value === '' ? undefined : String(value);
    router.setParams(next);
  };

  const body = (
    <>
      <View style={styles.head}>
        <Text variant="title" accessibilityRole="header">Register</Text>
        <Text variant="muted" accessibilityLiveRegion="polite" testID="register-count">
          {counts.data ? `${counts.data.total} ${counts.data.total === 1 ? 'request' : 'requests'}${counts.data.overdue ? `, ${counts.data.overdue} overdue` : ''}` : ' '}
        </Text>
      </View>
      <Filters filters={filters} set={set} open={filtersOpen} />
      <View style={styles.toggles}>
        <Button kind="secondary" label={`${filtersOpen ? 'Fewer' : 'More'} filters${active ? ` (${active} on)` : ''}`} onPress={() => setFiltersOpen(!filtersOpen)} testID="register-filters-toggle" />
        {active ? <Button kind="quiet" label="Clear filters" onPress={() => set({ state: undefined, type: undefined, projectId: undefined, atDesk: undefined, q: undefined })} testID="register-clear" /> : null}
      </View>

      {list.isPending ? <ActivityIndicator accessibilityLabel="Loading the register" /> : null}
      {list.error ? (
        <View style={styles.retry}>
          <Notice tone="error">{list.error.message}</Notice>
          <Button kind="secondary" label="Try again" onPress={() => void list.refetch()} />
        </View>
      ) : null}
      {list.isSuccess && list.items.length === 0 ? (
        <Notice tone="info" testID="register-empty">
          {active ? 'No request matches these filters. Clear a filter or change the search.' : 'There are no requests on your projects yet. A contractor files one with New request.'}
        </Notice>
      ) : null}
      <View style={styles.list} testID="register-list">
        {list.items.map((r) => <RequestCard key={r.id} request={r} selected={r.id === selectedId} onSelect={onSelect} />)}
      </View>
      {list.hasNextPage ? (
        <Button kind="secondary" label="Load more" busy={list.isFetchingNextPage} onPress={() => void list.fetchNextPage()} testID="register-more" />
      ) : list.items.length > 0 ? (
        <Text variant="muted">That is every matching request.</Text>
      ) : null}
    </>
  );

  return <ListWithDetail list={body} selectedId={selectedId} emptyHint="Choose a request in the register to read it here." />;
}

const styles = StyleSheet.create({
  head: { gap: space.xs },
  toggles: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  filters: { gap: space.md },
  list: { gap: space.md },
  retry: { gap: space.sm, alignItems: 'flex-start' },
});
