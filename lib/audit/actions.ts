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
