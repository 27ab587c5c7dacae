import { Screen } from '../../components/ui/Screen';
import { AccountPanel } from '../../components/AccountPanel';

export default function AccountRoute() {
  return (
    <Screen title="Account">
      <AccountPanel />
    </Screen>
  );
}
