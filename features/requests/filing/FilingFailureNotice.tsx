// What went wrong with the last filing, beside the buttons where the eye is on a long form, and
// how to try again without losing what was entered.
import { Link } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import type { ServerDraftRef } from '../../drafts/deviceDrafts';
import { Notice } from '../../ui/Notice';
import { Text } from '../../ui/Text';
import { colors, space } from '../../ui/theme';
import { fieldFor } from './formSchema';
import type { FilingFailure, FilingPhase } from './useFilingRun';

const phaseFailed: Record<FilingPhase, string> = {
  save: 'The draft was not saved.',
  upload: 'The draft is saved, but its files were not stored.',
  submit: 'The draft and its files are saved, but it was not sent to the section engineer.',
};

type Props = { failure: FilingFailure | null; server: ServerDraftRef | null; fileLabel: string };

export function FilingFailureNotice({ failure, server, fileLabel }: Props) {
  if (!failure) return null;
  const unplaced = Object.entries(failure.error.fields ?? {}).filter(([path]) => !fieldFor(path.split('.')));
  return (
    <View style={styles.failure} accessibilityLiveRegion="assertive" testID="filing-failure">
      <Notice tone="error">{`${phaseFailed[failure.phase]} The server answered: ${failure.error.message}`}</Notice>
      {unplaced.map(([path, message]) => (
        <Text key={path} variant="muted" style={styles.detail}>{path === '_' ? message : `${path}: ${message}`}</Text>
      ))}
      {server ? (
        <Text variant="muted">
          Draft {server.number} keeps what you entered. Press “{fileLabel}” to try again, or{' '}
          <Link href={`/requests/${server.id}`} style={styles.link} testID="filing-draft-link">open the draft</Link>.
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  failure: { gap: space.sm },
  detail: { color: colors.danger },
  link: { color: colors.slate, textDecorationLine: 'underline', fontWeight: '600' },
});
