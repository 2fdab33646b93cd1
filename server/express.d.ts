import type { Role } from '../shared/auth/permissions';

declare global {
  namespace Express {
    interface User {
      id: number;
      email: string;
      name: string;
      role: Role;
      status: 'invited' | 'active' | 'deactivated';
    }
  }
}

declare module 'express-session' {
  interface SessionData {
    csrfToken?: string;
    signedInAt?: number;
    passport?: { user?: number };
  }
}

export {};
