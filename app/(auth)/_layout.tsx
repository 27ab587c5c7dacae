import { Redirect, Slot } from 'expo-router';
import { useSession } from '../../components/providers/SessionProvider';

export default function AuthLayout() {
  const { loading, session } = useSession();
  if (loading) return null;
  if (session) return <Redirect href="/library" />;
  return <Slot />;
}
