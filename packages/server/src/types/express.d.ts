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

export {};
