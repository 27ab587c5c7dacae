import { Screen } from '../../../components/ui/Screen';
import { BatchPanel } from '../../../components/BatchPanel';

export default function BatchRoute() {
  return (
    <Screen title="Batch" subtitle="Several samples at once, one summary table">
      <BatchPanel />
    </Screen>
  );
}
