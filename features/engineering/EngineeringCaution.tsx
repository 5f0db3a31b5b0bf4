// The caution every engineering screen and report carries, in the amber box reserved for it.
import { StyleSheet, Text, View } from 'react-native';
import { engineeringCaution, engineeringVersion } from '../../shared/engineering';
import { plotColors, plotFont } from './plotStyle';

export function EngineeringCaution({ showVersion = false, testID }: { showVersion?: boolean; testID?: string }) {
  const text = showVersion ? `${engineeringCaution} (Engineering checks ${engineeringVersion}.)` : engineeringCaution;
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
