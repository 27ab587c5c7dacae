import { StyleSheet, Text, View } from 'react-native';
import { useTheme } from '../../hooks/useTheme';

const CHECK_NAME: Record<string, string> = {
  schema: 'form',
  id: 'id',
  formula: 'formula vs nuclei',
  shiftRange: 'shift range',
  multiplicity: 'multiplicity',
  nearDuplicate: 'near duplicate',
  similarName: 'similar name',
  similarPeaks: 'similar peaks',
};

/** The curation checks, as the curator will see them. */
export function CheckList({ problems, title = 'Curation checks' }: { problems: Array<{ check: string; field: string; message: string }> | null; title?: string }) {
  const t = useTheme();
  if (problems === null) {
    return (
      <View accessibilityLabel={title} style={[styles.box, { borderColor: t.colours.border, backgroundColor: t.colours.surface, borderRadius: t.radius.md }]}>
        <Text style={[styles.head, { color: t.colours.textMuted, fontFamily: t.fonts.semibold }]}>{title}: loading the checks…</Text>
      </View>
    );
  }
  return (
    <View accessibilityLabel={title} style={[styles.box, { borderColor: problems.length ? t.colours.caution : t.colours.positive, backgroundColor: t.colours.surface, borderRadius: t.radius.md }]}>
      <Text style={[styles.head, { color: t.colours.text, fontFamily: t.fonts.semibold }]}>
        {title}: {problems.length === 0 ? 'no problems found' : `${problems.length} to look at`}
      </Text>
      {problems.slice(0, 30).map((p, i) => (
        <Text key={i} style={[styles.line, { color: t.colours.text, fontFamily: t.fonts.regular }]}>
          • [{CHECK_NAME[p.check] ?? p.check}] {p.field}: {p.message}
        </Text>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { borderWidth: 1, borderLeftWidth: 4, padding: 10, gap: 4 },
  head: { fontSize: 14 },
  line: { fontSize: 13, lineHeight: 18 },
});
