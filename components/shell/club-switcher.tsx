"use client";
import { useRouter } from "next/navigation";
import type { ClubLink } from "@/db/queries/clubs";

export function ClubSwitcher({ clubs, current }: { clubs: Pick<ClubLink, "slug" | "name">[]; current: string }) {
  const router = useRouter();
  if (clubs.length < 2) return null;
  return (
    <label className="block text-sm">
      <span className="sr-only">Switch club</span>
      <select
        aria-label="Switch club"
        className="w-full max-w-full rounded border border-fin-500 bg-fin-700 px-2 py-1.5 text-white"
        value={current}
        onChange={(e) => router.push(`/clubs/${e.target.value}`)}
      >
        {clubs.map((c) => (
          <option key={c.slug} value={c.slug}>{c.name}</option>
        ))}
      </select>
    </label>
  );
}
