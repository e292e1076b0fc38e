import type { MigrationFn } from '@/lib/migrator';

export const up: MigrationFn = async ({ context: queryInterface }) => {
  await queryInterface.sequelize.query(`
    -- One rules text per circuit, bound again to whichever revision it is used with.
    create table circuit_rules (
      circuit_id uuid primary key references circuits(id) on delete cascade,
      text text not null check (length(text) <= 100000),
      revision integer not null check (revision >= 1),
      updated_by_id uuid not null references users(id),
      created_at timestamptz not null default now(),
      updated_at timestamptz not null default now()
    );

    create table scenarios (
      id uuid primary key default gen_random_uuid(),
      circuit_id uuid not null references circuits(id) on delete cascade,
      name text not null check (length(name) between 1 and 120),
      inputs jsonb not null,
      until_s double precision not null check (until_s > 0),
      expectations text not null check (length(expectations) <= 100000),
      revision integer not null default 1 check (revision >= 1),
      created_by_id uuid not null references users(id),
      updated_by_id uuid not null references users(id),
      created_at timestamptz not null default now(),
      updated_at timestamptz not null default now()
    );
    create unique index scenarios_circuit_name_idx on scenarios (circuit_id, lower(name));

    create table proofs (
      id uuid primary key default gen_random_uuid(),
      revision_id uuid not null references circuit_revisions(id) on delete cascade,
      rules_text text not null check (length(rules_text) <= 100000),
      variations jsonb not null,
      quantum_s double precision not null check (quantum_s > 0),
      steps integer not null check (steps >= 1),
      settle_s double precision not null check (settle_s >= 0),
      status text not null default 'queued' check (status in ('queued', 'running', 'succeeded', 'failed', 'cancelled')),
      progress jsonb,
      result jsonb,
      error text,
      created_by_id uuid not null references users(id),
      started_at timestamptz,
      finished_at timestamptz,
      created_at timestamptz not null default now(),
      updated_at timestamptz not null default now(),
      -- A finished proof says when; a queued or running one does not.
      check ((status in ('succeeded', 'failed', 'cancelled')) = (finished_at is not null))
    );
    create index proofs_revision_created_idx on proofs (revision_id, created_at desc);

    -- A counterexample of a proof is a run of kind 'proof'; it goes with its proof.
    alter table runs add column proof_id uuid references proofs(id) on delete cascade;
    create index runs_proof_idx on runs (proof_id) where proof_id is not null;
  `);
};

export const down: MigrationFn = async ({ context: queryInterface }) => {
  await queryInterface.sequelize.query(`
    drop index if exists runs_proof_idx;
    alter table runs drop column if exists proof_id;
    drop table if exists proofs;
    drop table if exists scenarios;
    drop table if exists circuit_rules;
  `);
};
