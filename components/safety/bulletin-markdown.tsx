import Markdown, { defaultUrlTransform, type Components } from "react-markdown";

// Bulletin text is Markdown written by the safety officer and shown to every member. Raw HTML
// in it is dropped (skipHtml), and links may only be http(s), mailto or tel (anything else,
// such as javascript:, is removed), so the text can never run script in a reader's browser.
function safeUrl(url: string): string {
  const cleaned = defaultUrlTransform(url);
  return /^(https?:|mailto:|tel:|\/|#)/i.test(cleaned) ? cleaned : "";
}

const components: Components = {
  h1: ({ children }) => <h3 className="mb-2 mt-4 text-lg font-bold">{children}</h3>,
  h2: ({ children }) => <h3 className="mb-2 mt-4 text-lg font-bold">{children}</h3>,
  h3: ({ children }) => <h4 className="mb-2 mt-3 font-bold">{children}</h4>,
  h4: ({ children }) => <h4 className="mb-2 mt-3 font-bold">{children}</h4>,
  p: ({ children }) => <p className="mb-3 leading-relaxed">{children}</p>,
  ul: ({ children }) => <ul className="mb-3 list-disc pl-6">{children}</ul>,
  ol: ({ children }) => <ol className="mb-3 list-decimal pl-6">{children}</ol>,
  li: ({ children }) => <li className="mb-1">{children}</li>,
  blockquote: ({ children }) => <blockquote className="mb-3 border-l-4 border-sand-300 pl-3 text-ink-700">{children}</blockquote>,
  code: ({ children }) => <code className="rounded bg-sand-200 px-1 font-mono text-sm">{children}</code>,
  pre: ({ children }) => <pre className="mb-3 overflow-x-auto rounded bg-sand-200 p-3 text-sm">{children}</pre>,
  a: ({ href, children }) => (href ? <a href={href} rel="noopener noreferrer nofollow" className="break-words">{children}</a> : <span>{children}</span>),
  img: ({ alt }) => <span className="italic text-ink-500">[image: {alt || "not shown"}]</span>,
  hr: () => <hr className="my-4 border-sand-300" />,
};

export function BulletinMarkdown({ markdown }: { markdown: string }) {
  return (
    <div className="min-w-0 break-words text-ink-900">
      <Markdown skipHtml urlTransform={safeUrl} components={components}>{markdown}</Markdown>
    </div>
  );
}
