"use client";
import { useMutation, useQuery } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
import type { BatchJson, ImportBody } from "@/lib/import/answers";
import type { ColumnMapping } from "@/lib/import/fields";
import { MAX_IMPORT_BYTES } from "@/lib/import/file-check";
import { ApiError, apiJson } from "@/lib/http/client";
import { bytes } from "./words";

// The state of an import on the page: the file, the server's check of it, the owner's
// column choices, the commit and its progress. The steps only render what this holds.

export type Step = "upload" | "mapping" | "preview";

export interface SavedMapping {
  id: string;
  name: string;
  mapping: Record<string, string | null>;
}

/** A random v4 UUID, also where the page is not served over https (crypto.randomUUID needs that). */
function uuid(): string {
  if (typeof crypto.randomUUID === "function") return crypto.randomUUID();
  const b = crypto.getRandomValues(new Uint8Array(16));
  b[6] = (b[6] & 0x0f) | 0x40;
  b[8] = (b[8] & 0x3f) | 0x80;
  const h = [...b].map((x) => x.toString(16).padStart(2, "0")).join("");
  return `${h.slice(0, 8)}-${h.slice(8, 12)}-${h.slice(12, 16)}-${h.slice(16, 20)}-${h.slice(20)}`;
}

async function postImport(file: File, options: { mapping?: ColumnMapping; dryRun: boolean; validOnly?: boolean; batchId?: string }): Promise<ImportBody> {
  const form = new FormData();
  if (options.mapping) form.append("mapping", JSON.stringify(options.mapping));
  form.append("dryRun", String(options.dryRun));
  if (options.validOnly) form.append("validOnly", "true");
  if (options.batchId) form.append("batchId", options.batchId);
  form.append("file", file); // last, so the small fields are read before the file streams in
  return apiJson<ImportBody>("/api/v1/imports", { method: "POST", body: form });
}

/** Upload, check, map, commit: the wizard's state and what each step may do. */
export function useImport(savedMappings: SavedMapping[]) {
  const router = useRouter();
  const [step, setStep] = useState<Step>("upload");
  const [file, setFile] = useState<File | null>(null);
  const [check, setCheck] = useState<ImportBody | null>(null);
  const [mapping, setMapping] = useState<ColumnMapping>({});
  const [problem, setProblem] = useState<string | null>(null);
  const [mappings, setMappings] = useState(savedMappings);
  const [batchId, setBatchId] = useState<string | null>(null);

  const dryRun = useMutation({
    mutationFn: (args: { file: File; mapping?: ColumnMapping; next: Step }) => postImport(args.file, { mapping: args.mapping, dryRun: true }),
    onMutate: () => setProblem(null),
    onSuccess: (body, args) => {
      setCheck(body);
      setMapping(body.mapping);
      setStep(args.next);
    },
    onError: (e) => setProblem(e.message),
  });

  const commit = useMutation({
    mutationFn: (args: { validOnly: boolean; batchId: string }) => postImport(file!, { mapping, dryRun: false, validOnly: args.validOnly, batchId: args.batchId }),
    onMutate: (args) => {
      setProblem(null);
      setBatchId(args.batchId);
    },
    onSuccess: (body) => router.push(`/stock/import/${body.batchId}`),
    onError: (e) => {
      setBatchId(null);
      setProblem(e.message);
      // a 422 carries the report of the rows that stopped the import
      if (e instanceof ApiError && e.status === 422 && e.body) setCheck(e.body as ImportBody);
    },
  });

  const progress = useQuery({
    queryKey: ["import-progress", batchId],
    enabled: Boolean(batchId) && commit.isPending,
    refetchInterval: 1000,
    retry: false,
    queryFn: (): Promise<BatchJson | null> => apiJson<BatchJson>(`/api/v1/imports/${batchId}`).catch(() => null),
  });

  function choose(f: File | undefined) {
    if (!f) return;
    setCheck(null);
    if (f.size > MAX_IMPORT_BYTES) {
      setFile(null);
      setProblem(`The file is ${bytes(f.size)}; the limit is ${bytes(MAX_IMPORT_BYTES)}. Split it into smaller files.`);
      return;
    }
    setFile(f);
    dryRun.mutate({ file: f, next: "mapping" });
  }

  return {
    step,
    setStep,
    file,
    check,
    mapping,
    setMapping,
    problem,
    mappings,
    /** Keeps a mapping the owner just saved in the list, by name. */
    saved: (m: SavedMapping) => setMappings((all) => [...all.filter((x) => x.name !== m.name), m].sort((a, b) => a.name.localeCompare(b.name))),
    choose,
    /** Checks the file again with the columns as chosen, then shows the preview. */
    recheck: () => file && dryRun.mutate({ file, mapping, next: "preview" }),
    restart: () => {
      setStep("upload");
      setFile(null);
      setCheck(null);
    },
    commit: (validOnly: boolean) => commit.mutate({ validOnly, batchId: uuid() }),
    checking: dryRun.isPending,
    committing: commit.isPending,
    busy: dryRun.isPending || commit.isPending,
    progress: progress.data ?? null,
  };
}
