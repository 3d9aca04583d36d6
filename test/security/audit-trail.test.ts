// Every change leaves one audit event naming who made it, written in the change's own transaction.
import { execFile } from "node:child_process";
import fs from "node:fs";
import os from "node:os";
import { promisify } from "node:util";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { acknowledgeAlert } from "../../lib/data/acknowledge-alert";
import { changeUserRole } from "../../lib/data/change-user-role";
import { createUser } from "../../lib/data/create-user";
import { importReadings } from "../../lib/data/import-readings";
import { listAuditEvents } from "../../lib/data/list-audit-events";
import { recordAudit } from "../../lib/data/record-audit";
import { recordCleaning } from "../../lib/data/record-cleaning";
import { createAsset, parseAssetFile, updateAsset } from "../../lib/data/save-asset";
import { disconnectPrisma } from "../../lib/db";
import { createSignedInUser, type TestUser } from "../support/auth-session";
import { createTestDatabase, type TestDatabase } from "../support/test-database";
import { canonicalCsv, textStream } from "../import/support/fixtures";

let database: TestDatabase;
let engineer: TestUser;
const by = () => ({ actor: engineer.email, userId: engineer.id });
const example = () => JSON.parse(fs.readFileSync("docs/examples/asset-e-4101.json", "utf8")) as Record<string, unknown>;
const latest = () => database.prisma.auditEvent.findFirstOrThrow({ orderBy: { id: "desc" } });
const count = () => database.prisma.auditEvent.count();

beforeAll(async () => {
  database = await createTestDatabase();
  process.env.DATABASE_URL = database.url;
  engineer = await createSignedInUser(database.prisma, "engineer");
});

afterAll(async () => {
  await disconnectPrisma();
  await database.drop();
});

describe("audit events", () => {
  it("record a sign-in", async () => {
    const event = await database.prisma.auditEvent.findFirstOrThrow({ where: { action: "user.sign-in", userId: engineer.id } });
    expect(event).toMatchObject({ actor: engineer.email, entity: "user", entityId: engineer.id });
  });

  it("record an asset's creation and update with the user, and nothing for an unchanged save", async () => {
    await createAsset(database.prisma, parseAssetFile(example()), engineer.email, engineer.id);
    expect(await latest()).toMatchObject({ action: "asset.create", entity: "asset", entityId: "E-4101", ...by() });
    await updateAsset(database.prisma, parseAssetFile({ ...example(), name: "Renamed cooler" }), engineer.email, engineer.id);
    const update = await latest();
    expect(update).toMatchObject({ action: "asset.update", entityId: "E-4101", summary: "updated asset E-4101: name", ...by() });
    expect(update.details).toMatchObject({ changes: { name: { before: "Naphtha splitter overhead trim cooler", after: "Renamed cooler" } } });
    const before = await count();
    await updateAsset(database.prisma, parseAssetFile({ ...example(), name: "Renamed cooler" }), engineer.email, engineer.id);
    expect(await count()).toBe(before);
  });

  it("are rolled back with a change that fails", async () => {
    const before = await count();
    await expect(createAsset(database.prisma, parseAssetFile(example()), engineer.email, engineer.id)).rejects.toThrow("asset E-4101 already exists");
    expect(await count()).toBe(before);
  });

  it("record a cleaning and an alert acknowledgement", async () => {
    const cleaning = await recordCleaning(database.prisma, { tag: "E-4101", date: "2026-05-12", method: "hydroblast", cost: 1200 }, engineer.email, engineer.id);
    expect(await latest()).toMatchObject({ action: "cleaning.record", entity: "cleaning", entityId: String(cleaning.id), summary: "recorded a hydroblast cleaning of E-4101 on 2026-05-12", ...by() });
    const asset = await database.prisma.asset.findUniqueOrThrow({ where: { tag: "E-4101" } });
    const alert = await database.prisma.instrumentAlert.create({ data: { assetId: asset.id, role: "coldOut", instrumentTag: "TI-4101D", kind: "drift", start: new Date("2026-04-01T00:00Z"), size: 3, sizeUnit: "K", evidence: "test" } });
    await acknowledgeAlert(database.prisma, alert.id, engineer.email, "sensor replaced", engineer.id);
    expect(await latest()).toMatchObject({ action: "alert.acknowledge", entityId: String(alert.id), summary: "acknowledged the drift alert on TI-4101D of E-4101: sensor replaced", ...by() });
    // a second acknowledgement fails and leaves no event
    const before = await count();
    await expect(acknowledgeAlert(database.prisma, alert.id, "someone", "", null)).rejects.toThrow(`alert ${alert.id} was already acknowledged by ${engineer.email}`);
    expect(await count()).toBe(before);
  });

  it("record the final status of an import: completed or failed", async () => {
    const done = await importReadings(database.prisma, { assetTag: "E-4101", source: "api", createdBy: engineer.email, userId: engineer.id, fileName: "may.csv", stream: textStream(canonicalCsv(10, Date.UTC(2026, 4, 1))) });
    expect(await latest()).toMatchObject({ action: "import.completed", entity: "import", entityId: String(done.batchId), summary: "imported may.csv into E-4101: 10 new, 0 changed, 0 rejected rows", ...by() });
    const refused = await importReadings(database.prisma, { assetTag: "E-4101", source: "api", createdBy: engineer.email, userId: engineer.id, fileName: "empty.csv", stream: textStream("") }).catch((error: unknown) => error as { batchId: number });
    const failed = await latest();
    expect(failed).toMatchObject({ action: "import.failed", entityId: String(refused.batchId), ...by() });
    expect(failed.summary).toMatch(/^import of empty\.csv into E-4101 failed: /);
    // one event per import, not one per stage
    expect(await database.prisma.auditEvent.count({ where: { entity: "import" } })).toBe(2);
  });

  it("record user creation and role changes with the admin who made them", async () => {
    const admin = await createSignedInUser(database.prisma, "admin");
    const created = await createUser(database.prisma, { email: "New.Person@Test.Example", role: "viewer", password: "long enough" }, { userId: admin.id, name: admin.email });
    expect(await latest()).toMatchObject({ action: "user.create", entityId: created.id, actor: admin.email, userId: admin.id, summary: "created user new.person@test.example with role viewer" });
    await changeUserRole(database.prisma, created.id, "planner", { userId: admin.id, name: admin.email });
    expect(await latest()).toMatchObject({ action: "user.change-role", entityId: created.id, actor: admin.email, summary: "changed the role of new.person@test.example from viewer to planner" });
  });

  it("name the CLI as cli:<os user> with no user id", async () => {
    const run = promisify(execFile);
    await run(process.execPath, ["--import", "tsx", "scripts/cli.ts", "user", "add", "--email", "cli-made@test.example", "--role", "viewer", "--password", "long enough"], {
      env: { ...process.env, DATABASE_URL: database.url },
    });
    expect(await latest()).toMatchObject({ action: "user.create", actor: `cli:${os.userInfo().username}`, userId: null, summary: "created user cli-made@test.example with role viewer" });
  }, 60_000);

  it("refuse an event without an actor or with a malformed action", async () => {
    await expect(recordAudit(database.prisma, { userId: null, actor: " ", action: "asset.update", entity: "asset", entityId: "x", summary: "x" })).rejects.toThrow("recordAudit: actor must name who made the change");
    await expect(recordAudit(database.prisma, { userId: null, actor: "test", action: "Update", entity: "asset", entityId: "x", summary: "x" })).rejects.toThrow('recordAudit: action must look like "entity.verb", got "Update"');
  });
});

describe("listAuditEvents", () => {
  it("lists newest first, filters by entity, record and actor, and pages", async () => {
    const all = await listAuditEvents(database.prisma, { pageSize: 500 });
    expect(all.total).toBeGreaterThan(8);
    const ids = all.events.map((event) => event.id);
    expect(ids).toEqual([...ids].sort((a, b) => b - a));
    const assets = await listAuditEvents(database.prisma, { entity: "asset" });
    expect(assets.events.map((event) => event.action)).toEqual(["asset.update", "asset.create"]);
    expect((await listAuditEvents(database.prisma, { entity: "asset", entityId: "E-0000" })).total).toBe(0);
    const cli = await listAuditEvents(database.prisma, { actor: "CLI:" });
    expect(cli.events.map((event) => event.summary)).toEqual(["created user cli-made@test.example with role viewer"]);
    const second = await listAuditEvents(database.prisma, { pageSize: 3, page: 2 });
    expect(second).toMatchObject({ page: 2, pageSize: 3, pages: Math.ceil(all.total / 3) });
    expect(second.events.map((event) => event.id)).toEqual(ids.slice(3, 6));
    // a page past the end shows the last page
    expect((await listAuditEvents(database.prisma, { pageSize: 3, page: 10_000 })).page).toBe(Math.ceil(all.total / 3));
  });
});
