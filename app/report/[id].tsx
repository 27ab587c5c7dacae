import { ScrollView } from 'react-native';
import { useLocalSearchParams } from 'expo-router';
import { Notice } from '../../components/ui/Notice';
import { PrintableReport } from '../../components/analysis/PrintableReport';
import { useAnalysisQuery } from '../../queries/analyses';
import { useTheme } from '../../hooks/useTheme';

export default function ReportRoute() {
  const t = useTheme();
  const { id } = useLocalSearchParams<{ id: string }>();
  const q = useAnalysisQuery(String(id));
  return (
    <ScrollView style={{ flex: 1, backgroundColor: t.colours.surface }}>
      {q.data ? <PrintableReport analysis={q.data} /> : <Notice text={q.isLoading ? 'Opening the report…' : 'This analysis is not on this device.'} />}
    </ScrollView>
  );
}
