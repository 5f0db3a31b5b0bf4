// A new request through the five-step form. What is typed is kept on the device meanwhile; saving,
// storing files and submitting are `useFilingRun`'s, so a retry reuses the draft already made.
import { useRouter } from 'expo-router';
import { ActivityIndicator, StyleSheet, View } from 'react-native';
import { Notice } from '../ui/Notice';
import { Screen } from '../ui/Screen';
import { Text } from '../ui/Text';
import { space } from '../ui/theme';
import { useMyProjects } from './api';
import { DeviceDraftOffer } from './filing/DeviceDraftOffer';
import { requestOfCopy } from './filing/editRequest';
import { DraftFilingForm } from './filing/DraftFilingForm';
import { emptyFiling } from './filing/formValues';
import { useFilingDraft, type KeptDraft } from './filing/useFilingDraft';
import { useFilingRun } from './filing/useFilingRun';

const fileLabel = 'File the request';

export function NewRequestScreen() {
  const router = useRouter();
  const projects = useMyProjects();
  const draft = useFilingDraft();
  const run = useFilingRun(draft, {
    move: (saved) => ({ type: 'submit', version: saved.version }),
    onFiled: (filed) => router.replace({ pathname: '/requests/[id]', params: { id: filed.id, filed: '1' } }),
  });

  // A copy kept for a request already on Spanrelay carries on in that request's own form.
  function carryOn(d: KeptDraft) {
    const requestId = requestOfCopy(d.localId);
    if (requestId) router.push(`/requests/${requestId}/edit`);
    else run.carryOn(d);
  }

  const single = projects.data?.length === 1 ? projects.data[0]!.id : '';

  return (
    <Screen>
      <View style={styles.head}>
        <Text variant="title" accessibilityRole="header">New request</Text>
        <Text variant="muted">
          A departure from the sealed plans needs approval before the work is done. It goes first to the section engineer, then to central office and the engineer of record.
        </Text>
      </View>
      {draft.online ? null : (
        <Notice tone="caution" testID="filing-offline">
          You are offline. What you type is kept on this device; saving to Spanrelay and filing wait for the connection.
        </Notice>
      )}
      <DeviceDraftOffer drafts={draft.kept} onCarryOn={carryOn} onDiscard={draft.discard} />
      {projects.isPending || !draft.ready ? <ActivityIndicator accessibilityLabel="Loading your projects" /> : null}
      {projects.error ? <Notice tone="error">{projects.error.message}</Notice> : null}
      {projects.data && projects.data.length === 0 ? <Notice tone="info">You are not a member of any project yet; ask your administrator.</Notice> : null}
      {projects.data && projects.data.length > 0 && draft.ready ? (
        <DraftFilingForm
          draft={draft}
          run={run}
          projects={projects.data}
          blank={emptyFiling('other_deviation', single)}
          projectLocked={draft.server !== null}
          fileLabel={fileLabel}
        />
      ) : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  head: { gap: space.xs },
});
