import type { Metadata } from "next";
import Link from "next/link";
import { NavIcon } from "@/components/shell/nav-icon";
import { buttonClass } from "@/components/ui/button-class";
import { requirePage } from "@/lib/auth/session";
import { moreFor } from "@/lib/shell/nav";

export const metadata: Metadata = { title: "More" };

/** On phones, everything that does not fit the bottom bar (and nothing the bar already has). */
export default async function MorePage() {
  const principal = await requirePage();
  return (
    <div className="flex max-w-md flex-col gap-4">
      <h1 className="text-3xl font-bold">More</h1>
      <ul className="flex flex-col gap-2">
        {moreFor(principal).map((e) => (
          <li key={e.href}>
            <Link href={e.href} className={buttonClass("secondary", "w-full justify-start gap-3", "large")}>
              <NavIcon icon={e.icon} />
              {e.label}
            </Link>
          </li>
        ))}
      </ul>
    </div>
  );
}
