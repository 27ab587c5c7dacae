import { StyleSheet, Text, View } from 'react-native';
import { useTheme } from '../../hooks/useTheme';
import { DataTable, type Column } from '../ui/DataTable';
import type { SignalEvidence } from '../../shared/screening';
import { fmt, statusText, type CandidateRow } from '../../client/analysisRows';

const COLUMNS: Column<SignalEvidence>[] = [
  { key: 'sig', title: 'Signal', minWidth: 80, flex: 1.3, render: (e) => `${e.label ?? `#${e.signalIndex + 1}`}${e.exchangeable ? ' (exch.)' : ''}` },
  { key: 'shift', title: 'δ lib', minWidth: 56, align: 'right', render: (e) => e.shift.toFixed(3) },
  { key: 'mult', title: 'Mult.', minWidth: 48, render: (e) => e.multiplicity ?? '—' },
  { key: 'lines', title: 'Lines', minWidth: 50, align: 'right', render: (e) => `${e.linesMatched}/${e.linesExpected}` },
  { key: 'delta', title: 'Δδ', minWidth: 64, align: 'right', render: (e) => (e.linesMatched ? e.deltaPpm.toFixed(4) : '—') },
  { key: 'ratio', title: 'Int./nucleus', minWidth: 84, align: 'right', render: (e) => (e.linesMatched ? `${fmt(e.ratio, 2)}×` : '—') },
];

/** Why a candidate is where it is: matched signals, missing ones, and what the fit says. */
export function EvidencePanel({ row, nameOf }: { row: CandidateRow; nameOf(id: string): string }) {
  const t = useTheme();
  const c = row.screen;
  const text = [styles.text, { color: t.colours.text, fontFamily: t.fonts.regular }];
  const muted = [styles.text, { color: t.colours.textMuted, fontFamily: t.fonts.regular }];
  return (
    <View accessibilityLabel={`Evidence for ${row.name}`} style={[styles.box, { borderColor: t.colours.border, backgroundColor: t.colours.surface, borderRadius: t.radius.md }]}>
      <Text accessibilityRole="header" style={[styles.title, { color: t.colours.text, fontFamily: t.fonts.semibold }]}>
        Evidence: {row.name}
      </Text>
      <Text style={text}>
        Screening score {c.score.toFixed(2)} — {(c.explainedShare * 100).toFixed(0)} % of its nuclei found; shift agreement {c.shiftFactor.toFixed(2)}; intensity consistency {c.intensityFactor.toFixed(2)}
        {c.intensityCv !== null ? ` (CV ${(c.intensityCv * 100).toFixed(0)} %)` : ''}.
      </Text>
      <Text style={text}>{statusText(row)}.</Text>
      {row.fit ? (
        <Text style={muted}>
          Fit: explains {(row.fit.share * 100).toFixed(1)} % of the mixture intensity; {(row.fit.coverage * 100).toFixed(0)} % of its signals supported; uniqueness {row.fit.uniqueness.toFixed(2)}; {row.fit.resolvedLines}{' '}
          resolved lines; common shift offset {row.fit.shiftOffsetPpm.toFixed(4)} ppm.
        </Text>
      ) : null}
      {c.ambiguityGroup ? <Text style={[styles.text, { color: t.colours.caution, fontFamily: t.fonts.medium }]}>Indistinguishable from other candidates on these peaks (group {c.ambiguityGroup}).</Text> : null}
      {c.shadowedBy.length ? <Text style={muted}>Every peak it matched is also explained by: {c.shadowedBy.map(nameOf).join(', ')}.</Text> : null}
      <DataTable label={`Matched signals of ${row.name}`} columns={COLUMNS} rows={c.evidence} rowKey={(e) => String(e.signalIndex)} />
      {c.unmatched.length ? (
        <Text style={muted}>
          Not found: {c.unmatched.map((u) => `${u.label ?? `#${u.signalIndex + 1}`} at ${u.shift.toFixed(2)} ppm${u.exchangeable ? ' (exchangeable, optional)' : ''}`).join('; ')}.
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { borderWidth: 1, padding: 12, gap: 8 },
  title: { fontSize: 16 },
  text: { fontSize: 13, lineHeight: 19 },
});
