// How stored objects leave the fake: list pages (newest first, cursor by id) and `expand[]`,
// which swaps an id for the object it names (payment_intent.latest_charge.balance_transaction,
// data.source, line_items).
import { invalidRequest } from "./errors";
import { readInteger, readString, readStringList, type FormObject } from "./form";
import type { PaymentsStore } from "./store";

export interface ListPage<T> {
  object: "list";
  data: T[];
  has_more: boolean;
  url: string;
}

export function paginate<T extends { id: string }>(items: T[], params: FormObject, url: string): ListPage<T> {
  const limit = readInteger(params, "limit") ?? 10;
  if (limit < 1 || limit > 100) throw invalidRequest("Invalid limit: must be between 1 and 100.", "limit");
  const after = readString(params, "starting_after");
  const before = readString(params, "ending_before");
  let window = items;
  if (after) {
    const i = items.findIndex((x) => x.id === after);
    if (i === -1) throw invalidRequest(`No such object: '${after}'`, "starting_after", "resource_missing");
    window = items.slice(i + 1);
    return { object: "list", data: window.slice(0, limit), has_more: window.length > limit, url };
  }
  if (before) {
    const i = items.findIndex((x) => x.id === before);
    if (i === -1) throw invalidRequest(`No such object: '${before}'`, "ending_before", "resource_missing");
    window = items.slice(0, i);
    return { object: "list", data: window.slice(-limit), has_more: window.length > limit, url };
  }
  return { object: "list", data: window.slice(0, limit), has_more: window.length > limit, url };
}

type Json = Record<string, unknown>;

function cannotExpand(path: string): never {
  throw invalidRequest(`This property cannot be expanded (${path}).`, "expand");
}

function expandInto(store: PaymentsStore, target: Json, segments: string[], path: string): void {
  const [head, ...rest] = segments;
  if (head === undefined) return;
  if (head === "data" && Array.isArray(target.data) && target.object === "list") {
    for (const item of target.data as Json[]) expandInto(store, item, rest, path);
    return;
  }
  if (head === "line_items" && target.object === "checkout.session") {
    const items = structuredClone(store.lineItems.get(String(target.id)) ?? []);
    target.line_items = {
      object: "list",
      data: items,
      has_more: false,
      url: `/v1/checkout/sessions/${String(target.id)}/line_items`,
    };
    expandInto(store, target.line_items as Json, rest, path);
    return;
  }
  const value = target[head];
  if (value === null) return;
  if (typeof value === "string") {
    const found = store.get(value);
    if (!found) cannotExpand(path);
    target[head] = structuredClone(found);
  } else if (typeof value !== "object" || value === undefined) {
    cannotExpand(path);
  }
  if (rest.length) expandInto(store, target[head] as Json, rest, path);
}

/** A deep copy of `body` with every `expand[]` path of the request applied. */
export function applyExpand<T>(store: PaymentsStore, body: T, params: FormObject): T {
  const paths = readStringList(params, "expand");
  if (paths.length === 0 || typeof body !== "object" || body === null) return body;
  const copy = structuredClone(body) as Json;
  for (const path of paths) {
    const segments = path.split(".");
    if (segments.length > 4) throw invalidRequest(`You cannot expand more than 4 levels of a property (${path}).`, "expand");
    expandInto(store, copy, segments, path);
  }
  return copy as T;
}
