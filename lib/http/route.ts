import "server-only";
import type { ZodType } from "zod";
import { config } from "@/lib/config";
import { can, type Permission } from "@/lib/auth/roles";
import { principalFromRequest, type Principal } from "@/lib/auth/session";
import { AppError, badRequest, forbidden, unauthorized, zodIssues } from "./errors";
import { clientIp } from "./client-ip";
import { isCrossSite } from "./csrf";

// Every route handler goes through `route`: CSRF, who, may they, what input, then the
// handler's own few lines. Failures come back as { error, issues } with the right status.

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

type Options<B, Q> = { body?: ZodType<B>; query?: ZodType<Q> };
type NextContext = { params: Promise<Record<string, string>> };

export function route<B = undefined, Q = undefined>(
  permission: Permission,
  options: Options<B, Q>,
  handler: (ctx: RouteContext<B, Q>) => Promise<unknown>,
) {
  return wrap(permission, options, handler as (ctx: PublicRouteContext<B, Q>) => Promise<unknown>);
}

/** A route anyone may call (sign-in, sign-up, public tag view). */
export function publicRoute<B = undefined, Q = undefined>(
  options: Options<B, Q>,
  handler: (ctx: PublicRouteContext<B, Q>) => Promise<unknown>,
) {
  return wrap(null, options, handler);
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
          host: request.headers.get("x-forwarded-host") ?? request.headers.get("host"),
          secFetchSite: request.headers.get("sec-fetch-site"),
          hasSessionCookie: cookie.includes("linkyard_session="),
          bearer,
        },
        [new URL(config.APP_URL).host],
      );
      if (crossSite) throw forbidden("Cross-site request refused.");

      const principal = await principalFromRequest(request);
      if (permission) {
        if (!principal) throw unauthorized();
        if (!can(principal, permission)) throw forbidden();
      }

      const url = new URL(request.url);
      const query = options.query ? parse(options.query, Object.fromEntries(url.searchParams)) : (undefined as Q);
      const body = options.body ? parse(options.body, await readBody(request)) : (undefined as B);
      const params = context ? await context.params : {};
      const ip = clientIp(request.headers);

      const result = await handler({ principal, body, query, params, request, ip });
      if (result instanceof Response) return result;
      return Response.json(result ?? { ok: true });
    } catch (error) {
      return errorResponse(error);
    }
  };
}

function parse<T>(schema: ZodType<T>, input: unknown): T {
  const result = schema.safeParse(input);
  if (!result.success) throw badRequest("Some fields need fixing.", zodIssues(result.error));
  return result.data;
}

async function readBody(request: Request): Promise<unknown> {
  const type = request.headers.get("content-type") ?? "";
  if (type.includes("application/x-www-form-urlencoded") || type.includes("multipart/form-data")) {
    return Object.fromEntries((await request.formData()).entries());
  }
  const text = await request.text();
  if (!text) return {};
  try {
    return JSON.parse(text);
  } catch {
    throw badRequest("The request body is not valid JSON.");
  }
}

export function errorResponse(error: unknown): Response {
  if (error instanceof AppError) {
    return Response.json({ error: error.message, issues: error.issues, ...withoutReserved(error.extra) }, { status: error.status });
  }
  console.error(error);
  return Response.json({ error: "Something went wrong on our side. Try again." }, { status: 500 });
}

function withoutReserved(extra: Readonly<Record<string, unknown>>): Record<string, unknown> {
  const { error: _error, issues: _issues, ...rest } = extra;
  return rest;
}
