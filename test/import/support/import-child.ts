// A separate process that imports a file and reports progress on stdout: the crash-safety test kills it mid-import.
// Usage: node --import tsx test/import/support/import-child.ts <database url> <asset tag> <file>
import fs from "node:fs";
import path from "node:path";
import { importReadings } from "../../../lib/data/import-readings";
import { createPrismaClient } from "../../../lib/db";

const [url, assetTag, file] = process.argv.slice(2);
if (!url || !assetTag || !file) {
  console.error("usage: import-child.ts <database url> <asset tag> <file>");
  process.exit(2);
}
const prisma = createPrismaClient(url);
try {
  const summary = await importReadings(prisma, {
    assetTag,
    source: "cli",
    createdBy: "crash-test",
    fileName: path.basename(file),
    stream: fs.createReadStream(file),
    onProgress: ({ rowsRead }) => process.stdout.write(`progress ${rowsRead}\n`),
  });
  process.stdout.write(`done ${JSON.stringify({ rowsNew: summary.rowsNew, rowsChanged: summary.rowsChanged })}\n`);
} finally {
  await prisma.$disconnect();
}
