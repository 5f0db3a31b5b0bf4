// The card every signed-out screen sits in (sign-in, forgotten password, reset, invitation), and
// the links between them.
import { useEffect, type ReactNode } from 'react';
import { Link, type Href } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';
import { installFocusRing } from '../ui/focusRing';
import { Screen } from '../ui/Screen';
import { Text } from '../ui/Text';
import { colors, fonts, radius, space } from '../ui/theme';

export function AuthCard({ title, intro, children }: { title: string; intro?: string; children: ReactNode }) {
  useEffect(installFocusRing, []);
  return (
    <Screen>
      <View style={styles.card}>
        <Text variant="title" accessibilityRole="header">{title}</Text>
        {intro ? <Text variant="muted">{intro}</Text> : null}
        {children}
      </View>
    </Screen>
  );
}

export function AuthLink({ href, label, testID }: { href: Href; label: string; testID?: string }) {
  return (
    <Link href={href} asChild>
      <Pressable accessibilityRole="link" testID={testID} style={styles.link}>
        <Text style={styles.linkText}>{label}</Text>
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  card: {
    backgroundColor: colors.surface,
    borderRadius: radius,
    borderWidth: 1,
    borderColor: colors.line,
    padding: space.xl,
    gap: space.lg,
    width: '100%',
    maxWidth: 440,
    alignSelf: 'center',
    marginTop: space.xxl,
  },
  link: { minHeight: 44, justifyContent: 'center', alignSelf: 'flex-start' },
  linkText: { color: colors.slate, fontFamily: fonts.medium, textDecorationLine: 'underline' },
});
