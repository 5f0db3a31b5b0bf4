// The signed-in frame. On a phone: a slim top bar and tabs along the bottom, in thumb reach. From
// 768 px: a side navigation with the same destinations. One component, one breakpoint hook.
import { useEffect, type ReactNode } from 'react';
import { Link, usePathname, useRouter } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';
import { roleLabels } from '../../shared/roles';
import type { Actor } from '../../shared/requests/types';
import { useSignOut } from '../auth/useActor';
import { useRequestCounts } from '../requests/api';
import { useBreakpoint } from '../ui/breakpoints';
import { installFocusRing } from '../ui/focusRing';
import { Icon } from '../ui/icons';
import { ariaCurrent } from '../ui/webAria';
import { Text } from '../ui/Text';
import { colors, fonts, radius, space } from '../ui/theme';
import { activeDestination, destinationsFor, type Destination } from './destinations';

function useWaitingCount(actor: Actor): number | null {
  const holdsDesk = destinationsFor(actor.role).some((d) => d.key === 'desk');
  const counts = useRequestCounts({ desk: 'mine' });
  return holdsDesk && counts.data ? counts.data.total : null;
}

function NavItem({ d, active, badge, layout }: { d: Destination; active: boolean; badge: number | null; layout: 'tab' | 'side' }) {
  const color = layout === 'tab' ? (active ? colors.slate : colors.inkMuted) : active ? colors.surface : colors.slateLight;
  const label = badge ? `${d.label}, ${badge} waiting` : d.label;
  return (
    <Link href={d.href} asChild>
      <Pressable
        accessibilityRole="link"
        accessibilityLabel={label}
        {...ariaCurrent(active)}
        testID={`nav-${d.key}`}
        // Flattened: a Link passing its child a style array fails on the web.
        style={StyleSheet.flatten([layout === 'tab' ? styles.tab : styles.sideItem, active && (layout === 'tab' ? styles.tabActive : styles.sideItemActive)])}
      >
        <View>
          <Icon name={d.icon} color={color} />
          {badge ? (
            <View style={styles.badge}>
              <Text style={styles.badgeText}>{badge > 99 ? '99+' : badge}</Text>
            </View>
          ) : null}
        </View>
        <Text numberOfLines={1} style={[layout === 'tab' ? styles.tabLabel : styles.sideLabel, { color }, active && styles.activeLabel]}>
          {d.label}
        </Text>
      </Pressable>
    </Link>
  );
}

function SignOutButton({ tone }: { tone: 'bar' | 'side' }) {
  const router = useRouter();
  const signOut = useSignOut();
  return (
    <Pressable
      accessibilityRole="button"
      accessibilityLabel="Sign out"
      testID="shell-sign-out"
      disabled={signOut.isPending}
      onPress={() => signOut.mutate(undefined, { onSuccess: () => router.replace('/sign-in') })}
      style={[styles.signOut, tone === 'side' && styles.signOutSide]}
    >
      <Icon name="signOut" color={colors.slateLight} size={20} />
      <Text style={styles.signOutText}>Sign out</Text>
    </Pressable>
  );
}

export function AppShell({ actor, children }: { actor: Actor; children: ReactNode }) {
  const { isPhone } = useBreakpoint();
  useEffect(installFocusRing, []);
  const pathname = usePathname();
  const items = destinationsFor(actor.role);
  const active = activeDestination(pathname, actor.role);
  const waiting = useWaitingCount(actor);
  const who = `${actor.name} · ${roleLabels[actor.role]}`;

  if (isPhone) {
    return (
      <View style={styles.frame}>
        <View style={styles.bar} testID="shell-bar">
          <Text style={styles.brand} accessibilityRole="header">Spanrelay</Text>
          <Text style={styles.whoText} numberOfLines={1} testID="shell-actor">{who}</Text>
          <SignOutButton tone="bar" />
        </View>
        <View style={styles.body}>{children}</View>
        <View style={styles.tabs} role="navigation" testID="nav-tabs">
          {items.map((d) => (
            <NavItem key={d.key} d={d} layout="tab" active={active === d.key} badge={d.key === 'desk' ? waiting : null} />
          ))}
        </View>
      </View>
    );
  }

  return (
    <View style={[styles.frame, styles.row]}>
      <View style={styles.side} role="navigation" testID="nav-side">
        <Text style={[styles.brand, styles.sideBrand]} accessibilityRole="header">Spanrelay</Text>
        <View style={styles.sideItems}>
          {items.map((d) => (
            <NavItem key={d.key} d={d} layout="side" active={active === d.key} badge={d.key === 'desk' ? waiting : null} />
          ))}
        </View>
        <View style={styles.sideFoot}>
          <Text style={styles.sideWho} testID="shell-actor">{who}</Text>
          {actor.organization ? <Text style={styles.orgText}>{actor.organization}</Text> : null}
          <SignOutButton tone="side" />
        </View>
      </View>
      <View style={styles.body}>{children}</View>
    </View>
  );
}

const styles = StyleSheet.create({
  frame: { flex: 1, backgroundColor: colors.concrete },
  row: { flexDirection: 'row' },
  bar: { flexDirection: 'row', alignItems: 'center', paddingHorizontal: space.md, paddingVertical: space.xs, backgroundColor: colors.slate, gap: space.sm, minHeight: 52 },
  brand: { color: colors.surface, fontFamily: fonts.semibold, fontSize: 20 },
  whoText: { color: colors.slateLight, fontSize: 14, flexShrink: 1, flexGrow: 1, textAlign: 'right' },
  sideWho: { color: colors.surface, fontSize: 14, fontFamily: fonts.medium },
  orgText: { color: colors.slateLight, fontSize: 13 },
  body: { flex: 1 },
  tabs: { flexDirection: 'row', backgroundColor: colors.surface, borderTopWidth: 1, borderTopColor: colors.line, paddingBottom: space.xs },
  tab: { flex: 1, minHeight: 56, alignItems: 'center', justifyContent: 'center', gap: 2, paddingTop: space.xs, borderTopWidth: 3, borderTopColor: 'transparent' },
  tabActive: { borderTopColor: colors.slate },
  tabLabel: { fontSize: 12, lineHeight: 16, fontFamily: fonts.medium },
  activeLabel: { fontFamily: fonts.semibold },
  side: { width: 232, backgroundColor: colors.slate, paddingVertical: space.lg, paddingHorizontal: space.md, gap: space.xl },
  sideBrand: { paddingHorizontal: space.sm },
  sideItems: { gap: space.xs, flex: 1 },
  sideItem: { flexDirection: 'row', alignItems: 'center', gap: space.md, minHeight: 44, paddingHorizontal: space.sm, borderRadius: radius },
  sideItemActive: { backgroundColor: colors.slateActive },
  sideLabel: { fontSize: 16, fontFamily: fonts.medium },
  sideFoot: { gap: space.xs },
  badge: { position: 'absolute', top: -6, right: -12, minWidth: 20, height: 20, borderRadius: 10, backgroundColor: colors.danger, alignItems: 'center', justifyContent: 'center', paddingHorizontal: 4 },
  badgeText: { color: colors.surface, fontSize: 12, lineHeight: 14, fontFamily: fonts.semibold },
  signOut: { flexDirection: 'row', alignItems: 'center', gap: space.xs, minHeight: 44, minWidth: 44, paddingHorizontal: space.sm, borderRadius: radius, borderWidth: 1, borderColor: colors.slateLight, justifyContent: 'center' },
  signOutSide: { alignSelf: 'flex-start', marginTop: space.sm },
  signOutText: { color: colors.surface, fontFamily: fonts.semibold, fontSize: 14 },
});
