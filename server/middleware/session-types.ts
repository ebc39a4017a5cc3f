import 'express-session';
import type { StudioRole } from '../../shared/auth/permissions';

declare module 'express-session' {
  interface SessionData {
    userId?: string;
    studioId?: string;
    csrfToken?: string;
  }
}

export type AuthContext = {
  user: { id: string; name: string; email: string };
  studioId: string | null;
  role: StudioRole | null;
};

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface Request {
      auth?: AuthContext;
    }
  }
}
