import type { MigrationFn } from '@/lib/migrator';

export const up: MigrationFn = async ({ context: queryInterface }) => {
  await queryInterface.sequelize.query(`
    create table review_requests (
      id uuid primary key default gen_random_uuid(),
      circuit_id uuid not null references circuits(id) on delete cascade,
      revision_id uuid not null references circuit_revisions(id) on delete cascade,
      requested_by_id uuid not null references users(id),
      message text not null check (length(message) between 1 and 2000),
      state text not null default 'requested' check (state in ('requested', 'approved', 'changes_requested', 'withdrawn')),
      stale boolean not null default false,
      stale_at timestamptz,
      decided_by_id uuid references users(id),
      decided_at timestamptz,
      decision_note text check (length(decision_note) <= 2000),
      created_at timestamptz not null default now(),
      updated_at timestamptz not null default now(),
      check (stale = (stale_at is not null)),
      -- A decision always names who made it and when; no other state does.
      check ((state in ('approved', 'changes_requested')) = (decided_by_id is not null and decided_at is not null))
    );
    create index review_requests_circuit_created_idx on review_requests (circuit_id, created_at desc);
    create index review_requests_revision_created_idx on review_requests (revision_id, created_at desc);
    create index review_requests_requester_created_idx on review_requests (requested_by_id, created_at desc);

    create table review_request_reviewers (
      review_request_id uuid not null references review_requests(id) on delete cascade,
      reviewer_id uuid not null references users(id) on delete cascade,
      primary key (review_request_id, reviewer_id)
    );
    create index review_request_reviewers_reviewer_idx on review_request_reviewers (reviewer_id);
  `);
};

export const down: MigrationFn = async ({ context: queryInterface }) => {
  await queryInterface.sequelize.query(`
    drop table if exists review_request_reviewers;
    drop table if exists review_requests;
  `);
};
