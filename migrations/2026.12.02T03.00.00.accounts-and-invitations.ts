import type { MigrationFn } from '@/lib/migrator';

export const up: MigrationFn = async ({ context: queryInterface }) => {
  await queryInterface.sequelize.query(`
    create table invitations (
      id uuid primary key default gen_random_uuid(),
      workspace_id uuid not null references workspaces(id) on delete cascade,
      email text not null check (email = lower(email)),
      role text not null check (role in ('owner', 'engineer', 'reviewer', 'technician', 'viewer')),
      token_hash char(64) not null unique,
      invited_by_id uuid not null references users(id),
      expires_at timestamptz not null,
      accepted_at timestamptz,
      accepted_by_id uuid references users(id),
      revoked_at timestamptz,
      created_at timestamptz not null default now()
    );
    create index invitations_workspace_created_idx on invitations (workspace_id, created_at desc);

    create table password_reset_tokens (
      id uuid primary key default gen_random_uuid(),
      user_id uuid not null references users(id) on delete cascade,
      token_hash char(64) not null unique,
      expires_at timestamptz not null,
      used_at timestamptz,
      created_at timestamptz not null default now()
    );
    create index password_reset_tokens_user_idx on password_reset_tokens (user_id);

    -- Counters of rate-limiter-flexible (its own column layout).
    create table rate_limits (
      key varchar(255) primary key,
      points integer not null default 0,
      expire bigint
    );
  `);
};

export const down: MigrationFn = async ({ context: queryInterface }) => {
  await queryInterface.sequelize.query(`
    drop table if exists rate_limits;
    drop table if exists password_reset_tokens;
    drop table if exists invitations;
  `);
};
