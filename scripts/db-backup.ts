// An online backup of the app's database (it may be running): a consistent copy with a
// timestamped name beside the database, or in the folder given, checked with integrity_check,
// plus a copy of the uploaded photos. Restore: README, "Backup and restore".
//
//   npm run db:backup                  # beside DATABASE_PATH
//   npm run db:backup -- /mnt/usb/sixteenths
import "./load-env";
import { backupDatabase } from "@/lib/backup";

async function main() {
  const source = process.env.DATABASE_PATH || "data/sixteenths.sqlite";
  const folder = process.argv[2];
  const result = await backupDatabase(source, folder);
  const mb = (result.bytes / 1024 / 1024).toFixed(2);
  console.log(`Backed up ${source}`);
  console.log(`  to ${result.file} (${mb} MB, ${result.bytes} bytes)`);
  console.log(`  integrity_check: ${result.integrity}`);
  console.log(result.uploads ? `  photos: ${result.uploads.files} files in ${result.uploads.folder}` : "  photos: none beside the database");
  console.log("  rows:");
  for (const table of result.tables) console.log(`    ${table.name.padEnd(28)} ${table.rows}`);
  if (result.integrity !== "ok") {
    console.error("The copy failed its integrity check: do not rely on it. Run the backup again.");
    process.exit(1);
  }
}

main().catch((error) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
