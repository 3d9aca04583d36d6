// The role model: which role may do what. Pure (no framework, no database), so
// pages, actions, route handlers, the CLI and tests share one table.

export const ROLES = ["viewer", "engineer", "planner", "admin"] as const;
export type Role = (typeof ROLES)[number];

/** What a request wants to do. "read" is every page and GET route. */
export const PERMISSIONS = {
  read: ["viewer", "engineer", "planner", "admin"],
  "assets.edit": ["engineer", "admin"],
  "data.import": ["engineer", "admin"],
  "cleanings.record": ["engineer", "admin"],
  "alerts.acknowledge": ["engineer", "admin"],
  "plan.run": ["planner", "admin"],
  "bookings.edit": ["planner", "admin"],
  "calendar.edit": ["planner", "admin"],
  "audit.read": ["engineer", "planner", "admin"],
  "users.manage": ["admin"],
} as const satisfies Record<string, readonly Role[]>;
export type Permission = keyof typeof PERMISSIONS;

/** One line per role, for the admin page and the README table. */
export const ROLE_DESCRIPTIONS: Record<Role, string> = {
  viewer: "reads the fleet, assessments, imports and plans; changes nothing",
  engineer: "imports data, edits the asset register, records cleanings, acknowledges alerts; reads the audit log",
  planner: "runs the cleaning planner, accepts, locks and moves bookings, edits calendar windows; reads the audit log",
  admin: "everything, plus user accounts and roles",
};

export function isRole(value: unknown): value is Role {
  return typeof value === "string" && (ROLES as readonly string[]).includes(value);
}

export function isPermission(value: unknown): value is Permission {
  return typeof value === "string" && Object.hasOwn(PERMISSIONS, value);
}

/** Whether `role` may do `permission`; an unknown role (a hand-edited row) may do nothing. */
export function can(role: string, permission: Permission): boolean {
  return isRole(role) && (PERMISSIONS[permission] as readonly Role[]).includes(role);
}
