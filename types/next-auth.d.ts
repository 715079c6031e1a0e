import "next-auth";
import "next-auth/jwt";

declare module "next-auth" {
  interface Session {
    user: { id: string; name: string; email: string; sessionVersion: number };
  }
  interface User {
    sessionVersion: number;
  }
}

declare module "next-auth/jwt" {
  interface JWT {
    /** users.session_version when the token was issued; a newer value in the database ends the session. */
    sv?: number;
  }
}
