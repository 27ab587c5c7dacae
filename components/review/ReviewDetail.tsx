import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { ApiError } from '../../client/api';
import { describeError } from '../../client/describeError';
import { useDecideMutation, useReviewDetailQuery } from '../../queries/review';
import { useTheme } from '../../hooks/useTheme';
import { useWideLayout } from '../../hooks/useWideLayout';
import type { Decision } from '../../shared/api/review';
import { EntryDetail } from '../EntryDetail';
import { CheckList } from '../submit/CheckList';
import { TextField } from '../ui/TextField';
import { Button } from '../ui/Button';
import { Notice } from '../ui/Notice';
import { ChoiceRow } from '../ui/ChoiceRow';

/** One submission beside the nearest existing entry, with the checks and the decision. */
export function ReviewDetail({ id }: { id: string }) {
  const t = useTheme();
  const wide = useWideLayout();
  const q = useReviewDetailQuery(id);
  const decide = useDecideMutation(id);
  const [decision, setDecision] = useState<Decision>('approve');
  const [comment, setComment] = useState('');
  const [problem, setProblem] = useState<string | null>(null);
  if (q.isLoading) return <Notice text="Reading the submission…" />;
  if (q.isError || !q.data) return <Notice tone="danger" text={describeError(q.error)} />;
  const { submission: s, nearest, current } = q.data;
  const other = current ?? nearest?.entry ?? null;
  // Both 1H spectra on one ppm span, so the curator compares like with like.
  const shifts = [s.entry, ...(other ? [other] : [])].flatMap((e) => e.signals.filter((x) => x.nucleus === '1H').map((x) => x.shift));
  const domain = shifts.length ? { lo: Math.min(...shifts) - 0.3, hi: Math.max(...shifts) + 0.3 } : null;
  const decided = s.status !== 'pending';

  const send = () => {
    setProblem(null);
    if (decision !== 'approve' && !comment.trim()) {
      setProblem(`Comment: a comment is required to ${decision === 'reject' ? 'reject' : 'ask for changes'}.`);
      return;
    }
    decide.mutate(
      { decision, comment: comment.trim(), version: s.version },
      {
        onError: (err) => {
          if (err instanceof ApiError && err.status === 409) setProblem('Another curator decided on this submission first; their decision is shown now.');
          else setProblem(describeError(err));
        },
      },
    );
  };

  const text = [styles.text, { color: t.colours.text, fontFamily: t.fonts.regular }];
  return (
    <View style={styles.wrap} accessibilityLabel={`Submission ${s.name}`}>
      <Text style={text}>
        {s.kind === 'new' ? 'New entry' : `Change of ${s.entryId} (from revision ${s.baseRevision ?? '?'})`} by {s.submitter.displayName}
        {s.studentWork ? ' — student work' : ''}; status: {s.status.replace('_', ' ')}.
      </Text>
      {s.note ? <Text style={text}>Note from the submitter: {s.note}</Text> : null}
      <CheckList problems={s.checks.problems} />
      {s.checks.similar.length ? (
        <Text style={[styles.text, { color: t.colours.textMuted, fontFamily: t.fonts.regular }]}>
          Similar entries: {s.checks.similar.map((x) => `${x.name} (${x.solvent}${x.nameScore !== null ? `, name ${x.nameScore.toFixed(2)}` : ''}${x.peakScore !== null ? `, peaks ${x.peakScore.toFixed(2)}` : ''})`).join('; ')}
        </Text>
      ) : null}
      <View style={[styles.side, wide && styles.sideWide]}>
        <View style={[styles.pane, { borderColor: t.colours.accent, borderRadius: t.radius.md }]}>
          <Text style={[styles.paneHead, { color: t.colours.accent, fontFamily: t.fonts.semibold }]}>Proposed</Text>
          <EntryDetail entry={s.entry} plotDomain={domain} />
        </View>
        <View style={[styles.pane, { borderColor: t.colours.border, borderRadius: t.radius.md }]}>
          <Text style={[styles.paneHead, { color: t.colours.textMuted, fontFamily: t.fonts.semibold }]}>{current ? 'Current revision' : 'Nearest existing entry'}</Text>
          {other ? <EntryDetail entry={other} plotDomain={domain} /> : <Notice text="No existing entry is close to this one." />}
        </View>
      </View>
      {decided ? (
        <Notice tone="info" label="Recorded decision" text={`Decided: ${s.status.replace('_', ' ')}${s.decidedBy ? ` by ${s.decidedBy.displayName}` : ''}${s.decisionComment ? ` — “${s.decisionComment}”` : ''}.`} />
      ) : (
        <View style={[styles.decide, { borderColor: t.colours.border, backgroundColor: t.colours.surface, borderRadius: t.radius.md }]}>
          <ChoiceRow
            label="Decision"
            value={decision}
            onChange={(v) => setDecision(v as Decision)}
            options={[{ value: 'approve', text: 'approve' }, { value: 'request_changes', text: 'ask for changes' }, { value: 'reject', text: 'reject' }]}
          />
          <TextField label="Comment to the submitter" multiline value={comment} onChangeText={setComment} />
          <Button label="Record the decision" busy={decide.isPending} onPress={send} />
        </View>
      )}
      {problem ? <Notice tone="danger" text={problem} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: 12 },
  text: { fontSize: 14, lineHeight: 20 },
  side: { gap: 12 },
  sideWide: { flexDirection: 'row', alignItems: 'flex-start' },
  pane: { flex: 1, minWidth: 0, borderWidth: 1, padding: 10, gap: 6 },
  paneHead: { fontSize: 13, textTransform: 'uppercase', letterSpacing: 0.5 },
  decide: { borderWidth: 1, padding: 12, gap: 10 },
});
