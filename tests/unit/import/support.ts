import { readRecords, type CsvFatal, type CsvRecord } from "@/lib/import/csv";
import type { Delimiter } from "@/lib/import/delimiter";
import type { ImportStore, PreparedCreate, PreparedUpdate } from "@/lib/import/pipeline";
import type { ExistingItem } from "@/lib/import/row-reader";
import { decodeText } from "@/lib/import/text";

/** Text in chunks of a given size, the way a stream hands it over. */
export async function* chunksOf(text: string | Uint8Array, size: number): AsyncGenerator<string | Uint8Array> {
  for (let i = 0; i < text.length; i += size) yield text.slice(i, i + size);
}

export async function records(text: string, delimiter: Delimiter = ",", chunk = 7): Promise<(CsvRecord | CsvFatal)[]> {
  const out: (CsvRecord | CsvFatal)[] = [];
  for await (const r of readRecords(decodeText(chunksOf(text, chunk), "utf-8"), delimiter)) out.push(r);
  return out;
}

/** Stock in a Map, standing in for the database. */
export class MemoryStore implements ImportStore {
  seen = new Map<string, number>();
  creates: PreparedCreate[] = [];
  updates: PreparedUpdate[] = [];
  rejectedRows: { fields: readonly string[]; messages: string[] }[] = [];
  constructor(public items: ExistingItem[] = []) {}
  async findExisting({ serials, tagCodes }: { serials: string[]; tagCodes: string[] }) {
    return this.items.filter((i) => (i.serial && serials.includes(i.serial)) || tagCodes.includes(i.tagCode));
  }
  async firstSeen(entries: { key: string; line: number }[]) {
    const earlier = new Map<string, number>();
    for (const e of entries) {
      if (this.seen.has(e.key)) earlier.set(e.key, this.seen.get(e.key)!);
      else this.seen.set(e.key, e.line);
    }
    return earlier;
  }
  async write(creates: PreparedCreate[], updates: PreparedUpdate[]) {
    this.creates.push(...creates);
    this.updates.push(...updates);
  }
  async rejected(fields: readonly string[], messages: string[]) {
    this.rejectedRows.push({ fields, messages });
  }
}

export const stockChain = (over: Partial<ExistingItem> = {}): ExistingItem => ({
  id: "11111111-1111-4111-8111-111111111111",
  tagCode: "K7XM-3HQA",
  kind: "chain",
  grade: 70,
  gradeMarked: true,
  size: "3/8",
  lengthMm: 6096,
  markedWllLb: null,
  serial: "CH-1",
  yardId: null,
  inServiceOn: null,
  costCents: 11900,
  details: { ends: "grab hook both ends" },
  wllLb: 6600,
  wllSource: "49 CFR 393.108",
  ...over,
});
