// One form pattern (DEVELOPERS.md "Forms and their answers"): every form in components/ and app/ that
// writes goes through the shared hook (components/ui/use-form-action.ts) and FormShell, read from the
// source so that a new form is covered without anyone remembering. Only FormShell renders a writing
// <form>; a GET form (a calculator's query string) writes nothing and may be plain.
import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";

const ROOT = path.resolve(import.meta.dirname, "../../..");
const SHELL = path.join("components", "ui", "form-shell.tsx");
const HOOK = path.join("components", "ui", "use-form-action.ts");

function sourceFiles(dir: string): string[] {
  return fs.readdirSync(path.join(ROOT, dir), { withFileTypes: true }).flatMap((e) => {
    const rel = path.join(dir, e.name);
    if (e.isDirectory()) return sourceFiles(rel);
    return /\.(tsx|ts)$/.test(e.name) ? [rel] : [];
  });
}

/** The source without comments (a comment may mention `<form action>`). */
function code(source: string): string {
  return source.replace(/\/\*[\s\S]*?\*\//g, "").replace(/(^|[^:"'`])\/\/.*$/gm, "$1");
}

const files = [...sourceFiles("components"), ...sourceFiles("app")].map((file) => ({ file, source: code(fs.readFileSync(path.join(ROOT, file), "utf8")) }));

/**
 * Files that call a server action outside a form, each for a reason of its own:
 * - the ramp queue sends a write kept on the device through the same action, under the key the
 *   form made (components/ramp/queue-store.ts), once there is signal;
 * - sign-out forgets the pages kept for the ramp, then calls the action, all inside useFormAction.
 */
const OUTSIDE_A_FORM = new Set([path.join("components", "ramp", "queue-store.ts"), path.join("components", "shell", "sign-out-button.tsx")]);

/** Cuts every call `name(…)` out of a source, replaced by "hooked". */
function cutCalls(source: string, name: string): string {
  let out = source;
  for (let at = out.indexOf(`${name}(`); at !== -1; at = out.indexOf(`${name}(`)) {
    let depth = 0;
    let j = at + name.length;
    for (; j < out.length; j++) {
      if (out[j] === "(") depth++;
      else if (out[j] === ")" && --depth === 0) break;
    }
    out = out.slice(0, at) + "hooked" + out.slice(j + 1);
  }
  return out;
}

/**
 * The source with every `useFormAction(…)` call, every action handed to a shared form component,
 * and every ramp wrapper (`rampAction(kind, action, schema)`, whose result goes to useFormAction:
 * checked below) taken out.
 */
function withoutHookCalls(source: string): string {
  const out = source.replace(/<(ActionForm|ActionButton)\b[^>]*?\baction=\{\w+\}/g, (m) => m.replace(/\baction=\{\w+\}/, ""));
  return cutCalls(cutCalls(out, "useFormAction"), "rampAction").replace(/^import[^;]*;$/gm, "");
}

/** Every opening tag of an element in a source: `<name …>` (to the first `>` not inside braces). */
function openingTags(source: string, name: string): string[] {
  const out: string[] = [];
  const re = new RegExp(`<${name}\\b`, "g");
  let m: RegExpExecArray | null;
  while ((m = re.exec(source))) {
    let depth = 0;
    let j = m.index;
    for (; j < source.length; j++) {
      const c = source[j];
      if (c === "{") depth++;
      else if (c === "}") depth--;
      else if (c === ">" && depth === 0) break;
    }
    out.push(source.slice(m.index, j + 1));
  }
  return out;
}

describe("every form that writes uses the shared hook", () => {
  it("finds the forms (the scan itself works)", () => {
    expect(files.filter((f) => /<FormShell\b/.test(f.source)).length).toBeGreaterThan(25);
  });

  it.each(files.filter((f) => f.file !== SHELL).map((f) => [f.file, f] as const))("%s", (_name, { file, source }) => {
    // No writing <form> of its own: only FormShell renders one.
    for (const tag of openingTags(source, "form")) {
      expect(tag, `${file}: a form that writes is <FormShell form={useFormAction(action)}>, not ${tag.slice(0, 80)}`).toMatch(/method="get"/i);
    }
    // No form actions that React would reset, no second form state machine.
    expect(source, `${file}: use useFormAction (components/ui/use-form-action.ts), not useActionState`).not.toMatch(/\buseActionState\b/);
    expect(source, `${file}: use useFormAction, not useFormStatus`).not.toMatch(/\buseFormStatus\b/);
    expect(source, `${file}: a button posting straight to an action bypasses the hook`).not.toMatch(/\bformAction=\{/);
    expect(source, `${file}: a key that changes with every render remounts the form`).not.toMatch(/key=\{[^}]*Date\.now\(\)/);
    // Each FormShell gets its handle from useFormAction in the same file.
    for (const tag of openingTags(source, "FormShell")) {
      const handle = /\bform=\{(\w+)\}/.exec(tag)?.[1];
      expect(handle, `${file}: ${tag.slice(0, 80)} needs form={…}`).toBeTruthy();
      expect(source, `${file}: ${handle} must come from useFormAction(…)`).toMatch(new RegExp(`\\b${handle}\\s*=\\s*useFormAction\\(`));
    }
    // A ramp-wrapped action is used only through the hook.
    for (const m of source.matchAll(/\bconst\s+(\w+)\s*=\s*rampAction\(/g)) {
      expect(source, `${file}: ${m[1]} (a ramp-wrapped action) must go to useFormAction(${m[1]})`).toMatch(new RegExp(`useFormAction\\(${m[1]}\\b`));
    }
    // A client file that imports a server action calls it only through the hook.
    if (file !== HOOK && !OUTSIDE_A_FORM.has(file) && /^["']use client["']/.test(source)) {
      const imported = [...source.matchAll(/import\s*\{([^}]*)\}\s*from\s*"@\/lib\/actions\/(?!action-state)[^"]+"/g)].flatMap((m) => m[1]!.split(",").map((n) => n.trim().replace(/^type\s+/, "")).filter((n) => n && !/^[A-Z]/.test(n)));
      const rest = withoutHookCalls(source);
      for (const name of imported) {
        expect(rest, `${file}: ${name} is used other than through useFormAction(…) or <ActionForm/ActionButton action>`).not.toMatch(new RegExp(`\\b${name}\\b`));
      }
    }
  });
});
