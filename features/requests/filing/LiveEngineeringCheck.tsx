// The check beside the form as the contractor types, a moment after they stop, so a figure can be
// corrected before the request goes anywhere. The server works it out again at submit.
import { useEffect, useState } from 'react';
import { useWatch } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { EngineeringCaution } from '../../engineering/EngineeringCaution';
import { EngineeringCheckView } from '../../engineering/EngineeringCheckView';
import { Text } from '../../ui/Text';
import { colors, radius, space } from '../../ui/theme';
import type { FilingControl, FilingFormValues } from './formValues';
import { liveCheckFor, type LiveCheck } from './liveCheck';

const SETTLE_MS = 300;

export function LiveEngineeringCheck({ control }: { control: FilingControl }) {
  const values = useWatch({ control }) as FilingFormValues;
  const key = JSON.stringify(values);
  const [live, setLive] = useState<LiveCheck>(() => liveCheckFor(values));

  useEffect(() => {
    const timer = setTimeout(() => setLive(liveCheckFor(JSON.parse(key) as FilingFormValues)), SETTLE_MS);
    return () => clearTimeout(timer);
  }, [key]);

  if (live.state === 'none') return null;
  return (
    <View style={styles.box} testID="filing-live-check" accessibilityLiveRegion="polite">
      <Text variant="heading" accessibilityRole="header">Engineering check</Text>
      <Text variant="muted">Worked out from the figures above as you type. The server works it out again when the request is filed and keeps it with the request.</Text>
      {live.state === 'ready' ? (
        <EngineeringCheckView check={live.check} bleed={space.md} testID="filing-check" />
      ) : (
        <>
          <Text style={live.state === 'refused' ? styles.refused : styles.waiting} testID="filing-check-hint">{live.hint}</Text>
          <EngineeringCaution />
        </>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.md, borderWidth: 1, borderColor: colors.slate, borderTopWidth: 4, borderRadius: radius, padding: space.md, backgroundColor: colors.surface },
  waiting: { color: colors.inkMuted },
  refused: { color: colors.caution },
});
