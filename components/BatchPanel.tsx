import { useMemo, useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { Link } from 'expo-router';
import { SolventSchema, type Solvent } from '../shared/solvent';
import { DEFAULT_TOLERANCE_PPM } from '../shared/nucleus';
import { SPECTROMETER_MHZ_RANGE } from '../shared/spectrometer';
// The header reader only (no engine): keep `matching/io/index` out of the first download.
import { mixtureFileStates } from '../matching/io/mixtureFileStates';
import { useRunBatchMutation } from '../queries/analyses';
import { batchSummary, batchToCsv } from '../client/batchSummary';
import { describeError } from '../client/describeError';
import { useTheme } from '../hooks/useTheme';
import { pickTextFiles, type PickedFile } from './pickTextFiles';
import { DEMO_MIXTURES } from './demoMixtures';
import { exportFile } from './exportFile';
import { CautionBanner } from './CautionBanner';
import { DataTable, type Column } from './ui/DataTable';
import { ChoiceRow } from './ui/ChoiceRow';
import { TextField } from './ui/TextField';
import { Button } from './ui/Button';
import { Notice } from './ui/Notice';
import type { BatchSummary } from '../client/batchSummary';

type Row = BatchSummary['rows'][number];

/** A run of samples with the same settings, summarised as one table. */
export function BatchPanel() {
  const t = useTheme();
  const [files, setFiles] = useState<Array<PickedFile & { demo?: boolean; title?: string }>>([]);
  const [solvent, setSolvent] = useState<Solvent>('D2O');
  const [mhz, setMhz] = useState('400');
  const batch = useRunBatchMutation();
  const summary = useMemo(
    () => (batch.data ? batchSummary(batch.data.map((r) => ({ fileName: r.fileName, analysis: r.analysis, error: r.error ? describeError(r.error) : null }))) : null),
    [batch.data],
  );
  const columns = useMemo<Column<Row>[]>(
    () =>
      summary
        ? [
            {
              key: 'sample',
              title: 'Sample',
              minWidth: 170,
              flex: 2,
              render: (r) =>
                r.analysisId ? (
                  <Link href={`/analyse/${r.analysisId}`} style={{ color: t.colours.accent, fontFamily: t.fonts.medium, fontSize: 13 }}>
                    {r.sample}
                  </Link>
                ) : (
                  <Text style={{ color: t.colours.danger, fontSize: 13 }}>
                    {r.sample}: {r.error}
                  </Text>
                ),
            },
            ...summary.compounds.map<Column<Row>>((c) => ({
              key: c.entryId,
              title: c.name.replace(/^Demo: /, ''),
              minWidth: 90,
              align: 'right',
              render: (r) => (r.amounts[c.entryId] === null ? '—' : r.amounts[c.entryId]!.toFixed(3)),
            })),
          ]
        : [],
    [summary, t],
  );

  const mhzNumber = mhz.trim() === '' ? NaN : Number(mhz.replace(',', '.'));
  const mhzOk = mhzNumber >= SPECTROMETER_MHZ_RANGE[0] && mhzNumber <= SPECTROMETER_MHZ_RANGE[1];
  const [ownSettings, setOwnSettings] = useState<string[]>([]);
  const run = () => {
    const m = mhzNumber;
    const own: string[] = [];
    batch.mutate(
      files.map((f) => {
        // What a file states about itself wins over the run's settings (a 600 MHz file read at
        // 400 MHz, or a D2O sample screened against CDCl3 entries, would be analysed wrongly).
        const stated = mixtureFileStates(f.name, f.content);
        const nucleus = stated.nucleus ?? '1H';
        const fileSolvent = stated.solvent && stated.solvent !== 'other' ? stated.solvent : solvent;
        const fileMhz = stated.mhz && stated.mhz >= SPECTROMETER_MHZ_RANGE[0] && stated.mhz <= SPECTROMETER_MHZ_RANGE[1] ? stated.mhz : m;
        const differs = [nucleus !== '1H' ? nucleus : null, fileSolvent !== solvent ? fileSolvent : null, fileMhz !== m ? `${Number(fileMhz.toPrecision(6))} MHz` : null].filter(Boolean);
        if (differs.length) own.push(`${f.name} (${differs.join(', ')})`);
        return {
          fileName: f.name,
          content: f.content,
          demo: f.demo,
          name: f.title,
          settings: { nucleus, solvent: fileSolvent, mhz: fileMhz, tolerancePpm: DEFAULT_TOLERANCE_PPM[nucleus], standard: null },
        };
      }),
    );
    setOwnSettings(own);
  };

  return (
    <View style={styles.wrap}>
      <View style={styles.row}>
        <Button label="Choose files" accessibleName="Choose mixture files" variant="quiet" onPress={() => void pickTextFiles(true).then((f) => f.length && setFiles(f))} />
        <Button
          label="Demo mixtures in this solvent"
          variant="quiet"
          onPress={() => setFiles(DEMO_MIXTURES.filter((d) => d.solvent === solvent && d.content !== null).map((d) => ({ name: d.fileName, content: d.content!, demo: true, title: d.title })))}
        />
      </View>
      <Text accessibilityLabel="Batch files" style={[styles.small, { color: t.colours.textMuted, fontFamily: t.fonts.regular }]}>
        {files.length ? `${files.length} files: ${files.map((f) => f.name).join(', ')}` : 'No files chosen. Every file is read as a 1H mixture with the settings below, except for what a file states about itself (JCAMP-DX header, "#" comments).'}
      </Text>
      <ChoiceRow label="Solvent of the run" value={solvent} onChange={(v) => setSolvent(v as Solvent)} options={SolventSchema.options.map((s) => ({ value: s, text: s }))} />
      <TextField label="Spectrometer (MHz)" keyboardType="decimal-pad" value={mhz} onChangeText={setMhz} error={mhzOk ? null : `Give the 1H frequency in MHz, between ${SPECTROMETER_MHZ_RANGE[0]} and ${SPECTROMETER_MHZ_RANGE[1]}.`} />
      <Button label="Run the batch" busy={batch.isPending} disabled={files.length === 0 || !mhzOk} onPress={run} />
      {batch.isPending ? <Notice text={`Analysed ${batch.done} of ${files.length}…`} /> : null}
      {ownSettings.length ? <Notice tone="info" label="Files with their own settings" text={`Read with the settings they state: ${ownSettings.join('; ')}.`} /> : null}
      {summary ? (
        <>
          <CautionBanner />
          <DataTable label="Batch summary" columns={columns} rows={summary.rows} rowKey={(r) => r.sample + (r.analysisId ?? '')} />
          <Text style={[styles.small, { color: t.colours.textMuted, fontFamily: t.fonts.regular }]}>Mole fractions among the confirmed compounds of each sample; every sample is also in the history.</Text>
          <Button label="Export the summary as CSV" variant="quiet" onPress={() => void exportFile('batch-summary.csv', 'text/csv', batchToCsv(summary))} />
        </>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: 12 },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: 8 },
  small: { fontSize: 13, lineHeight: 18 },
});
