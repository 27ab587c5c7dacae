import { Screen } from '../../../components/ui/Screen';
import { HistoryList } from '../../../components/HistoryList';

export default function HistoryRoute() {
  return (
    <Screen title="History" subtitle="Past analyses kept on this device">
      <HistoryList />
    </Screen>
  );
}
