import { forwardRef } from 'react';
import { StyleSheet, Text, TextInput, View, type TextInputProps } from 'react-native';
import { useTheme } from '../../hooks/useTheme';

export interface TextFieldProps extends TextInputProps {
  label: string;
  error?: string | null;
}

/** A labelled input; the label is also its accessible name. */
export const TextField = forwardRef<TextInput, TextFieldProps>(function TextField({ label, error, style, ...rest }, ref) {
  const t = useTheme();
  return (
    <View style={styles.wrap}>
      <Text style={[styles.label, { color: t.colours.textMuted, fontFamily: t.fonts.medium }]}>{label}</Text>
      <TextInput
        ref={ref}
        accessibilityLabel={label}
        placeholderTextColor={t.colours.textMuted}
        style={[
          styles.input,
          { borderColor: error ? t.colours.danger : t.colours.border, color: t.colours.text, backgroundColor: t.colours.surface, fontFamily: t.fonts.regular, borderRadius: t.radius.md },
          style,
        ]}
        {...rest}
      />
      {error ? (
        <Text accessibilityRole="alert" style={[styles.error, { color: t.colours.danger, fontFamily: t.fonts.regular }]}>
          {error}
        </Text>
      ) : null}
    </View>
  );
});

const styles = StyleSheet.create({
  wrap: { gap: 4, width: '100%' },
  label: { fontSize: 14 },
  input: { borderWidth: 1, minHeight: 44, paddingHorizontal: 12, paddingVertical: 8, fontSize: 16, width: '100%' },
  error: { fontSize: 14 },
});
