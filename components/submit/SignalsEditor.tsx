import { Pressable, StyleSheet, Switch, Text, View } from 'react-native';
import { Controller, useFieldArray, type Control, type FieldErrors } from 'react-hook-form';
import { useTheme } from '../../hooks/useTheme';
import { TextField } from '../ui/TextField';
import { Button } from '../ui/Button';
import { ChoiceRow } from '../ui/ChoiceRow';
import { EMPTY_SIGNAL, type SubmitValues } from './submitValues';

/** The signals of the proposed entry: one card a row, add, remove and move up/down. */
export function SignalsEditor({ control, errors }: { control: Control<SubmitValues>; errors: FieldErrors<SubmitValues> }) {
  const t = useTheme();
  const { fields, append, remove, move } = useFieldArray({ control, name: 'signals' });
  return (
    <View style={styles.wrap} accessibilityLabel="Signals editor">
      <Text style={[styles.head, { color: t.colours.text, fontFamily: t.fonts.semibold }]}>Signals ({fields.length})</Text>
      {fields.map((f, i) => {
        const e = errors.signals?.[i];
        const n = i + 1;
        return (
          <View key={f.id} style={[styles.card, { borderColor: t.colours.border, backgroundColor: t.colours.surfaceAlt, borderRadius: t.radius.md }]}>
            <View style={styles.cardHead}>
              <Text style={[styles.num, { color: t.colours.text, fontFamily: t.fonts.semibold }]}>Signal {n}</Text>
              <View style={styles.tools}>
                <Tool label={`Move signal ${n} up`} glyph="↑" disabled={i === 0} onPress={() => move(i, i - 1)} />
                <Tool label={`Move signal ${n} down`} glyph="↓" disabled={i === fields.length - 1} onPress={() => move(i, i + 1)} />
                <Tool label={`Remove signal ${n}`} glyph="✕" disabled={fields.length === 1} onPress={() => remove(i)} />
              </View>
            </View>
            <Controller
              control={control}
              name={`signals.${i}.nucleus`}
              render={({ field }) => (
                <ChoiceRow label={`Signal ${n} nucleus`} value={field.value} onChange={field.onChange} options={[{ value: '1H', text: '¹H' }, { value: '13C', text: '¹³C' }]} />
              )}
            />
            <View style={styles.grid}>
              <Controller
                control={control}
                name={`signals.${i}.shift`}
                render={({ field }) => (
                  <View style={styles.cell}>
                    <TextField label={`Signal ${n} shift (ppm)`} keyboardType="decimal-pad" value={field.value} onChangeText={field.onChange} onBlur={field.onBlur} error={e?.shift?.message} />
                  </View>
                )}
              />
              <Controller
                control={control}
                name={`signals.${i}.nuclei`}
                render={({ field }) => (
                  <View style={styles.cell}>
                    <TextField label={`Signal ${n} nuclei`} keyboardType="number-pad" value={field.value} onChangeText={field.onChange} onBlur={field.onBlur} error={e?.nuclei?.message} />
                  </View>
                )}
              />
              <Controller
                control={control}
                name={`signals.${i}.multiplicity`}
                render={({ field }) => (
                  <View style={styles.cell}>
                    <TextField label={`Signal ${n} multiplicity`} autoCapitalize="none" placeholder="s, d, t, dd, m…" value={field.value} onChangeText={field.onChange} error={e?.multiplicity?.message} />
                  </View>
                )}
              />
              <Controller
                control={control}
                name={`signals.${i}.j`}
                render={({ field }) => (
                  <View style={styles.cell}>
                    <TextField label={`Signal ${n} J (Hz)`} placeholder="7.1, 1.5" value={field.value} onChangeText={field.onChange} error={e?.j?.message} />
                  </View>
                )}
              />
              <Controller
                control={control}
                name={`signals.${i}.label`}
                render={({ field }) => (
                  <View style={styles.cell}>
                    <TextField label={`Signal ${n} group`} placeholder="CH3" value={field.value} onChangeText={field.onChange} error={e?.label?.message} />
                  </View>
                )}
              />
            </View>
            <Controller
              control={control}
              name={`signals.${i}.exchangeable`}
              render={({ field }) => (
                <View style={styles.switchRow}>
                  <Switch accessibilityLabel={`Signal ${n} exchangeable`} value={field.value} onValueChange={field.onChange} />
                  <Text style={[styles.small, { color: t.colours.textMuted, fontFamily: t.fonts.regular }]}>exchangeable (OH/NH, may be absent)</Text>
                </View>
              )}
            />
          </View>
        );
      })}
      <Button label="Add a signal" variant="quiet" onPress={() => append({ ...EMPTY_SIGNAL })} />
    </View>
  );
}

function Tool({ label, glyph, disabled, onPress }: { label: string; glyph: string; disabled: boolean; onPress(): void }) {
  const t = useTheme();
  return (
    <Pressable
      accessibilityRole="button"
      accessibilityLabel={label}
      accessibilityState={{ disabled }}
      disabled={disabled}
      onPress={onPress}
      style={[styles.tool, { borderColor: t.colours.border, borderRadius: t.radius.sm, opacity: disabled ? 0.4 : 1 }]}
    >
      <Text style={{ color: t.colours.text, fontFamily: t.fonts.bold, fontSize: 15 }}>{glyph}</Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: 10 },
  head: { fontSize: 16 },
  card: { borderWidth: 1, padding: 10, gap: 8 },
  cardHead: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between' },
  num: { fontSize: 14 },
  tools: { flexDirection: 'row', gap: 6 },
  tool: { borderWidth: 1, width: 36, height: 36, alignItems: 'center', justifyContent: 'center' },
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: 8 },
  cell: { flexGrow: 1, flexBasis: 140, minWidth: 120 },
  switchRow: { flexDirection: 'row', alignItems: 'center', gap: 8 },
  small: { fontSize: 12 },
});
