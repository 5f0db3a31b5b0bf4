// Where the person is in the filing: "Step 3 of 5: The departure", and a bar of the five steps.
import { forwardRef } from 'react';
import { StyleSheet, View } from 'react-native';
import { Text } from '../../ui/Text';
import { colors, space } from '../../ui/theme';
import { filingSteps, stepHeading, stepTitles, type FilingStep } from './steps';

export const StepIndicator = forwardRef<View, { step: FilingStep }>(function StepIndicator({ step }, ref) {
  const at = filingSteps.indexOf(step);
  return (
    <View ref={ref} style={styles.wrap}>
      <Text variant="heading" accessibilityRole="header" testID="filing-step">{stepHeading(step)}</Text>
      <View style={styles.bar} accessibilityElementsHidden importantForAccessibility="no-hide-descendants">
        {filingSteps.map((s, i) => (
          <View key={s} style={[styles.segment, i <= at && styles.done]} accessibilityLabel={stepTitles[s]} />
        ))}
      </View>
    </View>
  );
});

const styles = StyleSheet.create({
  wrap: { gap: space.sm },
  bar: { flexDirection: 'row', gap: space.xs },
  segment: { flex: 1, height: 6, borderRadius: 3, backgroundColor: colors.slateLight },
  done: { backgroundColor: colors.slate },
});
