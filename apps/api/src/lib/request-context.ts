import type { Role } from '@polecourt/contracts';

export interface SessionUser {
  id: number;
  email: string;
  name: string;
  role: Role;
}

declare module 'express-session' {
  interface SessionData {
    userId: number;
    csrfToken: string;
  }
}

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface Request {
      user?: SessionUser;
      /** Set when the request authenticated with a personal API token (Authorization: Bearer). */
      apiToken?: { id: number };
    }
  }
}
