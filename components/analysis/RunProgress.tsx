import { StyleSheet, Text, View } from 'react-native';
import { STAGE_TEXT, type AnalysisStage } from '../../client/analysisRun';
import { useTheme } from '../../hooks/useTheme';

const ORDER: AnalysisStage[] = ['reading', 'screening', 'fitting', 'saving'];

/** Which stage of the analysis is running, as text and a bar. */
export function RunProgress({ stage }: { stage: AnalysisStage }) {
  const t = useTheme();
  const i = ORDER.indexOf(stage);
  return (
    <View accessibilityRole="progressbar" accessibilityLabel="Analysis progress" accessibilityValue={{ min: 0, max: ORDER.length, now: i + 1, text: STAGE_TEXT[stage] }} style={styles.wrap}>
      <Text style={[styles.text, { color: t.colours.text, fontFamily: t.fonts.medium }]}>
        Step {i + 1} of {ORDER.length}: {STAGE_TEXT[stage]}…
      </Text>
      <View style={[styles.track, { backgroundColor: t.colours.surfaceAlt, borderRadius: t.radius.sm }]}>
        <View style={[styles.bar, { width: `${((i + 1) / ORDER.length) * 100}%`, backgroundColor: t.colours.accent, borderRadius: t.radius.sm }]} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: 6 },
  text: { fontSize: 14 },
  track: { height: 6, width: '100%', overflow: 'hidden' },
  bar: { height: 6 },
});
