import type { Finding } from "@/lib/securement";
import { groupFindings } from "@/lib/securement";
import { SEVERITY_BORDER, SEVERITY_TEXT, SeverityLabel } from "../severity";

/**
 * Every finding, most serious first, with its severity in words and its source. The same
 * finding on several tiedowns (four binders without a WLL) is one entry naming them.
 */
export function FindingList({ findings, tiedownLabels = [] }: { findings: readonly Finding[]; tiedownLabels?: readonly string[] }) {
  const groups = groupFindings(findings, tiedownLabels);
  return (
    <section aria-labelledby="findings-heading" className="flex flex-col gap-2">
      <h3 id="findings-heading" className="text-xl font-bold">
        Findings ({groups.length})
      </h3>
      {groups.length === 0 ? (
        <p className="text-lg">None: nothing beyond the figures above.</p>
      ) : (
        <ul className="flex flex-col gap-2">
          {groups.map((g, i) => (
            <li
              key={`${g.code}-${i}`}
              className={`flex flex-col gap-1 rounded-lg border-2 border-l-8 bg-white p-3 ${SEVERITY_BORDER[g.severity]}`}
              data-code={g.code}
              data-tiedowns={g.tiedowns.join(",")}
            >
              <span className={`flex flex-wrap items-center gap-2 ${SEVERITY_TEXT[g.severity]}`}>
                <SeverityLabel severity={g.severity} />
                {g.tiedowns.length > 1 && <span className="rounded border-2 border-current px-1.5 text-sm font-bold">{g.tiedowns.length} tiedowns</span>}
              </span>
              <p className="text-lg text-ink">{g.message}</p>
              <p className="text-sm text-ink-soft">Source: {g.source}</p>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
