// The caution every engineering screen and report carries, in the amber box reserved for it.
import { StyleSheet, Text, View } from 'react-native';
import { engineeringCaution, engineeringVersion } from '../../shared/engineering';
import { plotColors, plotFont } from './plotStyle';

// `version` names the checks that produced a stored result, which may be older than this build.
export function EngineeringCaution({ showVersion = false, version, testID }: { showVersion?: boolean; version?: string; testID?: string }) {
  const text = showVersion || version ? `${engineeringCaution} (Engineering checks ${version ?? engineeringVersion}.)` : engineeringCaution;
  return (
    <View style={styles.box} testID={testID} accessible accessibilityRole="text" accessibilityLabel={text}>
      <Text style={styles.text}>{text}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    backgroundColor: plotColors.cautionBg,
    borderColor: plotColors.caution,
    borderLeftWidth: 4,
    borderRadius: 6,
    paddingHorizontal: 12,
    paddingVertical: 10,
  },
  text: { color: plotColors.caution, fontFamily: plotFont, fontSize: 14, lineHeight: 20 },
});
