import { chromium } from "playwright-core";
const base = "http://localhost:3490";
const [,, email, ...paths] = process.argv;
const browser = await chromium.launch({ executablePath: "/usr/bin/chromium", args: ["--no-sandbox","--disable-gpu","--disable-background-networking","--disable-component-update","--disable-sync"] });
for (const [w, h, tag] of [[1280, 900, "d"], [390, 844, "m"]]) {
  const ctx = await browser.newContext({ viewport: { width: w, height: h } });
  const page = await ctx.newPage();
  await page.goto(base + "/sign-in");
  const form = page.getByRole("form", { name: "Sign in with password" });
  await form.getByLabel("E-mail").fill(email);
  await form.getByLabel("Password", { exact: true }).fill("hangar-demo-2026");
  await form.getByRole("button", { name: "Sign in", exact: true }).click();
  await page.waitForURL((u) => !u.pathname.startsWith("/sign-in"));
  for (const p of paths) {
    await page.goto(base + p);
    await page.waitForLoadState("load"); await page.waitForTimeout(800);
    const name = `${tag}-${email.split("@")[0]}-${p.replace(/[^a-z0-9]+/gi, "_").slice(-60)}`;
    const { sw, cw } = await page.evaluate(() => ({ sw: document.documentElement.scrollWidth, cw: document.documentElement.clientWidth }));
    await page.screenshot({ path: `/tmp/shots-money/${name}.png`, fullPage: true });
    console.log(name, page.url().replace(base, ""), sw > cw ? `OVERFLOW ${sw}>${cw}` : "ok");
  }
  await ctx.close();
}
await browser.close();
