import { useMemo, useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { Controller, useForm, useWatch, type Resolver } from 'react-hook-form';
import { SubmissionCreateBodySchema } from '../../shared/api/submissions';
import { SolventSchema } from '../../shared/solvent';
import type { LibraryEntry } from '../../shared/libraryEntry';
import { useEntryChecks } from '../../hooks/useEntryChecks';
import { useTheme } from '../../hooks/useTheme';
import { TextField } from '../ui/TextField';
import { ChoiceRow } from '../ui/ChoiceRow';
import { Button } from '../ui/Button';
import { SignalsEditor } from './SignalsEditor';
import { CheckList } from './CheckList';
import { EMPTY_VALUES, bodyPathToField, submissionBody, valuesToEntry, type SubmitValues } from './submitValues';
import type { SubmissionCreateInput } from '../../shared/api/submissions';

/** Validates through the shared submission schema and puts each issue on the field it names. */
const resolver: Resolver<SubmitValues> = async (values) => {
  const r = SubmissionCreateBodySchema.safeParse(submissionBody(values));
  if (r.success) return { values, errors: {} };
  const errors: Record<string, unknown> = {};
  for (const issue of r.error.issues) {
    const path = bodyPathToField(issue.path).split('.');
    let node = errors as Record<string, unknown>;
    path.forEach((k, i) => {
      if (i === path.length - 1) node[k] ??= { type: issue.code, message: issue.message };
      else node = (node[k] ??= {}) as Record<string, unknown>;
    });
  }
  return { values: {}, errors: errors as never };
};

export interface SubmitFormProps {
  library: LibraryEntry[];
  initial?: SubmitValues;
  busy: boolean;
  onSubmit(body: SubmissionCreateInput, title: string): Promise<void>;
}

export function SubmitForm({ library, initial, busy, onSubmit }: SubmitFormProps) {
  const t = useTheme();
  const { control, handleSubmit, formState, reset } = useForm<SubmitValues>({ resolver, defaultValues: initial ?? EMPTY_VALUES, mode: 'onTouched' });
  const values = useWatch({ control }) as SubmitValues;
  const [sentTitle, setSentTitle] = useState<string | null>(null);
  // The curation checks of matching/library, live as the person types (loaded on first use).
  const entry = useMemo(() => valuesToEntry(values), [values]);
  const problems = useEntryChecks(entry, library);
  const e = formState.errors;

  const submit = handleSubmit(async (v) => {
    await onSubmit(submissionBody(v), v.name);
    setSentTitle(v.name);
    reset(EMPTY_VALUES);
  });

  const field = (name: 'name' | 'id' | 'synonyms' | 'formula' | 'smiles' | 'mhz' | 'source' | 'notes' | 'note', label: string, extra: Partial<React.ComponentProps<typeof TextField>> = {}) => (
    <Controller
      control={control}
      name={name}
      render={({ field: f }) => <TextField label={label} value={f.value} onChangeText={f.onChange} onBlur={f.onBlur} error={(e as Record<string, { message?: string }>)[name]?.message} {...extra} />}
    />
  );

  return (
    <View style={styles.wrap}>
      {values.kind === 'change' ? (
        <Text style={[styles.small, { color: t.colours.textMuted, fontFamily: t.fonts.regular }]}>
          Proposing revision {(values.baseRevision ?? 1) + 1} of {values.id}
        </Text>
      ) : null}
      {field('name', 'Compound name')}
      {field('id', 'Entry id (optional)', { autoCapitalize: 'none', placeholder: 'made from the name and solvent when left empty', editable: values.kind === 'new' })}
      {field('synonyms', 'Synonyms (separate with ;)')}
      <View style={styles.pair}>
        <View style={styles.half}>{field('formula', 'Formula (Hill order)', { autoCapitalize: 'none', placeholder: 'C2H6O' })}</View>
        <View style={styles.half}>{field('mhz', 'Recorded at (MHz)', { keyboardType: 'decimal-pad' })}</View>
      </View>
      {field('smiles', 'SMILES (optional)', { autoCapitalize: 'none' })}
      <Controller
        control={control}
        name="solvent"
        render={({ field: f }) => <ChoiceRow label="Entry solvent" value={f.value} onChange={f.onChange} options={SolventSchema.options.map((s) => ({ value: s, text: s }))} />}
      />
      {field('source', 'Source (citation or your lab notebook)')}
      <SignalsEditor control={control} errors={e} />
      {field('notes', 'Notes on the entry (optional)', { multiline: true })}
      {field('note', 'Message to the curator (optional)', { multiline: true })}
      <CheckList problems={problems} />
      <Button label={values.kind === 'change' ? 'Submit the change' : 'Submit the entry'} busy={busy || formState.isSubmitting} onPress={submit} />
      {sentTitle ? <Text accessibilityLabel="Submission saved" style={[styles.small, { color: t.colours.positive, fontFamily: t.fonts.medium }]}>“{sentTitle}” is in the outbox; it goes to the curators with the next sync.</Text> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: 12, width: '100%' },
  pair: { flexDirection: 'row', gap: 12, flexWrap: 'wrap' },
  half: { flex: 1, minWidth: 150 },
  small: { fontSize: 13 },
});
