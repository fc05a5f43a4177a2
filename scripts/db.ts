import "./load-env";
import { env } from "@/lib/env";
import { prepareDatabase, removeDatabase } from "@/lib/setup";

const command = process.argv[2];

async function main() {
  const { DATABASE_PATH, BCRYPT_COST } = env();
  switch (command) {
    case "migrate":
      await prepareDatabase(DATABASE_PATH, { seed: false, bcryptCost: BCRYPT_COST });
      console.log(`Migrated ${DATABASE_PATH}.`);
      break;
    case "seed": {
      const { logins } = await prepareDatabase(DATABASE_PATH, { seed: true, bcryptCost: BCRYPT_COST });
      console.log(`Seeded the demo into ${DATABASE_PATH} (${logins.length} sample logins).`);
      break;
    }
    case "reset":
      removeDatabase(DATABASE_PATH);
      await prepareDatabase(DATABASE_PATH, { seed: true, bcryptCost: BCRYPT_COST });
      console.log(`Deleted, re-created and seeded ${DATABASE_PATH}.`);
      break;
    default:
      console.error("Usage: tsx scripts/db.ts migrate|seed|reset");
      process.exit(2);
  }
}

main().catch((error) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
