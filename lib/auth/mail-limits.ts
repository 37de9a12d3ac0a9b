import "server-only";
import { takeRateLimitHit } from "@/db/rate-limits";
import { tooManyRequests } from "@/lib/http/errors";

// Limits on the actions that send e-mail, so that Linkyard cannot be used to flood an inbox
// or to send mail in bulk: per e-mail address written to, per client address, per account.
// Each attempt is counted whether or not the address has an account, so the limit tells
// nothing about accounts either. The figures are common practice for small teams, not a standard.

interface Limit {
  limit: number;
  windowMinutes: number;
  message: string;
}

const HOUR = 60;
const DAY = 24 * 60;

export const MAIL_LIMITS = {
  resetPerEmail: { limit: 3, windowMinutes: HOUR, message: "Too many reset requests for this e-mail address. Use the newest link in your inbox, or wait an hour." },
  resetPerAddress: { limit: 10, windowMinutes: HOUR, message: "Too many reset requests from this address. Wait an hour and try again." },
  signUpPerAddress: { limit: 10, windowMinutes: HOUR, message: "Too many sign-ups from this address. Wait an hour and try again." },
  signUpPerEmail: { limit: 3, windowMinutes: HOUR, message: "Too many sign-ups with this e-mail address. Wait an hour and try again." },
  invitePerEmail: { limit: 3, windowMinutes: DAY, message: "Too many invites to this e-mail address today. Ask the person to use the link they already have, or try again tomorrow." },
  invitePerAccount: { limit: 20, windowMinutes: HOUR, message: "Too many invites from your account in the last hour. Wait an hour, then invite the rest." },
} satisfies Record<string, Limit>;

export type MailLimit = keyof typeof MAIL_LIMITS;

/**
 * Counts one attempt against each named limit, by its key; throws 429 with the words of the
 * first limit already reached. A key that is unknown (no client address) is not limited by it.
 */
export async function countMailAttempt(checks: [MailLimit, string | undefined][]): Promise<void> {
  for (const [name, key] of checks) {
    if (!key || key === "unknown") continue;
    const { limit, windowMinutes, message } = MAIL_LIMITS[name];
    if (!(await takeRateLimitHit(name, key.toLowerCase(), limit, windowMinutes * 60))) throw tooManyRequests(message);
  }
}
