import Link from "next/link";
import type { FieldIssue } from "@/lib/field-issues";
import { describePath, type CheckDraft } from "@/lib/forms/securement-draft";
import { SeverityIcon } from "../severity";
import type { ApiError } from "../api";

/** Why a check could not run: each field at fault named in words, or the session or the connection. */
export function CheckProblem({ error, draft, issues = error.issues }: { error: ApiError; draft: CheckDraft; issues?: readonly FieldIssue[] }) {
  return (
    <div role="alert" className="flex flex-col gap-2 rounded-xl border-4 border-stop bg-stop-bg p-4 text-ink">
      <p className="flex items-center gap-2 text-xl font-bold">
        <span className="text-stop">
          <SeverityIcon severity="fail" className="h-7 w-7" />
        </span>
        {error.status === 400 ? "Not checked: some entries need fixing" : "Not checked"}
      </p>
      {issues.length > 0 ? (
        <ul className="flex list-disc flex-col gap-1 pl-5 text-lg">
          {issues.map((i, n) => (
            <li key={`${i.path}-${n}`}>
              <strong>{describePath(i.path, draft)}:</strong> {i.message}
            </li>
          ))}
        </ul>
      ) : (
        <p className="text-lg">{error.message}</p>
      )}
      {error.status === 401 && (
        <Link href="/sign-in" className="text-lg font-bold underline">
          Sign in again
        </Link>
      )}
    </div>
  );
}
