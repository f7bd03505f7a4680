// Shared by the authorization tests: everything a server component hands on (its element tree
// with every prop, which is what ends up serialized into the page source) as one string.
import { isValidElement } from "react";

/** Every string and number in a rendered element tree's props, children included. */
export function treeText(node: unknown): string {
  const out: string[] = [];
  const seen = new WeakSet<object>();
  const visit = (value: unknown, depth: number): void => {
    if (depth > 60 || value === null || value === undefined || typeof value === "boolean") return;
    if (typeof value === "string" || typeof value === "number" || typeof value === "bigint") {
      out.push(String(value));
      return;
    }
    if (value instanceof Date) {
      out.push(value.toISOString());
      return;
    }
    if (typeof value !== "object") return;
    if (seen.has(value)) return;
    seen.add(value);
    if (isValidElement(value)) {
      visit((value as { props: unknown }).props, depth + 1);
      return;
    }
    if (Array.isArray(value)) {
      for (const v of value) visit(v, depth + 1);
      return;
    }
    for (const v of Object.values(value as Record<string, unknown>)) visit(v, depth + 1);
  };
  visit(node, 0);
  return out.join("\n");
}

export const params = <P extends Record<string, string>>(p: P) => ({ params: Promise.resolve(p) });
