import type { MigrationFn } from '@/lib/migrator';

export const up: MigrationFn = async ({ context: queryInterface }) => {
  await queryInterface.sequelize.query(`
    -- How a log's columns map to the circuit's tags. Saved from one upload and offered again for
    -- any log of the circuit with the same columns, so it outlives the upload it came from.
    create table log_mappings (
      id uuid primary key default gen_random_uuid(),
      circuit_id uuid not null references circuits(id) on delete cascade,
      upload_id uuid unique references uploads(id) on delete set null,
      name text not null check (length(name) between 1 and 120),
      mapping jsonb not null,
      columns_signature char(64) not null,
      revision integer not null default 1 check (revision >= 1),
      updated_by_id uuid not null references users(id),
      created_at timestamptz not null default now(),
      updated_at timestamptz not null default now()
    );
    create index log_mappings_circuit_signature_idx on log_mappings (circuit_id, columns_signature);

    create table fault_searches (
      id uuid primary key default gen_random_uuid(),
      upload_id uuid not null references uploads(id) on delete cascade,
      revision_id uuid not null references circuit_revisions(id) on delete cascade,
      -- The mapping as it was when the search started; the saved one may change since.
      mapping jsonb not null,
      status text not null default 'queued' check (status in ('queued', 'running', 'succeeded', 'failed', 'cancelled')),
      progress jsonb,
      result jsonb,
      error text,
      created_by_id uuid not null references users(id),
      started_at timestamptz,
      finished_at timestamptz,
      created_at timestamptz not null default now(),
      updated_at timestamptz not null default now(),
      check ((status in ('succeeded', 'failed', 'cancelled')) = (finished_at is not null))
    );
    create index fault_searches_upload_created_idx on fault_searches (upload_id, created_at desc);

    -- A replay is a run of kind 'replay' of one uploaded log; it goes with its log.
    alter table runs add column upload_id uuid references uploads(id) on delete cascade;
    create index runs_upload_idx on runs (upload_id, created_at desc) where upload_id is not null;
  `);
};

export const down: MigrationFn = async ({ context: queryInterface }) => {
  await queryInterface.sequelize.query(`
    drop index if exists runs_upload_idx;
    alter table runs drop column if exists upload_id;
    drop table if exists fault_searches;
    drop table if exists log_mappings;
  `);
};
