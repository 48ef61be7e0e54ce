import 'express-session';

declare global {
  namespace Express {
    /** The signed-in user as passport puts it on `req.user`. */
    interface User {
      id: string;
      email: string;
      name: string;
    }
  }
}

declare module 'express-session' {
  interface SessionData {
    /** Where to send the browser after a provider sign-in (a path on this site). */
    returnTo?: string;
  }
}

export {};
