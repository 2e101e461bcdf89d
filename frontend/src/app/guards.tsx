import type { ReactNode } from 'react';
import { Navigate, useLocation } from 'react-router';
import type { Role } from '@linkloom/shared';
import { useSession } from '../lib/session.js';
import { useRoleAtLeast } from '../lib/use-role.js';
import { EmptyState } from '../components/ui/empty-state.js';

/** Sends visitors without a session to sign-in, remembering where they were going. */
export function RequireSession({ children }: { children: ReactNode }) {
  const session = useSession();
  const location = useLocation();
  if (!session) {
    const next = encodeURIComponent(location.pathname + location.search);
    return <Navigate to={`/sign-in?next=${next}`} replace />;
  }
  return <>{children}</>;
}

export function RequireRole({ minimum, children }: { minimum: Role; children: ReactNode }) {
  const allowed = useRoleAtLeast(minimum);
  if (!allowed) {
    return (
      <EmptyState
        title="This screen is not open to your role"
        hint={`It needs the ${minimum} role or higher. Ask an admin if you need it.`}
      />
    );
  }
  return <>{children}</>;
}
