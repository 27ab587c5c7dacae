import type { ReactNode } from 'react';
import type { Role } from '../shared/user';
import { useSession } from './providers/SessionProvider';
import { Screen } from './ui/Screen';
import { Notice } from './ui/Notice';

/** Guards a route by role: the nav hides the item too, this stops a typed or bookmarked URL. */
export function RoleGate({ roles, what, children }: { roles: readonly Role[]; what: string; children: ReactNode }) {
  const { session } = useSession();
  if (!session || !roles.includes(session.user.role)) {
    return (
      <Screen title="Not available" subtitle={what}>
        <Notice tone="caution" label="Not allowed for your role" text={`${what} is open to ${roles.join(' and ')} accounts only. You are signed in as a ${session?.user.role ?? 'guest'}.`} />
      </Screen>
    );
  }
  return <>{children}</>;
}
