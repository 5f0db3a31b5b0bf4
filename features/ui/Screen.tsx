// Page frame: scrolls on a phone, keeps a readable measure on a wide screen.
import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { colors, space } from './theme';

export function Screen({ children, wide = false }: { children: ReactNode; wide?: boolean }) {
  return (
    <ScrollView style={styles.scroll} contentContainerStyle={styles.content} keyboardShouldPersistTaps="handled">
      <View style={[styles.column, { maxWidth: wide ? 1200 : 760 }]}>{children}</View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  scroll: { flex: 1, backgroundColor: colors.concrete },
  content: { padding: space.lg, alignItems: 'center' },
  column: { width: '100%', gap: space.lg },
});
