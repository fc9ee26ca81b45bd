import "server-only";

/**
 * Graphile-worker takes the ready job with the lowest priority number first. E-mail (sign-in
 * links, password resets, invitations and notices) goes ahead of everything; report builds go
 * last. Report builds also run in a runner of their own (runner-options.ts), so they never hold
 * the slots that send e-mail.
 */
export const EMAIL_PRIORITY = -10;
export const REPORT_PRIORITY = 10;
