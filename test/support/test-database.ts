// A fresh database for one test file, cloned from the run's migrated template.
import { randomBytes } from "node:crypto";
import pg from "pg";
import { inject } from "vitest";
import type { PrismaClient } from "../../generated/prisma/client";
import { createPrismaClient } from "../../lib/db";

export interface TestDatabase {
  url: string;
  name: string;
  prisma: PrismaClient;
  drop(): Promise<void>;
}

function withDatabase(url: string, database: string): string {
  const parsed = new URL(url);
  parsed.pathname = `/${database}`;
  return parsed.toString();
}

export async function adminQuery(sql: string): Promise<void> {
  const admin = new pg.Client({ connectionString: inject("serverUrl") });
  await admin.connect();
  try {
    await admin.query(sql);
  } finally {
    await admin.end();
  }
}

export async function createTestDatabase(): Promise<TestDatabase> {
  const template = inject("templateDatabase");
  const name = `${template}_${randomBytes(4).toString("hex")}`;
  // Cloning a template needs no other session on it; retry briefly if another file is cloning at the same moment.
  for (let attempt = 0; ; attempt++) {
    try {
      await adminQuery(`create database "${name}" template "${template}"`);
      break;
    } catch (error) {
      if (attempt >= 20 || !String((error as Error).message).includes("being accessed by other users")) throw error;
      await new Promise((resolve) => setTimeout(resolve, 100 + Math.random() * 200));
    }
  }
  const url = withDatabase(inject("serverUrl"), name);
  const prisma = createPrismaClient(url);
  return {
    url,
    name,
    prisma,
    drop: async () => {
      await prisma.$disconnect();
      await adminQuery(`drop database if exists "${name}" with (force)`);
    },
  };
}
