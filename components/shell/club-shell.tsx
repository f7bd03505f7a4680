import Link from "next/link";
import { Suspense, type ReactNode } from "react";
import type { ClubLink } from "@/db/queries/clubs";
import { ROLE_LABELS, type Role } from "@/permissions";
import { ClubSwitcher } from "./club-switcher";
import type { NavItem } from "./nav-items";
import { NavLinks } from "./nav-links";
import { PhoneMenu } from "./phone-menu";
import { SignOutButton } from "./sign-out-button";

type Props = {
  club: { slug: string; name: string };
  clubs: ClubLink[];
  nav: NavItem[];
  user: { name: string | null; email: string };
  roles: Role[];
  isOperator: boolean;
  children: ReactNode;
};

function Brand() {
  return (
    <span className="flex items-center gap-2 font-bold tracking-wide text-white">
      <svg aria-hidden="true" width="22" height="22" viewBox="0 0 24 24"><path d="M2 20 L12 4 L22 20 Z" fill="none" stroke="currentColor" strokeWidth="2.2" /><path d="M7 20 v-5 h10 v5" fill="none" stroke="currentColor" strokeWidth="2" /></svg>
      Hangarline
    </span>
  );
}

export function ClubShell({ club, clubs, nav, user, roles, isOperator, children }: Props) {
  const home = `/clubs/${club.slug}`;
  const sidebar = (
    <div className="flex flex-col gap-4">
      <div>
        <p className="text-xs uppercase tracking-widest text-sand-300">Club</p>
        <p className="font-bold text-white">{club.name}</p>
        <div className="mt-2"><ClubSwitcher clubs={clubs} current={club.slug} /></div>
      </div>
      <nav aria-label="Club sections"><NavLinks items={nav} home={home} /></nav>
      {isOperator ? <Link href="/operator" className="px-3 text-sm text-sand-50">Operator console</Link> : null}
      <div className="border-t border-fin-500 pt-3 text-sm text-sand-200">
        <p className="truncate text-white">{user.name ?? user.email}</p>
        <p className="text-xs">{roles.map((r) => ROLE_LABELS[r]).join(" · ")}</p>
        <SignOutButton />
      </div>
    </div>
  );
  return (
    <div className="min-h-dvh lg:grid lg:grid-cols-[16rem_1fr]">
      <header className="bg-fin-700 lg:hidden">
        <Suspense fallback={<div className="px-4 py-3"><Brand /></div>}>
          <PhoneMenu brand={<Brand />}>{sidebar}</PhoneMenu>
        </Suspense>
        <p className="truncate px-4 pb-2 text-sm text-sand-200">{club.name}</p>
      </header>
      <aside className="hidden bg-fin-700 p-4 lg:block">
        <div className="sticky top-4 flex flex-col gap-6">
          <Link href={home} className="no-underline"><Brand /></Link>
          {sidebar}
        </div>
      </aside>
      <main id="main" className="min-w-0 px-4 py-5 sm:px-6 lg:px-8 lg:py-8">{children}</main>
    </div>
  );
}
