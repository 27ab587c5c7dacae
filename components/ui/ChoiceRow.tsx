import { Pressable, StyleSheet, Text, View } from 'react-native';
import { useTheme } from '../../hooks/useTheme';

export interface ChoiceRowProps<T extends string> {
  /** Name of the choice; each option's accessible name is "label: option". */
  label: string;
  options: ReadonlyArray<{ value: T; text: string }>;
  value: T;
  onChange(value: T): void;
}

/** A row of mutually exclusive options that wraps on narrow screens. */
export function ChoiceRow<T extends string>({ label, options, value, onChange }: ChoiceRowProps<T>) {
  const t = useTheme();
  return (
    <View style={styles.wrap} accessibilityRole="radiogroup" accessibilityLabel={label}>
      <Text style={[styles.label, { color: t.colours.textMuted, fontFamily: t.fonts.medium }]}>{label}</Text>
      <View style={styles.row}>
        {options.map((o) => {
          const on = o.value === value;
          return (
            <Pressable
              key={o.value}
              accessibilityRole="radio"
              accessibilityLabel={`${label}: ${o.text}`}
              accessibilityState={{ checked: on, selected: on }}
              onPress={() => onChange(o.value)}
              style={[styles.chip, { borderColor: on ? t.colours.accent : t.colours.border, backgroundColor: on ? t.colours.surfaceAlt : t.colours.surface, borderRadius: t.radius.lg }]}
            >
              <Text style={[styles.text, { color: on ? t.colours.text : t.colours.textMuted, fontFamily: on ? t.fonts.semibold : t.fonts.regular }]}>{o.text}</Text>
            </Pressable>
          );
        })}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: 4 },
  label: { fontSize: 13 },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: 6 },
  chip: { borderWidth: 1, paddingHorizontal: 10, paddingVertical: 5, minHeight: 32, justifyContent: 'center' },
  text: { fontSize: 13 },
});
