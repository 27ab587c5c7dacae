import { StyleSheet, Text, View } from 'react-native';
import { useTheme } from '../../hooks/useTheme';

export interface NoticeProps {
  tone?: 'info' | 'caution' | 'danger';
  text: string;
  label?: string;
}

/** A one-line status or warning strip (offline, errors). */
export function Notice({ tone = 'info', text, label }: NoticeProps) {
  const t = useTheme();
  const colour = tone === 'danger' ? t.colours.danger : tone === 'caution' ? t.colours.caution : t.colours.textMuted;
  return (
    <View
      accessibilityRole={tone === 'info' ? 'text' : 'alert'}
      accessibilityLabel={label ?? text}
      style={[styles.box, { borderLeftColor: colour, backgroundColor: tone === 'caution' ? t.colours.cautionBg : t.colours.surfaceAlt, borderRadius: t.radius.sm }]}
    >
      <Text style={[styles.text, { color: t.colours.text, fontFamily: t.fonts.regular }]}>{text}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { borderLeftWidth: 4, paddingHorizontal: 12, paddingVertical: 8 },
  text: { fontSize: 14, lineHeight: 20 },
});
