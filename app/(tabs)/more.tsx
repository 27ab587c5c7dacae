import { Pressable, StyleSheet, Text } from 'react-native';
import { useRouter } from 'expo-router';
import { Screen } from '../../components/ui/Screen';
import { useSession } from '../../components/providers/SessionProvider';
import { navItemsFor } from '../../components/navItems';
import { useTheme } from '../../hooks/useTheme';

/** Phone only: the screens that do not fit in the bottom bar. */
export default function MoreRoute() {
  const t = useTheme();
  const router = useRouter();
  const { session } = useSession();
  const items = session ? navItemsFor(session.user.role).filter((i) => !i.phone) : [];
  return (
    <Screen title="More">
      {items.map((i) => (
        <Pressable
          key={i.href}
          accessibilityRole="link"
          accessibilityLabel={`Open ${i.label}`}
          onPress={() => router.push(i.href as never)}
          style={[styles.row, { backgroundColor: t.colours.surface, borderColor: t.colours.border, borderRadius: t.radius.md }]}
        >
          <Text style={[styles.glyph, { color: t.colours.accent, fontFamily: t.fonts.bold }]}>{i.glyph}</Text>
          <Text style={[styles.label, { color: t.colours.text, fontFamily: t.fonts.semibold }]}>{i.label}</Text>
        </Pressable>
      ))}
    </Screen>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: 12, padding: 14, borderWidth: 1 },
  glyph: { fontSize: 18, width: 22 },
  label: { fontSize: 16 },
});
