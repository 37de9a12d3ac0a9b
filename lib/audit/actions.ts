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
} as const satisfies Record<string, string>;

export type AuditAction = keyof typeof AUDIT_WORDS;

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
