import { useLocalSearchParams } from 'expo-router';
import { Screen } from '../../components/ui/Screen';
import { ResetPasswordForm } from '../../components/ResetPasswordForm';
import { BackLink } from '../../components/ui/BackLink';

export default function ResetPasswordRoute() {
  const { token } = useLocalSearchParams<{ token?: string }>();
  return (
    <Screen title="Reset the password">
      <BackLink href="/sign-in" label="Back to sign in" />
      <ResetPasswordForm token={typeof token === 'string' && token ? token : undefined} />
    </Screen>
  );
}
