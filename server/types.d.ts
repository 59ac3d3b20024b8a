import type { Role } from '../shared/schemas/roles';

declare global {
  namespace Express {
    /** The signed-in person, loaded from the session on every request. */
    interface User {
      id: number;
      breweryId: number;
      role: Role;
      email: string;
      displayName: string;
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
