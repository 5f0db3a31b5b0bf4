// One engineering check as a reviewer reads it: the verdict, the findings, the plots of its own
// figures and the caution. The form shows a live check as it is typed; a request shows the one
// stored at submit, so everyone sees the figures that were filed.
import { StyleSheet, useWindowDimensions, View } from 'react-native';
import { Text } from '../ui/Text';
import { radius, space } from '../ui/theme';
import { deckFigures, findingsOf, jointFigures, sealFigures, type CheckLike } from './checkFigures';
import { EngineeringCaution } from './EngineeringCaution';
import { PlotInset } from './Inset';
import { useCheckPlots } from './lazyCheckPlots';
import { useMeasuredWidth } from './useMeasuredWidth';
import { verdictOf } from './verdict';

function Plots({ check, width }: { check: CheckLike; width: number }) {
  // Asked for as soon as the view is shown, while its width is being measured.
  const plots = useCheckPlots();
  if (width <= 0 || !plots) return null;
  const { DeckCheckPlots, JointCheckPlots, SealCheckPlots } = plots;
  if (check.kind === 'deck_placement_change') {
    const f = deckFigures(check);
    return f ? <DeckCheckPlots figures={f} width={width} /> : null;
  }
  if (check.kind === 'construction_joint_relocation') {
    const f = jointFigures(check);
    return f ? <JointCheckPlots figures={f} width={width} /> : null;
  }
  if (check.kind === 'joint_seal_substitution') {
    const f = sealFigures(check);
    return f ? <SealCheckPlots figures={f} width={width} /> : null;
  }
  return null;
}

// `bleed` is the padding of the box around the view: on a phone the plots reach out over it,
// since every pixel of width is lettering a site reader can read.
export function EngineeringCheckView({ check, stored = false, bleed = 0, testID }: { check: CheckLike; stored?: boolean; bleed?: number; testID?: string }) {
  const { width: windowWidth } = useWindowDimensions();
  const outward = windowWidth < 600 ? bleed : 0;
  const [width, onLayout] = useMeasuredWidth();
  const verdict = verdictOf(check.verdict);
  const findings = findingsOf(check);
  const version = typeof check.engineeringVersion === 'string' ? check.engineeringVersion : undefined;
  return (
    <View style={styles.wrap} testID={testID}>
      {verdict ? (
        <View style={[styles.verdict, { backgroundColor: verdict.bg, borderColor: verdict.fg }]} testID={testID ? `${testID}-verdict` : undefined}>
          <Text variant="label" style={{ color: verdict.fg }}>{verdict.title}</Text>
        </View>
      ) : null}
      {findings.length > 0 ? (
        <View style={styles.findings}>
          {findings.map((f, i) => (
            <View key={i} style={styles.finding}>
              <Text style={styles.bullet}>•</Text>
              <Text style={styles.findingText}>{f}</Text>
            </View>
          ))}
        </View>
      ) : null}
      <View onLayout={onLayout} style={outward ? { marginHorizontal: -outward } : undefined}>
        <PlotInset.Provider value={outward}>
          <Plots check={check} width={width} />
        </PlotInset.Provider>
      </View>
      <EngineeringCaution version={stored ? version : undefined} showVersion={!stored} />
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.md },
  verdict: { borderLeftWidth: 4, borderRadius: radius, paddingHorizontal: space.md, paddingVertical: space.sm },
  findings: { gap: space.xs },
  finding: { flexDirection: 'row', gap: space.sm },
  bullet: { lineHeight: 22 },
  findingText: { flex: 1, fontSize: 15 },
});
