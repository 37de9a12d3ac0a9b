import type { Severity } from "@/lib/securement";

/** Severity in words, with a shape and a colour that only repeat the words. */
export const SEVERITY_WORDS: Record<Severity, string> = {
  fail: "Does not meet the rule",
  warn: "Warning",
  info: "Note",
};

export const SEVERITY_BORDER: Record<Severity, string> = {
  fail: "border-stop",
  warn: "border-caution",
  info: "border-idle",
};

export const SEVERITY_TEXT: Record<Severity, string> = {
  fail: "text-stop",
  warn: "text-caution",
  info: "text-idle",
};

/** A cross in a circle (fail), an exclamation in a triangle (warning), an i in a circle (note). */
export function SeverityIcon({ severity, className = "h-6 w-6" }: { severity: Severity; className?: string }) {
  return (
    <svg viewBox="0 0 24 24" className={`shrink-0 ${className}`} fill="none" stroke="currentColor" strokeWidth="2.5" strokeLinecap="round" strokeLinejoin="round" aria-hidden="true">
      {severity === "fail" && <><circle cx="12" cy="12" r="10" /><path d="M8 8l8 8M16 8l-8 8" /></>}
      {severity === "warn" && <><path d="M12 2.5L22 20.5H2z" /><path d="M12 9v5M12 17.5v.01" /></>}
      {severity === "info" && <><circle cx="12" cy="12" r="10" /><path d="M12 11v6M12 7.5v.01" /></>}
    </svg>
  );
}

export function SeverityLabel({ severity }: { severity: Severity }) {
  return (
    <span className="inline-flex items-center gap-1.5 text-base font-bold">
      <SeverityIcon severity={severity} />
      {SEVERITY_WORDS[severity]}
    </span>
  );
}
