import { ActivityIndicator, Pressable, StyleSheet, Text, type PressableProps } from 'react-native';
import { useTheme } from '../../hooks/useTheme';

export interface ButtonProps extends Omit<PressableProps, 'children'> {
  label: string;
  /** Accessible name when it differs from the visible label. */
  accessibleName?: string;
  variant?: 'primary' | 'quiet';
  busy?: boolean;
}

export function Button({ label, accessibleName, variant = 'primary', busy = false, disabled, style, ...rest }: ButtonProps) {
  const t = useTheme();
  const primary = variant === 'primary';
  return (
    <Pressable
      accessibilityRole="button"
      accessibilityLabel={accessibleName ?? label}
      accessibilityState={{ disabled: !!disabled || busy, busy }}
      disabled={disabled || busy}
      style={(state) => [
        styles.base,
        {
          backgroundColor: primary ? t.colours.accent : 'transparent',
          borderColor: primary ? t.colours.accent : t.colours.border,
          opacity: disabled ? 0.5 : state.pressed ? 0.85 : 1,
          borderRadius: t.radius.md,
        },
        typeof style === 'function' ? style(state) : style,
      ]}
      {...rest}
    >
      {busy ? (
        <ActivityIndicator color={primary ? t.colours.accentText : t.colours.text} />
      ) : (
        <Text style={[styles.label, { color: primary ? t.colours.accentText : t.colours.text, fontFamily: t.fonts.semibold }]}>{label}</Text>
      )}
    </Pressable>
  );
}

const styles = StyleSheet.create({
  base: { minHeight: 44, paddingHorizontal: 16, paddingVertical: 10, alignItems: 'center', justifyContent: 'center', borderWidth: 1 },
  label: { fontSize: 16 },
});
