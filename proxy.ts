import { NextResponse, type NextRequest } from "next/server";
import { clientIp } from "@/lib/http/client-ip";
import { tagLookupsExhausted, tooManyLookupsResponse } from "@/lib/tags/lookups";

// Only the tag resolver passes through here: a page cannot answer 429, so the rate limit
// of /t/{code} is checked before the page runs (the page records each lookup).
export async function proxy(request: NextRequest) {
  if (await tagLookupsExhausted(clientIp(request.headers))) return tooManyLookupsResponse();
  return NextResponse.next();
}

export const config = { matcher: "/t/:code*" };
