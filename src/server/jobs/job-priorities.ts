import "server-only";

/**
 * Graphile-worker takes the ready job with the lowest priority number first. E-mail (sign-in
 * links, password resets, invitations and notices) goes ahead of everything; report builds go
 * last, one at a time across all instances in their own named queue, so a report never holds
 * both of a worker's slots and an e-mail never waits for one.
 */
export const EMAIL_PRIORITY = -10;
export const REPORT_PRIORITY = 10;
export const REPORT_QUEUE = "reports";
