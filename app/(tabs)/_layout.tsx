import { Redirect, Slot } from 'expo-router';
import { AppShell, type NavItem } from '../../components/AppShell';
import { AccountFooter } from '../../components/AccountFooter';
import { useSession } from '../../components/providers/SessionProvider';

const ITEMS: NavItem[] = [{ href: '/library', label: 'Library', glyph: '▦' }];

export default function TabsLayout() {
  const { loading, session } = useSession();
  if (loading) return null;
  if (!session) return <Redirect href="/sign-in" />;
  return (
    <AppShell items={ITEMS} footer={<AccountFooter />}>
      <Slot />
    </AppShell>
  );
}
