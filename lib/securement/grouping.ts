/**
 * Groups findings that say the same thing about several tiedowns (four binders without a
 * WLL, four unmarked chains) into one finding that names the tiedowns, for screens and
 * printouts. Pure: it reads the findings of a check (`SecurementCheckResult.findings`), or
 * any list of the same shape, and never changes them.
 *
 * Two findings are the same when their code, severity, source and `detail` (the message
 * without the words that say where) are equal. A finding without a tiedown or a detail is
 * a group of its own, with its message unchanged.
 *
 * @module
 */
import type { Finding, FindingCode, Severity } from "./findings";

/**
 * One or more findings that say the same thing. `message` names every tiedown it applies
 * to; `tiedowns` are their 0-based indexes, `paths` the request paths of each member, and
 * `findings` the members themselves, in their order.
 *
 * @example
 * const g: FindingGroup = {
 *   code: "MISSING_WLL", severity: "fail", source: "49 CFR 393.108(a)",
 *   message: "Tiedowns 1 (front left), 2 (front right), 3 (rear left) and 4 (rear right), component 2: A binder must carry a marked WLL ...",
 *   tiedowns: [0, 1, 2, 3], paths: ["tiedowns.0.components.1.wll", "..."], findings: [],
 * };
 */
export interface FindingGroup {
  readonly code: FindingCode;
  readonly severity: Severity;
  readonly source: string;
  readonly message: string;
  readonly tiedowns: readonly number[];
  readonly paths: readonly string[];
  readonly findings: readonly Finding[];
}

function key(f: Finding): string | undefined {
  if (f.tiedown === undefined || f.detail === undefined) return undefined;
  return JSON.stringify([f.code, f.severity, f.source, f.detail]);
}

function tiedownWords(index: number, label: string | undefined): string {
  const name = label?.trim();
  return name && name.toLowerCase() !== `tiedown ${index + 1}` ? `${index + 1} (${name})` : String(index + 1);
}

function list(words: readonly string[]): string {
  return words.length <= 1 ? (words[0] ?? "") : `${words.slice(0, -1).join(", ")} and ${words.at(-1)}`;
}

/** ", component 2" when every member points at the same component index. */
function sharedComponent(members: readonly Finding[]): string {
  const i = members[0]!.component;
  return i !== undefined && members.every((f) => f.component === i) ? `, component ${i + 1}` : "";
}

/**
 * Groups findings that repeat for several tiedowns into one. Groups keep the order of their
 * first member (so a list sorted fail → warn → info stays sorted). `tiedownLabels[i]` names
 * tiedown `i` in the grouped message (e.g. the check result's `tiedowns[i].label`); without
 * it tiedowns are named by number.
 *
 * @example
 * groupFindings(result.findings, result.tiedowns.map((t) => t.label));
 * // four MISSING_WLL findings, one per corner binder, become one group:
 * // { code: "MISSING_WLL", tiedowns: [0, 1, 2, 3],
 * //   message: "Tiedowns 1 (front left), 2 (front right), 3 (rear left) and 4 (rear right), component 2: A binder must carry ..." }
 */
export function groupFindings(findings: readonly Finding[], tiedownLabels: readonly (string | undefined)[] = []): FindingGroup[] {
  const groups: Finding[][] = [];
  const byKey = new Map<string, Finding[]>();
  for (const f of findings) {
    const k = key(f);
    const existing = k === undefined ? undefined : byKey.get(k);
    if (existing) {
      existing.push(f);
      continue;
    }
    const group = [f];
    groups.push(group);
    if (k !== undefined) byKey.set(k, group);
  }
  return groups.map((members) => {
    const first = members[0]!;
    const tiedowns = [...new Set(members.flatMap((f) => (f.tiedown === undefined ? [] : [f.tiedown])))];
    const message =
      members.length === 1 || tiedowns.length < 2
        ? first.message
        : `Tiedowns ${list(tiedowns.map((i) => tiedownWords(i, tiedownLabels[i])))}${sharedComponent(members)}: ${first.detail}`;
    return {
      code: first.code,
      severity: first.severity,
      source: first.source,
      message,
      tiedowns,
      paths: members.flatMap((f) => (f.path === undefined ? [] : [f.path])),
      findings: members,
    };
  });
}
