"use client";
import { MappingStep } from "./mapping-step";
import { PreviewStep } from "./preview-step";
import { UploadStep } from "./upload-step";
import { useImport, type SavedMapping, type Step } from "./use-import";

const STEP_NAMES: Record<Step, string> = { upload: "File", mapping: "Columns", preview: "Check and import" };

/** Upload, columns, check, import: the owner's way of bringing a supplier's list into stock. */
export function ImportWizard({ savedMappings }: { savedMappings: SavedMapping[] }) {
  const w = useImport(savedMappings);
  return (
    <div className="flex flex-col gap-5">
      <ol aria-label="Steps" className="flex flex-wrap gap-2 text-base">
        {(["upload", "mapping", "preview"] as Step[]).map((s, i) => (
          <li key={s} aria-current={w.step === s ? "step" : undefined} className={`rounded-full border-2 px-3 py-1 font-bold ${w.step === s ? "border-ink bg-signal" : "border-idle text-ink-soft"}`}>
            {i + 1}. {STEP_NAMES[s]}
          </li>
        ))}
      </ol>

      <div aria-live="polite" role="status">
        {w.problem && <p className="rounded-lg border-2 border-stop bg-stop-bg p-3 text-lg font-bold text-stop">{w.problem}</p>}
      </div>

      {w.step === "upload" && <UploadStep onFile={w.choose} busy={w.checking} />}

      {w.step === "mapping" && w.check && w.file && (
        <MappingStep
          check={w.check}
          file={w.file}
          mapping={w.mapping}
          setMapping={w.setMapping}
          mappings={w.mappings}
          onSaved={w.saved}
          busy={w.busy}
          onCheck={w.recheck}
          onRestart={w.restart}
        />
      )}

      {w.step === "preview" && w.check && w.file && (
        <PreviewStep
          check={w.check}
          busy={w.busy}
          committing={w.committing}
          progress={w.progress}
          onBack={() => w.setStep("mapping")}
          onCommit={w.commit}
        />
      )}
    </div>
  );
}
