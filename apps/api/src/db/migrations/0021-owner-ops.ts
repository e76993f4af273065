import type { MigrationFn } from 'umzug';
import type { QueryInterface } from 'sequelize';

// The owner's back office: changing a bake day after it is announced,
// calling one off as a resumable job, telling subscribers about new bake
// days, and the outbox headers that one-click unsubscribing needs.
export const up: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.sequelize.query(`
    -- a window taken off a bake day that still has orders in it stays for
    -- those orders (they are asked to pick another) but takes no new ones
    ALTER TABLE pickup_windows ADD COLUMN removed_at timestamptz;

    -- after the owner changes a paid order's window or place, its customer may
    -- move or cancel it with a full refund until this time, cut-off or not
    ALTER TABLE orders ADD COLUMN change_grace_until timestamptz;

    -- when subscribers were told that this bake day's orders are open (once)
    ALTER TABLE bake_days
      ADD COLUMN announced_at timestamptz,
      ADD COLUMN called_off_at timestamptz,
      ADD COLUMN called_off_reason text;
    -- days already open before this migration were announced the old way
    UPDATE bake_days SET announced_at = orders_open_at WHERE status = 'published' AND orders_open_at <= now();

    ALTER TABLE outbox ADD COLUMN headers jsonb NOT NULL DEFAULT '{}';

    -- long-running work (calling off a bake day), claimed by the API's job
    -- runner with FOR UPDATE SKIP LOCKED; a lease that runs out lets another
    -- process (or this one after a restart) pick it up where it stopped
    CREATE TABLE jobs (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      kind text NOT NULL CHECK (kind IN ('call-off')),
      subject_id uuid NOT NULL,
      state text NOT NULL DEFAULT 'queued' CHECK (state IN ('queued', 'running', 'done', 'failed')),
      total integer NOT NULL DEFAULT 0 CHECK (total >= 0),
      done integer NOT NULL DEFAULT 0 CHECK (done >= 0),
      payload jsonb NOT NULL DEFAULT '{}',
      locked_by text,
      locked_until timestamptz,
      attempts integer NOT NULL DEFAULT 0,
      last_error text,
      created_by uuid REFERENCES users(id) ON DELETE SET NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      finished_at timestamptz,
      CHECK (done <= total)
    );
    CREATE UNIQUE INDEX jobs_one_per_subject ON jobs (kind, subject_id);
    CREATE INDEX jobs_due ON jobs (created_at) WHERE state IN ('queued', 'running');

    -- each piece of a job, done at most once: its effect and its 'done' mark
    -- commit together
    CREATE TABLE job_items (
      job_id uuid NOT NULL REFERENCES jobs(id) ON DELETE CASCADE,
      position integer NOT NULL,
      kind text NOT NULL CHECK (kind IN ('order', 'person')),
      ref_id uuid NOT NULL,
      state text NOT NULL DEFAULT 'pending' CHECK (state IN ('pending', 'done')),
      attempts integer NOT NULL DEFAULT 0,
      last_error text,
      done_at timestamptz,
      PRIMARY KEY (job_id, position),
      UNIQUE (job_id, kind, ref_id)
    );

    -- people who asked to hear about new bake days (double opt-in)
    CREATE TABLE announcement_subscribers (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      email text NOT NULL,
      user_id uuid REFERENCES users(id) ON DELETE SET NULL,
      status text NOT NULL DEFAULT 'pending' CHECK (status IN ('pending', 'confirmed', 'unsubscribed')),
      confirm_token text NOT NULL UNIQUE,
      unsubscribe_token text NOT NULL UNIQUE,
      confirm_sent_at timestamptz,
      confirmed_at timestamptz,
      unsubscribed_at timestamptz,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE UNIQUE INDEX announcement_subscribers_email ON announcement_subscribers (lower(email));
  `);
};

export const down: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.sequelize.query(`
    DROP TABLE IF EXISTS announcement_subscribers, job_items, jobs;
    ALTER TABLE outbox DROP COLUMN IF EXISTS headers;
    ALTER TABLE bake_days DROP COLUMN IF EXISTS announced_at, DROP COLUMN IF EXISTS called_off_at, DROP COLUMN IF EXISTS called_off_reason;
    ALTER TABLE orders DROP COLUMN IF EXISTS change_grace_until;
    ALTER TABLE pickup_windows DROP COLUMN IF EXISTS removed_at;
  `);
};
