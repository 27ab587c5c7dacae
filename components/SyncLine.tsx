import { StyleSheet, Text, View } from 'react-native';
import { describeError, isOffline } from '../client/describeError';
import { useTheme } from '../hooks/useTheme';
import { useSync } from './providers/SyncProvider';
import { Button } from './ui/Button';
import { Notice } from './ui/Notice';

export function formatWhen(iso: string | null): string {
  if (!iso) return 'never';
  const d = new Date(iso);
  return `${d.toLocaleDateString()} ${d.toLocaleTimeString([], { hour: '2-digit', minute: '2-digit' })}`;
}

/** One line about the last sync with a sync-now action, and the offline state when it applies. */
export function SyncLine() {
  const t = useTheme();
  const sync = useSync();
  const phase = sync.progress ? { pushing: 'sending your submissions', pulling: `receiving library changes (${sync.progress.pulled})`, checking: 'reading curator decisions' }[sync.progress.phase] : null;
  return (
    <View style={styles.wrap}>
      <View style={styles.row}>
        <Text accessibilityLabel="Sync state" style={[styles.text, { color: t.colours.textMuted, fontFamily: t.fonts.regular }]}>
          {sync.running ? `Syncing: ${phase ?? 'starting'}…` : `Last sync: ${formatWhen(sync.lastAt)}`}
        </Text>
        <Button label="Sync now" variant="quiet" busy={sync.running} onPress={() => void sync.syncNow()} />
      </View>
      {sync.error ? <Notice tone={isOffline(sync.error) ? 'info' : 'danger'} text={describeError(sync.error)} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: 6 },
  row: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', gap: 8, flexWrap: 'wrap' },
  text: { fontSize: 13, flexShrink: 1 },
});
