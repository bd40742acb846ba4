// The signed-in frame: a side navigation from 900 px, bottom tabs below, and a header with the
// profile menu (name, role, sign-out).
import { Link, usePathname, useRouter } from 'expo-router';
import { useState, type ReactNode } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { SafeAreaView } from 'react-native-safe-area-context';
import { colors, fonts, radius, space } from '@/constants/theme';
import { isActive, navFor, ROLE_LABELS, type NavItem } from '@/constants/navigation';
import { useBreakpoints } from '@/hooks/use-breakpoints';
import { useSignOutMutation, type Me } from '@/hooks/use-session';

const TAB_LIMIT = 4;

export function AppShell({ me, children }: { me: Me; children: ReactNode }) {
  const { wide } = useBreakpoints();
  const items = navFor(me.role);
  return (
    <SafeAreaView style={styles.root} edges={['top', 'bottom']}>
      <Header me={me} />
      <View style={styles.body}>
        {wide ? <SideNav items={items} /> : null}
        <View style={styles.main} role="main" testID="main">
          {children}
        </View>
      </View>
      {wide ? null : <BottomTabs items={items} />}
    </SafeAreaView>
  );
}

function NavLink({ item, variant }: { item: NavItem; variant: 'side' | 'tab' }) {
  const pathname = usePathname();
  const active = isActive(item.href, pathname);
  const [focused, setFocused] = useState(false);
  // Link's asChild slot passes style straight to the DOM on web: one flat object, focus tracked by hand.
  return (
    <Link href={item.href as never} asChild>
      <Pressable
        accessibilityRole="link"
        aria-current={active ? 'page' : undefined}
        testID={item.testID}
        onFocus={() => setFocused(true)}
        onBlur={() => setFocused(false)}
        style={StyleSheet.flatten([variant === 'side' ? styles.sideItem : styles.tabItem, active && styles.itemActive, focused && styles.focus])}
      >
        <Text style={[styles.glyph, active && styles.textActive]} aria-hidden>
          {item.glyph}
        </Text>
        <Text style={[variant === 'side' ? styles.sideLabel : styles.tabLabel, active && styles.textActive]} numberOfLines={1}>
          {item.label}
        </Text>
      </Pressable>
    </Link>
  );
}

function SideNav({ items }: { items: NavItem[] }) {
  return (
    <View style={styles.side} role="navigation" aria-label="Main" testID="side-nav">
      {items.map((i) => (
        <NavLink key={i.href} item={i} variant="side" />
      ))}
    </View>
  );
}

function BottomTabs({ items }: { items: NavItem[] }) {
  const shown = items.length > TAB_LIMIT + 1 ? items.slice(0, TAB_LIMIT) : items;
  const more: NavItem | null = shown.length < items.length ? { href: '/more', label: 'More', glyph: '≡', roles: [], testID: 'nav-more' } : null;
  return (
    <View style={styles.tabs} role="navigation" aria-label="Main" testID="bottom-tabs">
      {shown.map((i) => (
        <NavLink key={i.href} item={i} variant="tab" />
      ))}
      {more ? <NavLink item={more} variant="tab" /> : null}
    </View>
  );
}

function Header({ me }: { me: Me }) {
  const [open, setOpen] = useState(false);
  const signOut = useSignOutMutation();
  const router = useRouter();
  return (
    <View style={styles.header}>
      <Link href="/" accessibilityLabel="Bootwright home" style={styles.brand}>
        <Text style={styles.brandMark}>▚</Text>
        <Text style={styles.brandText}> Bootwright</Text>
      </Link>
      <View>
        <Pressable
          accessibilityRole="button"
          accessibilityLabel={`Profile menu for ${me.name}`}
          aria-expanded={open}
          testID="profile-button"
          onPress={() => setOpen((o) => !o)}
          style={(s) => [styles.profileButton, (s as { focused?: boolean }).focused && styles.focus]}
        >
          <Text style={styles.avatar}>{initials(me.name)}</Text>
          <Text style={styles.roleChip} testID="role-chip">
            {ROLE_LABELS[me.role]}
          </Text>
        </Pressable>
        {open ? (
          <View style={styles.menu} testID="profile-menu" accessibilityRole="menu">
            <Text style={styles.menuName}>{me.name}</Text>
            <Text style={styles.menuEmail}>{me.email}</Text>
            <Pressable
              accessibilityRole="menuitem"
              testID="sign-out"
              onPress={() =>
                signOut.mutate(undefined, {
                  onSettled: () => {
                    setOpen(false);
                    router.replace('/sign-in');
                  },
                })
              }
              style={(s) => [styles.menuItem, (s as { focused?: boolean }).focused && styles.focus]}
            >
              <Text style={styles.menuItemText}>Sign out</Text>
            </Pressable>
          </View>
        ) : null}
      </View>
    </View>
  );
}

function initials(name: string): string {
  return name
    .split(/\s+/)
    .filter(Boolean)
    .slice(0, 2)
    .map((w) => w[0]!.toUpperCase())
    .join('');
}

const styles = StyleSheet.create({
  root: { flex: 1, backgroundColor: colors.background },
  header: {
    height: 56,
    flexDirection: 'row',
    alignItems: 'center',
    justifyContent: 'space-between',
    paddingHorizontal: space.lg,
    backgroundColor: colors.surface,
    borderBottomWidth: 1,
    borderBottomColor: colors.border,
    zIndex: 10,
  },
  brand: { flexDirection: 'row', alignItems: 'center' },
  brandMark: { fontFamily: fonts.bold, fontSize: 20, color: colors.primary },
  brandText: { fontFamily: fonts.bold, fontSize: 18, color: colors.text },
  profileButton: { flexDirection: 'row', alignItems: 'center', gap: space.sm, padding: space.xs, borderRadius: radius.md },
  avatar: {
    width: 32,
    height: 32,
    borderRadius: 16,
    backgroundColor: colors.primary,
    color: colors.primaryText,
    textAlign: 'center',
    lineHeight: 32,
    fontFamily: fonts.semibold,
    fontSize: 13,
  },
  roleChip: { fontFamily: fonts.semibold, fontSize: 13, color: colors.primary },
  menu: {
    position: 'absolute',
    right: 0,
    top: 44,
    minWidth: 220,
    backgroundColor: colors.surface,
    borderColor: colors.border,
    borderWidth: 1,
    borderRadius: radius.md,
    padding: space.md,
    gap: space.xs,
    shadowColor: '#000',
    shadowOpacity: 0.12,
    shadowRadius: 12,
    shadowOffset: { width: 0, height: 4 },
  },
  menuName: { fontFamily: fonts.semibold, fontSize: 15, color: colors.text },
  menuEmail: { fontFamily: fonts.regular, fontSize: 13, color: colors.textMuted, marginBottom: space.sm },
  menuItem: { paddingVertical: space.sm, paddingHorizontal: space.sm, borderRadius: radius.sm, backgroundColor: colors.surfaceAlt },
  menuItemText: { fontFamily: fonts.semibold, fontSize: 14, color: colors.danger },
  body: { flex: 1, flexDirection: 'row' },
  main: { flex: 1 },
  side: { width: 220, paddingVertical: space.lg, paddingHorizontal: space.sm, gap: space.xs, borderRightWidth: 1, borderRightColor: colors.border, backgroundColor: colors.surface },
  sideItem: { flexDirection: 'row', alignItems: 'center', gap: space.md, paddingVertical: space.sm, paddingHorizontal: space.md, borderRadius: radius.md },
  sideLabel: { fontFamily: fonts.semibold, fontSize: 15, color: colors.text },
  tabs: { flexDirection: 'row', borderTopWidth: 1, borderTopColor: colors.border, backgroundColor: colors.surface },
  tabItem: { flex: 1, alignItems: 'center', paddingVertical: space.sm, gap: 2, minHeight: 56 },
  tabLabel: { fontFamily: fonts.semibold, fontSize: 12, color: colors.text },
  glyph: { fontFamily: fonts.regular, fontSize: 18, color: colors.textMuted },
  itemActive: { backgroundColor: colors.primarySoft },
  textActive: { color: colors.primary },
  focus: { outlineColor: colors.focus, outlineWidth: 3, outlineStyle: 'solid' } as object,
});
