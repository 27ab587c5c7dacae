import { Screen } from '../../components/ui/Screen';
import { RegisterForm } from '../../components/RegisterForm';
import { BackLink } from '../../components/ui/BackLink';

export default function RegisterRoute() {
  return (
    <Screen title="Create an account" subtitle="Students and analysts can register; curators are appointed by an admin.">
      <BackLink href="/sign-in" label="Back to sign in" />
      <RegisterForm />
    </Screen>
  );
}
