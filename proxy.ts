import { withAuth } from "next-auth/middleware";

/**
 * A convenience redirect only: signed-out visitors of the signed-in area go to the sign-in page. Every page,
 * route handler and server action checks the session, organisation and role itself.
 */
export default withAuth({ pages: { signIn: "/sign-in" } });

export const config = {
  matcher: ["/plans/:path*", "/routes/:path*", "/rigs/:path*", "/organisation/:path*", "/account/:path*"],
};
