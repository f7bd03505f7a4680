import { ReconcileParseError } from "./errors";

/**
 * An OFX element: an aggregate has children, a leaf ("element" in the spec) has a value.
 * `line` is where its start tag sits in the file, for error messages.
 */
export type OfxNode = { name: string; value?: string; children: OfxNode[]; line: number };

export type OfxDocument = { root: OfxNode; version?: string };

// Comments, CDATA, processing instructions / declarations, tags, and text between tags.
const TOKEN = /<!--[\s\S]*?-->|<!\[CDATA\[([\s\S]*?)\]\]>|<[?!][\s\S]*?>|<(\/?)([A-Za-z][\w.]*)[^>]*?(\/?)>|([^<]+)|</g;

const ENTITIES: Record<string, string> = { amp: "&", lt: "<", gt: ">", quot: '"', apos: "'", nbsp: "\u00a0" };

function decodeEntities(text: string): string {
  return text.replace(/&(#x[0-9a-f]+|#\d+|[a-z]+);/gi, (whole, name: string) => {
    if (name[0] === "#") {
      const code = name[1] === "x" || name[1] === "X" ? parseInt(name.slice(2), 16) : parseInt(name.slice(1), 10);
      return Number.isFinite(code) && code <= 0x10ffff ? String.fromCodePoint(code) : whole;
    }
    return ENTITIES[name.toLowerCase()] ?? whole;
  });
}

/** VERSION from an OFX 1.x SGML header ("VERSION:102") or an OFX 2.x "<?OFX … VERSION="211"?>". */
function headerVersion(header: string): string | undefined {
  const pi = /<\?OFX\b[^>]*?\bVERSION\s*=\s*"(\d+)"/i.exec(header);
  return pi?.[1] ?? /^\s*VERSION\s*:\s*(\d+)/im.exec(header)?.[1];
}

/**
 * Reads OFX into a tree. One reader serves both forms of the spec: OFX 1.x is SGML in which
 * elements carrying data are not closed (`<TRNAMT>-12.50` followed directly by the next tag),
 * OFX 2.x is XML in which they are. A start tag followed by text is therefore a leaf whose
 * value ends at the next tag, and its end tag, when present, is simply consumed. End tags of
 * aggregates close any elements still open inside them.
 */
export function parseOfxTree(text: string): OfxDocument {
  const start = text.search(/<OFX[\s>]/i);
  if (start < 0) throw new ReconcileParseError("no <OFX> element: this is not an OFX file", { row: 1 });
  const version = headerVersion(text.slice(0, start));
  let line = 1 + (text.slice(0, start).match(/\n/g)?.length ?? 0);
  let root: OfxNode | undefined;
  const stack: OfxNode[] = [];
  let justClosedLeaf: OfxNode | undefined;
  const body = text.slice(start);
  const token = new RegExp(TOKEN.source, "g");

  let pending = "";
  const flushText = () => {
    const top = stack[stack.length - 1];
    const value = pending.trim();
    pending = "";
    if (value === "" || !top || top.children.length > 0 || top.value !== undefined) return;
    top.value = value;
    stack.pop();
    justClosedLeaf = top;
  };

  for (let m = token.exec(body); m; m = token.exec(body)) {
    const tokenLine = line;
    line += m[0].match(/\n/g)?.length ?? 0;
    const [whole, cdata, slash, rawName, selfClose, rawText] = m;
    if (rawName === undefined) {
      if (cdata !== undefined) pending += cdata;
      else if (rawText !== undefined) pending += decodeEntities(rawText);
      else if (whole === "<") pending += whole; // a stray "<" the sender failed to escape
      continue; // comments and processing instructions carry no data
    }
    flushText();
    const name = rawName.toUpperCase();
    if (slash) {
      const consumesLeaf = justClosedLeaf?.name === name;
      justClosedLeaf = undefined;
      if (consumesLeaf) continue;
      const at = stack.map((n) => n.name).lastIndexOf(name);
      if (at < 0) continue; // a stray end tag closes nothing
      const closing = stack[at];
      if (closing && at === stack.length - 1 && closing.children.length === 0 && closing.value === undefined) {
        closing.value = ""; // <MEMO></MEMO>
      }
      stack.length = at;
      continue;
    }
    justClosedLeaf = undefined;
    const node: OfxNode = { name, children: [], line: tokenLine };
    const top = stack[stack.length - 1];
    if (top) top.children.push(node);
    else if (!root) root = node;
    else break; // anything after the OFX root is not ours to read
    if (selfClose) node.value = "";
    else stack.push(node);
  }
  flushText();
  if (!root) throw new ReconcileParseError("the <OFX> element is empty", { row: line });
  return version === undefined ? { root } : { root, version };
}

/** Every descendant with one of `names`, in document order (not descending into matches). */
export function findAll(node: OfxNode, ...names: string[]): OfxNode[] {
  const found: OfxNode[] = [];
  const walk = (n: OfxNode) => {
    for (const child of n.children) {
      if (names.includes(child.name)) found.push(child);
      else walk(child);
    }
  };
  walk(node);
  return found;
}

/** The value of a direct child, or of a path of children ("LEDGERBAL", "BALAMT"). */
export function valueAt(node: OfxNode | undefined, ...path: string[]): string | undefined {
  let current = node;
  for (const name of path) current = current?.children.find((c) => c.name === name);
  return current?.value;
}

export function childOf(node: OfxNode | undefined, name: string): OfxNode | undefined {
  return node?.children.find((c) => c.name === name);
}
