import type React from 'react';
import { useMemo, useRef, useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { SolventSchema, type Solvent } from '../../shared/solvent';
import { DEFAULT_TOLERANCE_PPM, type Nucleus } from '../../shared/nucleus';
import { SPECTROMETER_MHZ_RANGE } from '../../shared/spectrometer';
import type { LibraryEntry } from '../../shared/libraryEntry';
import type { AnalysisInput } from '../../client/analysisRun';
import { useTheme } from '../../hooks/useTheme';
import { TextField } from '../ui/TextField';
import { ChoiceRow } from '../ui/ChoiceRow';
import { Button } from '../ui/Button';
import { Notice } from '../ui/Notice';
import { pickTextFiles, type PickedFile } from '../pickTextFiles';
import { DEMO_MIXTURES, demoMixtureContent } from '../demoMixtures';
// The header reader only (no engine): keep `matching/io/index` out of the first download.
import { mixtureFileStates } from '../../matching/io/mixtureFileStates';
import type { FileStatedMeta } from '../../matching/io/jcampHeaderMeta';

type Source = 'paste' | 'file' | 'demo';

export interface AnalyseFormProps {
  library: LibraryEntry[];
  busy: boolean;
  onRun(input: AnalysisInput): void;
  /** Progress or problems of the last run, shown just above the run button where the eye is. */
  status?: React.ReactNode;
}

function numberOrNull(s: string): number | null {
  const v = Number(s.trim().replace(',', '.'));
  return s.trim() !== '' && Number.isFinite(v) ? v : null;
}

/** Where the mixture comes from and how to read it; every field names its own problem. */
export function AnalyseForm({ library, busy, onRun, status }: AnalyseFormProps) {
  const t = useTheme();
  const [source, setSource] = useState<Source>('paste');
  const [text, setText] = useState('');
  const [name, setName] = useState('');
  const [file, setFile] = useState<PickedFile | null>(null);
  const [demoKey, setDemoKey] = useState<string | null>(null);
  const [nucleus, setNucleus] = useState<Nucleus>('1H');
  const [solvent, setSolvent] = useState<Solvent>('D2O');
  const [mhz, setMhz] = useState('400');
  const [tol, setTol] = useState(String(DEFAULT_TOLERANCE_PPM['1H']));
  const [stdId, setStdId] = useState('none');
  const [stdConc, setStdConc] = useState('');
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [pickError, setPickError] = useState<string | null>(null);
  const [fileNote, setFileNote] = useState<string | null>(null);
  const [pasteNote, setPasteNote] = useState<string | null>(null);
  const [loadingDemo, setLoadingDemo] = useState(false);

  const standards = useMemo(() => library.filter((e) => e.category === 'reference' && e.solvent === solvent), [library, solvent]);
  const demo = DEMO_MIXTURES.find((d) => d.key === demoKey) ?? null;

  const chooseDemo = (key: string) => {
    const d = DEMO_MIXTURES.find((x) => x.key === key);
    setDemoKey(key);
    if (!d) return;
    // The demo files are 1H; their sample sheet gives solvent, frequency and standard.
    setNucleus('1H');
    setTol(String(DEFAULT_TOLERANCE_PPM['1H']));
    setSolvent(d.solvent);
    setMhz(String(d.mhz));
    setStdId(d.standard?.entryId ?? 'none');
    setStdConc(d.standard ? String(d.standard.concentrationMM) : '');
  };

  /** Puts what a file or pasted text states about itself into the settings; returns what was set. */
  const applyStated = (stated: FileStatedMeta): string[] => {
    const said: string[] = [];
    if (stated.nucleus) {
      setNucleus(stated.nucleus);
      setTol(String(DEFAULT_TOLERANCE_PPM[stated.nucleus]));
      said.push(stated.nucleus);
    }
    if (stated.solvent && stated.solvent !== 'other') {
      setSolvent(stated.solvent);
      said.push(stated.solvent);
    }
    if (stated.mhz && stated.mhz >= SPECTROMETER_MHZ_RANGE[0] && stated.mhz <= SPECTROMETER_MHZ_RANGE[1]) {
      const shown = String(Number(stated.mhz.toPrecision(6)));
      setMhz(shown);
      said.push(`${shown} MHz`);
    }
    return said;
  };

  // Pasted text with "# solvent D2O, 600 MHz" comments fills the settings when those comments
  // change (not on every keystroke, so a setting changed by hand afterwards stays).
  const pastedStated = useRef('{}');
  const onPaste = (v: string) => {
    setText(v);
    const stated = mixtureFileStates('pasted.txt', v);
    const key = JSON.stringify(stated);
    if (key === pastedStated.current) return;
    pastedStated.current = key;
    const said = applyStated(stated);
    setPasteNote(said.length ? `Read from the pasted text: ${said.join(', ')}. Change the settings below if it is wrong.` : null);
  };

  const choose = async () => {
    setPickError(null);
    try {
      const [f] = await pickTextFiles(false);
      if (!f) return;
      setFile(f);
      // What the file states about itself fills the settings below (a 600 MHz spectrum read at
      // the form's 400 MHz would place every coupled line wrongly); the user can still change them.
      const said = applyStated(mixtureFileStates(f.name, f.content));
      setFileNote(said.length ? `Read from the file: ${said.join(', ')}. Change the settings below if the file is wrong.` : 'The file does not state its solvent or frequency: check the settings below.');
    } catch (err) {
      setPickError(err instanceof Error ? err.message : 'The file could not be read.');
    }
  };

  const run = () => {
    const e: Record<string, string> = {};
    const m = numberOrNull(mhz);
    const tp = numberOrNull(tol);
    const c = numberOrNull(stdConc);
    if (m === null || m < SPECTROMETER_MHZ_RANGE[0] || m > SPECTROMETER_MHZ_RANGE[1]) e.mhz = `Spectrometer frequency: give the 1H frequency in MHz, between ${SPECTROMETER_MHZ_RANGE[0]} and ${SPECTROMETER_MHZ_RANGE[1]}.`;
    if (tp === null || tp <= 0 || tp > 1) e.tol = 'Tolerance: give a positive number of ppm, at most 1.';
    if (stdId !== 'none' && (c === null || c <= 0)) e.std = 'Internal standard concentration: give a positive number of mmol/L.';
    if (source === 'paste' && !text.trim()) e.text = 'Peak list: paste at least one line "shift, intensity".';
    if (source === 'file' && !file) e.file = 'Choose a file first.';
    if (source === 'demo' && !demo) e.demo = 'Pick one of the demo mixtures.';
    setErrors(e);
    if (Object.keys(e).length) return;
    const settings = { nucleus, solvent, mhz: m!, tolerancePpm: tp!, standard: stdId !== 'none' ? { entryId: stdId, concentrationMM: c! } : null };
    if (source === 'demo' && demo) {
      // A demo spectrum's text comes in a chunk of its own, on first use.
      setLoadingDemo(true);
      demoMixtureContent(demo)
        .then((content) => onRun({ fileName: demo.fileName, content, name: demo.title, demo: true, settings }))
        .catch((err: unknown) => setErrors({ demo: `The demo file could not be loaded: ${err instanceof Error ? err.message : String(err)}` }))
        .finally(() => setLoadingDemo(false));
    } else if (source === 'file' && file) {
      onRun({ fileName: file.name, content: file.content, name: name.trim() || undefined, settings });
    } else {
      onRun({ fileName: 'pasted.txt', content: text, name: name.trim() || 'pasted peak list', settings });
    }
  };

  const label = [styles.label, { color: t.colours.textMuted, fontFamily: t.fonts.medium }];
  return (
    <View style={[styles.card, { backgroundColor: t.colours.surface, borderColor: t.colours.border, borderRadius: t.radius.lg }]}>
      <ChoiceRow
        label="Mixture from"
        value={source}
        onChange={(v) => setSource(v as Source)}
        options={[{ value: 'paste', text: 'pasted peak list' }, { value: 'file', text: 'a file' }, { value: 'demo', text: 'demo mixtures' }]}
      />
      {source === 'paste' ? (
        <>
          <TextField label="Sample name" value={name} onChangeText={setName} placeholder="e.g. honey lot 14" />
          <TextField
            label="Peak list"
            multiline
            numberOfLines={6}
            value={text}
            onChangeText={onPaste}
            placeholder={'shift, intensity[, width Hz] — one peak a line\n3.21, 100\n1.33, 45.5'}
            style={styles.area}
            error={errors.text}
          />
          {pasteNote ? <Notice tone="info" label="Settings from the pasted text" text={pasteNote} /> : null}
        </>
      ) : null}
      {source === 'file' ? (
        <View style={styles.group}>
          <Button label={file ? 'Choose another file' : 'Choose a file'} accessibleName="Choose a mixture file" variant="quiet" onPress={() => void choose()} />
          <Text accessibilityLabel="Chosen file" style={label}>
            {file ? `${file.name} (${file.content.length.toLocaleString()} characters)` : 'Peak list (.csv .tsv .txt) or spectrum (.csv, JCAMP-DX .jdx .dx)'}
          </Text>
          {file ? <TextField label="Sample name" value={name} onChangeText={setName} placeholder={file.name.replace(/\.[^.]*$/, '')} /> : null}
          {file && fileNote ? <Notice tone="info" label="Settings from the file" text={fileNote} /> : null}
          {errors.file ? <Notice tone="danger" text={errors.file} /> : null}
          {pickError ? <Notice tone="danger" text={pickError} /> : null}
        </View>
      ) : null}
      {source === 'demo' ? (
        <View style={styles.group}>
          <Text style={label}>Invented demo samples of the Wrenfold Vale scenario (demo data)</Text>
          {DEMO_MIXTURES.length === 0 ? <Notice text="No demo mixtures were shipped with this build." /> : null}
          {DEMO_MIXTURES.map((d) => (
            <Button
              key={d.key}
              label={`${d.title}${d.key === demoKey ? ' ✓' : ''}`}
              accessibleName={`Demo mixture ${d.title}`}
              variant={d.key === demoKey ? 'primary' : 'quiet'}
              onPress={() => chooseDemo(d.key)}
            />
          ))}
          {demo?.description ? <Text style={label}>{demo.description}</Text> : null}
          {errors.demo ? <Notice tone="danger" text={errors.demo} /> : null}
        </View>
      ) : null}
      <ChoiceRow
        label="Nucleus"
        value={nucleus}
        onChange={(v) => {
          setNucleus(v as Nucleus);
          setTol(String(DEFAULT_TOLERANCE_PPM[v as Nucleus]));
        }}
        options={[{ value: '1H', text: '¹H' }, { value: '13C', text: '¹³C' }]}
      />
      <ChoiceRow label="Solvent" value={solvent} onChange={(v) => setSolvent(v as Solvent)} options={SolventSchema.options.map((s) => ({ value: s, text: s }))} />
      <View style={styles.pair}>
        <View style={styles.half}>
          <TextField label="Spectrometer (MHz)" keyboardType="decimal-pad" value={mhz} onChangeText={setMhz} error={errors.mhz} />
        </View>
        <View style={styles.half}>
          <TextField label="Tolerance (ppm)" keyboardType="decimal-pad" value={tol} onChangeText={setTol} error={errors.tol} />
        </View>
      </View>
      <ChoiceRow
        label="Internal standard"
        value={stdId}
        onChange={setStdId}
        options={[{ value: 'none', text: 'none' }, ...standards.map((s) => ({ value: s.id, text: s.name.replace(/\s*\(.*\)$/, '') }))]}
      />
      {stdId !== 'none' ? <TextField label="Standard concentration (mmol/L)" keyboardType="decimal-pad" value={stdConc} onChangeText={setStdConc} error={errors.std} /> : null}
      {status}
      <Button label="Run analysis" busy={busy || loadingDemo} onPress={run} />
    </View>
  );
}

const styles = StyleSheet.create({
  card: { gap: 14, padding: 16, borderWidth: 1, width: '100%' },
  group: { gap: 8 },
  label: { fontSize: 13, lineHeight: 18 },
  area: { minHeight: 130, textAlignVertical: 'top' },
  pair: { flexDirection: 'row', gap: 12, flexWrap: 'wrap' },
  half: { flex: 1, minWidth: 150 },
});
