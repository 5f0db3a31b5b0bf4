// On the request's page, the way into the filing form for a request back at its filer's desk:
// the body is changed there and sent on from there, never resubmitted unchanged from the page.
import { useRouter } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import type { RequestDetail } from '../../../shared/requests/types';
import { Button } from '../../ui/Button';
import { Text } from '../../ui/Text';
import { space } from '../../ui/theme';
import { editModeFor } from './editRequest';
import { ReturnComment } from './ReturnComment';

export function ReviseEntry({ request, actorId }: { request: RequestDetail; actorId: string | undefined }) {
  const router = useRouter();
  const mode = editModeFor(request, actorId);
  if (!mode) return null;
  const revise = mode === 'revise';
  return (
    <View style={styles.wrap} testID="request-revise-entry">
      {revise ? <ReturnComment r={request} testID="request-return-comment" /> : null}
      <Text variant="muted">
        {revise
          ? `It was returned to you. Change it in the filing form, say what changed, and resubmit it as revision ${request.currentRevision}.`
          : 'This draft has not been filed yet. Carry on in the filing form and file it from there.'}
      </Text>
      <View style={styles.button}>
        <Button label={revise ? 'Revise the request' : 'Continue the draft'} onPress={() => router.push(`/requests/${request.id}/edit`)} testID="request-revise" />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.sm, alignItems: 'stretch' },
  button: { alignSelf: 'flex-start' },
});
