// Decoding of the payment provider's request encoding: application/x-www-form-urlencoded with
// bracket paths (metadata[member]=x, line_items[0][price_data][unit_amount]=2500), the way the
// SDK writes both POST bodies and GET query strings. Also the typed readers the routes use to
// turn those strings into checked values, failing with the provider's error codes.
import { ApiError } from "./errors";

export type FormValue = string | FormValue[] | FormObject;
export interface FormObject {
  [key: string]: FormValue;
}

const FORBIDDEN_KEYS = new Set(["__proto__", "prototype", "constructor"]);

function splitKey(key: string): string[] | null {
  const open = key.indexOf("[");
  if (open === -1) return [key];
  const head = key.slice(0, open);
  const rest = key.slice(open);
  const parts = [head];
  const re = /\[([^\]]*)\]/gy;
  let consumed = 0;
  for (let m = re.exec(rest); m; m = re.exec(rest)) {
    parts.push(m[1] ?? "");
    consumed = re.lastIndex;
  }
  return consumed === rest.length && head ? parts : null;
}

function isIndex(s: string): boolean {
  return /^(0|[1-9]\d{0,5})$/.test(s);
}

// Objects whose keys are all indices become arrays, so line_items[0]… reads as a list.
function finalize(value: FormValue): FormValue {
  if (typeof value === "string" || Array.isArray(value)) return value;
  const keys = Object.keys(value);
  for (const k of keys) value[k] = finalize(value[k] as FormValue);
  if (keys.length > 0 && keys.every(isIndex)) {
    return keys.sort((a, b) => Number(a) - Number(b)).map((k) => value[k] as FormValue);
  }
  return value;
}

export function parseForm(encoded: string): FormObject {
  const root: FormObject = {};
  const appendCounters = new Map<FormObject, number>();
  for (const [rawKey, value] of new URLSearchParams(encoded)) {
    const parts = splitKey(rawKey);
    if (!parts || parts.some((p) => FORBIDDEN_KEYS.has(p))) {
      throw new ApiError(400, "invalid_request_error", `Invalid parameter name: ${rawKey}`, { param: rawKey });
    }
    let node: FormObject = root;
    for (let i = 0; i < parts.length; i++) {
      let part = parts[i] as string;
      if (part === "") {
        // "a[]=x" appends; numbered so that finalize() turns the object into an array.
        const n = appendCounters.get(node) ?? 0;
        appendCounters.set(node, n + 1);
        part = String(n);
      }
      if (i === parts.length - 1) {
        node[part] = value;
        break;
      }
      const next = node[part];
      if (next === undefined || typeof next === "string" || Array.isArray(next)) {
        const child: FormObject = {};
        node[part] = child;
        node = child;
      } else {
        node = next;
      }
    }
  }
  return finalize(root) as FormObject;
}

// ---- typed readers -------------------------------------------------------------------------

function missingParam(param: string): ApiError {
  return new ApiError(400, "invalid_request_error", `Missing required param: ${param}.`, {
    code: "parameter_missing",
    param,
  });
}

function invalidParam(param: string, message: string, code = "parameter_invalid_string"): ApiError {
  return new ApiError(400, "invalid_request_error", message, { code, param });
}

export function readString(params: FormObject, key: string, param = key): string | null {
  const v = params[key];
  if (v === undefined || v === "") return null;
  if (typeof v !== "string") throw invalidParam(param, `Invalid string: ${param} must be a string.`);
  return v;
}

export function requireString(params: FormObject, key: string, param = key): string {
  const v = readString(params, key, param);
  if (v === null) throw missingParam(param);
  return v;
}

export function readInteger(params: FormObject, key: string, param = key): number | null {
  const v = readString(params, key, param);
  if (v === null) return null;
  if (!/^-?\d{1,15}$/.test(v)) throw invalidParam(param, `Invalid integer: ${v}`, "parameter_invalid_integer");
  return Number(v);
}

export function requireInteger(params: FormObject, key: string, param = key): number {
  const v = readInteger(params, key, param);
  if (v === null) throw missingParam(param);
  return v;
}

export function readObject(params: FormObject, key: string, param = key): FormObject | null {
  const v = params[key];
  if (v === undefined || v === "") return null;
  if (typeof v === "string" || Array.isArray(v)) throw invalidParam(param, `Invalid object: ${param} must be a hash.`);
  return v;
}

export function readArray(params: FormObject, key: string, param = key): FormValue[] | null {
  const v = params[key];
  if (v === undefined || v === "") return null;
  if (!Array.isArray(v)) throw invalidParam(param, `Invalid array: ${param} must be a list.`);
  return v;
}

export function readStringList(params: FormObject, key: string): string[] {
  const list = readArray(params, key) ?? [];
  return list.map((v, i) => {
    if (typeof v !== "string") throw invalidParam(`${key}[${i}]`, `Invalid string: ${key}[${i}]`);
    return v;
  });
}

/** metadata[k]=v pairs; an empty value removes that key, as the provider's API does. */
export function readMetadata(params: FormObject, base: Record<string, string> = {}): Record<string, string> {
  const raw = params.metadata;
  if (raw === undefined) return { ...base };
  if (raw === "") return {};
  if (typeof raw === "string") throw invalidParam("metadata", "Invalid object: metadata must be a hash.");
  const out: Record<string, string> = { ...base };
  // Keys that are all digits were folded into an array by parseForm; read them back as keys.
  const entries = Array.isArray(raw) ? raw.map((v, i) => [String(i), v] as const) : Object.entries(raw);
  for (const [k, v] of entries) {
    if (typeof v !== "string") throw invalidParam(`metadata[${k}]`, `Invalid string: metadata[${k}]`);
    if (k.length > 40) throw invalidParam(`metadata[${k}]`, "Metadata keys can be at most 40 characters.");
    if (v.length > 500) throw invalidParam(`metadata[${k}]`, "Metadata values can be at most 500 characters.");
    if (v === "") delete out[k];
    else out[k] = v;
  }
  if (Object.keys(out).length > 50) throw invalidParam("metadata", "Metadata can have at most 50 keys.");
  return out;
}

export function readEnum<T extends string>(params: FormObject, key: string, allowed: readonly T[]): T | null {
  const v = readString(params, key);
  if (v === null) return null;
  if (!(allowed as readonly string[]).includes(v)) {
    throw invalidParam(key, `Invalid ${key}: must be one of ${allowed.join(", ")}`, "parameter_invalid_string");
  }
  return v as T;
}
