import { Screen } from '../../../components/ui/Screen';
import { AdminPanel } from '../../../components/AdminPanel';

export default function AdminRoute() {
  return (
    <Screen title="Admin" subtitle="Accounts, roles and the e-mail outbox">
      <AdminPanel />
    </Screen>
  );
}
