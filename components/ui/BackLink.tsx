import { Pressable, StyleSheet, Text } from 'react-native';
import { useRouter } from 'expo-router';
import { useTheme } from '../../hooks/useTheme';

export function BackLink({ href, label }: { href: string; label: string }) {
  const t = useTheme();
  const router = useRouter();
  return (
    <Pressable accessibilityRole="link" accessibilityLabel={label} onPress={() => (router.canGoBack() ? router.back() : router.replace(href as never))} style={styles.link}>
      <Text style={[styles.text, { color: t.colours.accent, fontFamily: t.fonts.medium }]}>← {label}</Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  link: { alignSelf: 'flex-start', paddingVertical: 6 },
  text: { fontSize: 14 },
});
