// The frame of the administrator's screens: the refusal for anyone else who types the address,
// the heading, and the switch between people and projects.
import type { ReactNode } from 'react';
import { Link, usePathname } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';
import { useActor } from '../auth/useActor';
import { Notice } from '../ui/Notice';
import { Screen } from '../ui/Screen';
import { Text } from '../ui/Text';
import { ariaCurrent } from '../ui/webAria';
import { colors, fonts, radius, space } from '../ui/theme';

const tabs = [
  { href: '/people', label: 'People', testID: 'admin-tab-people' },
  { href: '/people/projects', label: 'Projects', testID: 'admin-tab-projects' },
] as const;

export function AdminFrame({ title, intro, children }: { title: string; intro: string; children: ReactNode }) {
  const pathname = usePathname();
  const actor = useActor();
  if (actor.data && actor.data.role !== 'admin') {
    return (
      <Screen>
        <Notice tone="info" testID="admin-only">Only administrators manage people and projects. If your role or projects need to change, ask your administrator.</Notice>
      </Screen>
    );
  }
  return (
    <Screen wide>
      <View style={styles.head}>
        <Text variant="title" accessibilityRole="header">{title}</Text>
        <Text variant="muted">{intro}</Text>
      </View>
      <View style={styles.tabs} accessibilityLabel="People or projects">
        {tabs.map((tab) => {
          const current = pathname === tab.href;
          // Flattened: a Link passing its child a style array fails on the web.
          return (
            <Link key={tab.href} href={tab.href} asChild>
              <Pressable accessibilityRole="link" {...ariaCurrent(current)} testID={tab.testID} style={StyleSheet.flatten([styles.tab, current && styles.current])}>
                <Text style={[styles.tabText, current && styles.currentText]}>{tab.label}</Text>
              </Pressable>
            </Link>
          );
        })}
      </View>
      {children}
    </Screen>
  );
}

const styles = StyleSheet.create({
  head: { gap: space.xs, maxWidth: 760 },
  tabs: { flexDirection: 'row', gap: space.sm },
  tab: { minHeight: 44, paddingHorizontal: space.lg, justifyContent: 'center', alignItems: 'center', borderRadius: radius, borderWidth: 1, borderColor: colors.line, backgroundColor: colors.surface },
  current: { backgroundColor: colors.slate, borderColor: colors.slate },
  tabText: { fontFamily: fonts.semibold },
  currentText: { color: colors.surface },
});
