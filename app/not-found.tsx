import Link from "next/link";

export default function NotFound() {
  return (
    <main className="mx-auto flex max-w-md flex-col gap-4 px-4 py-12">
      <h1 className="text-3xl font-bold">Nothing here</h1>
      <p className="text-lg">This page does not exist, or it belongs to another company.</p>
      <Link href="/" className="text-lg font-bold underline">Back to today</Link>
    </main>
  );
}
