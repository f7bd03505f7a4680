// Small node:http helpers shared by the local stand-ins for hosted services. They are
// deliberately framework-free so the fakes start in milliseconds inside a test process.
import { createServer, type IncomingMessage, type ServerResponse } from "node:http";
import type { AddressInfo } from "node:net";
import path from "node:path";
import { pathToFileURL } from "node:url";

export type RequestHandler = (req: IncomingMessage, res: ServerResponse) => Promise<void> | void;

export interface ListeningServer {
  url: string;
  port: number;
  close(): Promise<void>;
}

const DEFAULT_BODY_LIMIT = 5_000_000;

export class BodyTooLargeError extends Error {}

export async function readBody(req: IncomingMessage, limitBytes = DEFAULT_BODY_LIMIT): Promise<string> {
  const chunks: Buffer[] = [];
  let size = 0;
  for await (const chunk of req) {
    const buf = typeof chunk === "string" ? Buffer.from(chunk) : (chunk as Buffer);
    size += buf.length;
    if (size > limitBytes) throw new BodyTooLargeError(`Request body larger than ${limitBytes} bytes`);
    chunks.push(buf);
  }
  return Buffer.concat(chunks).toString("utf8");
}

export function sendJson(
  res: ServerResponse,
  status: number,
  body: unknown,
  headers: Record<string, string> = {},
): void {
  const text = JSON.stringify(body);
  res.writeHead(status, {
    "Content-Type": "application/json; charset=utf-8",
    "Content-Length": String(Buffer.byteLength(text)),
    "Cache-Control": "no-store",
    ...headers,
  });
  res.end(text);
}

export function sendHtml(res: ServerResponse, status: number, html: string): void {
  res.writeHead(status, {
    "Content-Type": "text/html; charset=utf-8",
    "Content-Length": String(Buffer.byteLength(html)),
    "Cache-Control": "no-store",
  });
  res.end(html);
}

export function sendRedirect(res: ServerResponse, location: string): void {
  // 303 so that a browser follows a POSTed form with a GET, as a hosted page must.
  res.writeHead(303, { Location: location, "Content-Length": "0" });
  res.end();
}

export function escapeHtml(value: string): string {
  return value
    .replace(/&/g, "&amp;")
    .replace(/</g, "&lt;")
    .replace(/>/g, "&gt;")
    .replace(/"/g, "&quot;")
    .replace(/'/g, "&#39;");
}

/** Reads a Bearer token; null when the header is absent or not of that scheme. */
export function readBearer(req: IncomingMessage): string | null {
  const header = req.headers.authorization;
  if (!header) return null;
  const m = /^Bearer\s+(.+)$/i.exec(header.trim());
  return m?.[1]?.trim() || null;
}

export async function listenServer(
  handler: RequestHandler,
  opts: { port?: number; host?: string },
): Promise<ListeningServer> {
  const host = opts.host ?? "127.0.0.1";
  const server = createServer((req, res) => {
    Promise.resolve(handler(req, res)).catch((err: unknown) => {
      // A fake must never crash its host test process; answer 500 and keep serving.
      console.error("[fake-service] unhandled error", err);
      if (!res.headersSent) sendJson(res, 500, { error: { message: "fake service internal error" } });
      else res.end();
    });
  });
  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(opts.port ?? 0, host, () => {
      server.off("error", reject);
      resolve();
    });
  });
  const port = (server.address() as AddressInfo).port;
  const urlHost = host.includes(":") ? `[${host}]` : host;
  return {
    url: `http://${urlHost}:${port}`,
    port,
    close: () =>
      new Promise<void>((resolve, reject) => {
        server.close((err) => (err ? reject(err) : resolve()));
        // Keep-alive sockets would otherwise hold close() open until they time out.
        server.closeAllConnections();
      }),
  };
}

/** True when the module at `importMetaUrl` was started directly (`tsx file.ts`), not imported. */
export function isMainModule(importMetaUrl: string): boolean {
  const entry = process.argv[1];
  if (!entry) return false;
  return pathToFileURL(path.resolve(entry)).href === importMetaUrl;
}
