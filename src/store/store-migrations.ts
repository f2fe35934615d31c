/**
 * The store's schema as an ordered list of migrations; `schema_version` records which ones ran.
 * Never edit a shipped migration: append a new one, so older store files upgrade in place.
 */
export const STORE_MIGRATIONS: readonly string[] = [
  `
  CREATE TABLE claims (
    fingerprint    TEXT PRIMARY KEY,
    claim_id       TEXT NOT NULL,
    canonical_json TEXT NOT NULL,
    engine_version TEXT NOT NULL,
    source_file    TEXT,
    first_seen_at  TEXT NOT NULL
  );
  CREATE INDEX claims_by_id ON claims (claim_id);

  CREATE TABLE runs (
    run_id            INTEGER PRIMARY KEY AUTOINCREMENT,
    fingerprint       TEXT NOT NULL REFERENCES claims (fingerprint),
    started_at        TEXT NOT NULL,
    ended_at          TEXT,
    heartbeat_at      TEXT NOT NULL,
    host              TEXT NOT NULL,
    pid               INTEGER NOT NULL,
    options_json      TEXT NOT NULL,
    status            TEXT NOT NULL CHECK (status IN ('running', 'completed', 'interrupted', 'failed')),
    stop_reason       TEXT,
    instances_checked INTEGER NOT NULL DEFAULT 0,
    holds             INTEGER NOT NULL DEFAULT 0,
    counterexamples   INTEGER NOT NULL DEFAULT 0,
    error_json        TEXT
  );
  CREATE INDEX runs_by_claim ON runs (fingerprint, run_id);

  CREATE TABLE chunks (
    chunk_id     INTEGER PRIMARY KEY AUTOINCREMENT,
    fingerprint  TEXT NOT NULL REFERENCES claims (fingerprint),
    class_key    TEXT NOT NULL,
    method       TEXT NOT NULL CHECK (method IN ('exact', 'modular')),
    start_index  INTEGER NOT NULL,
    end_index    INTEGER NOT NULL CHECK (end_index > start_index),
    state        TEXT NOT NULL CHECK (state IN ('leased', 'done')),
    run_id       INTEGER NOT NULL REFERENCES runs (run_id),
    checked      INTEGER NOT NULL DEFAULT 0,
    holds        INTEGER NOT NULL DEFAULT 0,
    fails        INTEGER NOT NULL DEFAULT 0,
    skipped_zero INTEGER NOT NULL DEFAULT 0,
    paired       INTEGER NOT NULL DEFAULT 0,
    error_bound  REAL NOT NULL DEFAULT 0,
    duration_ms  REAL,
    finished_at  TEXT
  );
  CREATE INDEX chunks_by_range ON chunks (fingerprint, class_key, start_index);

  CREATE TABLE counterexamples (
    fingerprint     TEXT NOT NULL REFERENCES claims (fingerprint),
    class_key       TEXT NOT NULL,
    instance_index  INTEGER NOT NULL,
    size            INTEGER NOT NULL,
    lengths         TEXT NOT NULL,
    left_theory     TEXT NOT NULL,
    left_sides      TEXT NOT NULL,
    left_value      TEXT NOT NULL,
    left_json       TEXT NOT NULL,
    right_theory    TEXT NOT NULL,
    right_sides     TEXT NOT NULL,
    right_value     TEXT NOT NULL,
    right_json      TEXT NOT NULL,
    permutation     TEXT,
    confirmed_exact INTEGER NOT NULL CHECK (confirmed_exact = 1),
    found_run       INTEGER NOT NULL REFERENCES runs (run_id),
    rechecked_run   INTEGER REFERENCES runs (run_id),
    recheck         TEXT CHECK (recheck IN ('fails', 'holds')),
    PRIMARY KEY (fingerprint, class_key, instance_index)
  );

  CREATE TABLE verified_classes (
    fingerprint  TEXT NOT NULL REFERENCES claims (fingerprint),
    class_key    TEXT NOT NULL,
    method       TEXT NOT NULL CHECK (method IN ('exact', 'modular')),
    size         INTEGER NOT NULL,
    lengths      TEXT NOT NULL,
    variables    TEXT NOT NULL,
    instances    INTEGER NOT NULL,
    error_bound  REAL NOT NULL,
    verified_run INTEGER NOT NULL REFERENCES runs (run_id),
    verified_at  TEXT NOT NULL,
    PRIMARY KEY (fingerprint, class_key, method)
  );

  CREATE TABLE permutations (
    fingerprint    TEXT NOT NULL REFERENCES claims (fingerprint),
    class_key      TEXT NOT NULL,
    instance_index INTEGER NOT NULL,
    permutation    TEXT NOT NULL,
    PRIMARY KEY (fingerprint, class_key, instance_index)
  );
  `,
  // 2: per chunk, the permutations that serve every instance of the chunk (JSON list of lists; NULL when not searched).
  `
  ALTER TABLE chunks ADD COLUMN common_permutations TEXT;
  ALTER TABLE chunks ADD COLUMN permutations_truncated INTEGER NOT NULL DEFAULT 0;
  `,
  // 3: discover's evidence per candidate claim and class: instances compared, how many had a nonzero value,
  // and (polynomial theories) the permutations that served the whole class.
  `
  CREATE TABLE discover_evidence (
    fingerprint         TEXT NOT NULL REFERENCES claims (fingerprint),
    class_key           TEXT NOT NULL,
    instances           INTEGER NOT NULL,
    nonzero             INTEGER NOT NULL,
    common_permutations TEXT,
    run_id              INTEGER NOT NULL REFERENCES runs (run_id),
    PRIMARY KEY (fingerprint, class_key)
  );
  `,
  // 4: the start token of the process holding a run, so a reused pid is not mistaken for it.
  `
  ALTER TABLE runs ADD COLUMN process_start TEXT;
  CREATE INDEX chunks_leased ON chunks (state) WHERE state = 'leased';
  `,
  // 5 (issue 7): counts of boundaries, values as they are, fingerprints of the mathematics.
  // - counterexamples: partner_of (found through its pair: the representative's index), σ(value) apart from
  //   T(b)'s own value. Older rows of substitution claims kept only σ(value), in right_value: it moves to
  //   substituted_value and right_value says so.
  // - chunks: vacuous / nonzero holds; an old chunk's partners (paired) held by the rule of its time, so they
  //   join its holds, and its nonzero count is unknown (NULL).
  // - claims: every fingerprint is recomputed from the canonical JSON without statement and upper bounds
  //   (puzzlesweep_fingerprint, registered by openStore), and every row follows its claim.
  `
  ALTER TABLE counterexamples ADD COLUMN partner_of INTEGER;
  ALTER TABLE counterexamples ADD COLUMN substitution TEXT;
  ALTER TABLE counterexamples ADD COLUMN substituted_value TEXT;
  ALTER TABLE counterexamples ADD COLUMN substituted_json TEXT;
  UPDATE counterexamples
     SET substituted_value = right_value, substituted_json = right_json,
         right_value = '(not kept by this older store: replay shows it)',
         right_json = json_object('lengths', json_extract(right_json, '$.lengths'), 'value', NULL)
   WHERE fingerprint IN (SELECT fingerprint FROM claims WHERE json_extract(canonical_json, '$.compare.relation.type') = 'equalAfterSubstitution');

  ALTER TABLE chunks ADD COLUMN vacuous INTEGER NOT NULL DEFAULT 0;
  ALTER TABLE chunks ADD COLUMN nonzero INTEGER;
  UPDATE chunks SET holds = holds + paired WHERE state = 'done';

  CREATE TEMP TABLE rekey AS
    SELECT fingerprint AS old, puzzlesweep_fingerprint(canonical_json, engine_version) AS new, first_seen_at FROM claims;
  DELETE FROM rekey WHERE old = new;
  INSERT OR IGNORE INTO claims (fingerprint, claim_id, canonical_json, engine_version, source_file, first_seen_at)
    SELECT r.new, c.claim_id, c.canonical_json, c.engine_version, c.source_file, c.first_seen_at
      FROM claims c JOIN rekey r ON c.fingerprint = r.old ORDER BY c.first_seen_at DESC, c.rowid DESC;
  UPDATE runs SET fingerprint = (SELECT new FROM rekey WHERE old = runs.fingerprint) WHERE fingerprint IN (SELECT old FROM rekey);
  UPDATE chunks SET fingerprint = (SELECT new FROM rekey WHERE old = chunks.fingerprint) WHERE fingerprint IN (SELECT old FROM rekey);
  UPDATE OR IGNORE counterexamples SET fingerprint = (SELECT new FROM rekey WHERE old = counterexamples.fingerprint) WHERE fingerprint IN (SELECT old FROM rekey);
  UPDATE OR IGNORE verified_classes SET fingerprint = (SELECT new FROM rekey WHERE old = verified_classes.fingerprint) WHERE fingerprint IN (SELECT old FROM rekey);
  UPDATE OR IGNORE permutations SET fingerprint = (SELECT new FROM rekey WHERE old = permutations.fingerprint) WHERE fingerprint IN (SELECT old FROM rekey);
  UPDATE OR IGNORE discover_evidence SET fingerprint = (SELECT new FROM rekey WHERE old = discover_evidence.fingerprint) WHERE fingerprint IN (SELECT old FROM rekey);
  -- Rows left behind repeat a row of the same class and index under the merged claim: the same result.
  DELETE FROM counterexamples WHERE fingerprint IN (SELECT old FROM rekey);
  DELETE FROM verified_classes WHERE fingerprint IN (SELECT old FROM rekey);
  DELETE FROM permutations WHERE fingerprint IN (SELECT old FROM rekey);
  DELETE FROM discover_evidence WHERE fingerprint IN (SELECT old FROM rekey);
  DELETE FROM claims WHERE fingerprint IN (SELECT old FROM rekey);
  DROP TABLE rekey;
  `,
  // 6 (issue 7): the claim as the user last wrote it (JSON text; NULL for claims stored before), for reports.
  `
  ALTER TABLE claims ADD COLUMN source_json TEXT;
  `,
  // 7 (issue 7): a counterexample found before partners were stored (migration 5 counted its failing partner
  // T(b) among the holds of a chunk of that time) waits for the next run to derive the partner: the re-check
  // confirms T(b) exactly, stores its row and takes it out of that chunk's holds.
  `
  ALTER TABLE counterexamples ADD COLUMN partner_pending INTEGER NOT NULL DEFAULT 0;
  UPDATE counterexamples SET partner_pending = 1
   WHERE partner_of IS NULL
     AND EXISTS (SELECT 1 FROM chunks k
                  WHERE k.fingerprint = counterexamples.fingerprint AND k.class_key = counterexamples.class_key
                    AND k.state = 'done' AND k.nonzero IS NULL AND k.paired > 0);
  `,
];
