import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, Text, View } from 'react-native';
import { useTheme } from '../../hooks/useTheme';

export interface ScreenProps {
  title: string;
  subtitle?: string;
  children: ReactNode;
  /** Scroll the body (default) or let the child manage scrolling (lists). */
  scroll?: boolean;
}

/** Page frame: a heading and a body that never overflows the viewport horizontally. */
export function Screen({ title, subtitle, children, scroll = true }: ScreenProps) {
  const t = useTheme();
  const head = (
    <View style={styles.head}>
      <Text accessibilityRole="header" style={[styles.title, { color: t.colours.text, fontFamily: t.fonts.bold }]}>
        {title}
      </Text>
      {subtitle ? <Text style={[styles.subtitle, { color: t.colours.textMuted, fontFamily: t.fonts.regular }]}>{subtitle}</Text> : null}
    </View>
  );
  if (!scroll) {
    return (
      <View style={[styles.fill, { backgroundColor: t.colours.background }]}>
        <View style={styles.headPadded}>{head}</View>
        <View style={styles.fillBody}>{children}</View>
      </View>
    );
  }
  return (
    <ScrollView style={[styles.fill, { backgroundColor: t.colours.background }]} contentContainerStyle={styles.body}>
      {head}
      {children}
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  fill: { flex: 1, width: '100%' },
  fillBody: { flex: 1, paddingHorizontal: 16, paddingBottom: 16, minHeight: 0 },
  body: { paddingHorizontal: 16, paddingBottom: 24, gap: 12, maxWidth: 1200, width: '100%', alignSelf: 'center' },
  head: { paddingTop: 20, paddingBottom: 8, gap: 2 },
  headPadded: { paddingHorizontal: 16 },
  title: { fontSize: 26 },
  subtitle: { fontSize: 14 },
});
