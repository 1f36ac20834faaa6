import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Accounts, e-mailed tokens, the audit log, the e-mail outbox, sessions and sign-in counters. */
export class Foundation1764626400000 implements MigrationInterface {
  name = 'Foundation1764626400000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE users (
      id int unsigned NOT NULL AUTO_INCREMENT,
      email varchar(254) NOT NULL,
      display_name varchar(60) NOT NULL,
      password_hash varchar(255) NOT NULL,
      role enum('member','builder','moderator','admin') NOT NULL DEFAULT 'member',
      email_verified_at datetime(3) NULL,
      session_epoch int unsigned NOT NULL DEFAULT 0,
      suspended_at datetime(3) NULL,
      suspended_reason varchar(500) NULL,
      last_sign_in_at datetime(3) NULL,
      created_at datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      updated_at datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
      PRIMARY KEY (id),
      UNIQUE INDEX uq_users_email (email)
    ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);

    await q.query(`CREATE TABLE one_time_tokens (
      id int unsigned NOT NULL AUTO_INCREMENT,
      token_hash char(64) NOT NULL,
      purpose enum('verify_email','reset_password','change_email') NOT NULL,
      user_id int unsigned NOT NULL,
      new_email varchar(254) NULL,
      expires_at datetime(3) NOT NULL,
      used_at datetime(3) NULL,
      created_at datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      PRIMARY KEY (id),
      UNIQUE INDEX uq_one_time_tokens_hash (token_hash),
      CONSTRAINT fk_one_time_tokens_user FOREIGN KEY (user_id) REFERENCES users (id) ON DELETE CASCADE ON UPDATE NO ACTION
    ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);

    await q.query(`CREATE TABLE audit_events (
      id bigint unsigned NOT NULL AUTO_INCREMENT,
      actor_id int unsigned NULL,
      action varchar(64) NOT NULL,
      target_type varchar(32) NULL,
      target_id varchar(64) NULL,
      detail json NULL,
      ip varchar(45) NULL,
      created_at datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      PRIMARY KEY (id),
      INDEX ix_audit_events_target (target_type, target_id),
      INDEX ix_audit_events_created_at (created_at),
      CONSTRAINT fk_audit_events_actor FOREIGN KEY (actor_id) REFERENCES users (id) ON DELETE SET NULL ON UPDATE NO ACTION
    ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);

    await q.query(`CREATE TABLE outbound_emails (
      id bigint unsigned NOT NULL AUTO_INCREMENT,
      to_address varchar(254) NOT NULL,
      subject varchar(200) NOT NULL,
      text_body text NOT NULL,
      html_body text NOT NULL,
      state enum('pending','sent','failed') NOT NULL DEFAULT 'pending',
      attempts int unsigned NOT NULL DEFAULT 0,
      last_error varchar(500) NULL,
      next_attempt_at datetime(3) NOT NULL,
      sent_at datetime(3) NULL,
      created_at datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      PRIMARY KEY (id),
      INDEX ix_outbound_emails_state_due (state, next_attempt_at)
    ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);

    // Layout expected by express-mysql-session (createDatabaseTable is off).
    await q.query(`CREATE TABLE sessions (
      session_id varchar(128) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
      expires int unsigned NOT NULL,
      data mediumtext CHARACTER SET utf8mb4 COLLATE utf8mb4_bin,
      PRIMARY KEY (session_id),
      INDEX ix_sessions_expires (expires)
    ) ENGINE=InnoDB`);

    // Layout expected by rate-limiter-flexible's MySQL store (tableCreated is on).
    await q.query(`CREATE TABLE rate_limits (
      \`key\` varchar(255) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL,
      points int NOT NULL DEFAULT 0,
      expire bigint unsigned NULL,
      PRIMARY KEY (\`key\`)
    ) ENGINE=InnoDB`);
  }

  async down(q: QueryRunner): Promise<void> {
    for (const table of ['rate_limits', 'sessions', 'outbound_emails', 'audit_events', 'one_time_tokens', 'users']) {
      await q.query(`DROP TABLE ${table}`);
    }
  }
}
