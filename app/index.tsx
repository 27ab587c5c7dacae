import { Redirect } from 'expo-router';
import { useSession } from '../components/providers/SessionProvider';

export default function Index() {
  const { loading, session } = useSession();
  if (loading) return null;
  return <Redirect href={session ? '/library' : '/sign-in'} />;
}
