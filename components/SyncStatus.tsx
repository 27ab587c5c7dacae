import { StyleSheet, Text, View } from 'react-native';
import { useOutboxQuery } from '../queries/outbox';
import { useLibraryQuery } from '../queries/library';
import { useTheme } from '../hooks/useTheme';
import { useSync } from './providers/SyncProvider';
import { SyncLine, formatWhen } from './SyncLine';
import type { OutboxItem } from '../localdb/outbox';

const STATUS_TEXT: Record<OutboxItem['status'], string> = {
  pending: 'waiting to be sent',
  sent: 'with the curators',
  approved: 'approved — in the library after the next sync',
  rejected: 'rejected by a curator',
  changes_requested: 'sent back: a curator asks for changes (submit again)',
  failed: 'refused by the server',
};

/** Last sync, what waits in the outbox, and what happened to each submission. */
export function SyncStatus() {
  const t = useTheme();
  const sync = useSync();
  const outbox = useOutboxQuery();
  const library = useLibraryQuery();
  const items = outbox.data ?? [];
  const pending = items.filter((i) => i.status === 'pending').length;
  const o = sync.lastOutcome;
  const text = [styles.text, { color: t.colours.text, fontFamily: t.fonts.regular }];
  return (
    <View style={styles.wrap}>
      <SyncLine />
      <Text accessibilityLabel="Pending outbox count" style={[styles.big, { color: t.colours.text, fontFamily: t.fonts.semibold }]}>
        {pending} waiting in the outbox
      </Text>
      <Text style={text}>Library on this device: {library.data?.length ?? '…'} entries. Last sync: {formatWhen(sync.lastAt)}.</Text>
      {o ? (
        <Text accessibilityLabel="Last sync outcome" style={text}>
          Last round: {o.pushed} sent, {o.refused} refused, {o.pulled} library changes received, {o.decided} decisions read.
        </Text>
      ) : null}
      <Text style={[styles.text, { color: t.colours.textMuted, fontFamily: t.fonts.regular }]}>
        Sync runs at start, when the connection comes back and when you ask. A round cut short keeps what it finished; the rest follows next time, and nothing is sent twice.
      </Text>
      <View accessibilityLabel="Outbox" style={styles.list}>
        {items.map((i) => (
          <View key={i.id} accessibilityLabel={`Outbox item ${i.title}`} style={[styles.item, { borderColor: i.status === 'failed' || i.status === 'rejected' ? t.colours.danger : t.colours.border, backgroundColor: t.colours.surface, borderRadius: t.radius.md }]}>
            <Text style={[styles.text, { color: t.colours.text, fontFamily: t.fonts.semibold }]}>
              {i.title} {i.kind === 'upload' ? '(file)' : ''}
            </Text>
            <Text accessibilityLabel={`Status of ${i.title}`} style={text}>
              {STATUS_TEXT[i.status]}
            </Text>
            {i.message ? <Text style={[styles.text, { color: t.colours.textMuted, fontFamily: t.fonts.regular }]}>{i.message}</Text> : null}
            <Text style={[styles.small, { color: t.colours.textMuted, fontFamily: t.fonts.regular }]}>saved {formatWhen(i.createdAt)}</Text>
          </View>
        ))}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: 10 },
  big: { fontSize: 18 },
  text: { fontSize: 14, lineHeight: 20 },
  small: { fontSize: 12 },
  list: { gap: 8 },
  item: { borderWidth: 1, padding: 10, gap: 2 },
});
