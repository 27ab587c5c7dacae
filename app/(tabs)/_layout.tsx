import { Redirect, Slot } from 'expo-router';
import { AppShell } from '../../components/AppShell';
import { AccountFooter } from '../../components/AccountFooter';
import { useSession } from '../../components/providers/SessionProvider';
import { navItemsFor } from '../../components/navItems';

export default function TabsLayout() {
  const { loading, session } = useSession();
  if (loading) return null;
  if (!session) return <Redirect href="/sign-in" />;
  return (
    <AppShell items={navItemsFor(session.user.role)} footer={<AccountFooter />}>
      <Slot />
    </AppShell>
  );
}
