import type { Role } from '../shared/schemas/roles';
import type { Me } from '../shared/schemas/auth';

declare global {
  namespace Express {
    interface Request {
      /** The person and brewery the session store loaded with the session (see server/middlewares/session.ts). */
      loadedSessionUser?: { id: number; user: User | false };
    }

    /** The signed-in person, loaded from the session on every request. */
    interface User {
      id: number;
      breweryId: number;
      role: Role;
      email: string;
      displayName: string;
      brewery: Me['brewery'];
    }
  }
}

declare module 'express-session' {
  interface SessionData {
    /** When the person signed in (ms since epoch): the absolute timeout counts from here. */
    signedInAt?: number;
    /** Last request (ms since epoch, to the minute): the idle timeout counts from here. */
    lastSeenAt?: number;
  }
}

export {};
