import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { UploadMetaSchema } from '../../shared/api/submissions';
import { SolventSchema, type Solvent } from '../../shared/solvent';
import { useTheme } from '../../hooks/useTheme';
import { pickTextFiles, type PickedFile } from '../pickTextFiles';
import { TextField } from '../ui/TextField';
import { ChoiceRow } from '../ui/ChoiceRow';
import { Button } from '../ui/Button';
import { Notice } from '../ui/Notice';
import { entryIdFor } from './submitValues';
import type { UploadBody } from '../../client/sync';

/** A new entry from a 1H peak list or JCAMP-DX file; the server turns its peaks into signals. */
export function UploadForm({ busy, onSubmit }: { busy: boolean; onSubmit(body: UploadBody, title: string): Promise<void> }) {
  const t = useTheme();
  const [file, setFile] = useState<PickedFile | null>(null);
  const [name, setName] = useState('');
  const [formula, setFormula] = useState('');
  const [solvent, setSolvent] = useState<Solvent>('CDCl3');
  const [mhz, setMhz] = useState('400');
  const [source, setSource] = useState('');
  const [total, setTotal] = useState('');
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [saved, setSaved] = useState<string | null>(null);

  const submit = async () => {
    const meta = {
      kind: 'new',
      ...(total.trim() ? { totalNuclei: Number(total) } : {}),
      entry: { id: entryIdFor(name, solvent), name: name.trim(), synonyms: [], formula: formula.trim(), category: 'user', source: source.trim(), solvent, mhz: Number(mhz) },
    };
    const r = UploadMetaSchema.safeParse(meta);
    const e: Record<string, string> = {};
    if (!file) e.file = 'Choose a file first.';
    if (!r.success) for (const i of r.error.issues) e[String(i.path[i.path.length - 1])] ??= i.message;
    setErrors(e);
    if (Object.keys(e).length || !file) return;
    await onSubmit({ fileName: file.name, content: file.content, meta }, name.trim());
    setSaved(name.trim());
    setFile(null);
  };

  return (
    <View style={styles.wrap}>
      <Button label={file ? `File: ${file.name}` : 'Choose a peak-list or JCAMP-DX file'} accessibleName="Choose an entry file" variant="quiet" onPress={() => void pickTextFiles(false).then(([f]) => f && setFile(f))} />
      {errors.file ? <Notice tone="danger" text={errors.file} /> : null}
      <TextField label="Compound name" value={name} onChangeText={setName} error={errors.name} />
      <TextField label="Formula (Hill order)" autoCapitalize="none" value={formula} onChangeText={setFormula} error={errors.formula} />
      <ChoiceRow label="Entry solvent" value={solvent} onChange={(v) => setSolvent(v as Solvent)} options={SolventSchema.options.map((s) => ({ value: s, text: s }))} />
      <TextField label="Recorded at (MHz)" keyboardType="decimal-pad" value={mhz} onChangeText={setMhz} error={errors.mhz} />
      <TextField label="Source (citation or your lab notebook)" value={source} onChangeText={setSource} error={errors.source} />
      <TextField label="Total 1H nuclei (optional)" keyboardType="number-pad" value={total} onChangeText={setTotal} error={errors.totalNuclei} />
      <Text style={[styles.small, { color: t.colours.textMuted, fontFamily: t.fonts.regular }]}>
        Each peak becomes a singlet; its nuclei follow its share of the intensity. The curators see the checks on the server.
      </Text>
      <Button label="Submit the file" busy={busy} onPress={() => void submit()} />
      {saved ? <Text accessibilityLabel="Submission saved" style={[styles.small, { color: t.colours.positive, fontFamily: t.fonts.medium }]}>“{saved}” is in the outbox; it goes to the curators with the next sync.</Text> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: 12 },
  small: { fontSize: 13 },
});
