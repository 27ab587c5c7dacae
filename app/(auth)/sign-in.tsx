import { Screen } from '../../components/ui/Screen';
import { SignInForm } from '../../components/SignInForm';
import { useSession } from '../../components/providers/SessionProvider';
import { AuthLinks } from '../../components/AuthLinks';

export default function SignInRoute() {
  const { signIn } = useSession();
  return (
    <Screen title="Tessera" subtitle="Which known compounds are in this sample, and how much.">
      <SignInForm onSubmit={signIn} />
      <AuthLinks />
    </Screen>
  );
}
