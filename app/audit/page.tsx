import Link from "next/link";
import { AccessDenied } from "@/app/_components/access-denied";
import { requireSignedInUser } from "@/lib/auth/current-user";
import { can } from "@/lib/auth/permissions";
import { listAuditEvents } from "@/lib/data/list-audit-events";
import { getPrisma } from "@/lib/db";

export const dynamic = "force-dynamic";

const ENTITIES = ["asset", "import", "cleaning", "alert", "plan", "booking", "calendar", "user"];

type Search = { entity?: string; entityId?: string; actor?: string; page?: string };

function pageLink(search: Search, page: number): string {
  const query = new URLSearchParams();
  for (const key of ["entity", "entityId", "actor"] as const) if (search[key]) query.set(key, search[key]);
  if (page > 1) query.set("page", String(page));
  const text = query.toString();
  return text ? `/audit?${text}` : "/audit";
}

const first = (value: string | string[] | undefined) => (Array.isArray(value) ? value[0] : value)?.trim() || undefined;

export default async function AuditPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const user = await requireSignedInUser();
  if (!can(user.role, "audit.read")) return <AccessDenied user={user} permission="audit.read" />;
  const raw = await searchParams;
  const search: Search = { entity: first(raw.entity), entityId: first(raw.entityId), actor: first(raw.actor), page: first(raw.page) };
  const result = await listAuditEvents(getPrisma(), { entity: search.entity, entityId: search.entityId, actor: search.actor, page: Number(search.page ?? 1) });
  return (
    <>
      <h1>Audit log</h1>
      <p className="subtle">Every change made in the web app, through the API or with the command line: who, when and what. Newest first. Times in UTC.</p>
      <form method="get" action="/audit" className="filters" role="search" aria-label="Filter the audit log">
        <label>
          Record kind
          <select name="entity" defaultValue={search.entity ?? ""}>
            <option value="">all</option>
            {ENTITIES.map((entity) => <option key={entity} value={entity}>{entity}</option>)}
          </select>
        </label>
        <label>
          Record id or tag
          <input name="entityId" defaultValue={search.entityId ?? ""} placeholder="E-1105" />
        </label>
        <label>
          Who (part of the name)
          <input name="actor" defaultValue={search.actor ?? ""} placeholder="engineer@ or cli:" />
        </label>
        <button type="submit">Filter</button>
        {search.entity || search.entityId || search.actor ? <Link href="/audit">Clear</Link> : null}
      </form>
      {result.events.length === 0 ? (
        <p className="empty">No audit events{search.entity || search.entityId || search.actor ? " match these filters" : " yet"}.</p>
      ) : (
        <table className="grid" aria-label="Audit events">
          <thead>
            <tr><th scope="col">When (UTC)</th><th scope="col">Who</th><th scope="col">Action</th><th scope="col">Record</th><th scope="col">What</th></tr>
          </thead>
          <tbody>
            {result.events.map((event) => (
              <tr key={event.id}>
                <td><time dateTime={event.at}>{event.at.slice(0, 19).replace("T", " ")}</time></td>
                <td><Link href={pageLink({ actor: event.actor }, 1)}>{event.actor}</Link></td>
                <td>{event.action}</td>
                <td><Link href={pageLink({ entity: event.entity, entityId: event.entityId }, 1)}>{event.entity} {event.entityId}</Link></td>
                <td>{event.summary}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
      <nav className="pager" aria-label="Pages">
        {result.page > 1 ? <Link href={pageLink(search, result.page - 1)} rel="prev">Newer</Link> : null}
        <span className="subtle">Page {result.page} of {result.pages} ({result.total.toLocaleString("en-US")} events)</span>
        {result.page < result.pages ? <Link href={pageLink(search, result.page + 1)} rel="next">Older</Link> : null}
      </nav>
    </>
  );
}
