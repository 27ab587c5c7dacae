import { useLocalSearchParams } from 'expo-router';
import { Screen } from '../../../components/ui/Screen';
import { Notice } from '../../../components/ui/Notice';
import { EntryDetail } from '../../../components/EntryDetail';
import { BackLink } from '../../../components/ui/BackLink';
import { useEntryQuery } from '../../../queries/library';

export default function EntryRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const entry = useEntryQuery(String(id));
  return (
    <Screen title="Library entry">
      <BackLink href="/library" label="Back to the library" />
      {entry.isLoading ? <Notice text="Reading the entry…" /> : entry.data ? <EntryDetail entry={entry.data} /> : <Notice tone="danger" text={`No entry "${id}" on this device.`} />}
    </Screen>
  );
}
