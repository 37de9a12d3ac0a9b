import "server-only";
import type { ZodType } from "zod";
import { config } from "@/lib/config";
import { can, type Permission } from "@/lib/auth/roles";
import { principalFromRequest, type Principal } from "@/lib/auth/session";
import { SESSION_COOKIE } from "@/lib/auth/session-cookie";
import { AppError, badRequest, forbidden, unauthorized, zodIssues } from "./errors";
import { clientIp } from "./client-ip";
import { appOrigin, isCrossSite } from "./csrf";
import { DATABASE_DOWN, isConnectionFailure, RETRY_AFTER_SECONDS } from "./unavailable";

// Every route handler goes through `route`: CSRF, who, may they, what input, then the
// handler's own few lines. Failures come back as { error, issues } with the right status;
// every answer is Cache-Control: no-store (it is someone's data, or about their account).

/** The app's own origin, worked out once: every request's Origin is compared with it. */
const APP_ORIGIN = appOrigin(config.APP_URL);

/** The largest body a route reads: the public account routes take a few fields, the rest a kit or a check. */
export const BODY_LIMITS = { public: 8 * 1024, signedIn: 128 * 1024 } as const;

interface RouteContext<B, Q> {
  principal: Principal;
  body: B;
  query: Q;
  params: Record<string, string>;
  request: Request;
  ip: string;
}

interface PublicRouteContext<B, Q> extends Omit<RouteContext<B, Q>, "principal"> {
  principal: Principal | null;
}

type Options<B, Q> = { body?: ZodType<B>; query?: ZodType<Q>; maxBodyBytes?: number };
type NextContext = { params: Promise<Record<string, string>> };

export function route<B = undefined, Q = undefined>(
  permission: Permission,
  options: Options<B, Q>,
  handler: (ctx: RouteContext<B, Q>) => Promise<unknown>,
) {
  return wrap(permission, { maxBodyBytes: BODY_LIMITS.signedIn, ...options }, handler as (ctx: PublicRouteContext<B, Q>) => Promise<unknown>);
}

/** A route anyone may call (sign-in, sign-up, public tag view). */
export function publicRoute<B = undefined, Q = undefined>(
  options: Options<B, Q>,
  handler: (ctx: PublicRouteContext<B, Q>) => Promise<unknown>,
) {
  return wrap(null, { maxBodyBytes: BODY_LIMITS.public, ...options }, handler);
}

function wrap<B, Q>(
  permission: Permission | null,
  options: Options<B, Q>,
  handler: (ctx: PublicRouteContext<B, Q>) => Promise<unknown>,
) {
  return async (request: Request, context?: NextContext): Promise<Response> => {
    try {
      const cookie = request.headers.get("cookie") ?? "";
      const bearer = /^bearer /i.test(request.headers.get("authorization") ?? "");
      const crossSite = isCrossSite(
        {
          method: request.method,
          origin: request.headers.get("origin"),
          secFetchSite: request.headers.get("sec-fetch-site"),
          hasSessionCookie: cookie.includes(`${SESSION_COOKIE}=`),
          bearer,
        },
        APP_ORIGIN,
      );
      if (crossSite) throw forbidden("Cross-site request refused.");

      const principal = await principalFromRequest(request);
      if (permission) {
        if (!principal) throw unauthorized();
        if (!can(principal, permission)) throw forbidden();
      }

      const url = new URL(request.url);
      const query = options.query ? parse(options.query, Object.fromEntries(url.searchParams)) : (undefined as Q);
      let body = undefined as B;
      if (options.body) {
        const raw = await readBody(request, options.maxBodyBytes!);
        body = parse(options.body, raw);
        if (request.method === "PATCH") refuseEmptyPatch(raw, body);
      }
      const params = context ? await context.params : {};
      const ip = clientIp(request.headers);

      const result = await handler({ principal, body, query, params, request, ip });
      return noStore(result instanceof Response ? result : Response.json(result ?? { ok: true }));
    } catch (error) {
      return noStore(errorResponse(error));
    }
  };
}

/** The answer with Cache-Control: no-store (copied first when its headers are frozen, as a redirect's are). */
function noStore(response: Response): Response {
  try {
    response.headers.set("Cache-Control", "no-store");
    return response;
  } catch {
    const copy = new Response(response.body, { status: response.status, statusText: response.statusText, headers: response.headers });
    copy.headers.set("Cache-Control", "no-store");
    return copy;
  }
}

/** A PATCH whose every key was unknown (zod drops them) would change nothing: say which keys. */
function refuseEmptyPatch(raw: unknown, parsed: unknown) {
  if (!parsed || typeof parsed !== "object" || Array.isArray(parsed)) return;
  if (Object.values(parsed).some((v) => v !== undefined)) return;
  const keys = raw && typeof raw === "object" && !Array.isArray(raw) ? Object.keys(raw) : [];
  if (!keys.length) throw badRequest("Send at least one field to change.");
  throw badRequest(
    "Nothing to change: none of these is a field that can be changed here.",
    keys.map((k) => ({ path: k, message: `${k} is not a field that can be changed here.` })),
  );
}

function parse<T>(schema: ZodType<T>, input: unknown): T {
  const result = schema.safeParse(input);
  if (!result.success) throw badRequest("Some fields need fixing.", zodIssues(result.error));
  return result.data;
}

async function readBody(request: Request, maxBytes: number): Promise<unknown> {
  const type = request.headers.get("content-type") ?? "";
  const bytes = await readCapped(request, maxBytes);
  if (type.includes("application/x-www-form-urlencoded") || type.includes("multipart/form-data")) {
    return Object.fromEntries((await new Response(new Blob([bytes as BlobPart]), { headers: { "content-type": type } }).formData()).entries());
  }
  const text = new TextDecoder().decode(bytes);
  if (!text) return {};
  try {
    return JSON.parse(text);
  } catch {
    throw badRequest("The request body is not valid JSON.");
  }
}

/** The body, refused with 413 as soon as it passes the cap (a declared length is believed at once). */
async function readCapped(request: Request, maxBytes: number): Promise<Uint8Array> {
  const tooLarge = () => new AppError(413, `The request is too large: this address takes at most ${Math.round(maxBytes / 1024)} KB.`);
  if (Number(request.headers.get("content-length") ?? 0) > maxBytes) throw tooLarge();
  if (!request.body) return new Uint8Array(0);
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let size = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    size += value.byteLength;
    if (size > maxBytes) {
      await reader.cancel();
      throw tooLarge();
    }
    chunks.push(value);
  }
  return Buffer.concat(chunks);
}

export function errorResponse(error: unknown): Response {
  if (error instanceof AppError) {
    return Response.json({ error: error.message, issues: error.issues, ...withoutReserved(error.extra) }, { status: error.status });
  }
  if (isConnectionFailure(error)) {
    return Response.json({ error: DATABASE_DOWN }, { status: 503, headers: { "Retry-After": String(RETRY_AFTER_SECONDS) } });
  }
  console.error(error);
  return Response.json({ error: "Something went wrong on our side. Try again." }, { status: 500 });
}

function withoutReserved(extra: Readonly<Record<string, unknown>>): Record<string, unknown> {
  const { error: _error, issues: _issues, ...rest } = extra;
  return rest;
}
