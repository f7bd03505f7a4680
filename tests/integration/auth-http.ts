// Drives the real Auth.js route handlers (app/api/auth/[...nextauth]) in-process: a tiny cookie
// jar, the CSRF step, password sign-in, sign-out and reading the session.
import { NextRequest } from "next/server";
import { handlers } from "@/auth";

export class AuthClient {
  readonly cookies = new Map<string, string>();

  constructor(
    readonly origin = "http://app.test",
    readonly extraHeaders: Record<string, string> = {},
  ) {}

  private cookieHeader(): string {
    return [...this.cookies].map(([k, v]) => `${k}=${v}`).join("; ");
  }

  private keep(response: Response): void {
    for (const line of response.headers.getSetCookie()) {
      const [pair = "", ...attrs] = line.split(";");
      const eq = pair.indexOf("=");
      const name = pair.slice(0, eq).trim();
      const value = pair.slice(eq + 1).trim();
      const expired = attrs.some((a) => /max-age=0\b/i.test(a.trim()) || /expires=Thu, 01 Jan 1970/i.test(a.trim()));
      if (!value || expired) this.cookies.delete(name);
      else this.cookies.set(name, value);
    }
  }

  async request(path: string, init: { method?: "GET" | "POST"; form?: Record<string, string>; headers?: Record<string, string> } = {}): Promise<Response> {
    const method = init.method ?? "GET";
    const headers: Record<string, string> = { ...this.extraHeaders, ...init.headers };
    if (this.cookies.size) headers.cookie = this.cookieHeader();
    let body: string | undefined;
    if (init.form) {
      headers["content-type"] = "application/x-www-form-urlencoded";
      body = new URLSearchParams(init.form).toString();
    }
    const request = new NextRequest(new URL(path, this.origin), { method, headers, body });
    const response = await (method === "GET" ? handlers.GET(request) : handlers.POST(request));
    this.keep(response);
    return response;
  }

  async csrf(): Promise<string> {
    const response = await this.request("/api/auth/csrf");
    return ((await response.json()) as { csrfToken: string }).csrfToken;
  }

  async signInWithPassword(email: string, password: string): Promise<Response> {
    const csrfToken = await this.csrf();
    return this.request("/api/auth/callback/credentials", { method: "POST", form: { csrfToken, email, password, callbackUrl: `${this.origin}/clubs` } });
  }

  async requestLink(email: string): Promise<Response> {
    const csrfToken = await this.csrf();
    return this.request("/api/auth/signin/email", { method: "POST", form: { csrfToken, email, callbackUrl: `${this.origin}/clubs` } });
  }

  async signOut(): Promise<Response> {
    const csrfToken = await this.csrf();
    return this.request("/api/auth/signout", { method: "POST", form: { csrfToken } });
  }

  /** The session as /api/auth/session answers it: null when there is none. */
  async session(): Promise<{ user?: { id?: string; email?: string } } | null> {
    const response = await this.request("/api/auth/session");
    const body = (await response.json()) as { user?: { id?: string; email?: string } } | null;
    return body && body.user ? body : null;
  }

  sessionCookie(): string | undefined {
    return this.cookies.get("authjs.session-token");
  }
}
