import type { Finding } from "@/lib/securement";
import { SEVERITY_BORDER, SEVERITY_TEXT, SeverityLabel } from "../severity";

/** Every finding, most serious first, with its severity in words and its source. */
export function FindingList({ findings }: { findings: readonly Finding[] }) {
  return (
    <section aria-labelledby="findings-heading" className="flex flex-col gap-2">
      <h3 id="findings-heading" className="text-xl font-bold">
        Findings ({findings.length})
      </h3>
      {findings.length === 0 ? (
        <p className="text-lg">None: nothing beyond the figures above.</p>
      ) : (
        <ul className="flex flex-col gap-2">
          {findings.map((f, i) => (
            <li key={`${f.code}-${i}`} className={`flex flex-col gap-1 rounded-lg border-2 border-l-8 bg-white p-3 ${SEVERITY_BORDER[f.severity]}`} data-code={f.code}>
              <span className={SEVERITY_TEXT[f.severity]}>
                <SeverityLabel severity={f.severity} />
              </span>
              <p className="text-lg text-ink">{f.message}</p>
              <p className="text-sm text-ink-soft">Source: {f.source}</p>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
