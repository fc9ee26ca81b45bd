import { z } from "zod";

export const ZEmail = z
  .string({ error: "E-mail is required" })
  .trim()
  .toLowerCase()
  .max(255, "E-mail is at most 255 characters")
  .pipe(z.email({ error: "Enter an e-mail address such as name@firm.com" }));

// bcrypt reads only the first 72 bytes; longer passwords are refused rather than cut silently.
export const ZNewPassword = z
  .string({ error: "Password is required" })
  .min(10, "Password must be at least 10 characters")
  .refine((p) => new TextEncoder().encode(p).length <= 72, "Password must be at most 72 bytes");

export const ZPersonName = z.string({ error: "Name is required" }).trim().min(1, "Name is required").max(120, "Name is at most 120 characters");

export const ZSignIn = z.object({
  email: ZEmail,
  password: z.string({ error: "Password is required" }).min(1, "Password is required").max(200, "Password is too long"),
});

export const ZMagicLinkRequest = z.object({ email: ZEmail });

export const ZSignUp = z.object({
  firmName: z.string({ error: "Firm name is required" }).trim().min(2, "Firm name must be at least 2 characters").max(120, "Firm name is at most 120 characters"),
  name: ZPersonName,
  email: ZEmail,
  password: ZNewPassword,
});
export type TSignUp = z.infer<typeof ZSignUp>;

/** A secret from an e-mailed link (invitation or password reset): 43 base64url characters. */
export const ZLinkToken = z.string({ error: "Link token is required" }).regex(/^[A-Za-z0-9_-]{43}$/, "This link is not valid: copy the whole link from the e-mail");

export const ZInvitationAccept = z.object({
  token: ZLinkToken,
  // Needed only when the invited address has no account yet.
  name: ZPersonName.optional(),
  password: ZNewPassword.optional(),
});
export type TInvitationAccept = z.infer<typeof ZInvitationAccept>;

export const ZPasswordResetRequest = z.object({ email: ZEmail });
export const ZPasswordResetConfirm = z.object({ token: ZLinkToken, password: ZNewPassword });
