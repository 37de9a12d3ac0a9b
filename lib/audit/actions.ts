// Everything the audit log records, as a closed set, with the words the audit log page shows.
// A new kind of change adds its action here; a string built at run time cannot slip in.

/** Each audit action, and how the audit log says it. */
export const AUDIT_WORDS = {
  "organisation.created": "Company set up",
  "organisation.updated": "Company settings changed",
  "organisation.intervals_updated": "Inspection intervals changed",
  "person.invited": "Person invited",
  "person.joined": "Person joined",
  "person.updated": "Person's role or access changed",
  "person.password_reset": "Password reset",
  "invite.withdrawn": "Invite withdrawn",
  "api_token.created": "API token created",
  "api_token.revoked": "API token revoked",
  "api_token.capped": "API token lowered to its maker's role",
  "item.created": "Item added",
  "item.updated": "Item details changed",
  "items.moved": "Items moved to another yard",
  "item.check_pass": "Pre-use check: no defects",
  "item.check_fail": "Pre-use check: defects found, tagged out",
  "item.tagged_out": "Item tagged out",
  "item.inspected": "Periodic inspection recorded",
  "item.return_to_service": "Item returned to service",
  "item.retired": "Item retired",
  "item.lost": "Item marked lost",
  "item.found": "Item marked found",
  "item.event_corrected": "History entry corrected",
  "item.certificate_added": "Certificate or document added",
  "items.imported": "Stock imported from a CSV file",
  "items.import_undone": "CSV import undone",
  "import_mapping.saved": "Column mapping saved",
  "import_mapping.deleted": "Column mapping deleted",
  "organisation.units_updated": "Units shown changed",
  "saved_check.saved": "Securement check saved",
  "saved_check.updated": "Saved securement check changed",
  "saved_check.deleted": "Saved securement check deleted",
  "machine_class.created": "Machine class added",
  "machine.created": "Machine added",
  "machine.updated": "Machine changed",
  "trailer.created": "Trailer added",
  "trailer.updated": "Trailer changed",
  "anchor_point.inspected": "Anchor point inspected",
  "anchor_point.tagged_out": "Anchor point tagged out",
  "anchor_point.returned_to_service": "Anchor point returned to service",
  "anchor_point.retired": "Anchor point retired",
  "kit.created": "Kit planned",
  "kit.updated": "Kit changed",
  "kit.copied": "Kit copied to another day",
  "kit.tiedown_added": "Tiedown added to a kit",
  "kit.tiedown_updated": "Kit tiedown changed",
  "kit.tiedown_removed": "Tiedown removed from a kit",
  "kit.items_added": "Gear added to a kit",
  "kit.item_removed": "Gear removed from a kit",
  "kit.corners_filled": "Kit corners filled like the first",
  "kit.placed": "Machine placed on the kit's deck",
  "kit.proposal_applied": "Proposed kit used in place of the tiedowns",
  "kit.draft": "Kit back to draft",
  "kit.ready": "Kit marked ready",
  "kit.loaded": "Kit loaded",
  "kit.returned": "Kit returned",
  "organisation.digest_time_updated": "Daily digest time changed",
  "mail.preferences_changed": "E-mail choices changed",
  "mail.unsubscribed": "Unsubscribed by an e-mail's link",
  "mail.resent": "Failed e-mail sent again",
} as const satisfies Record<string, string>;

export type AuditAction = keyof typeof AUDIT_WORDS;

/** The audit action of a kit moving to each state. */
export const KIT_STATE_ACTIONS = {
  draft: "kit.draft",
  ready: "kit.ready",
  loaded: "kit.loaded",
  returned: "kit.returned",
} as const satisfies Record<string, AuditAction>;

/**
 * The words for an audit row's action (a row written before an action was renamed still
 * reads, in the plain form of its name).
 * @example auditWords("item.check_fail") // "Pre-use check: defects found, tagged out"
 */
export function auditWords(action: string): string {
  if (Object.hasOwn(AUDIT_WORDS, action)) return AUDIT_WORDS[action as AuditAction];
  const words = action.replace(/[._]/g, " ").trim();
  return words.charAt(0).toUpperCase() + words.slice(1);
}

/** Kinds of change, for the audit log's filter, each in words. */
export const AUDIT_KINDS = {
  people: "People and access",
  settings: "Company settings",
  stock: "Stock and item details",
  inspections: "Checks, inspections and tag-outs",
  imports: "CSV imports",
  fleet: "Machines, trailers and anchor points",
  kits: "Kits",
  checks: "Saved load checks",
  mail: "E-mail",
} as const satisfies Record<string, string>;

export type AuditKind = keyof typeof AUDIT_KINDS;

/** The kind of each action: every action has one (the type sees to it). */
const KIND_OF: Record<AuditAction, AuditKind> = {
  "organisation.created": "settings",
  "organisation.updated": "settings",
  "organisation.intervals_updated": "settings",
  "organisation.units_updated": "settings",
  "organisation.digest_time_updated": "settings",
  "person.invited": "people",
  "person.joined": "people",
  "person.updated": "people",
  "person.password_reset": "people",
  "invite.withdrawn": "people",
  "api_token.created": "people",
  "api_token.revoked": "people",
  "api_token.capped": "people",
  "item.created": "stock",
  "item.updated": "stock",
  "items.moved": "stock",
  "item.retired": "stock",
  "item.lost": "stock",
  "item.found": "stock",
  "item.event_corrected": "stock",
  "item.certificate_added": "stock",
  "item.check_pass": "inspections",
  "item.check_fail": "inspections",
  "item.tagged_out": "inspections",
  "item.inspected": "inspections",
  "item.return_to_service": "inspections",
  "items.imported": "imports",
  "items.import_undone": "imports",
  "import_mapping.saved": "imports",
  "import_mapping.deleted": "imports",
  "saved_check.saved": "checks",
  "saved_check.updated": "checks",
  "saved_check.deleted": "checks",
  "machine_class.created": "fleet",
  "machine.created": "fleet",
  "machine.updated": "fleet",
  "trailer.created": "fleet",
  "trailer.updated": "fleet",
  "anchor_point.inspected": "fleet",
  "anchor_point.tagged_out": "fleet",
  "anchor_point.returned_to_service": "fleet",
  "anchor_point.retired": "fleet",
  "kit.created": "kits",
  "kit.updated": "kits",
  "kit.copied": "kits",
  "kit.tiedown_added": "kits",
  "kit.tiedown_updated": "kits",
  "kit.tiedown_removed": "kits",
  "kit.items_added": "kits",
  "kit.item_removed": "kits",
  "kit.corners_filled": "kits",
  "kit.placed": "kits",
  "kit.proposal_applied": "kits",
  "kit.draft": "kits",
  "kit.ready": "kits",
  "kit.loaded": "kits",
  "kit.returned": "kits",
  "mail.preferences_changed": "mail",
  "mail.unsubscribed": "mail",
  "mail.resent": "mail",
};

/**
 * The actions of one kind of change (what the audit log's filter asks the database for).
 * @example actionsOfKind("imports") // ["items.imported", "items.import_undone", "import_mapping.saved", "import_mapping.deleted"]
 */
export function actionsOfKind(kind: AuditKind): AuditAction[] {
  return (Object.keys(KIND_OF) as AuditAction[]).filter((a) => KIND_OF[a] === kind);
}

/**
 * The kind of change of a stored action, in words ("Other" for one no longer in the set).
 * @example auditKindWords("item.inspected") // "Checks, inspections and tag-outs"
 */
export function auditKindWords(action: string): string {
  return Object.hasOwn(KIND_OF, action) ? AUDIT_KINDS[KIND_OF[action as AuditAction]] : "Other";
}

const ENTITY_WORDS: Record<string, string> = {
  item: "Item",
  kit: "Kit",
  machine: "Machine",
  machine_class: "Machine class",
  trailer: "Trailer",
  anchor_point: "Anchor point",
  user: "Person",
  invite: "Invite",
  api_token: "API token",
  import_batch: "Import",
  import_mapping: "Column mapping",
  saved_check: "Saved load check",
  mail_message: "E-mail",
  organisation: "Company",
  yard: "Yard",
};

/**
 * What a change concerned, in words: the thing and its name where the log knows it (an item's
 * tag code, a kit's job, a person's name), and the reason or note given with the change.
 * @example auditSubject({ entity: "item", label: "3X4K-9P2M", after: { reason: "Bent hook" } }) // "Item 3X4K-9P2M: “Bent hook”"
 */
export function auditSubject(row: { entity: string; label: string | null; after: unknown }): string {
  const thing = ENTITY_WORDS[row.entity] ?? row.entity.replaceAll("_", " ");
  const named = row.label ? `${thing} ${row.label}` : thing;
  const after = (row.after ?? {}) as Record<string, unknown>;
  const said = typeof after.reason === "string" ? after.reason : typeof after.note === "string" ? after.note : null;
  return said ? `${named}: “${said}”` : named;
}
