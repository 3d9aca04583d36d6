import { describe, expect, it } from "vitest";
import { can, isPermission, isRole, PERMISSIONS, ROLES, type Permission } from "../../lib/auth/permissions";

const ALL = Object.keys(PERMISSIONS) as Permission[];
const allowed = (role: string) => ALL.filter((permission) => can(role, permission)).sort();

describe("can", () => {
  it("lets a viewer read and nothing else", () => {
    expect(allowed("viewer")).toEqual(["read"]);
  });

  it("lets an engineer import, edit assets, record cleanings, acknowledge alerts and read the audit log, but not plan or manage users", () => {
    // the role model of the brief: engineer = import data, edit assets, record cleanings, acknowledge alerts
    expect(allowed("engineer")).toEqual(["alerts.acknowledge", "assets.edit", "audit.read", "cleanings.record", "data.import", "read"]);
    expect(can("engineer", "plan.run")).toBe(false);
    expect(can("engineer", "users.manage")).toBe(false);
  });

  it("lets a planner run plans, edit bookings and calendar windows and read, but not change data or users", () => {
    expect(allowed("planner")).toEqual(["audit.read", "bookings.edit", "calendar.edit", "plan.run", "read"]);
    for (const permission of ["assets.edit", "data.import", "cleanings.record", "alerts.acknowledge", "users.manage"] as const) expect(can("planner", permission)).toBe(false);
  });

  it("lets an admin do everything", () => {
    expect(allowed("admin")).toEqual([...ALL].sort());
  });

  it("grants nothing to an unknown or empty role (a hand-edited row)", () => {
    for (const role of ["", "root", "Admin", "viewer "]) expect(allowed(role)).toEqual([]);
  });

  it("grants user management to admins only", () => {
    expect(ROLES.filter((role) => can(role, "users.manage"))).toEqual(["admin"]);
  });
});

describe("isRole and isPermission", () => {
  it("recognise exactly the listed names", () => {
    expect(ROLES.every(isRole)).toBe(true);
    expect(isRole("superuser")).toBe(false);
    expect(isPermission("plan.run")).toBe(true);
    expect(isPermission("toString")).toBe(false);
  });
});
