"use client";
import Link from "next/link";
import { usePathname } from "next/navigation";
import type { NavItem } from "./nav-items";

export function NavLinks({ items, home }: { items: NavItem[]; home: string }) {
  const pathname = usePathname();
  return (
    <ul className="flex flex-col gap-0.5">
      {items.map((item) => {
        const active = item.href === home ? pathname === home : pathname.startsWith(item.href);
        return (
          <li key={item.href}>
            <Link
              href={item.href}
              aria-current={active ? "page" : undefined}
              className={`flex min-h-11 items-center rounded px-3 py-2 no-underline ${active ? "bg-white font-bold text-fin-700" : "text-sand-50 hover:bg-fin-500 hover:no-underline"}`}
            >
              {item.label}
            </Link>
          </li>
        );
      })}
    </ul>
  );
}
