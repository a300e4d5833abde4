/** `npm run seed`: adds the demo scenario (idempotent). `--if-empty` seeds only a fresh database. */
import { createDb } from "../db/client";
import { DEMO_PASSWORD, DEMO_PEOPLE, isEmpty, seedDemo } from "../db/seed";

const db = createDb(undefined, 1);
const printOnly = process.argv.includes("--print-only");
try {
  if (printOnly) {
    // only the sign-in list below
  } else if (process.argv.includes("--if-empty") && !(await isEmpty(db))) {
    console.log("seed: database already has accounts; demo left as it is");
  } else {
    const { created } = await seedDemo(db);
    console.log(`seed: demo ready (${created} account${created === 1 ? "" : "s"} added)`);
  }
  if (printOnly || process.argv.includes("--print")) {
    console.log(`demo sign-in (password for all: ${DEMO_PASSWORD})`);
    for (const p of DEMO_PEOPLE) console.log(`  ${p.role.padEnd(8)} ${p.email}`);
  }
} catch (err) {
  console.error(`seed: ${err instanceof Error ? err.message : String(err)}`);
  process.exitCode = 1;
} finally {
  await db.destroy();
}
