import { requireSignedInUser } from "@/lib/auth/current-user";
import { formatQuantity, UNIT_SYSTEM_LABELS } from "@/lib/present/display-units";
import { setUnitSystemAction } from "./actions";

export const dynamic = "force-dynamic";

/** Example values shown beside each choice: a 1 MW duty, U of 400 W/(m²·K), Rf of 3.5×10⁻⁴ m²·K/W, 150 °C. */
const EXAMPLE = { dutyW: 1e6, uWPerM2K: 400, foulingM2KPerW: 3.5e-4, temperatureK: 423.15 };

export default async function AccountPage({ searchParams }: { searchParams: Promise<{ saved?: string; error?: string }> }) {
  const user = await requireSignedInUser();
  const { saved, error } = await searchParams;
  return (
    <>
      <h1>Your account</h1>
      <dl className="facts">
        <dt>Email</dt><dd>{user.email}</dd>
        <dt>Name</dt><dd>{user.name}</dd>
        <dt>Role</dt><dd>{user.role}</dd>
      </dl>
      <h2 id="units-heading">Units</h2>
      {saved ? <p className="notice" role="status">Units saved.</p> : null}
      {error ? <p className="form-errors" role="alert">Not saved: {error}</p> : null}
      <form action={setUnitSystemAction} className="panel units-form" aria-labelledby="units-heading">
        <fieldset>
          <legend>Show quantities in</legend>
          {(["si", "us"] as const).map((system) => (
            <label key={system} className="choice">
              <input type="radio" name="unitSystem" value={system} defaultChecked={user.unitSystem === system} />
              <span>
                {UNIT_SYSTEM_LABELS[system]}
                <span className="subtle small">
                  {" "}e.g. {formatQuantity(system, "duty", EXAMPLE.dutyW)}, {formatQuantity(system, "u", EXAMPLE.uWPerM2K)}, {formatQuantity(system, "foulingResistance", EXAMPLE.foulingM2KPerW)}, {formatQuantity(system, "temperature", EXAMPLE.temperatureK, 4)}
                </span>
              </span>
            </label>
          ))}
        </fieldset>
        <p className="subtle">Money stays in each site&apos;s currency; dates in each site&apos;s time zone. Stored values and the JSON API stay SI.</p>
        <button type="submit" className="primary">Save units</button>
      </form>
    </>
  );
}
