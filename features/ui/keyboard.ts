// react-native-web presses a Pressable on Enter, and on Space only when it is a button. A radio or
// a checkbox is expected to answer Space as well (it is the key a keyboard user tries first), so
// these controls add it themselves.
import { Platform } from 'react-native';

type KeyEvent = { key: string; preventDefault: () => void };

// Spread onto a Pressable; the web's onKeyDown is missing from React Native's prop types.
export function spaceAlsoPresses(onPress: () => void): object {
  if (Platform.OS !== 'web') return {};
  return {
    onKeyDown: (e: KeyEvent) => {
      if (e.key !== ' ' && e.key !== 'Spacebar') return;
      // Space would otherwise scroll the page.
      e.preventDefault();
      onPress();
    },
  };
}
