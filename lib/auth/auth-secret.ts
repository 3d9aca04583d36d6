// The key that signs session cookies: BETTER_AUTH_SECRET when set, otherwise a
// random one made on first start and kept in .foulcast/auth-secret (git-ignored).
import { randomBytes } from "node:crypto";
import fs from "node:fs";
import path from "node:path";
import { projectRoot } from "../database/connection-settings";

export function authSecretFile(): string {
  return path.resolve(projectRoot(), process.env.FOULCAST_AUTH_SECRET_FILE ?? ".foulcast/auth-secret");
}

/** The signing secret; creates the file (mode 600) when neither it nor the env var exists. */
export function authSecret(): string {
  const fromEnv = process.env.BETTER_AUTH_SECRET?.trim();
  if (fromEnv) return fromEnv;
  const file = authSecretFile();
  try {
    return readSecret(file);
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code !== "ENOENT") throw error;
  }
  fs.mkdirSync(path.dirname(file), { recursive: true });
  try {
    // 32 random bytes, base64url: 256 bits. "wx" fails if another process wrote it first; then read theirs.
    fs.writeFileSync(file, `${randomBytes(32).toString("base64url")}\n`, { flag: "wx", mode: 0o600 });
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code !== "EEXIST") throw error;
  }
  return readSecret(file);
}

function readSecret(file: string): string {
  const secret = fs.readFileSync(file, "utf8").trim();
  if (secret.length < 32) throw new Error(`${file} holds a secret shorter than 32 characters; delete the file to make a new one, or set BETTER_AUTH_SECRET`);
  return secret;
}
