// Every route handler under app/api and every server action under app ("use server" files), found on disk so
// new ones are covered without editing this file: anonymous callers get 401 (route) or a redirect to /sign-in
// (action), viewers get 403, and the database is unchanged. Where a fixture gives realistic arguments, the same
// call made by an allowed role does change the database, so the refusal is not an accident of bad input.
import fs from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { AccessDenied } from "../../lib/auth/require-role";
import { sessionUser } from "../../lib/auth/session-user";
import { exportAssetFile } from "../../lib/data/export-asset-file";
import { createAsset, parseAssetFile } from "../../lib/data/save-asset";
import { disconnectPrisma } from "../../lib/db";
import { createSignedInUser, type TestUser } from "../support/auth-session";
import { createTestDatabase, type TestDatabase } from "../support/test-database";
import { canonicalCsv } from "../import/support/fixtures";

// Server actions read the request through next/headers; here the test decides which cookie "the browser" sent.
const request = vi.hoisted(() => ({ headers: new Headers() }));
class RedirectSignal extends Error {
  constructor(readonly url: string) {
    super(`redirect to ${url}`);
  }
}
vi.mock("next/headers", () => ({
  headers: async () => request.headers,
  cookies: async () => ({ get: () => undefined, getAll: () => [], set: () => undefined, delete: () => undefined }),
}));
vi.mock("next/cache", () => ({ revalidatePath: () => undefined, revalidateTag: () => undefined }));
vi.mock("next/navigation", async (original) => ({
  ...(await original<typeof import("next/navigation")>()),
  redirect: (url: string) => {
    throw new RedirectSignal(url);
  },
}));

const APP = path.resolve("app");
const METHODS = ["GET", "HEAD", "POST", "PUT", "PATCH", "DELETE"] as const;
const MUTATING = new Set(["POST", "PUT", "PATCH", "DELETE"]);
/** Public on purpose; everything else must refuse anonymous callers. */
const PUBLIC_ROUTES = new Set(["api/health/route.ts", "api/auth/[...all]/route.ts"]);
const PUBLIC_ACTIONS = new Set(["sign-in/actions.ts#signInAction", "sign-in/actions.ts#signOutAction"]);
/** Open to every signed-in role on purpose (they change only the caller's own settings); anonymous callers are still refused. */
const SELF_SERVICE_ACTIONS = new Set(["account/actions.ts#setUnitSystemAction"]);

function filesUnder(folder: string, accept: (file: string) => boolean): string[] {
  return fs.readdirSync(folder, { withFileTypes: true, recursive: true }).flatMap((entry) => {
    const file = path.join(entry.parentPath, entry.name);
    return entry.isFile() && accept(file) ? [path.relative(APP, file).split(path.sep).join("/")] : [];
  });
}
const routeFiles = filesUnder(path.join(APP, "api"), (file) => path.basename(file) === "route.ts");
const actionFiles = filesUnder(APP, (file) => /\.(ts|tsx)$/.test(file) && /^\s*(\/\/[^\n]*\n\s*)*["']use server["']/.test(fs.readFileSync(file, "utf8")));

let database: TestDatabase;
let viewer: TestUser;
let engineer: TestUser;
let admin: TestUser;
/** Targets of the admin actions' positive controls: one gets a new password, one is removed. */
let passwordTarget: TestUser;
let removalTarget: TestUser;
let assetTag: string;
let alertId: number;
let assetJson: Record<string, unknown>;

/** A fingerprint of every table but the session tables: any insert, update or delete changes it. */
async function fingerprint(): Promise<Record<string, string>> {
  const tables = await database.prisma.$queryRawUnsafe<{ name: string }[]>(
    `select table_name::text as name from information_schema.tables where table_schema = 'public' and table_type = 'BASE TABLE'
       and table_name not in ('session', 'verification', '_prisma_migrations') order by table_name`,
  );
  const result: Record<string, string> = {};
  for (const { name } of tables) {
    const rows = await database.prisma.$queryRawUnsafe<{ hash: string }[]>(`select md5(coalesce(string_agg(t::text, '|' order by t::text), '')) as hash from "${name}" t`);
    result[name] = rows[0]?.hash ?? "";
  }
  return result;
}

function cookieHeaders(user: TestUser | null): Headers {
  return new Headers(user ? { cookie: user.cookie } : {});
}

function form(fields: Record<string, string>): FormData {
  const data = new FormData();
  for (const [key, value] of Object.entries(fields)) data.append(key, value);
  return data;
}

/** Realistic arguments per server action (built when called, after set-up); others get an empty FormData. */
const ACTION_FIXTURES: Record<string, () => unknown[]> = {
  "assets/actions.ts#saveAssetAction": () => ["update", JSON.stringify({ ...assetJson, name: "Renamed by the authorization test" })],
  "assets/[tag]/alert-actions.ts#acknowledgeAlertAction": () => [form({ alertId: String(alertId), tag: assetTag, note: "seen" })],
  "assets/[tag]/cleaning-actions.ts#recordCleaningAction": () => [form({ tag: assetTag, date: "2026-06-01", method: "hydroblast" })],
  "admin/users/actions.ts#createUserAction": () => [form({ email: "new-user@test.example", role: "viewer", password: "a long password" })],
  "admin/users/actions.ts#changeUserRoleAction": () => [form({ userId: viewer.id, role: "planner" })],
  "admin/users/actions.ts#setUserPasswordAction": () => [form({ userId: passwordTarget.id, password: "a new long password" })],
  "admin/users/actions.ts#removeUserAction": () => [form({ userId: removalTarget.id, email: removalTarget.email, confirm: "yes" })],
};

function actionArguments(key: string): unknown[] | null {
  return ACTION_FIXTURES[key]?.() ?? null;
}

/** Runs an action as `user`; a redirect ends it normally (its target is returned), other errors propagate. */
async function runAction(action: (...args: unknown[]) => Promise<unknown>, args: unknown[], user: TestUser | null) {
  request.headers = cookieHeaders(user);
  try {
    return { value: await action(...args), redirect: null as string | null };
  } catch (error) {
    if (error instanceof RedirectSignal) return { value: undefined, redirect: error.url };
    throw error;
  }
}

type RouteHandler = (request: Request, context: { params: Promise<Record<string, string>> }) => Promise<Response>;

function routeCall(file: string) {
  const segments = path.dirname(file).split("/");
  const params: Record<string, string> = {};
  const urlPath = segments
    .map((segment) => {
      const name = /^\[(\w+)\]$/.exec(segment)?.[1];
      if (!name) return segment;
      params[name] = name === "tag" ? assetTag : "1";
      return encodeURIComponent(params[name]);
    })
    .join("/");
  return { url: `http://localhost:3000/${urlPath}`, params };
}

function routeRequest(file: string, method: string, user: TestUser | null): { request: Request; context: { params: Promise<Record<string, string>> } } {
  const { url, params } = routeCall(file);
  const headers = cookieHeaders(user);
  let body: string | undefined;
  if (MUTATING.has(method)) {
    headers.set("content-type", "text/csv");
    body = canonicalCsv(30, Date.UTC(2026, 4, 1));
  }
  return { request: new Request(url, { method, headers, body }), context: { params: Promise.resolve(params) } };
}

beforeAll(async () => {
  database = await createTestDatabase();
  process.env.DATABASE_URL = database.url;
  const example = JSON.parse(fs.readFileSync("docs/examples/asset-e-4101.json", "utf8")) as unknown;
  assetTag = (await createAsset(database.prisma, parseAssetFile(example), "test")).tag;
  assetJson = (await exportAssetFile(database.prisma, assetTag)) as unknown as Record<string, unknown>;
  const asset = await database.prisma.asset.findUniqueOrThrow({ where: { tag: assetTag } });
  const alert = await database.prisma.instrumentAlert.create({
    data: { assetId: asset.id, role: "hotIn", instrumentTag: "TI-4101A", kind: "bias", start: new Date("2026-04-01T00:00:00Z"), size: 2, sizeUnit: "K", evidence: "test" },
  });
  alertId = alert.id;
  [viewer, engineer, admin, passwordTarget, removalTarget] = await Promise.all([
    createSignedInUser(database.prisma, "viewer"),
    createSignedInUser(database.prisma, "engineer"),
    createSignedInUser(database.prisma, "admin"),
    createSignedInUser(database.prisma, "engineer"),
    createSignedInUser(database.prisma, "planner"),
  ]);
});

afterAll(async () => {
  await disconnectPrisma();
  await database.drop();
});

describe("discovery", () => {
  it("finds the route handlers and server actions that exist today", () => {
    // a floor, not the full list: new files are picked up by the loops below
    expect(routeFiles).toEqual(expect.arrayContaining(["api/assets/route.ts", "api/assets/[tag]/readings/route.ts", "api/health/route.ts", "api/auth/[...all]/route.ts"]));
    expect(actionFiles).toEqual(expect.arrayContaining(["assets/actions.ts", "assets/[tag]/alert-actions.ts", "assets/[tag]/cleaning-actions.ts", "admin/users/actions.ts", "sign-in/actions.ts"]));
  });
});

describe.each(routeFiles.filter((file) => !PUBLIC_ROUTES.has(file)))("route %s", (file) => {
  it("answers 401 to anonymous callers and 403 to viewers for state changes, writing nothing", async () => {
    const module = (await import(path.join(APP, file))) as Partial<Record<(typeof METHODS)[number], RouteHandler>>;
    const methods = METHODS.filter((method) => typeof module[method] === "function");
    expect(methods.length).toBeGreaterThan(0);
    for (const method of methods) {
      const handler = module[method] as RouteHandler;
      const before = await fingerprint();
      const anonymous = routeRequest(file, method, null);
      const anonymousResponse = await handler(anonymous.request, anonymous.context);
      expect(anonymousResponse.status, `${method} anonymous`).toBe(401);
      expect(await anonymousResponse.json()).toMatchObject({ code: "unauthenticated" });
      const asViewer = routeRequest(file, method, viewer);
      const viewerResponse = await handler(asViewer.request, asViewer.context);
      if (MUTATING.has(method)) {
        expect(viewerResponse.status, `${method} viewer`).toBe(403);
        expect(await viewerResponse.json()).toMatchObject({ code: "forbidden" });
      } else {
        // reading is every signed-in role's right: the answer may be 404 for the placeholder id, never 401/403
        expect([401, 403], `${method} viewer`).not.toContain(viewerResponse.status);
      }
      expect(await fingerprint(), `${method} wrote nothing`).toEqual(before);
    }
  });
});

describe("route positive control", () => {
  it("lets an engineer import through POST /api/assets/{tag}/readings, named in the audit log", async () => {
    const { POST } = (await import(path.join(APP, "api/assets/[tag]/readings/route.ts"))) as { POST: RouteHandler };
    const before = await fingerprint();
    const call = routeRequest("api/assets/[tag]/readings/route.ts", "POST", engineer);
    const response = await POST(call.request, call.context);
    expect(response.status).toBe(201);
    expect(await response.json()).toMatchObject({ rowsNew: 30, createdBy: engineer.email });
    expect(await fingerprint()).not.toEqual(before);
    const event = await database.prisma.auditEvent.findFirstOrThrow({ where: { action: "import.completed" }, orderBy: { id: "desc" } });
    expect(event).toMatchObject({ actor: engineer.email, userId: engineer.id, entity: "import" });
  });
});

const actionCases = await Promise.all(
  actionFiles.map(async (file) => {
    const module = (await import(path.join(APP, file))) as Record<string, unknown>;
    return Object.entries(module)
      .filter(([, value]) => typeof value === "function")
      .map(([name]) => ({ file, name, key: `${file}#${name}` }));
  }),
).then((lists) => lists.flat());

describe.each(actionCases.filter((entry) => !PUBLIC_ACTIONS.has(entry.key) && !SELF_SERVICE_ACTIONS.has(entry.key)))("server action $key", ({ file, name, key }) => {
  it("redirects anonymous callers to /sign-in and refuses viewers, writing nothing", async () => {
    const action = ((await import(path.join(APP, file))) as Record<string, (...args: unknown[]) => Promise<unknown>>)[name] as (...args: unknown[]) => Promise<unknown>;
    const args = actionArguments(key) ?? [new FormData()];
    const before = await fingerprint();
    const anonymous = await runAction(action, args, null);
    expect(anonymous.redirect).toBe("/sign-in");
    // A refusal is AccessDenied 403, or (for a form that shows its problems) the denial in the returned state.
    let refusal: string;
    try {
      const result = await runAction(action, args, viewer);
      refusal = JSON.stringify(result);
    } catch (error) {
      expect(error).toBeInstanceOf(AccessDenied);
      expect((error as AccessDenied).status).toBe(403);
      refusal = (error as Error).message;
    }
    expect(refusal).toContain("your role (viewer) does not allow");
    expect(await fingerprint()).toEqual(before);
  });
});

describe("server action positive controls", () => {
  it.each(actionCases.filter((entry) => entry.key in ACTION_FIXTURES).map((entry) => entry.key))("%s changes the database for an admin", async (key) => {
    const [file, name] = key.split("#") as [string, string];
    const action = ((await import(path.join(APP, file))) as Record<string, (...args: unknown[]) => Promise<unknown>>)[name] as (...args: unknown[]) => Promise<unknown>;
    const before = await fingerprint();
    const result = await runAction(action, actionArguments(key) ?? [], admin);
    expect(result.redirect ?? "").not.toContain("error=");
    expect(await fingerprint()).not.toEqual(before);
    const event = await database.prisma.auditEvent.findFirstOrThrow({ orderBy: { id: "desc" } });
    expect(event).toMatchObject({ actor: admin.email, userId: admin.id });
  });
});

describe("self-service server actions", () => {
  it("setUnitSystemAction redirects anonymous callers, and lets a viewer change only their own units, audited", async () => {
    const { setUnitSystemAction } = (await import(path.join(APP, "account/actions.ts"))) as { setUnitSystemAction: (data: FormData) => Promise<void> };
    const before = await fingerprint();
    const anonymous = await runAction(setUnitSystemAction as (...args: unknown[]) => Promise<unknown>, [form({ unitSystem: "us" })], null);
    expect(anonymous.redirect).toBe("/sign-in");
    expect(await fingerprint()).toEqual(before);
    const asViewer = await runAction(setUnitSystemAction as (...args: unknown[]) => Promise<unknown>, [form({ unitSystem: "us" })], viewer);
    expect(asViewer.redirect).toBe("/account?saved=1");
    const rows = await database.prisma.user.findMany({ where: { id: { in: [viewer.id, engineer.id] } }, select: { id: true, unitSystem: true } });
    expect(Object.fromEntries(rows.map((row) => [row.id, row.unitSystem]))).toEqual({ [viewer.id]: "us", [engineer.id]: "si" });
    const event = await database.prisma.auditEvent.findFirstOrThrow({ where: { action: "user.units" }, orderBy: { id: "desc" } });
    expect(event).toMatchObject({ actor: viewer.email, userId: viewer.id, entityId: viewer.id });
    const invalid = await runAction(setUnitSystemAction as (...args: unknown[]) => Promise<unknown>, [form({ unitSystem: "imperial" })], viewer);
    expect(invalid.redirect).toContain("error=");
  });
});

describe("admin user actions", () => {
  type FormAction = (...args: unknown[]) => Promise<unknown>;
  const usersActions = async () => (await import(path.join(APP, "admin/users/actions.ts"))) as Record<"removeUserAction" | "setUserPasswordAction", FormAction>;

  it("removeUserAction refuses without the ticked confirm box, naming the user, and removes nothing", async () => {
    const { removeUserAction } = await usersActions();
    const target = await createSignedInUser(database.prisma, "viewer");
    const before = await fingerprint();
    const result = await runAction(removeUserAction, [form({ userId: target.id, email: target.email })], admin);
    expect(new URL(result.redirect ?? "", "http://localhost").searchParams.get("error")).toBe(`confirm: tick "confirm" beside ${target.email} to remove the account; nothing was removed`);
    expect(await fingerprint()).toEqual(before);
    expect(await sessionUser(new Headers({ cookie: target.cookie }))).toMatchObject({ id: target.id });
  });

  it("removeUserAction refuses the admin's own account with the reason in the page's error", async () => {
    const { removeUserAction } = await usersActions();
    const before = await fingerprint();
    const result = await runAction(removeUserAction, [form({ userId: admin.id, email: admin.email, confirm: "yes" })], admin);
    expect(new URL(result.redirect ?? "", "http://localhost").searchParams.get("error")).toBe(`user: ${admin.email} is your own account; another admin must remove it`);
    expect(await fingerprint()).toEqual(before);
  });

  it("setUserPasswordAction refuses a short password with the field named, and ends the target's sessions when it succeeds", async () => {
    const { setUserPasswordAction } = await usersActions();
    const target = await createSignedInUser(database.prisma, "viewer");
    const before = await fingerprint();
    const refused = await runAction(setUserPasswordAction, [form({ userId: target.id, password: "short" })], admin);
    expect(new URL(refused.redirect ?? "", "http://localhost").searchParams.get("error")).toBe("password: must be at least 8 characters");
    expect(await fingerprint()).toEqual(before);
    const saved = await runAction(setUserPasswordAction, [form({ userId: target.id, password: "long enough now" })], admin);
    expect(new URL(saved.redirect ?? "", "http://localhost").searchParams.get("saved")).toBe(`Set a new password for ${target.email}; 1 session ended.`);
    expect(await sessionUser(new Headers({ cookie: target.cookie }))).toBeNull();
  });
});
