import { StyleSheet, Text, View } from 'react-native';
import { useSession } from './providers/SessionProvider';
import { useTheme } from '../hooks/useTheme';
import { Button } from './ui/Button';

/** Who is signed in, with a sign-out action. */
export function AccountFooter() {
  const t = useTheme();
  const { session, signOut } = useSession();
  if (!session) return null;
  return (
    <View style={styles.wrap}>
      <Text numberOfLines={1} style={[styles.who, { color: t.colours.textMuted, fontFamily: t.fonts.regular }]}>
        {session.user.displayName} · {session.user.role}
      </Text>
      <Button label="Sign out" variant="quiet" onPress={() => void signOut()} />
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: 6, paddingHorizontal: 6 },
  who: { fontSize: 13 },
});
