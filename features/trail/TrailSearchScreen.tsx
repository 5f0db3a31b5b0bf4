// The auditor's way into the record: find requests by number, structure, a person who acted, the
// dates of their trail and the decision, then open a trail. The search lives in the address, so
// coming back from a trail, reloading or sharing the link keeps it.
import { useLocalSearchParams, useRouter } from 'expo-router';
import { useState } from 'react';
import { ActivityIndicator, StyleSheet, View } from 'react-native';
import { useActor } from '../auth/useActor';
import { ApiError } from '../api/http';
import { useBreakpoint } from '../ui/breakpoints';
import { Button } from '../ui/Button';
import { Notice } from '../ui/Notice';
import { Panel } from '../ui/Panel';
import { Screen } from '../ui/Screen';
import { Text } from '../ui/Text';
import { space } from '../ui/theme';
import { useTrailSearch } from './api';
import { describeFilters, filterNames, filtersOf, forApi, valuesOf, type TrailSearchValues } from './searchFilters';
import { TrailResultCard } from './TrailResultCard';
import { TrailSearchForm } from './TrailSearchForm';

export function TrailSearchScreen() {
  const router = useRouter();
  const params = useLocalSearchParams<Record<string, string>>();
  const { isWide } = useBreakpoint();
  const { data: actor } = useActor();
  const values = valuesOf(params);
  const filters = filtersOf(values);
  const search = useTrailSearch(forApi(filters));
  const searchKey = JSON.stringify(filters);
  const wide = isWide;

  const [filtersOpen, setFiltersOpen] = useState(false);

  const onSearch = (next: TrailSearchValues) => {
    setFiltersOpen(false);
    const nextFilters = filtersOf(next);
    router.setParams(Object.fromEntries(filterNames.map((name) => [name, nextFilters[name] ?? undefined])));
    // The same search again is a wish to see it fresh.
    if (JSON.stringify(nextFilters) === searchKey) void search.refetch();
  };

  const error = search.error;
  const serverFields = error instanceof ApiError && error.status === 400 ? error.fields : undefined;
  const filtered = Object.keys(filters).length > 0;

  // On a phone the form folds away once a search is made, so the results are in view.
  const formShown = wide || filtersOpen || !!serverFields;
  const form = (
    <Panel
      title="Search the trail"
      aside={
        wide ? undefined : (
          <Button kind="quiet" label={formShown ? 'Hide filters' : 'Show filters'} onPress={() => setFiltersOpen(!formShown)} testID="trail-search-toggle" />
        )
      }
    >
      <Text variant="muted" testID="trail-search-summary">
        {formShown
          ? `${actor?.role === 'auditor' ? 'Every request on every project.' : 'The requests of your projects.'} Leave a field empty to not filter by it.`
          : describeFilters(values)}
      </Text>
      {formShown ? (
        <TrailSearchForm key={searchKey} initial={values} onSearch={onSearch} busy={search.isFetching && !search.isFetchingNextPage} serverFields={serverFields} />
      ) : null}
    </Panel>
  );

  const results = (
    <View style={styles.results} testID="trail-search-results">
      <Text variant="heading" accessibilityRole="header" accessibilityLiveRegion="polite">
        {search.isSuccess ? `${search.items.length}${search.hasNextPage ? '+' : ''} ${search.items.length === 1 ? 'request' : 'requests'}${filtered ? ' found' : ', latest activity first'}` : 'Requests'}
      </Text>
      {search.isPending ? (
        <View style={styles.loading} testID="trail-search-loading">
          <ActivityIndicator />
          <Text variant="muted">Searching the trail…</Text>
        </View>
      ) : null}
      {error && !serverFields ? (
        <View style={styles.errorRow}>
          <Notice tone="error">{error.message}</Notice>
          <Button kind="secondary" label="Try again" onPress={() => void search.refetch()} testID="trail-search-retry" />
        </View>
      ) : null}
      {serverFields ? <Notice tone="error">{error!.message}</Notice> : null}
      {search.isSuccess && search.items.length === 0 ? (
        <View testID="trail-search-empty">
          <Notice tone="info">
            {filtered ? 'No request matches all of these. Widen the dates, shorten a number, or clear a filter.' : 'No request has a trail yet. Requests appear here from the moment they are started.'}
          </Notice>
        </View>
      ) : null}
      <View style={styles.list}>
        {search.items.map((hit) => (
          <TrailResultCard key={hit.id} hit={hit} />
        ))}
      </View>
      {search.hasNextPage ? (
        <Button kind="secondary" label="Load more" busy={search.isFetchingNextPage} onPress={() => void search.fetchNextPage()} testID="trail-search-more" />
      ) : null}
    </View>
  );

  return (
    <Screen wide>
      <View style={styles.head}>
        <Text variant="title" accessibilityRole="header">Trail</Text>
        <Text variant="muted">Who did what to each request, and when; every entry is chained to the one before it.</Text>
      </View>
      {wide ? (
        <View style={styles.columns}>
          <View style={styles.formColumn}>{form}</View>
          <View style={styles.resultsColumn}>{results}</View>
        </View>
      ) : (
        <>
          {form}
          {results}
        </>
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  head: { gap: space.xs },
  columns: { flexDirection: 'row', gap: space.lg, alignItems: 'flex-start' },
  formColumn: { width: 400 },
  resultsColumn: { flex: 1, minWidth: 0 },
  results: { gap: space.md },
  list: { gap: space.md },
  loading: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  errorRow: { gap: space.sm },
});
