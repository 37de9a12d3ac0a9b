// The bare baseline of the tag lookup: Node's own http server and pg, no framework, doing the
// work GET /api/v1/tags/{code} does: the session and its person (one query), the item by its
// tag code in that organisation (one query), and the same JSON (toItemJson, on the
// organisation's clock). Same pool size as the app's Knex pool. Run by bench/api.ts:
//   DATABASE_URL=… node --import tsx bench/bare-server.ts <port>
import { createServer } from "node:http";
import pg from "pg";
import { toItemJson } from "../lib/stock/item-json";
import { todayIn } from "../lib/time";

const port = Number(process.argv[2] ?? 3299);
const pool = new pg.Pool({ connectionString: process.env.DATABASE_URL, max: 10 });

const SESSION_SQL = `select u.id, u.organisation_id, u.role, u.disabled_at, o.time_zone, s.expires_at
  from user_sessions s join users u on u.id = s.user_id join organisations o on o.id = u.organisation_id where s.id = $1`;
const ITEM_SQL = `select i.id, i.tag_code as "tagCode", i.kind, i.grade, i.grade_marked as "gradeMarked", i.size, i.length_mm as "lengthMm",
  i.marked_wll_lb as "markedWllLb", i.wll_lb as "wllLb", i.wll_source as "wllSource", i.serial, i.status, i.yard_id as "yardId", y.name as "yardName",
  to_char(i.next_inspection_due, 'YYYY-MM-DD') as "nextInspectionDue", i.last_checked_at as "lastCheckedAt", i.last_check_passed as "lastCheckPassed",
  to_char(i.last_inspected_on, 'YYYY-MM-DD') as "lastInspectedOn", i.details, to_char(i.in_service_on, 'YYYY-MM-DD') as "inServiceOn",
  i.cost_cents as "costCents", i.organisation_id as "organisationId"
  from items i left join yards y on y.id = i.yard_id where i.tag_code = $1`;

function send(res: import("node:http").ServerResponse, status: number, body: unknown) {
  res.writeHead(status, { "content-type": "application/json", "cache-control": "no-store" });
  res.end(JSON.stringify(body));
}

createServer(async (req, res) => {
  try {
    const m = /^\/api\/v1\/tags\/([^/?]+)/.exec(req.url ?? "");
    if (!m) return send(res, 404, { error: "Not found." });
    const sid = /(?:^|;\s*)linkyard_session=([^;]+)/.exec(req.headers.cookie ?? "")?.[1];
    if (!sid) return send(res, 401, { error: "Sign in first." });
    const session = (await pool.query(SESSION_SQL, [sid])).rows[0];
    if (!session || session.disabled_at || session.expires_at < new Date()) return send(res, 401, { error: "Sign in first." });
    const item = (await pool.query(ITEM_SQL, [decodeURIComponent(m[1]!)])).rows[0];
    if (!item || item.organisationId !== session.organisation_id) return send(res, 404, { error: "No item has this tag code." });
    send(res, 200, toItemJson(item, { timeZone: session.time_zone, today: todayIn(session.time_zone) }));
  } catch (error) {
    console.error(error);
    send(res, 500, { error: "bare server failed" });
  }
}).listen(port, "127.0.0.1", () => console.log(`bare baseline on http://127.0.0.1:${port}`));
