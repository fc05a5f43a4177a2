import { SequelizeStorage, Umzug } from "umzug";
import type { Sequelize } from "sequelize";
import { migrations } from "@/migrations";

export function migrator(sequelize: Sequelize) {
  return new Umzug({
    migrations,
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize, tableName: "schema_migrations" }),
    logger: undefined,
  });
}

export async function migrateUp(sequelize: Sequelize) {
  return migrator(sequelize).up();
}
