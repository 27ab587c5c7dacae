import { Pressable, StyleSheet, Text, View } from 'react-native';
import type { SubmissionSummary } from '../../shared/api/submissions';
import { describeError } from '../../client/describeError';
import { useReviewQueueQuery } from '../../queries/review';
import { useTheme } from '../../hooks/useTheme';
import { Notice } from '../ui/Notice';
import { Button } from '../ui/Button';
import { formatWhen } from '../SyncLine';

export function ReviewQueue({ status, selectedId, onOpen }: { status: string; selectedId: string | null; onOpen(s: SubmissionSummary): void }) {
  const t = useTheme();
  const q = useReviewQueueQuery(status);
  if (q.isLoading) return <Notice text="Reading the queue from the server…" />;
  if (q.isError)
    return (
      <View style={styles.list}>
        <Notice tone="caution" text={describeError(q.error)} />
        <Button label="Try again" variant="quiet" onPress={() => void q.refetch()} />
      </View>
    );
  const items = q.data?.items ?? [];
  return (
    <View accessibilityLabel="Review queue" style={styles.list}>
      <Text style={[styles.small, { color: t.colours.textMuted, fontFamily: t.fonts.regular }]}>{q.data?.total ?? 0} submissions</Text>
      {items.length === 0 ? <Notice text="Nothing waits for a decision." /> : null}
      {items.map((s) => (
        <Pressable
          key={s.id}
          accessibilityRole="button"
          accessibilityLabel={`Review ${s.name}`}
          onPress={() => onOpen(s)}
          style={[styles.row, { backgroundColor: s.id === selectedId ? t.colours.surfaceAlt : t.colours.surface, borderColor: t.colours.border, borderRadius: t.radius.md }]}
        >
          <Text numberOfLines={2} style={[styles.name, { color: t.colours.text, fontFamily: t.fonts.semibold }]}>
            {s.name}
          </Text>
          <Text style={[styles.small, { color: t.colours.textMuted, fontFamily: t.fonts.regular }]}>
            {s.kind === 'new' ? 'new entry' : `change of ${s.entryId}`} · {s.submitter.displayName}
            {s.studentWork ? ' · student work' : ''} · {s.problemCount} check findings · {formatWhen(s.createdAt)}
          </Text>
        </Pressable>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: 8 },
  row: { borderWidth: 1, padding: 12, gap: 3 },
  name: { fontSize: 15 },
  small: { fontSize: 12 },
});
