// A small HTTP client for integration tests: keeps a cookie like a browser, sends an
// Origin header on mutations like a browser, and reads the mail fake's inbox.
// scripts/test.sh serves the app with TRUSTED_PROXIES=127.0.0.1, so the tests stand in for a
// reverse proxy: each Client is a client of its own address (X-Forwarded-For), and one
// test's sign-ups, resets or failed sign-ins never count against another's limits.

export const BASE_URL = process.env.LINKYARD_BASE_URL ?? "http://127.0.0.1:3100";
export const MAIL_API = process.env.MAIL_API ?? "http://127.0.0.1:54380";

/** A random address in IPv6's documentation range (RFC 3849): one per Client. */
export function testAddress(): string {
  const part = () => Math.floor(Math.random() * 0x10000).toString(16);
  return `2001:db8:${part()}:${part()}:${part()}:${part()}:${part()}:${part()}`;
}

export class Client {
  cookie = "";
  readonly address = testAddress();
  /** `base`: another app process of the same deployment (its Origin stays APP_URL's, as behind a load balancer). */
  constructor(readonly bearer?: string, public base = BASE_URL) {}

  async request(method: string, path: string, body?: unknown, headers: Record<string, string> = {}) {
    const h: Record<string, string> = { "x-forwarded-for": this.address, ...headers };
    if (this.cookie) h.cookie = this.cookie;
    if (this.bearer) h.authorization = `Bearer ${this.bearer}`;
    if (method !== "GET" && method !== "HEAD" && !("origin" in h)) h.origin = BASE_URL;
    let payload: BodyInit | undefined;
    if (body instanceof FormData || typeof body === "string") payload = body;
    else if (body !== undefined) {
      payload = JSON.stringify(body);
      h["content-type"] = "application/json";
    }
    const res = await fetch(this.base + path, { method, headers: h, body: payload, redirect: "manual" });
    const set = res.headers.get("set-cookie");
    if (set?.startsWith("linkyard_session=")) {
      const value = set.split(";")[0];
      this.cookie = value === "linkyard_session=" ? "" : value;
    }
    const text = await res.text();
    let json: any = undefined;
    try {
      json = text ? JSON.parse(text) : undefined;
    } catch {
      /* not JSON */
    }
    return { status: res.status, json, text, headers: res.headers };
  }

  get = (path: string, headers?: Record<string, string>) => this.request("GET", path, undefined, headers);
  post = (path: string, body?: unknown, headers?: Record<string, string>) => this.request("POST", path, body, headers);
  patch = (path: string, body?: unknown) => this.request("PATCH", path, body);
  delete = (path: string) => this.request("DELETE", path);
}

let counter = 0;
export function uniqueEmail(prefix = "t"): string {
  return `${prefix}-${Date.now().toString(36)}-${(counter++).toString(36)}-${Math.random().toString(36).slice(2, 6)}@linkyard-test.example`;
}

export const TEST_PASSWORD = "correct-horse-battery";

/**
 * Signs up as a person does: the form's answer, then the link in the e-mail (the job
 * worker sends it), which makes the company and signs its owner in. Returns that client.
 */
export async function signUpWithLink(input: { organisationName: string; name: string; email: string; password: string; timeZone?: string }): Promise<Client> {
  const res = await new Client().post("/api/v1/signups", input);
  if (res.status !== 202) throw new Error(`sign-up failed: ${res.status} ${res.text}`);
  const token = linkIn((await latestMailTo(input.email, { subject: /^Confirm your e-mail/ })).text, "/sign-up/confirm");
  const client = new Client();
  const confirmed = await client.post("/api/v1/signups/confirm", { token });
  if (confirmed.status !== 201) throw new Error(`sign-up confirmation failed: ${confirmed.status} ${confirmed.text}`);
  return client;
}

/** A new organisation with its owner signed in. */
export async function newOrganisation(name = "Test Outfit") {
  const email = uniqueEmail("owner");
  const owner = await signUpWithLink({ organisationName: name, name: "Owner Person", email, password: TEST_PASSWORD });
  const me = await owner.get("/api/v1/me");
  return { owner, email, organisationId: me.json.organisation.id as string, userId: me.json.id as string };
}

export interface MailItem {
  id: string;
  to: { address: string }[];
  subject: string;
  text: string;
}

/** Every e-mail to an address in the mail fake, oldest first. */
export async function mailsTo(address: string): Promise<MailItem[]> {
  const mails = (await (await fetch(`${MAIL_API}/api/email`)).json()) as MailItem[];
  return mails.filter((m) => m.to.some((t) => t.address.toLowerCase() === address.toLowerCase()));
}

/**
 * Waits for the newest e-mail to an address in the mail fake (one whose subject matches,
 * when given: an owner's inbox also holds the sign-up e-mail, digests…), and returns it.
 * E-mail goes through the job queue, so it may arrive a moment after the request answered.
 */
export async function latestMailTo(address: string, options: number | { timeoutMs?: number; subject?: RegExp } = {}): Promise<MailItem> {
  const { timeoutMs = 10_000, subject } = typeof options === "number" ? { timeoutMs: options } : options;
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    const mine = (await mailsTo(address)).filter((m) => !subject || subject.test(m.subject));
    if (mine.length) return mine[mine.length - 1];
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`no e-mail to ${address}${subject ? ` with a subject like ${subject}` : ""}`);
}

/** Empties an address's inbox in the mail fake (a demo person's inbox outlives the test database). */
export async function deleteMailTo(address: string): Promise<void> {
  for (const m of await mailsTo(address)) await fetch(`${MAIL_API}/api/email/${m.id}`, { method: "DELETE" });
}

/** The raw message as the mail fake received it, headers included (its JSON leaves some out). */
export async function mailSource(id: string): Promise<string> {
  return (await fetch(`${MAIL_API}/api/email/${id}/source`)).text();
}

export function linkIn(text: string, path: string): string {
  const match = text.match(new RegExp(`https?://[^\\s]+${path}/([A-Za-z0-9_-]+)`));
  if (!match) throw new Error(`no ${path} link in: ${text}`);
  return match[1];
}

/** Invites a person with a role and has them accept; returns their signed-in client. */
export async function addMember(owner: Client, role: "owner" | "planner" | "yard_hand", designated = false) {
  const email = uniqueEmail(role);
  const invite = await owner.post("/api/v1/invites", { email, role, designated });
  if (invite.status !== 201) throw new Error(`invite failed: ${invite.status} ${invite.text}`);
  const mail = await latestMailTo(email);
  const token = linkIn(mail.text, "/invite");
  const member = new Client();
  const res = await member.post("/api/v1/invites/accept", { token, name: `${role} person`, password: TEST_PASSWORD });
  if (res.status !== 201) throw new Error(`accept failed: ${res.status} ${res.text}`);
  return { client: member, email, userId: res.json.userId as string };
}
