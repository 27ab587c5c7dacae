import { Platform, StyleSheet, Text, View } from 'react-native';
import type { StoredAnalysis } from '../../localdb/analyses';
import { CAUTION_TEXT } from '../../shared/caution';
import { analysisRows, fmt, statusText, withUncertainty } from '../../client/analysisRows';
import { useTheme } from '../../hooks/useTheme';
import { Button } from '../ui/Button';
import { CautionBanner } from '../CautionBanner';
import { DataTable, type Column } from '../ui/DataTable';
import type { CandidateRow } from '../../client/analysisRows';
import { SpectrumPlot } from '../plot/SpectrumPlot';

const COLUMNS: Column<CandidateRow>[] = [
  { key: 'rank', title: '#', minWidth: 30, flex: 0.4, render: (r) => String(r.rank) },
  { key: 'name', title: 'Compound', minWidth: 150, flex: 2.2, render: (r) => r.name },
  { key: 'score', title: 'Score', minWidth: 50, align: 'right', render: (r) => r.screen.score.toFixed(2) },
  { key: 'q', title: 'q-value', minWidth: 56, align: 'right', render: (r) => fmt(r.qValue, 2) },
  { key: 'x', title: 'Mole fraction', minWidth: 110, align: 'right', render: (r) => (r.amount && !r.amount.isStandard ? withUncertainty(r.amount.moleFraction, r.amount.moleFractionUncertainty) : '—') },
  { key: 'c', title: 'mmol/L', minWidth: 100, align: 'right', render: (r) => withUncertainty(r.amount?.concentrationMM, r.amount?.concentrationUncertaintyMM) },
  { key: 's', title: 'Fit', minWidth: 130, flex: 1.6, render: (r) => statusText(r) },
];

/** A plain page to print or save as PDF from the browser. */
export function PrintableReport({ analysis }: { analysis: StoredAnalysis }) {
  const t = useTheme();
  const rows = analysisRows(analysis);
  const fit = analysis.report.fit;
  const text = [styles.text, { color: t.colours.text, fontFamily: t.fonts.regular }];
  return (
    <View style={styles.page}>
      <Text accessibilityRole="header" style={[styles.title, { color: t.colours.text, fontFamily: t.fonts.bold }]}>
        Tessera analysis report
      </Text>
      <Text style={text}>
        Sample: {analysis.name}
        {analysis.demo ? ' (demo data, invented)' : ''}
      </Text>
      <Text style={text}>
        {analysis.mixture.nucleus}, {analysis.settings.solvent}, {analysis.settings.mhz} MHz, tolerance {analysis.settings.tolerancePpm} ppm
        {analysis.settings.standard ? `, internal standard ${analysis.settings.standard.entryId} at ${analysis.settings.standard.concentrationMM} mmol/L` : ''}
      </Text>
      <Text style={text}>Analysed {new Date(analysis.createdAt).toLocaleString()} against {analysis.libraryCount} library entries recorded in {analysis.settings.solvent}; fit R² {fit.rSquared.toFixed(3)}.</Text>
      <CautionBanner />
      <DataTable label="Report candidates" columns={COLUMNS} rows={rows} rowKey={(r) => r.entryId} />
      <SpectrumPlot
        label="Report overlay plot"
        height={240}
        traces={[
          { key: 'mix', label: 'mixture', colour: 'plotMixture', x: fit.axis, y: fit.mixtureCurve },
          { key: 'sum', label: 'fitted sum', colour: 'plotFit', x: fit.axis, y: fit.fittedSum, dashed: true },
          { key: 'res', label: 'residual', colour: 'plotResidual', x: fit.axis, y: fit.residual },
        ]}
      />
      {analysis.report.warnings.map((w) => (
        <Text key={w} style={text}>
          Warning: {w}
        </Text>
      ))}
      <Text style={[styles.small, { color: t.colours.textMuted, fontFamily: t.fonts.regular }]}>{CAUTION_TEXT}</Text>
      {Platform.OS === 'web' ? <Button label="Print" variant="quiet" onPress={() => window.print()} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  page: { gap: 10, padding: 20, maxWidth: 900, width: '100%', alignSelf: 'center' },
  title: { fontSize: 22 },
  text: { fontSize: 14, lineHeight: 20 },
  small: { fontSize: 12, lineHeight: 17 },
});
