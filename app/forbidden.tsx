import Link from "next/link";

export default function Forbidden() {
  return (
    <main className="mx-auto flex max-w-md flex-col gap-4 px-4 py-12">
      <h1 className="text-3xl font-bold">Not for your role</h1>
      <p className="text-lg">Your role does not open this page. Ask your company&apos;s owner if you need it.</p>
      <Link href="/" className="text-lg font-bold underline">Back to today</Link>
    </main>
  );
}
