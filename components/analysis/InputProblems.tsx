import { StyleSheet, Text, View } from 'react-native';
import { InputError } from '../../matching/io/InputError';
import { describeError } from '../../client/describeError';
import { useTheme } from '../../hooks/useTheme';

/** A failed run explained: each problem with the line or field it concerns. */
export function InputProblems({ error }: { error: unknown }) {
  const t = useTheme();
  const issues = error instanceof InputError ? error.issues : null;
  return (
    <View accessibilityRole="alert" accessibilityLabel="Analysis problems" style={[styles.box, { borderLeftColor: t.colours.danger, backgroundColor: t.colours.surfaceAlt, borderRadius: t.radius.sm }]}>
      <Text style={[styles.head, { color: t.colours.text, fontFamily: t.fonts.semibold }]}>{issues ? 'The mixture could not be read; nothing was saved.' : describeError(error)}</Text>
      {issues?.slice(0, 20).map((i, k) => (
        <Text key={k} style={[styles.line, { color: t.colours.text, fontFamily: t.fonts.regular }]}>
          {i.line !== undefined ? `Line ${i.line}` : i.field ? `Field ${i.field}` : 'Input'}
          {i.line !== undefined && i.field ? ` (${i.field})` : ''}: {i.message}
        </Text>
      ))}
      {issues && issues.length > 20 ? <Text style={[styles.line, { color: t.colours.textMuted }]}>… and {issues.length - 20} more</Text> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { borderLeftWidth: 4, padding: 10, gap: 4 },
  head: { fontSize: 14 },
  line: { fontSize: 13 },
});
