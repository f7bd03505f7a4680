import Database from "better-sqlite3";
import { subject } from "@casl/ability";
import { defineAbilityFor, type AppAbility } from "@/permissions/abilities";
import type { Role } from "@/permissions/roles";
import { formatMoney } from "@/lib/money/format";

// What the test server's database holds, read-only: the ids that fill the route tree's dynamic
// segments, and the private facts ("markers") that must not reach a role that may not see them.

export const CLUB_SLUG = "reedwater";

export type Viewer = {
  key: string;
  email: string | null;
  userId: string | null;
  name: string | null;
  /** The viewer's roles in the club under test; null = no membership there (operator, outsider, anonymous). */
  roles: Role[] | null;
  ability: AppAbility | null;
  /** Users who share some club with this viewer (whose names the viewer may legitimately know). */
  knows: Set<string>;
  /** An operator assigned to the club under test: sees its cross-club totals, never member-level data. */
  operatorOfClub: boolean;
};

export type Marker = {
  category: string;
  text: string;
  /** A stricter test once `text` is found (e.g. a number in a JSON value position). */
  re?: RegExp;
  /** Whose fact it is (a user id), when it belongs to a person. */
  ownerId: string | null;
  ownerName: string;
  /** May this viewer see it? Derived from the permission table (permissions/abilities.ts). */
  allowed: (v: Viewer) => boolean;
  /** Which request paths the marker is checked on (all by default). */
  scope?: (path: string) => boolean;
};

type Row = Record<string, unknown>;

export type SeedFacts = {
  clubId: string;
  currency: string;
  users: Map<string, { id: string; name: string; email: string }>;
  members: { userId: string; membershipId: string; roles: Role[] }[];
  ids: Record<string, () => string[]>;
  markers: Marker[];
  viewerLegitAmounts: (userId: string | null) => Set<string>;
  viewerOwnMemos: (userId: string | null) => Set<string>;
  close: () => void;
};

const can = (v: Viewer, action: string, subj: string, fields?: Record<string, unknown>) =>
  Boolean(v.ability?.can(action as never, (fields ? subject(subj, { ...fields }) : subj) as never));
const isSelf = (v: Viewer, userId: string | null) => userId !== null && v.userId === userId;

export const MONEY_PATH = /\/money(\/|$)|\/statements\/|\/account(\/|$)/;
export const LEDGER_AREA = /\/money(\/|$)/;

/** A number as a JSON value: after ":" / "," / "[", not part of a longer number. */
function jsonNumber(n: number): RegExp {
  return new RegExp(`[:,\\[]\\s*${String(n).replace("-", "\\-")}(?![\\d.])`);
}

/** An e-mail address standing alone (admin@… is not found inside cottonwood.admin@…). */
export function emailPattern(email: string): RegExp {
  return new RegExp(`(?<![\\w.+-])${email.replace(/[.*+?^${}()|[\]\\]/g, "\\$&")}`, "i");
}

export function readSeedFacts(dbFile: string): SeedFacts {
  const db = new Database(dbFile, { readonly: true, fileMustExist: true });
  const all = <T = Row>(sql: string, ...args: unknown[]) => db.prepare(sql).all(...args) as T[];
  const get = <T = Row>(sql: string, ...args: unknown[]) => db.prepare(sql).get(...args) as T | undefined;

  const club = get<{ id: string; currency: string }>("select id, currency from clubs where slug = ?", CLUB_SLUG);
  if (!club) throw new Error(`The test database has no club ${CLUB_SLUG}`);
  const clubId = club.id;
  const money = (minor: number) => formatMoney(minor, club.currency);

  const users = new Map(all<{ id: string; name: string; email: string }>("select id, name, email from users").map((u) => [u.id, u]));
  const nameOf = (id: string | null) => (id ? (users.get(id)?.name ?? id) : "the club");
  const members = all<{ userId: string; membershipId: string; roles: string }>(
    "select user_id as userId, id as membershipId, roles from memberships where club_id = ? and status = 'active'", clubId,
  ).map((m) => ({ ...m, roles: JSON.parse(m.roles) as Role[] }));
  const memberIds = new Set(members.map((m) => m.userId));
  // "Another member" first: the people who are none of the signed-in demo roles come first in every id list.
  const demoEmails = /^(member|instructor|safety|treasurer|maintenance|admin|mechanic|operator)@/;
  const othersFirst = (ids: string[]) => [...ids].sort((a, b) => Number(demoEmails.test(users.get(a)?.email ?? "")) - Number(demoEmails.test(users.get(b)?.email ?? "")));

  // ---- ids for the dynamic segments ---------------------------------------------------------
  const userByEmail = (email: string) => [...users.values()].find((u) => u.email === email)?.id;
  const idUsers = () => {
    // Someone who is none of the signed-in roles (money, a lapsed medical and review), and one with medical limitations.
    const picks = [userByEmail("pilot2@hangarline.test"), userByEmail("instructor@hangarline.test")];
    return picks.filter((x): x is string => Boolean(x && memberIds.has(x)));
  };
  const ids: Record<string, () => string[]> = {
    club: () => [CLUB_SLUG],
    userId: idUsers,
    membershipId: () => {
      const want = new Set(idUsers().slice(0, 2));
      return members.filter((m) => want.has(m.userId)).map((m) => m.membershipId);
    },
    bookingId: () => {
      // Bookings with accepted warnings (someone else's private reasons) first, then one plain one.
      const rows = all<{ id: string; userId: string; w: string }>("select id, user_id as userId, accepted_warnings as w from bookings where club_id = ? order by created_at desc", clubId);
      const warned = rows.filter((r) => r.w !== "[]").slice(0, 1).map((r) => r.id);
      const plain = rows.find((r) => r.w === "[]")?.id;
      return [...warned, ...(plain ? [plain] : [])];
    },
    reportId: () => {
      const anon = get<{ id: string }>("select id from safety_reports where club_id = ? and anonymous = 1 order by created_at limit 1", clubId)?.id;
      const named = get<{ id: string }>("select id from safety_reports where club_id = ? and anonymous = 0 order by created_at limit 1", clubId)?.id;
      return [anon, named].filter((x): x is string => Boolean(x));
    },
    documentId: () => {
      const rows = all<{ id: string; userId: string }>("select id, user_id as userId from member_documents where club_id = ? and reference is not null order by created_at", clubId);
      const byOwner = new Map<string, string>();
      for (const r of rows) if (!byOwner.has(r.userId)) byOwner.set(r.userId, r.id);
      return othersFirst([...byOwner.keys()]).slice(0, 2).map((u) => byOwner.get(u)!);
    },
    aircraftId: () => all<{ id: string }>("select id from aircraft where club_id = ? order by registration limit 1", clubId).map((r) => r.id),
    squawkId: () => all<{ id: string }>("select id from squawks where club_id = ? order by created_at limit 1", clubId).map((r) => r.id),
    bulletinId: () => {
      // The newest published one (its acknowledgements list names who read it).
      const pub = get<{ id: string }>("select id from bulletins where club_id = ? and status = 'published' order by created_at desc limit 1", clubId)?.id;
      return pub ? [pub] : [];
    },
    statementId: () => all<{ id: string }>("select id from bank_statements where club_id = ? order by period_end desc limit 1", clubId).map((r) => r.id),
    uploadId: () => {
      // A private one (a member's document) first, then any other.
      const priv = get<{ id: string }>("select id from uploads where club_id = ? and owner_user_id is not null order by created_at limit 1", clubId)?.id;
      const any = get<{ id: string }>("select id from uploads where club_id = ? and owner_user_id is null order by created_at limit 1", clubId)?.id;
      return [priv, any].filter((x): x is string => Boolean(x));
    },
    month: () => {
      const m = get<{ p: string }>("select max(period_start) as p from statements where club_id = ?", clubId)?.p;
      return m ? [m.slice(0, 7)] : [];
    },
    // Secrets that are only ever stored hashed: nobody can know a live one, so the matrix asks with a made-up value.
    token: () => ["leak-matrix-made-up-token-0000000000"],
    nextauth: () => ["session", "providers"],
  };

  // ---- markers: private facts and who may see them ------------------------------------------
  const markers: Marker[] = [];
  const add = (m: Marker) => {
    if (m.text.trim().length >= 4) markers.push(m);
  };

  // Balances of member accounts, and the closing balance of every issued statement.
  const balances = all<{ userId: string; bal: number }>(
    `select la.member_user_id as userId, sum(jl.debit_minor - jl.credit_minor) as bal
       from ledger_accounts la join journal_lines jl on jl.account_id = la.id
      where la.club_id = ? and la.member_user_id is not null group by la.member_user_id`, clubId,
  );
  const accountAllowed = (owner: string) => (v: Viewer) => isSelf(v, owner) || can(v, "read", "Account", { userId: owner });
  for (const b of balances) {
    if (Math.abs(b.bal) < 1000) continue; // under ten units: too common a figure to mean anything
    add({ category: "balance", text: money(b.bal), ownerId: b.userId, ownerName: nameOf(b.userId), allowed: accountAllowed(b.userId) });
    // The same figure as data handed to a client component (minor units in the RSC payload).
    add({ category: "balance (minor units)", text: String(b.bal), re: jsonNumber(b.bal), ownerId: b.userId, ownerName: nameOf(b.userId), allowed: accountAllowed(b.userId) });
  }
  for (const s of all<{ userId: string; closing: number; period: string }>("select member_user_id as userId, closing_minor as closing, period_start as period from statements where club_id = ?", clubId)) {
    if (Math.abs(s.closing) < 1000) continue;
    add({ category: `statement ${s.period.slice(0, 7)} closing balance`, text: money(s.closing), ownerId: s.userId, ownerName: nameOf(s.userId), allowed: accountAllowed(s.userId) });
    add({ category: `statement ${s.period.slice(0, 7)} closing balance (minor units)`, text: String(s.closing), re: jsonNumber(s.closing), ownerId: s.userId, ownerName: nameOf(s.userId), allowed: accountAllowed(s.userId) });
  }

  // The club's receivables in total: the ledger roles and the club's operator (counts and totals only).
  const owed = balances.reduce((t, b) => t + Math.max(0, b.bal), 0);
  const net = balances.reduce((t, b) => t + b.bal, 0);
  for (const total of new Set([owed, net])) {
    add({ category: "club receivables total", text: money(total), ownerId: null, ownerName: "the club", allowed: (v) => v.operatorOfClub || can(v, "read", "Ledger") });
  }

  // Other members' names on money pages (the ledger area, statements, account pages).
  for (const m of members) {
    const u = users.get(m.userId);
    if (!u?.name) continue;
    add({ category: "name on a money page", text: u.name, ownerId: u.id, ownerName: u.name, allowed: accountAllowed(u.id), scope: (p) => MONEY_PATH.test(p) });
  }

  // Journal descriptions (ledger roles only); the viewer's own entries' descriptions are theirs to see.
  for (const e of all<{ memo: string; userId: string | null }>("select distinct memo, member_user_id as userId from journal_entries where club_id = ?", clubId)) {
    if (e.memo.length < 16) continue; // "Card payment" and the like are words of the interface too
    add({ category: "journal description", text: e.memo, ownerId: e.userId, ownerName: nameOf(e.userId), allowed: (v) => isSelf(v, e.userId) || can(v, "read", "Ledger") });
  }
  for (const l of all<{ description: string }>("select distinct description from bank_lines where club_id = ?", clubId)) {
    if (l.description.length < 12) continue;
    add({ category: "bank statement line", text: l.description, ownerId: null, ownerName: "the club", allowed: (v) => can(v, "read", "Ledger") || can(v, "read", "Reconciliation") });
  }

  // Medical details: limitations, the exam date as data, the birth date (the member's alone).
  for (const m of all<{ userId: string; limitations: string | null; examDate: string; medicalClass: number | null }>("select user_id as userId, limitations, exam_date as examDate, medical_class as medicalClass from medical_certificates where club_id = ?", clubId)) {
    const allowed = (v: Viewer) => isSelf(v, m.userId) || can(v, "readDetails", "Medical", { userId: m.userId });
    if (m.limitations) add({ category: "medical limitations", text: m.limitations, ownerId: m.userId, ownerName: nameOf(m.userId), allowed });
    add({ category: "medical exam date", text: `"examDate":"${m.examDate}"`, ownerId: m.userId, ownerName: nameOf(m.userId), allowed });
    if (m.medicalClass) add({ category: "medical class", text: `"medicalClass":${m.medicalClass}`, ownerId: m.userId, ownerName: nameOf(m.userId), allowed, scope: (p) => p.includes("/api/") });
  }
  for (const r of all<{ userId: string; birthDate: string | null }>("select user_id as userId, birth_date as birthDate from member_private_records where club_id = ?", clubId)) {
    if (r.birthDate) add({ category: "date of birth", text: r.birthDate, ownerId: r.userId, ownerName: nameOf(r.userId), allowed: (v) => isSelf(v, r.userId) });
  }
  // Certificate and policy numbers, the examiner or insurer on a member's documents.
  const userNames = new Set([...users.values()].map((u) => u.name));
  for (const d of all<{ userId: string; reference: string | null; details: string | null; kind: string }>("select user_id as userId, reference, details, kind from member_documents where club_id = ?", clubId)) {
    const allowed = (v: Viewer) => isSelf(v, d.userId) || can(v, "read", "MemberDocument", { userId: d.userId });
    if (d.reference) add({ category: `${d.kind} number`, text: d.reference, ownerId: d.userId, ownerName: nameOf(d.userId), allowed });
    if (d.details && d.details.length >= 12 && !userNames.has(d.details)) add({ category: `${d.kind} details`, text: d.details, ownerId: d.userId, ownerName: nameOf(d.userId), allowed });
  }

  // Accepted booking warnings: the member's own, or an officer whose role covers what the warning is about.
  const warningSubject: Record<string, [string, string] | null> = {
    inArrears: ["read", "Account"],
    medicalExpired: ["readDetails", "Medical"],
    notCurrent: ["read", "Currency"],
    flightReview: ["read", "Currency"],
    notCheckedOut: ["read", "Currency"],
  };
  for (const b of all<{ id: string; userId: string; w: string }>("select id, user_id as userId, accepted_warnings as w from bookings where club_id = ? and accepted_warnings != '[]'", clubId)) {
    for (const w of JSON.parse(b.w) as { guard: string; reason: string }[]) {
      const subj = warningSubject[w.guard];
      if (!subj) continue; // about the aircraft, not the person
      add({ category: `booking warning (${w.guard})`, text: w.reason, ownerId: b.userId, ownerName: nameOf(b.userId), allowed: (v) => isSelf(v, b.userId) || can(v, subj[0], subj[1], { userId: b.userId }) });
    }
  }

  // Confidential report bodies: the reporter and the safety role; an anonymous report's filer is nobody's to know.
  const reportEvents = all<{ reportId: string; actorId: string }>("select report_id as reportId, actor_id as actorId from safety_report_events where club_id = ?", clubId);
  for (const r of all<{ id: string; reporterId: string | null; anonymous: number; whatHappened: string; factorsNote: string | null }>(
    "select id, reporter_id as reporterId, anonymous, what_happened as whatHappened, factors_note as factorsNote from safety_reports where club_id = ?", clubId,
  )) {
    const allowed = (v: Viewer) => isSelf(v, r.reporterId) || can(v, "readDetails", "SafetyReport", { reporterId: r.reporterId });
    const first = r.whatHappened.split(/(?<=[.!?])\s/)[0]!.slice(0, 120);
    add({ category: `${r.anonymous ? "anonymous" : "named"} safety report text`, text: first, ownerId: r.reporterId, ownerName: r.anonymous ? "anonymous" : nameOf(r.reporterId), allowed });
    if (r.factorsNote) add({ category: `${r.anonymous ? "anonymous" : "named"} safety report note`, text: r.factorsNote, ownerId: r.reporterId, ownerName: r.anonymous ? "anonymous" : nameOf(r.reporterId), allowed });
    if (r.anonymous) {
      // Whoever filed it, no page about the report may name a member who did not act on it.
      const actors = new Set(reportEvents.filter((e) => e.reportId === r.id).map((e) => e.actorId));
      for (const m of members) {
        const u = users.get(m.userId);
        if (!u || actors.has(u.id)) continue;
        for (const text of [u.name, u.email]) {
          add({ category: "a name beside an anonymous report", text, re: text === u.email ? emailPattern(text) : undefined, ownerId: u.id, ownerName: u.name, allowed: (v) => isSelf(v, u.id), scope: (p) => p.includes(r.id) });
        }
      }
    }
  }

  // Nothing of the club's people reaches someone with no role in it (operator, outsider, anonymous).
  for (const m of members) {
    const u = users.get(m.userId);
    if (!u) continue;
    for (const text of [u.name, u.email]) {
      add({ category: "a member of the club (seen from outside it)", text, re: text === u.email ? emailPattern(text) : undefined, ownerId: u.id, ownerName: u.name, allowed: (v) => v.roles !== null || v.knows.has(u.id) });
    }
  }

  const both = (out: Set<string>, minor: number) => out.add(money(minor)).add(String(minor));
  const viewerLegitAmounts = (userId: string | null) => {
    const out = new Set<string>();
    for (const p of all<{ a: number }>("select amount_minor as a from dues_plans where club_id = ?", clubId)) both(out, p.a);
    if (!userId) return out;
    for (const l of all<{ d: number; c: number }>(
      `select jl.debit_minor as d, jl.credit_minor as c from journal_lines jl join ledger_accounts la on la.id = jl.account_id where la.club_id = ? and la.member_user_id = ?`, clubId, userId,
    )) both(out, l.d || l.c);
    for (const s of all<{ o: number; ch: number; cr: number; cl: number }>("select opening_minor as o, charges_minor as ch, credits_minor as cr, closing_minor as cl from statements where club_id = ? and member_user_id = ?", clubId, userId)) {
      for (const a of [s.o, s.ch, s.cr, s.cl]) both(out, a);
    }
    const own = balances.find((b) => b.userId === userId);
    if (own) both(out, own.bal);
    return out;
  };
  const viewerOwnMemos = (userId: string | null) =>
    new Set(userId ? all<{ memo: string }>("select distinct memo from journal_entries where club_id = ? and member_user_id = ?", clubId, userId).map((r) => r.memo) : []);

  return { clubId, currency: club.currency, users, members, ids, markers, viewerLegitAmounts, viewerOwnMemos, close: () => db.close() };
}

export function viewerFor(facts: SeedFacts, dbFile: string, key: string, email: string | null): Viewer {
  const user = email ? [...facts.users.values()].find((u) => u.email === email) : undefined;
  if (email && !user) throw new Error(`No demo account ${email}`);
  const membership = user ? facts.members.find((m) => m.userId === user.id) : undefined;
  const roles = membership ? membership.roles : null;
  const knows = new Set<string>();
  let operatorOfClub = false;
  if (user) {
    const db = new Database(dbFile, { readonly: true, fileMustExist: true });
    operatorOfClub = Boolean(db.prepare("select 1 from operator_assignments oa join users u on u.id = oa.user_id where oa.user_id = ? and oa.club_id = ? and u.platform_role = 'operator'").get(user.id, facts.clubId));
    const rows = db
      .prepare("select distinct o.user_id as id from memberships mine join memberships o on o.club_id = mine.club_id where mine.user_id = ? and mine.status = 'active'")
      .all(user.id) as { id: string }[];
    db.close();
    for (const r of rows) knows.add(r.id);
    knows.add(user.id);
  }
  return {
    key, email, userId: user?.id ?? null, name: user?.name ?? null, roles,
    ability: roles && user ? defineAbilityFor({ userId: user.id, roles }) : null,
    knows,
    operatorOfClub,
  };
}
