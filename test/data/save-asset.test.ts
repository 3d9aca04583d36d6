import fs from "node:fs";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { exportAssetFile } from "../../lib/data/export-asset-file";
import { listAssetRevisions } from "../../lib/data/list-asset-revisions";
import { AssetRegisterError, createAsset, parseAssetFile, updateAsset } from "../../lib/data/save-asset";
import { createTestDatabase, type TestDatabase } from "../support/test-database";

let database: TestDatabase;
const example = () => JSON.parse(fs.readFileSync("docs/examples/asset-e-4101.json", "utf8")) as Record<string, unknown>;

beforeAll(async () => {
  database = await createTestDatabase();
});
afterAll(async () => {
  await database.drop();
});

describe("createAsset and updateAsset", () => {
  it("creates the asset with its site, unit and instruments in SI, and records the creation", async () => {
    const result = await createAsset(database.prisma, parseAssetFile(example()), "test:alice");
    expect(result.action).toBe("created");
    const stored = await database.prisma.asset.findUniqueOrThrow({ where: { tag: "E-4101" }, include: { instruments: true, unit: { include: { site: true } } } });
    expect(stored.unit.code).toBe("NSU-4");
    expect(stored.unit.site.timeZone).toBe("Europe/Amsterdam");
    expect(stored.coldCpKind).toBe("water");
    expect(stored.coldCpPressurePa).toBe(4.5e5);
    expect(stored.cleaningCostCents).toBe(1_800_000);
    expect(stored.instruments).toHaveLength(6);
    const [revision] = (await listAssetRevisions(database.prisma, "E-4101")) ?? [];
    expect(revision).toMatchObject({ changedBy: "test:alice", action: "created" });
    expect(Object.keys(revision?.changes ?? {})).toEqual(expect.arrayContaining(["areaM2", "instruments", "unit"]));
  });

  it("refuses to create a tag that exists, and to update one that does not, changing nothing", async () => {
    await expect(createAsset(database.prisma, parseAssetFile(example()), "test")).rejects.toThrow(new AssetRegisterError("asset E-4101 already exists; use update to change it"));
    const unknown = { ...example(), tag: "E-9999" };
    await expect(updateAsset(database.prisma, parseAssetFile(unknown), "test")).rejects.toThrow("asset E-9999 does not exist; use add to create it");
    expect(await database.prisma.asset.count()).toBe(1);
  });

  it("refuses an unknown site or unit given only by code", async () => {
    const raw = { ...example(), tag: "E-4102", site: "NOPE" };
    await expect(createAsset(database.prisma, parseAssetFile(raw), "test")).rejects.toThrow('unknown site "NOPE"; give "site": { "code", "name", "timeZone" } to create it');
    expect(await database.prisma.asset.count()).toBe(1);
  });

  it("round-trips through export: loading the exported file back changes nothing", async () => {
    const exported = await exportAssetFile(database.prisma, "E-4101");
    const result = await updateAsset(database.prisma, parseAssetFile(exported), "test:bob");
    expect(result).toEqual({ tag: "E-4101", action: "unchanged", changedFields: [] });
    expect(await listAssetRevisions(database.prisma, "E-4101")).toHaveLength(1);
  });

  it("records only the fields that changed, with before and after values, newest first", async () => {
    const raw = example();
    raw.area = { value: 130, unit: "m2" };
    raw.instruments = (raw.instruments as { role: string }[]).filter((instrument) => instrument.role !== "coldOut");
    const result = await updateAsset(database.prisma, parseAssetFile(raw), "test:carol");
    expect(result.action).toBe("updated");
    expect(result.changedFields.sort()).toEqual(["areaM2", "instruments"]);
    const [latest] = (await listAssetRevisions(database.prisma, "E-4101")) ?? [];
    expect(latest?.changedBy).toBe("test:carol");
    // NIST SP 811 B.8: 1292 ft² = 120.030 727 68 m² (exact)
    expect(latest?.changes.areaM2).toEqual({ before: 120.03072768, after: 130 });
    expect(await database.prisma.instrument.count()).toBe(5);
  });
});
