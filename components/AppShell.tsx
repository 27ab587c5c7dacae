import type { ReactNode } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { usePathname, useRouter } from 'expo-router';
import { useSafeAreaInsets } from 'react-native-safe-area-context';
import { useTheme } from '../hooks/useTheme';
import { useWideLayout } from '../hooks/useWideLayout';

export interface NavItem {
  href: string;
  label: string;
  /** A short glyph drawn in the bar (our own, text-based). */
  glyph: string;
  /** Shown in the phone's bottom bar; the others are reached through "More". */
  phone?: boolean;
}

/** Where the phone's "More" item leads: a page listing the items that are not in the bar. */
export const MORE_HREF = '/more';

export interface AppShellProps {
  items: NavItem[];
  children: ReactNode;
  footer?: ReactNode;
}

/** Phone: content above a bottom bar. Wide (≥ 1024 px): a side rail beside the content. */
export function AppShell({ items, children, footer }: AppShellProps) {
  const t = useTheme();
  const wide = useWideLayout();
  const pathname = usePathname();
  const router = useRouter();
  const insets = useSafeAreaInsets();

  const isActive = (href: string) => pathname === href || pathname.startsWith(href + '/');
  const barItems: NavItem[] = wide
    ? items
    : [...items.filter((i) => i.phone), { href: MORE_HREF, label: 'More', glyph: '⋯' }];
  const nav = barItems.map((item) => {
    const active = item.href === MORE_HREF ? isActive(MORE_HREF) || items.some((i) => !i.phone && isActive(i.href)) : isActive(item.href);
    return (
      <Pressable
        key={item.href}
        accessibilityRole="link"
        accessibilityLabel={item.label}
        accessibilityState={{ selected: active }}
        onPress={() => router.navigate(item.href as never)}
        style={[wide ? styles.railItem : styles.barItem, active && { backgroundColor: t.colours.surfaceAlt }, { borderRadius: t.radius.md }]}
      >
        <Text style={[styles.glyph, { color: active ? t.colours.accent : t.colours.textMuted, fontFamily: t.fonts.bold }]}>{item.glyph}</Text>
        <Text
          numberOfLines={1}
          style={[wide ? styles.railLabel : styles.barLabel, { color: active ? t.colours.text : t.colours.textMuted, fontFamily: active ? t.fonts.semibold : t.fonts.regular }]}
        >
          {item.label}
        </Text>
      </Pressable>
    );
  });

  if (wide) {
    return (
      <View style={[styles.row, { backgroundColor: t.colours.background }]}>
        <View role="navigation" aria-label="Main navigation" style={[styles.rail, { backgroundColor: t.colours.surface, borderRightColor: t.colours.border }]}>
          <Text style={[styles.brand, { color: t.colours.accent, fontFamily: t.fonts.bold }]}>Tessera</Text>
          {nav}
          <View style={styles.spacer} />
          {footer}
        </View>
        <View style={styles.content}>{children}</View>
      </View>
    );
  }
  return (
    <View style={[styles.column, { backgroundColor: t.colours.background }]}>
      <View style={styles.content}>{children}</View>
      <View
        role="navigation" aria-label="Main navigation"
        style={[styles.bar, { backgroundColor: t.colours.surface, borderTopColor: t.colours.border, paddingBottom: Math.max(insets.bottom, 6) }]}
      >
        {nav}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flex: 1, flexDirection: 'row', minHeight: 0 },
  column: { flex: 1, flexDirection: 'column', minHeight: 0 },
  content: { flex: 1, minWidth: 0, minHeight: 0 },
  rail: { width: 220, paddingVertical: 16, paddingHorizontal: 10, gap: 4, borderRightWidth: 1 },
  brand: { fontSize: 22, paddingHorizontal: 10, paddingBottom: 16 },
  railItem: { flexDirection: 'row', alignItems: 'center', gap: 10, paddingHorizontal: 10, paddingVertical: 10 },
  railLabel: { fontSize: 15 },
  spacer: { flex: 1 },
  bar: { flexDirection: 'row', borderTopWidth: 1, paddingTop: 6, paddingHorizontal: 4 },
  barItem: { flex: 1, alignItems: 'center', paddingVertical: 4, minWidth: 0 },
  barLabel: { fontSize: 11 },
  glyph: { fontSize: 16 },
});
