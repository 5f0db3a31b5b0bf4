// Back, Next (or File on the last step) and Save draft, with what became of the last save.
import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { Button } from '../../ui/Button';
import { Notice } from '../../ui/Notice';
import { Text } from '../../ui/Text';
import { space } from '../../ui/theme';
import type { DraftNotice } from './useFilingDraft';

type Props = {
  first: boolean;
  last: boolean;
  busy: boolean;
  progress?: string | null;
  saving: boolean;
  draftNotice: DraftNotice | null;
  onBack: () => void;
  onNext: () => void;
  onFile: () => void;
  onSaveDraft: () => void;
  // The last step's button, e.g. "Resubmit as revision 2".
  fileLabel?: string;
  // Why the last press did not move on. Below the buttons: a message above them that vanishes as
  // a box loses focus would move the button out from under the finger pressing it.
  attention?: ReactNode;
};

export function StepNav({ first, last, busy, progress, saving, draftNotice, onBack, onNext, onFile, onSaveDraft, fileLabel = 'File the request', attention }: Props) {
  return (
    <View style={styles.wrap}>
      <View style={styles.row}>
        {first ? null : (
          <View style={styles.item}>
            <Button kind="secondary" label="Back" onPress={onBack} disabled={busy} testID="filing-back" />
          </View>
        )}
        <View style={styles.item}>
          {last ? (
            <Button label={fileLabel} busy={busy} onPress={onFile} testID="filing-submit" />
          ) : (
            <Button label="Next" onPress={onNext} disabled={busy} testID="filing-next" />
          )}
        </View>
      </View>
      {attention}
      {busy && progress ? <Text variant="muted" style={styles.center} accessibilityLiveRegion="polite">{progress}</Text> : null}
      {last ? <Text variant="muted" style={styles.center}>It goes to the section engineer of the project, who is told by e-mail.</Text> : null}
      <Button kind="secondary" label="Save draft" busy={saving} disabled={busy} onPress={onSaveDraft} testID="filing-save-draft" />
      <View accessibilityLiveRegion="polite">
        {draftNotice ? <Notice tone={draftNotice.tone} testID="draft-notice">{draftNotice.text}</Notice> : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.md },
  row: { flexDirection: 'row', gap: space.md },
  item: { flex: 1 },
  center: { textAlign: 'center' },
});
