import type { MigrationFn } from '@/lib/migrator';

export const up: MigrationFn = async ({ context: queryInterface }) => {
  await queryInterface.sequelize.query(`
    -- Set when the author changes the body, so readers can tell an edited comment from the original.
    alter table comments add column edited_at timestamptz;

    alter table runs add column name text check (length(name) between 1 and 120);
  `);
};

export const down: MigrationFn = async ({ context: queryInterface }) => {
  await queryInterface.sequelize.query(`
    alter table runs drop column if exists name;
    alter table comments drop column if exists edited_at;
  `);
};
