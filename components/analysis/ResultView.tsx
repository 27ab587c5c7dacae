import { useMemo, useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { useRouter } from 'expo-router';
import type { StoredAnalysis } from '../../localdb/analyses';
import { COMPONENT_COLOUR_KEYS } from '../../constants/theme';
import { analysisRows } from '../../client/analysisRows';
import { fittedLinesCurve } from '../../client/fittedLinesCurve';
import { analysisToCsv, analysisToJson, exportFileName } from '../../client/analysisExport';
import { useTheme } from '../../hooks/useTheme';
import { CautionBanner } from '../CautionBanner';
import { Button } from '../ui/Button';
import { Notice } from '../ui/Notice';
import { SpectrumPlot, type PlotTrace } from '../plot/SpectrumPlot';
import { exportFile } from '../exportFile';
import { CandidateTable } from './CandidateTable';
import { EvidencePanel } from './EvidencePanel';

/** One analysis result: caution, summary, ranked candidates, evidence, overlay plot, exports. */
export function ResultView({ analysis }: { analysis: StoredAnalysis }) {
  const t = useTheme();
  const router = useRouter();
  const rows = useMemo(() => analysisRows(analysis), [analysis]);
  const [selected, setSelected] = useState<string | null>(
    // The largest confirmed compound first (not the standard or a reference).
    rows.filter((r) => r.confirmed && r.amount && !r.amount.isStandard && r.screen.category !== 'reference').sort((a, b) => b.amount!.moleFraction - a.amount!.moleFraction)[0]?.entryId ??
      rows[0]?.entryId ??
      null,
  );
  const row = rows.find((r) => r.entryId === selected) ?? null;
  const { fit } = analysis.report;
  const traces = useMemo<PlotTrace[]>(() => {
    const out: PlotTrace[] = [
      { key: 'mix', label: analysis.mixture.kind === 'spectrum' ? 'mixture' : 'mixture (peak list as lines)', colour: 'plotMixture', x: fit.axis, y: fit.mixtureCurve, width: 1.4 },
      { key: 'sum', label: 'fitted sum', colour: 'plotFit', x: fit.axis, y: fit.fittedSum, dashed: true },
    ];
    // Analyses stored before fitted lines were kept carry their curves; newer ones carry the lines.
    fit.components.forEach((c, i) =>
      out.push({ key: `c-${c.entryId}`, label: c.name, colour: COMPONENT_COLOUR_KEYS[i % COMPONENT_COLOUR_KEYS.length], x: fit.axis, y: c.curve.length > 0 || !c.lines ? c.curve : fittedLinesCurve(c.lines, fit.axis), width: 1 }),
    );
    out.push({ key: 'res', label: 'residual', colour: 'plotResidual', x: fit.axis, y: fit.residual, width: 1 });
    return out;
  }, [analysis, fit]);
  const nameOf = (id: string) => rows.find((r) => r.entryId === id)?.name ?? id;
  const s = analysis.screen;
  const muted = [styles.text, { color: t.colours.textMuted, fontFamily: t.fonts.regular }];

  return (
    <View style={styles.wrap}>
      <CautionBanner />
      {analysis.demo ? <Notice tone="info" label="Demo data" text="Demo data: an invented sample of the Wrenfold Vale scenario, not a real measurement." /> : null}
      <View style={styles.summary}>
        <Text accessibilityRole="header" style={[styles.title, { color: t.colours.text, fontFamily: t.fonts.bold }]}>
          {analysis.name}
        </Text>
        <Text style={muted}>
          {analysis.mixture.nucleus} · {analysis.settings.solvent} · {analysis.settings.mhz} MHz · tolerance {analysis.settings.tolerancePpm} ppm · {s.peaksUsed.length} peaks used, {s.peaksExcluded.length}{' '}
          excluded · {s.entriesScreened} library entries in {analysis.settings.solvent} screened · {new Date(analysis.createdAt).toLocaleString()}
        </Text>
        <Text accessibilityLabel="Fit summary" style={muted}>
          {fit.components.length} confirmed by the fit (R² {fit.rSquared.toFixed(3)}, linewidth {fit.linewidthHz.toFixed(2)} Hz {fit.linewidthSource === 'option' ? 'given' : `from the ${fit.linewidthSource}`}
          ); {s.unexplainedPeaks.length} peaks explained by no candidate.
          {analysis.report.qValues.length ? ` q-values from ${analysis.report.decoySets} decoy libraries (target–decoy).` : ''}
        </Text>
        {analysis.report.warnings.map((w) => (
          <Notice key={w} tone="caution" text={w} />
        ))}
      </View>
      {rows.length === 0 ? <Notice text="No library entry reached the screening threshold." /> : null}
      <CandidateTable rows={rows} hasStandard={!!analysis.settings.standard} selectedId={selected} onSelect={(r) => setSelected(r.entryId)} />
      <SpectrumPlot label="Overlay plot" traces={traces} height={280} />
      {row ? <EvidencePanel row={row} nameOf={nameOf} /> : null}
      {s.peaksExcluded.length ? (
        <Text style={muted}>
          Left out before matching: {s.peaksExcluded.slice(0, 12).map((p) => `${p.shift.toFixed(2)} ppm (${p.detail})`).join('; ')}
          {s.peaksExcluded.length > 12 ? ` … and ${s.peaksExcluded.length - 12} more` : ''}.
        </Text>
      ) : null}
      <View style={styles.actions}>
        <Button label="Export CSV" variant="quiet" onPress={() => void exportFile(exportFileName(analysis, 'csv'), 'text/csv', analysisToCsv(analysis))} />
        <Button label="Export JSON" variant="quiet" onPress={() => void exportFile(exportFileName(analysis, 'json'), 'application/json', analysisToJson(analysis))} />
        <Button label="Printable report" variant="quiet" onPress={() => router.push(`/report/${analysis.id}`)} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: 14, width: '100%' },
  summary: { gap: 4 },
  title: { fontSize: 20 },
  text: { fontSize: 13, lineHeight: 19 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: 8 },
});
