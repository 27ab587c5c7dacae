import { Pressable, StyleSheet, Text, View } from 'react-native';
import { useRouter } from 'expo-router';
import { useTheme } from '../hooks/useTheme';

export function AuthLinks() {
  const t = useTheme();
  const router = useRouter();
  const link = (href: string, label: string) => (
    <Pressable accessibilityRole="link" accessibilityLabel={label} onPress={() => router.push(href as never)}>
      <Text style={[styles.text, { color: t.colours.accent, fontFamily: t.fonts.medium }]}>{label}</Text>
    </Pressable>
  );
  return (
    <View style={styles.row}>
      {link('/register', 'Create an account')}
      {link('/reset-password', 'Lost access? Get a reset code')}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', justifyContent: 'center', gap: 24, flexWrap: 'wrap' },
  text: { fontSize: 14, paddingVertical: 6 },
});
