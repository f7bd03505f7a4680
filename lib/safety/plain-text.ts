// Bulletin bodies are Markdown. E-mails carry them as plain paragraphs (never HTML taken from
// the text), so the formatting marks are taken off and links keep their address in words.

function stripInline(text: string): string {
  return text
    .replace(/!\[([^\]]*)\]\(([^)\s]+)[^)]*\)/g, "$1")
    .replace(/\[([^\]]+)\]\(([^)\s]+)[^)]*\)/g, "$1 ($2)")
    .replace(/`([^`]+)`/g, "$1")
    .replace(/(\*\*|__)(.+?)\1/g, "$2")
    .replace(/(\*|_)(\S(?:.*?\S)?)\1/g, "$2")
    .replace(/~~(.+?)~~/g, "$1");
}

function stripLine(line: string): string {
  return stripInline(
    line
      .replace(/^\s{0,3}#{1,6}\s+/, "")
      .replace(/^\s{0,3}>\s?/, "")
      .replace(/^\s*([-*+])\s+/, "• ")
      .replace(/^\s*(\d+)[.)]\s+/, "$1. "),
  ).trimEnd();
}

/** Paragraphs of plain text: blank lines separate paragraphs; list items stay one per line. */
export function markdownToParagraphs(markdown: string): string[] {
  const blocks = markdown.replace(/\r\n?/g, "\n").split(/\n\s*\n/);
  const out: string[] = [];
  for (const block of blocks) {
    const lines = block.split("\n").filter((l) => !/^\s*(```|~~~|-{3,}|\*{3,}|_{3,})\s*$/.test(l)).map(stripLine).filter((l) => l.trim() !== "");
    if (lines.length === 0) continue;
    const isList = lines.every((l) => l.startsWith("• ") || /^\d+\. /.test(l));
    out.push(isList ? lines.join("\n") : lines.join(" "));
  }
  return out;
}
