import { useLocalSearchParams } from 'expo-router';
import { Screen } from '../../../components/ui/Screen';
import { BackLink } from '../../../components/ui/BackLink';
import { ReviewDetail } from '../../../components/review/ReviewDetail';

export default function ReviewSubmissionRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return (
    <Screen title="Review a submission">
      <BackLink href="/review" label="Back to the queue" />
      <ReviewDetail id={String(id)} />
    </Screen>
  );
}
