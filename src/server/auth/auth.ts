import "server-only";
import NextAuth, { CredentialsSignin } from "next-auth";
import Credentials from "next-auth/providers/credentials";
import Nodemailer from "next-auth/providers/nodemailer";
import { env, secureCookies } from "@/server/env";
import { authenticatePassword } from "@/server/services/authenticate-password";
import { claimUnverifiedAccount } from "@/server/services/claim-unverified-account";
import { sendMagicLink } from "@/server/services/send-magic-link";
import { userExists } from "@/server/services/user-exists";
import { filmsheetAdapter } from "./adapter";
import { clientAddress } from "./client-address";
import { openUserSession, revokeUserSession, SESSION_MAX_AGE_SECONDS } from "./user-sessions";

/** Shown as `?code=` on the sign-in page; says what happened without saying which part was wrong. */
export class SignInRefused extends CredentialsSignin {
  constructor(code: "invalid" | "rate_limited", readonly retryAfterSeconds?: number) {
    super(code);
    this.code = code;
  }
}

/** Sign-in links and magic-link e-mails expire after this long. */
export const MAGIC_LINK_MINUTES = 15;

// Lazy configuration: read the environment per request, not when the module loads at build time.
export const { handlers, auth, signIn, signOut } = NextAuth(() => ({
  adapter: filmsheetAdapter(),
  secret: env().AUTH_SECRET,
  trustHost: true,
  basePath: "/api/auth",
  // Credentials sign-in needs JWT sessions. Each carries the id of a user_sessions row, checked
  // on every request with the person's memberships and roles, so signing out, "sign out
  // everywhere" and removing someone all take effect at once.
  session: { strategy: "jwt", maxAge: SESSION_MAX_AGE_SECONDS, updateAge: 24 * 3600 },
  // Session cookies: httpOnly and SameSite=Lax always (Auth.js defaults), Secure over https.
  useSecureCookies: secureCookies(),
  pages: { signIn: "/sign-in", verifyRequest: "/sign-in/check-email", error: "/sign-in" },
  providers: [
    Credentials({
      credentials: { email: { label: "E-mail", type: "email" }, password: { label: "Password", type: "password" } },
      async authorize(credentials, request) {
        const result = await authenticatePassword(credentials, clientAddress(request.headers));
        if (result.ok) return result.user;
        throw new SignInRefused(result.reason, result.reason === "rate_limited" ? result.retryAfterSeconds : undefined);
      },
    }),
    Nodemailer({
      server: env().SMTP_URL,
      from: env().MAIL_FROM,
      maxAge: MAGIC_LINK_MINUTES * 60,
      // Queued, not sent here, so a mail server that is down delays the link instead of losing it.
      sendVerificationRequest: ({ identifier, url, expires, request }) =>
        sendMagicLink({ email: identifier, url, expiresAt: expires, address: clientAddress(request.headers) }),
    }),
  ],
  callbacks: {
    async signIn({ user, account, email }) {
      if (account?.provider !== "nodemailer") return true;
      // Asking for a link always looks the same (no hint whether the address has an account);
      // completing one works only for an existing account, so links never create users.
      if (email?.verificationRequest) return true;
      if (!user.email || !(await userExists(user.email))) return false;
      // Following the link proves the address; an account that had not proven it loses the
      // password a stranger may have chosen when signing it up.
      if (!("emailVerified" in user && user.emailVerified)) await claimUnverifiedAccount(user.email);
      return true;
    },
    async jwt({ token, user }) {
      if (user) {
        // Only these claims: the token never carries the password hash or other columns.
        token.sub = String(user.id);
        token.name = user.name ?? null;
        token.email = user.email ?? null;
        token.authAt = Math.floor(Date.now() / 1000);
        token.sid = await openUserSession(Number(user.id));
      }
      delete token.picture;
      return token;
    },
    session({ session, token }) {
      session.user = { id: token.sub ?? "", name: token.name ?? null, email: token.email ?? "", emailVerified: null };
      (session as typeof session & { authAt?: number }).authAt = typeof token.authAt === "number" ? token.authAt : 0;
      (session as typeof session & { sid?: unknown }).sid = token.sid;
      return session;
    },
  },
  events: {
    // Signing out ends the session on the server too, not only in this browser's cookie jar.
    async signOut(message) {
      if ("token" in message && message.token) await revokeUserSession(message.token.sid);
    },
  },
  logger: {
    // A refused password is routine; the refusal itself is recorded in sign_in_attempts.
    error(error) {
      if (error instanceof CredentialsSignin || (error as { type?: string }).type === "CredentialsSignin") return;
      console.error(`[auth] ${error.name}: ${error.message}`);
    },
    warn() {},
  },
}));
