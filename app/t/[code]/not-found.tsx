import Link from "next/link";

export default function UnknownTag() {
  return (
    <>
      <h1 className="text-3xl font-bold">No item has this tag code</h1>
      <p className="text-lg">
        Check the code printed under the QR code and try again. If the tag is damaged or unreadable, do not use
        the item until someone who looks after the gear has checked it.
      </p>
      <Link href="/scan" className="text-lg font-bold underline">Scan another tag</Link>
    </>
  );
}
