import { Screen } from '../../../components/ui/Screen';
import { SyncStatus } from '../../../components/SyncStatus';

export default function SyncRoute() {
  return (
    <Screen title="Sync" subtitle="This device and the shared library">
      <SyncStatus />
    </Screen>
  );
}
