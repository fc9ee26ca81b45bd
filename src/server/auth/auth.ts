import "server-only";
import NextAuth, { CredentialsSignin } from "next-auth";
import Credentials from "next-auth/providers/credentials";
import Nodemailer from "next-auth/providers/nodemailer";
import { env, secureCookies } from "@/server/env";
import { authenticatePassword } from "@/server/services/authenticate-password";
import { sendMagicLink } from "@/server/services/send-magic-link";
import { userExists } from "@/server/services/user-exists";
import { filmsheetAdapter } from "./adapter";
import { clientAddress } from "./client-address";

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
  // Credentials sign-in needs JWT sessions; membership and roles are still read from the
  // database on every request, so removing someone takes effect at once.
  session: { strategy: "jwt", maxAge: 30 * 24 * 3600, updateAge: 24 * 3600 },
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
      sendVerificationRequest: ({ identifier, url, expires }) => sendMagicLink({ email: identifier, url, expiresAt: expires }),
    }),
  ],
  callbacks: {
    async signIn({ user, account, email }) {
      if (account?.provider !== "nodemailer") return true;
      // Asking for a link always looks the same (no hint whether the address has an account);
      // completing one works only for an existing account, so links never create users.
      if (email?.verificationRequest) return true;
      return user.email ? userExists(user.email) : false;
    },
    jwt({ token, user }) {
      if (user) {
        // Only these claims: the token never carries the password hash or other columns.
        token.sub = String(user.id);
        token.name = user.name ?? null;
        token.email = user.email ?? null;
        token.authAt = Math.floor(Date.now() / 1000);
      }
      delete token.picture;
      return token;
    },
    session({ session, token }) {
      session.user = { id: token.sub ?? "", name: token.name ?? null, email: token.email ?? "", emailVerified: null };
      (session as typeof session & { authAt?: number }).authAt = typeof token.authAt === "number" ? token.authAt : 0;
      return session;
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
