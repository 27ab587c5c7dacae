import { Screen } from '../../../components/ui/Screen';
import { SubmitScreen } from '../../../components/submit/SubmitScreen';

export default function SubmitRoute() {
  return (
    <Screen title="Submit" subtitle="Propose an entry for the shared library; it waits in the outbox until it is sent">
      <SubmitScreen />
    </Screen>
  );
}
