import { StyleSheet, Text, View } from 'react-native';
import { useRouter } from 'expo-router';
import { useSession } from './providers/SessionProvider';
import { useTheme } from '../hooks/useTheme';
import { Button } from './ui/Button';

const ROLE_TEXT = {
  student: 'Students analyse and submit entries; their submissions are marked as student work.',
  analyst: 'Analysts analyse mixtures and submit entries.',
  curator: 'Curators also review submissions and decide what enters the shared library.',
  admin: 'Admins manage accounts and roles and read the e-mail outbox.',
} as const;

export function AccountPanel() {
  const t = useTheme();
  const router = useRouter();
  const { session, signOut } = useSession();
  if (!session) return null;
  const u = session.user;
  return (
    <View style={styles.wrap}>
      <Text style={[styles.name, { color: t.colours.text, fontFamily: t.fonts.semibold }]}>{u.displayName}</Text>
      <Text accessibilityLabel="Signed in as" style={[styles.text, { color: t.colours.textMuted, fontFamily: t.fonts.regular }]}>
        {u.email} · {u.role}
      </Text>
      <Text style={[styles.text, { color: t.colours.text, fontFamily: t.fonts.regular }]}>{ROLE_TEXT[u.role]}</Text>
      <Text style={[styles.text, { color: t.colours.textMuted, fontFamily: t.fonts.regular }]}>
        Your session is kept on this device, so the app opens signed in with no connection. History stays on this device after you sign out; your unsent submissions wait until you sign in here again (nobody else on the device sends them).
      </Text>
      <Button label="Sync status" variant="quiet" onPress={() => router.push('/sync')} />
      <Button label="Sign out" accessibleName="Sign out of this device" onPress={() => void signOut()} />
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: 10, maxWidth: 560 },
  name: { fontSize: 20 },
  text: { fontSize: 14, lineHeight: 20 },
});
