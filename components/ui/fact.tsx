/** One labelled figure of a record's details, inside a `<dl>`: the label small, the value bold. */
export function Fact({ label, children }: { label: string; children: React.ReactNode }) {
  return (
    <div className="flex flex-col">
      <dt className="text-base text-ink-soft">{label}</dt>
      <dd className="text-lg font-bold">{children}</dd>
    </div>
  );
}
