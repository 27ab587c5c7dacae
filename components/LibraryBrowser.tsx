import { useEffect } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { useLibraryQuery, usePullLibraryMutation } from '../queries/library';
import { useSession } from './providers/SessionProvider';
import { describeError, isOffline } from '../client/describeError';
import { useTheme } from '../hooks/useTheme';
import { LibraryList } from './LibraryList';
import { Notice } from './ui/Notice';
import { Button } from './ui/Button';

/** The library screen body: the local copy, refreshed from the server when it can be reached. */
export function LibraryBrowser() {
  const t = useTheme();
  const { session } = useSession();
  const local = useLibraryQuery();
  const pull = usePullLibraryMutation(session?.accessToken ?? null);
  const { mutate } = pull;

  useEffect(() => {
    mutate();
  }, [mutate]);

  const entries = local.data ?? [];
  return (
    <View style={styles.wrap}>
      <View style={styles.status}>
        <Text accessibilityLabel="Entries on this device" style={[styles.count, { color: t.colours.textMuted, fontFamily: t.fonts.regular }]}>
          {local.isLoading ? 'Reading the library on this device…' : `${entries.length} entries on this device`}
        </Text>
        <Button label="Refresh" accessibleName="Refresh from server" variant="quiet" busy={pull.isPending} onPress={() => pull.mutate()} />
      </View>
      {pull.isError ? <Notice tone={isOffline(pull.error) ? 'info' : 'danger'} text={describeError(pull.error)} /> : null}
      {local.isError ? <Notice tone="danger" text={describeError(local.error)} /> : null}
      <LibraryList entries={entries} />
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { flex: 1, gap: 10, minHeight: 0 },
  status: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', gap: 8, flexWrap: 'wrap' },
  count: { fontSize: 14 },
});
