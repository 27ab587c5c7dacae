import { StyleSheet, Text, View } from 'react-native';
import { useRouter } from 'expo-router';
import { Screen } from '../../../components/ui/Screen';
import { AnalyseForm } from '../../../components/analysis/AnalyseForm';
import { RunProgress } from '../../../components/analysis/RunProgress';
import { InputProblems } from '../../../components/analysis/InputProblems';
import { HistoryList } from '../../../components/HistoryList';
import { useLibraryQuery } from '../../../queries/library';
import { useRunAnalysisMutation } from '../../../queries/analyses';
import { useWideLayout } from '../../../hooks/useWideLayout';
import { useTheme } from '../../../hooks/useTheme';

export default function AnalyseRoute() {
  const router = useRouter();
  const wide = useWideLayout();
  const t = useTheme();
  const library = useLibraryQuery();
  const run = useRunAnalysisMutation();
  const form = (
    <AnalyseForm
      library={library.data ?? []}
      busy={run.isPending}
      onRun={(input) => run.mutate(input, { onSuccess: (a) => router.push(`/analyse/${a.id}`) })}
      status={run.stage ? <RunProgress stage={run.stage} /> : run.isError ? <InputProblems error={run.error} /> : null}
    />
  );
  return (
    <Screen title="Analyse" subtitle="Which library compounds are in this mixture, and how much — computed on this device">
      {wide ? (
        <View style={styles.panes}>
          <View style={styles.form}>{form}</View>
          <View style={styles.side}>
            <Text style={[styles.head, { color: t.colours.text, fontFamily: t.fonts.semibold }]}>Recent analyses</Text>
            <HistoryList />
          </View>
        </View>
      ) : (
        form
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  panes: { flexDirection: 'row', gap: 16, alignItems: 'flex-start' },
  form: { flex: 1.6, minWidth: 0 },
  side: { flex: 1, minWidth: 0, gap: 8 },
  head: { fontSize: 16 },
});
