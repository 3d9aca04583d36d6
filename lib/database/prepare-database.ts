// One entry point for every process that needs the database (web server
// launcher, CLI, tests): find or start the server, then apply migrations.
import { databaseTarget } from "./connection-settings";
import { ensureEmbeddedServer, type EmbeddedHandle } from "./embedded-server";
import { migrate, type MigrationReport } from "./migrate";

export interface PreparedDatabase {
  url: string;
  embedded: EmbeddedHandle | null;
  migrations: MigrationReport;
  /** For the embedded server: stops it unless other clients still use it (see EmbeddedHandle.release). */
  release(): Promise<void>;
}

export async function prepareDatabase(options: { log?: (message: string) => void; migrate?: boolean } = {}): Promise<PreparedDatabase> {
  const target = databaseTarget();
  const embedded = target.kind === "embedded" ? await ensureEmbeddedServer(target, { log: options.log }) : null;
  const url = target.url;
  const migrations = options.migrate === false ? { applied: [], alreadyApplied: 0 } : await migrate(url);
  return {
    url,
    embedded,
    migrations,
    release: async () => {
      if (embedded) await embedded.release();
    },
  };
}
