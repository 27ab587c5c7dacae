import { useMemo, useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { LibraryEntry, Signal } from '../shared/libraryEntry';
import type { Nucleus } from '../shared/nucleus';
import { useTheme } from '../hooks/useTheme';
import { DataTable, type Column } from './ui/DataTable';
import { ChoiceRow } from './ui/ChoiceRow';
import { SpectrumPlot } from './plot/SpectrumPlot';
import { entrySpectrum } from './plot/entrySpectrum';
import type { Range } from './plot/plotMath';
import { CATEGORY_LABEL } from './LibraryList';

const COLUMNS: Column<{ s: Signal; i: number }>[] = [
  { key: 'n', title: 'Nucleus', minWidth: 56, render: ({ s }) => s.nucleus },
  { key: 'shift', title: 'δ (ppm)', minWidth: 64, align: 'right', render: ({ s }) => s.shift.toFixed(s.nucleus === '1H' ? 2 : 1) },
  { key: 'mult', title: 'Multiplicity', minWidth: 80, render: ({ s }) => (s.nucleus === '1H' ? s.multiplicity : (s.carbonType ?? '—')) },
  { key: 'j', title: 'J (Hz)', minWidth: 70, render: ({ s }) => (s.nucleus === '1H' && s.j.length ? s.j.map((j) => j.toFixed(1)).join(', ') : '—') },
  { key: 'nuclei', title: 'Nuclei', minWidth: 50, align: 'right', render: ({ s }) => String(s.nuclei) },
  { key: 'label', title: 'Group', minWidth: 70, flex: 1.4, render: ({ s }) => `${s.label ?? ''}${s.nucleus === '1H' && s.exchangeable ? ' (exch.)' : ''}` || '—' },
];

/** One entry: what it is, where it comes from, its signals and a simulated spectrum. */
export function EntryDetail({ entry, plotDomain = null }: { entry: LibraryEntry; plotDomain?: Range | null }) {
  const t = useTheme();
  const nuclei = [...new Set(entry.signals.map((s) => s.nucleus))] as Nucleus[];
  const [nucleus, setNucleus] = useState<Nucleus>(nuclei[0] ?? '1H');
  const sim = useMemo(() => entrySpectrum(entry, nucleus), [entry, nucleus]);
  const rows = entry.signals.map((s, i) => ({ s, i }));
  const meta = [
    ['Formula', entry.formula],
    ['Solvent', entry.solvent],
    ['Recorded at', `${entry.mhz} MHz${entry.temperatureC !== undefined ? `, ${entry.temperatureC} °C` : ''}${entry.pH !== undefined ? `, pH ${entry.pH}` : ''}`],
    ['Category', CATEGORY_LABEL[entry.category]],
    ['Source', entry.source],
    ['Revision', String(entry.revision ?? 1)],
    ...(entry.synonyms.length ? [['Also called', entry.synonyms.join(', ')]] : []),
    ...(entry.studentWork ? [['Note', 'student work']] : []),
  ];
  return (
    <View style={styles.wrap} accessibilityLabel={`Entry details ${entry.name}`}>
      <Text accessibilityRole="header" style={[styles.name, { color: t.colours.text, fontFamily: t.fonts.bold }]}>
        {entry.name}
      </Text>
      <View style={styles.meta}>
        {meta.map(([k, v]) => (
          <View key={k} style={styles.metaRow}>
            <Text style={[styles.metaKey, { color: t.colours.textMuted, fontFamily: t.fonts.medium }]}>{k}</Text>
            <Text style={[styles.metaVal, { color: t.colours.text, fontFamily: t.fonts.regular }]}>{v}</Text>
          </View>
        ))}
      </View>
      <DataTable label="Signals" columns={COLUMNS} rows={rows} rowKey={(r) => String(r.i)} />
      {nuclei.length > 1 ? (
        <ChoiceRow label="Simulated nucleus" value={nucleus} onChange={(v) => setNucleus(v as Nucleus)} options={nuclei.map((n) => ({ value: n, text: n }))} />
      ) : null}
      <SpectrumPlot
        label={`Simulated ${nucleus} spectrum of ${entry.name}`}
        height={200}
        domain={nucleus === '1H' ? plotDomain : null}
        traces={[{ key: 'sim', label: `simulated ${nucleus}, ${entry.mhz} MHz, first-order, Lorentzian lines`, colour: 'plotFit', x: sim.x, y: sim.y }]}
      />
      {entry.notes ? <Text style={[styles.notes, { color: t.colours.textMuted, fontFamily: t.fonts.regular }]}>{entry.notes}</Text> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: 12, width: '100%' },
  name: { fontSize: 22 },
  meta: { gap: 4 },
  metaRow: { flexDirection: 'row', gap: 10, flexWrap: 'wrap' },
  metaKey: { fontSize: 13, width: 90 },
  metaVal: { fontSize: 13, flex: 1, minWidth: 160 },
  notes: { fontSize: 13, lineHeight: 19 },
});
