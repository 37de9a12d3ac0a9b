import { db } from "./index";

// Stock queries. Always scoped to one organisation.

export async function countItemsByStatus(organisationId: string) {
  const rows = await db("items")
    .where({ organisation_id: organisationId })
    .groupBy("status")
    .select("status")
    .count<{ status: string; count: string }[]>("id as count");
  return Object.fromEntries(rows.map((r) => [r.status, Number(r.count)])) as Record<string, number>;
}

export async function countInspectionsDue(organisationId: string, within = 30) {
  const row = await db("items")
    .where({ organisation_id: organisationId, status: "in_service" })
    .where("next_inspection_due", "<=", db.raw(`current_date + ?::int`, [within]))
    .count<{ count: string }>("id as count")
    .first();
  return Number(row?.count ?? 0);
}

export async function listItemsBrief(organisationId: string, limit = 200) {
  return db("items as i")
    .leftJoin("yards as y", "y.id", "i.yard_id")
    .where("i.organisation_id", organisationId)
    .orderBy(["i.kind", "i.tag_code"])
    .limit(limit)
    .select(
      "i.id", "i.tag_code as tagCode", "i.kind", "i.grade", "i.size", "i.marked_wll_lb as markedWllLb",
      "i.status", "i.serial", "y.name as yardName", "i.next_inspection_due as nextInspectionDue",
    );
}
