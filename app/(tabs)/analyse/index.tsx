import { useRouter } from 'expo-router';
import { Screen } from '../../../components/ui/Screen';
import { AnalyseForm } from '../../../components/analysis/AnalyseForm';
import { RunProgress } from '../../../components/analysis/RunProgress';
import { InputProblems } from '../../../components/analysis/InputProblems';
import { useLibraryQuery } from '../../../queries/library';
import { useRunAnalysisMutation } from '../../../queries/analyses';

export default function AnalyseRoute() {
  const router = useRouter();
  const library = useLibraryQuery();
  const run = useRunAnalysisMutation();
  return (
    <Screen title="Analyse" subtitle="Which library compounds are in this mixture, and how much — computed on this device">
      <AnalyseForm
        library={library.data ?? []}
        busy={run.isPending}
        onRun={(input) => run.mutate(input, { onSuccess: (a) => router.push(`/analyse/${a.id}`) })}
        status={run.stage ? <RunProgress stage={run.stage} /> : run.isError ? <InputProblems error={run.error} /> : null}
      />
    </Screen>
  );
}
