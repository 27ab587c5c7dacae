import { useLocalSearchParams } from 'expo-router';
import { Screen } from '../../../components/ui/Screen';
import { Notice } from '../../../components/ui/Notice';
import { BackLink } from '../../../components/ui/BackLink';
import { ResultView } from '../../../components/analysis/ResultView';
import { useAnalysisQuery } from '../../../queries/analyses';

export default function AnalysisResultRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const q = useAnalysisQuery(String(id));
  return (
    <Screen title="Result" subtitle="Tentative identification and amounts">
      <BackLink href="/analyse" label="New analysis" />
      {q.isLoading ? <Notice text="Opening the analysis…" /> : q.data ? <ResultView analysis={q.data} /> : <Notice tone="danger" text="This analysis is not on this device." />}
    </Screen>
  );
}
