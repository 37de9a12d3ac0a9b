import { publicRoute } from "@/lib/http/route";
import { unsubscribe } from "@/lib/mail/service";

// The List-Unsubscribe address of every reminder. A mail program's one-click unsubscribe
// (RFC 8058) POSTs "List-Unsubscribe=One-Click" here with no sign-in; the signed token
// names the person and the kind. A GET (a person opening the address) changes nothing and
// goes to the page with the button.

export const GET = publicRoute({}, async ({ params }) => new Response(null, { status: 303, headers: { location: `/unsubscribe/${encodeURIComponent(params.token ?? "")}` } }));

export const POST = publicRoute({}, async ({ params }) => {
  const { kind } = await unsubscribe(params.token ?? "");
  return { ok: true, kind };
});
