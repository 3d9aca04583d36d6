import { AccessDenied } from "@/app/_components/access-denied";
import { requireSignedInUser } from "@/lib/auth/current-user";
import { can, ROLE_DESCRIPTIONS, ROLES } from "@/lib/auth/permissions";
import { MAX_PASSWORD_LENGTH, MIN_PASSWORD_LENGTH } from "@/lib/data/create-user";
import { listUsers } from "@/lib/data/list-users";
import { getPrisma } from "@/lib/db";
import { changeUserRoleAction, createUserAction, removeUserAction, setUserPasswordAction } from "./actions";

export const dynamic = "force-dynamic";

export default async function UsersPage({ searchParams }: { searchParams: Promise<{ saved?: string; error?: string }> }) {
  const user = await requireSignedInUser();
  if (!can(user.role, "users.manage")) return <AccessDenied user={user} permission="users.manage" />;
  const { saved, error } = await searchParams;
  const users = await listUsers(getPrisma());
  return (
    <>
      <h1>Users</h1>
      {saved ? <p className="notice" role="status">{saved}</p> : null}
      {error ? <p className="form-errors" role="alert">Not saved: {error}</p> : null}
      <dl className="facts panel">
        {ROLES.map((role) => [<dt key={`${role}-term`}>{role}</dt>, <dd key={`${role}-text`}>{ROLE_DESCRIPTIONS[role]}</dd>])}
      </dl>
      <h2>Accounts</h2>
      <table className="grid" aria-label="User accounts">
        <thead>
          <tr><th scope="col">Email</th><th scope="col">Name</th><th scope="col">Created</th><th scope="col">Signed in since</th><th scope="col">Role</th><th scope="col">New password</th><th scope="col">Remove</th></tr>
        </thead>
        <tbody>
          {users.map((row) => (
            <tr key={row.id}>
              <td>{row.email}</td>
              <td>{row.name}</td>
              <td>{row.createdAt.slice(0, 10)}</td>
              <td>{row.activeSince ? row.activeSince.slice(0, 16).replace("T", " ") + " UTC" : "—"}</td>
              <td>
                <form action={changeUserRoleAction} className="actions">
                  <input type="hidden" name="userId" value={row.id} />
                  <label className="visually-hidden" htmlFor={`role-${row.id}`}>Role of {row.email}</label>
                  <select id={`role-${row.id}`} name="role" defaultValue={row.role}>
                    {ROLES.map((role) => <option key={role} value={role}>{role}</option>)}
                  </select>
                  <button type="submit">Change role</button>
                </form>
              </td>
              <td>
                <form action={setUserPasswordAction} className="actions">
                  <input type="hidden" name="userId" value={row.id} />
                  <label className="visually-hidden" htmlFor={`password-${row.id}`}>New password for {row.email}</label>
                  <input id={`password-${row.id}`} name="password" type="password" required minLength={MIN_PASSWORD_LENGTH} maxLength={MAX_PASSWORD_LENGTH} autoComplete="new-password" />
                  <button type="submit">Set password</button>
                </form>
              </td>
              <td>
                {row.id === user.id ? (
                  <span className="subtle">your account</span>
                ) : (
                  <form action={removeUserAction} className="actions">
                    <input type="hidden" name="userId" value={row.id} />
                    <input type="hidden" name="email" value={row.email} />
                    <label>
                      <input type="checkbox" name="confirm" value="yes" required /> confirm<span className="visually-hidden"> removing {row.email}</span>
                    </label>
                    <button type="submit">Remove</button>
                  </form>
                )}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      <h2>New user</h2>
      <form action={createUserAction} className="inline-form panel">
        <label>Email <input name="email" type="email" required autoComplete="off" /></label>
        <label>Name <input name="name" placeholder="optional" /></label>
        <label>
          Role
          <select name="role" defaultValue="viewer">
            {ROLES.map((role) => <option key={role} value={role}>{role}</option>)}
          </select>
        </label>
        <label>Initial password <input name="password" type="password" required minLength={MIN_PASSWORD_LENGTH} autoComplete="new-password" /></label>
        <button type="submit">Create user</button>
      </form>
      <p className="subtle">
        Give the initial or new password to the person directly. Setting a password ends every session of that user at once
        (your own too, for your own account). Removing a user deletes their account and sessions; the audit log keeps
        what they did. Every change here is written to the audit log.
      </p>
    </>
  );
}
