import type { MigrationFn } from '@/lib/migrator';

// Plain SQL keeps the schema readable and lets us add checks and the immutability trigger.
export const up: MigrationFn = async ({ context: queryInterface }) => {
  await queryInterface.sequelize.query(`
    create table users (
      id uuid primary key default gen_random_uuid(),
      email text not null unique check (email = lower(email)),
      name text not null,
      password_hash text not null,
      created_at timestamptz not null default now(),
      updated_at timestamptz not null default now()
    );

    create table workspaces (
      id uuid primary key default gen_random_uuid(),
      name text not null,
      slug text not null unique,
      created_at timestamptz not null default now(),
      updated_at timestamptz not null default now()
    );

    create table memberships (
      id uuid primary key default gen_random_uuid(),
      user_id uuid not null references users(id) on delete cascade,
      workspace_id uuid not null references workspaces(id) on delete cascade,
      role text not null check (role in ('owner', 'engineer', 'reviewer', 'technician', 'viewer')),
      created_at timestamptz not null default now(),
      updated_at timestamptz not null default now(),
      unique (user_id, workspace_id)
    );
    create index memberships_workspace_idx on memberships (workspace_id);

    create table circuits (
      id uuid primary key default gen_random_uuid(),
      workspace_id uuid not null references workspaces(id) on delete cascade,
      title text not null check (length(title) between 1 and 120),
      description text not null default '',
      current_revision_id uuid,
      current_revision_number integer not null default 0,
      lock_version integer not null default 0,
      created_by_id uuid not null references users(id),
      created_at timestamptz not null default now(),
      updated_at timestamptz not null default now()
    );
    create index circuits_workspace_updated_idx on circuits (workspace_id, updated_at desc);
    create index circuits_workspace_title_idx on circuits (workspace_id, lower(title));

    create table circuit_revisions (
      id uuid primary key default gen_random_uuid(),
      circuit_id uuid not null references circuits(id) on delete cascade,
      number integer not null check (number >= 1),
      document jsonb not null,
      author_id uuid not null references users(id),
      message text not null default '',
      created_at timestamptz not null default now(),
      unique (circuit_id, number)
    );
    alter table circuits add constraint circuits_current_revision_fk
      foreign key (current_revision_id) references circuit_revisions(id) deferrable initially deferred;

    create function circuit_revisions_immutable() returns trigger language plpgsql as $$
    begin
      raise exception 'circuit revisions are immutable; create a new revision instead';
    end $$;
    create trigger circuit_revisions_no_update before update on circuit_revisions
      for each row execute function circuit_revisions_immutable();

    create table comments (
      id uuid primary key default gen_random_uuid(),
      circuit_id uuid not null references circuits(id) on delete cascade,
      revision_id uuid references circuit_revisions(id) on delete set null,
      parent_id uuid references comments(id) on delete cascade,
      author_id uuid not null references users(id),
      anchor jsonb not null,
      body text not null check (length(body) between 1 and 10000),
      resolved_at timestamptz,
      resolved_by_id uuid references users(id),
      created_at timestamptz not null default now(),
      updated_at timestamptz not null default now()
    );
    create index comments_circuit_created_idx on comments (circuit_id, created_at);

    create table runs (
      id uuid primary key default gen_random_uuid(),
      revision_id uuid not null references circuit_revisions(id) on delete cascade,
      kind text not null check (kind in ('live', 'scenario', 'proof', 'replay')),
      status text not null check (status in ('queued', 'running', 'succeeded', 'failed', 'cancelled')),
      inputs jsonb not null,
      summary jsonb,
      trace_key text,
      created_by_id uuid not null references users(id),
      finished_at timestamptz,
      created_at timestamptz not null default now(),
      updated_at timestamptz not null default now()
    );
    create index runs_revision_created_idx on runs (revision_id, created_at desc);

    create table uploads (
      id uuid primary key default gen_random_uuid(),
      workspace_id uuid not null references workspaces(id) on delete cascade,
      circuit_id uuid references circuits(id) on delete cascade,
      uploaded_by_id uuid not null references users(id),
      file_name text not null,
      content_type text not null,
      size_bytes bigint not null check (size_bytes >= 0),
      sha256 char(64) not null,
      storage_key text not null unique,
      created_at timestamptz not null default now()
    );
    create index uploads_circuit_created_idx on uploads (circuit_id, created_at desc);

    create table audit_events (
      id bigserial primary key,
      workspace_id uuid references workspaces(id) on delete cascade,
      actor_id uuid references users(id) on delete set null,
      action text not null,
      target_type text,
      target_id text,
      data jsonb not null default '{}',
      created_at timestamptz not null default now()
    );
    create index audit_events_workspace_created_idx on audit_events (workspace_id, created_at desc);
    create index audit_events_actor_created_idx on audit_events (actor_id, created_at desc);
  `);
};

export const down: MigrationFn = async ({ context: queryInterface }) => {
  await queryInterface.sequelize.query(`
    drop table if exists audit_events;
    drop table if exists uploads;
    drop table if exists runs;
    drop table if exists comments;
    alter table if exists circuits drop constraint if exists circuits_current_revision_fk;
    drop table if exists circuit_revisions;
    drop function if exists circuit_revisions_immutable();
    drop table if exists circuits;
    drop table if exists memberships;
    drop table if exists workspaces;
    drop table if exists users;
  `);
};
