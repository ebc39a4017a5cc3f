import { createContext, useContext, type ReactNode } from 'react';
import type { MeResponse } from '@shared/contracts/auth';

const SessionContext = createContext<MeResponse | null>(null);

// The signed-in layout provides the session once it is known, so pages inside it read a
// `me` that is never null (and keep reading it while a sign-out is on its way).
export function SessionProvider({ me, children }: { me: MeResponse; children: ReactNode }) {
  return <SessionContext value={me}>{children}</SessionContext>;
}

export function useSession(): MeResponse {
  const me = useContext(SessionContext);
  if (!me) throw new Error('useSession() is for pages inside the signed-in layout');
  return me;
}
