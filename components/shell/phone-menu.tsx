"use client";
import { usePathname, useSearchParams } from "next/navigation";
import { useEffect, useRef, type ReactNode } from "react";

/**
 * The phone's menu: a disclosure that closes itself once the page it led to is shown (and when a
 * link inside it is followed to the page already on screen), so a new page never starts below an
 * open menu.
 */
export function PhoneMenu({ brand, children }: { brand: ReactNode; children: ReactNode }) {
  const ref = useRef<HTMLDetailsElement>(null);
  const pathname = usePathname();
  const search = useSearchParams();
  const where = `${pathname}?${search.toString()}`;
  useEffect(() => {
    if (ref.current) ref.current.open = false;
  }, [where]);
  return (
    <details
      ref={ref}
      className="group"
      onClick={(event) => {
        // A followed link (or a submitted sign-out) inside the panel closes it at once.
        const target = event.target as HTMLElement;
        if (target.closest("a[href]") && ref.current) ref.current.open = false;
      }}
    >
      <summary className="flex min-h-11 cursor-pointer list-none items-center justify-between px-4 py-3">
        {brand}
        <span className="rounded border border-sand-300 px-3 py-2 text-sm text-white">
          <span className="group-open:hidden">Menu</span><span className="hidden group-open:inline">Close</span>
        </span>
      </summary>
      <div className="px-4 pb-4">{children}</div>
    </details>
  );
}
