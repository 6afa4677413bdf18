import { QueryTypes } from 'sequelize';

import type { MigrationContext } from '../db/migrator';

/**
 * Review columns on deviations, and the indexes of the quality queue.
 *
 * recipe_id and step_kind are copies (of the run's recipe and of the step's kind in the run's
 * version) so the queue filters on its own table: a join to runs, or a look into the version's
 * JSON content, cannot use an index that also holds the sort order. Both are fixed when the
 * deviation is raised, as a run never changes recipe and a released version never changes.
 *
 * `revision` goes up with every change of the deviation's state (assignee, severity,
 * disposition, closure): it is part of the canonical record whose SHA-256 is the content hash a
 * signer reviews, so any such change makes an older hash stale. Comments do not bump it.
 */
export async function up({ context: { sequelize } }: { context: MigrationContext }) {
  await sequelize.query(`ALTER TABLE deviations
    ADD COLUMN recipe_id INT NULL AFTER run_id,
    ADD COLUMN step_kind VARCHAR(30) NULL AFTER step_id,
    ADD COLUMN assignee_id INT NULL,
    ADD COLUMN assigned_at DATETIME(3) NULL,
    ADD COLUMN revision INT NOT NULL DEFAULT 1,
    ADD COLUMN dispositioned_at DATETIME(3) NULL,
    ADD COLUMN closed_at DATETIME(3) NULL,
    ADD COLUMN closed_by INT NULL,
    ADD COLUMN closure_note TEXT NULL,
    ADD COLUMN closure_signature_id INT NULL`);
  await sequelize.query('UPDATE deviations d JOIN runs r ON r.id = d.run_id SET d.recipe_id = r.recipe_id');
  await backfillStepKinds(sequelize);
  await sequelize.query(`ALTER TABLE deviations
    MODIFY recipe_id INT NOT NULL,
    ADD CONSTRAINT deviations_recipe_fk FOREIGN KEY (recipe_id) REFERENCES recipes (id) ON DELETE RESTRICT,
    ADD CONSTRAINT deviations_assignee_fk FOREIGN KEY (assignee_id) REFERENCES users (id) ON DELETE RESTRICT,
    ADD CONSTRAINT deviations_closed_by_fk FOREIGN KEY (closed_by) REFERENCES users (id) ON DELETE RESTRICT,
    ADD CONSTRAINT deviations_closure_signature_fk FOREIGN KEY (closure_signature_id) REFERENCES signatures (id) ON DELETE RESTRICT`);
  await createQueueIndexes(sequelize);
  // A closed deviation is a final record: the service answers 409, and this refuses raw SQL too.
  await sequelize.query(`CREATE TRIGGER deviations_closed_frozen BEFORE UPDATE ON deviations FOR EACH ROW
    BEGIN
      IF OLD.state = 'closed' THEN
        SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'closed deviations are read-only';
      END IF;
    END`);
}

/**
 * The queue's first page, newest first (created_at DESC, id DESC), under its usual filters.
 * Each index starts with the equality filters and ends with the sort, so MariaDB reads the page
 * straight off the index and stops after it (no sort of every match):
 *   state (+ severity)   the daily view: open or in review, critical first by filter
 *   severity             one severity across states
 *   recipe (+ state)     one product's deviations
 *   created_by           one operator's (the person who raised it)
 *   created_at           date ranges and the unfiltered queue
 * A trailing `state` makes the counts per state (same filters, any state) read the index alone.
 * A run's own deviations are few, so the existing (run_id, rule, …) index serves that filter.
 * Text (q) uses a FULLTEXT index over title, expected and actual in boolean mode, every word
 * required as a prefix (textSearchPlan). LIKE '%word%' cannot use any index and would scan every
 * row at 100 000 deviations; a prefix index on title alone would miss words inside the text.
 * Words the index skips (under 3 characters, stopwords) fall back to LIKE, but only over the rows
 * the other filters and the full-text match have already narrowed down.
 */
async function createQueueIndexes(sequelize: MigrationContext['sequelize']) {
  for (const old of ['deviations_state', 'deviations_severity', 'deviations_created_at']) {
    await sequelize.query(`DROP INDEX ${old} ON deviations`);
  }
  const indexes: Record<string, string> = {
    deviations_queue_state: 'state, created_at DESC, id DESC',
    deviations_queue_state_severity: 'state, severity, created_at DESC, id DESC',
    deviations_queue_severity: 'severity, created_at DESC, id DESC, state',
    deviations_queue_recipe: 'recipe_id, state, created_at DESC, id DESC',
    deviations_queue_operator: 'created_by, created_at DESC, id DESC, state',
    deviations_queue_created: 'created_at DESC, id DESC, state',
  };
  for (const [name, columns] of Object.entries(indexes)) await sequelize.query(`CREATE INDEX ${name} ON deviations (${columns})`);
  await sequelize.query('CREATE FULLTEXT INDEX deviations_text ON deviations (title, expected, actual)');
}

/** Step kinds of deviations raised before this migration, read from their run's version content. */
async function backfillStepKinds(sequelize: MigrationContext['sequelize']) {
  const rows = await sequelize.query<{ id: number; step_id: string; content: unknown }>(
    `SELECT d.id, d.step_id, v.content FROM deviations d JOIN runs r ON r.id = d.run_id JOIN recipe_versions v ON v.id = r.version_id
     WHERE d.step_id IS NOT NULL`,
    { type: QueryTypes.SELECT },
  );
  for (const row of rows) {
    const content = (typeof row.content === 'string' ? JSON.parse(row.content) : row.content) as { steps?: { id: string; kind: string }[] };
    const kind = content.steps?.find((s) => s.id === row.step_id)?.kind ?? null;
    if (kind) await sequelize.query('UPDATE deviations SET step_kind = ? WHERE id = ?', { replacements: [kind, row.id] });
  }
}

export async function down({ context: { sequelize } }: { context: MigrationContext }) {
  await sequelize.query('DROP TRIGGER IF EXISTS deviations_closed_frozen');
  await sequelize.query('DROP INDEX deviations_text ON deviations');
  // The created_by foreign key of 0011 leans on the operator index now (MariaDB dropped its own).
  await sequelize.query('CREATE INDEX deviations_created_by ON deviations (created_by)');
  for (const name of ['deviations_queue_state', 'deviations_queue_state_severity', 'deviations_queue_severity', 'deviations_queue_operator', 'deviations_queue_created']) {
    await sequelize.query(`DROP INDEX ${name} ON deviations`);
  }
  await sequelize.query(`ALTER TABLE deviations
    DROP FOREIGN KEY deviations_recipe_fk, DROP FOREIGN KEY deviations_assignee_fk,
    DROP FOREIGN KEY deviations_closed_by_fk, DROP FOREIGN KEY deviations_closure_signature_fk`);
  await sequelize.query('DROP INDEX deviations_queue_recipe ON deviations');
  await sequelize.query(`ALTER TABLE deviations
    DROP COLUMN recipe_id, DROP COLUMN step_kind, DROP COLUMN assignee_id, DROP COLUMN assigned_at, DROP COLUMN revision,
    DROP COLUMN dispositioned_at, DROP COLUMN closed_at, DROP COLUMN closed_by, DROP COLUMN closure_note, DROP COLUMN closure_signature_id`);
  await sequelize.query('CREATE INDEX deviations_state ON deviations (state)');
  await sequelize.query('CREATE INDEX deviations_severity ON deviations (severity)');
  await sequelize.query('CREATE INDEX deviations_created_at ON deviations (created_at)');
}
