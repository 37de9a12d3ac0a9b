"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { buttonClass } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { apiJson } from "@/lib/http/client";

/** An owner adds a machine class of the organisation's own (a trencher, a tracked carrier…). */
export function MachineClassForm() {
  const router = useRouter();
  const [name, setName] = useState("");
  const [note, setNote] = useState<{ ok: boolean; text: string } | null>(null);

  async function submit(event: React.FormEvent) {
    event.preventDefault();
    try {
      const added = await apiJson<{ name: string; created: boolean }>("/api/v1/machine-classes", { method: "POST", body: JSON.stringify({ name }) });
      setNote({ ok: true, text: added.created ? `Added the class ${added.name}.` : `${added.name} is already a class.` });
      setName("");
      router.refresh();
    } catch (error) {
      setNote({ ok: false, text: error instanceof Error ? error.message : "Not saved." });
    }
  }

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-2">
      <Field label="New machine class" name="className" value={name} onChange={(e) => setName(e.target.value)} maxLength={40} error={note && !note.ok ? note.text : undefined} />
      <button type="submit" className={buttonClass("secondary")}>
        Add the class
      </button>
      <p role="status" aria-live="polite" className="text-lg font-bold text-ok">
        {note?.ok ? note.text : ""}
      </p>
    </form>
  );
}
