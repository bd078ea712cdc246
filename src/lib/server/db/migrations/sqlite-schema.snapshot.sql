CREATE INDEX `api_tokens_shop_id` ON `api_tokens` (`shop_id`);

CREATE INDEX `audit_events_object_type_object_id` ON `audit_events` (`object_type`, `object_id`);

CREATE INDEX `audit_events_shop_id_at` ON `audit_events` (`shop_id`, `at`);

CREATE INDEX `booth_links_shop_id_procedure_id` ON `booth_links` (`shop_id`, `procedure_id`);

CREATE INDEX `booth_links_shop_id_revision_id` ON `booth_links` (`shop_id`, `revision_id`);

CREATE UNIQUE INDEX `booth_links_token` ON `booth_links` (`token`);

CREATE UNIQUE INDEX `booth_lookups_bucket_window_start` ON `booth_lookups` (`bucket`, `window_start`);

CREATE INDEX `booth_lookups_link_id_at` ON `booth_lookups` (`link_id`, `at`);

CREATE INDEX `booth_lookups_shop_id_at` ON `booth_lookups` (`shop_id`, `at`);

CREATE INDEX `continuity_entries_shop_id_welder_id_used_on` ON `continuity_entries` (`shop_id`, `welder_id`, `used_on`);

CREATE UNIQUE INDEX `continuity_entries_welder_id_process_used_on` ON `continuity_entries` (`welder_id`, `process`, `used_on`);

CREATE INDEX `continuity_taps_shop_id_received_at` ON `continuity_taps` (`shop_id`, `received_at`);

CREATE INDEX `job_joints_shop_id_revision_id` ON `job_joints` (`shop_id`, `revision_id`);

CREATE INDEX `joint_inspections_joint_id` ON `joint_inspections` (`joint_id`);

CREATE UNIQUE INDEX `lapse_notices_qualification_id_lapses_on_kind` ON `lapse_notices` (`qualification_id`, `lapses_on`, `kind`);

CREATE INDEX `pqr_addenda_shop_id_pqr_id` ON `pqr_addenda` (`shop_id`, `pqr_id`);

CREATE INDEX `pqr_reports_shop_id_pqr_id` ON `pqr_reports` (`shop_id`, `pqr_id`);

CREATE UNIQUE INDEX `pqrs_shop_id_number` ON `pqrs` (`shop_id`, `number`);

CREATE INDEX `pqrs_shop_id_process` ON `pqrs` (`shop_id`, `process`);

CREATE INDEX `pqrs_shop_id_state` ON `pqrs` (`shop_id`, `state`);

CREATE UNIQUE INDEX `procedure_revision_pqrs_revision_id_pqr_id` ON `procedure_revision_pqrs` (`revision_id`, `pqr_id`);

CREATE INDEX `procedure_revision_pqrs_shop_id_pqr_id` ON `procedure_revision_pqrs` (`shop_id`, `pqr_id`);

CREATE UNIQUE INDEX `procedure_revision_records_revision_id_record_id` ON `procedure_revision_records` (`revision_id`, `record_id`);

CREATE INDEX `procedure_revision_records_shop_id_record_id` ON `procedure_revision_records` (`shop_id`, `record_id`);

CREATE UNIQUE INDEX `procedure_revisions_procedure_id_rev` ON `procedure_revisions` (`procedure_id`, `rev`);

CREATE INDEX `procedure_revisions_shop_id_state_submitted_at` ON `procedure_revisions` (`shop_id`, `state`, `submitted_at`);

CREATE INDEX `procedures_shop_id_base_metal_family` ON `procedures` (`shop_id`, `base_metal_family`);

CREATE INDEX `procedures_shop_id_code` ON `procedures` (`shop_id`, `code`);

CREATE UNIQUE INDEX `procedures_shop_id_number` ON `procedures` (`shop_id`, `number`);

CREATE INDEX `procedures_shop_id_process` ON `procedures` (`shop_id`, `process`);

CREATE INDEX `procedures_shop_id_state` ON `procedures` (`shop_id`, `state`);

CREATE INDEX `procedures_shop_id_updated_at` ON `procedures` (`shop_id`, `updated_at`);

CREATE INDEX `qualification_confirmations_shop_id_qualification_id` ON `qualification_confirmations` (`shop_id`, `qualification_id`);

CREATE INDEX `qualifications_shop_id_process` ON `qualifications` (`shop_id`, `process`);

CREATE INDEX `qualifications_shop_id_welder_id` ON `qualifications` (`shop_id`, `welder_id`);

CREATE INDEX `settings_photos_shop_id_record_id` ON `settings_photos` (`shop_id`, `record_id`);

CREATE INDEX `settings_records_shop_id_amps` ON `settings_records` (`shop_id`, `amps`);

CREATE INDEX `settings_records_shop_id_author_id_welded_on` ON `settings_records` (`shop_id`, `author_id`, `welded_on`);

CREATE INDEX `settings_records_shop_id_base_metal_family_thickness_mm` ON `settings_records` (`shop_id`, `base_metal_family`, `thickness_mm`);

CREATE INDEX `settings_records_shop_id_created_at` ON `settings_records` (`shop_id`, `created_at`);

CREATE INDEX `settings_records_shop_id_filler_class` ON `settings_records` (`shop_id`, `filler_class`);

CREATE INDEX `settings_records_shop_id_outcome_kind_welded_on` ON `settings_records` (`shop_id`, `outcome_kind`, `welded_on`);

CREATE INDEX `settings_records_shop_id_position` ON `settings_records` (`shop_id`, `position`);

CREATE INDEX `settings_records_shop_id_process_thickness_mm` ON `settings_records` (`shop_id`, `process`, `thickness_mm`);

CREATE INDEX `settings_records_shop_id_thickness_mm` ON `settings_records` (`shop_id`, `thickness_mm`);

CREATE INDEX `settings_records_shop_id_welded_on_id` ON `settings_records` (`shop_id`, `welded_on`, `id`);

CREATE INDEX `settings_records_shop_process_family_thickness` ON `settings_records` (`shop_id`, `process`, `base_metal_family`, `thickness_mm`);

CREATE INDEX `sign_offs_shop_id_revision_id` ON `sign_offs` (`shop_id`, `revision_id`);

CREATE INDEX `users_shop_id_role` ON `users` (`shop_id`, `role`);

CREATE INDEX `verification_links_shop_id_welder_id` ON `verification_links` (`shop_id`, `welder_id`);

CREATE UNIQUE INDEX `verification_links_token` ON `verification_links` (`token`);

CREATE INDEX `weld_logs_shop_id_welder_id` ON `weld_logs` (`shop_id`, `welder_id`);

CREATE INDEX `weld_overrides_joint_id_welder_id` ON `weld_overrides` (`joint_id`, `welder_id`);

CREATE INDEX `welders_shop_id_name` ON `welders` (`shop_id`, `name`);

CREATE UNIQUE INDEX `welders_shop_id_stamp` ON `welders` (`shop_id`, `stamp`);

CREATE UNIQUE INDEX `welders_user_id` ON `welders` (`user_id`);

CREATE INDEX `window_counters_window_end` ON `window_counters` (`window_end`);

CREATE TABLE `accounts` (`id` UUID PRIMARY KEY, `type` VARCHAR(255) NOT NULL, `provider` VARCHAR(255) NOT NULL, `provider_account_id` VARCHAR(255) NOT NULL, `refresh_token` VARCHAR(255), `access_token` VARCHAR(255), `expires_at` INTEGER, `token_type` VARCHAR(255), `scope` VARCHAR(255), `id_token` TEXT, `session_state` VARCHAR(255), `user_id` UUID REFERENCES `users` (`id`) ON DELETE CASCADE);

CREATE TABLE `api_tokens` (`id` INTEGER PRIMARY KEY AUTOINCREMENT, `shop_id` INTEGER NOT NULL REFERENCES `shops` (`id`), `name` VARCHAR(80) NOT NULL, `role` VARCHAR(20) NOT NULL, `token_hash` VARCHAR(64) NOT NULL UNIQUE, `prefix` VARCHAR(16) NOT NULL, `created_by_id` UUID NOT NULL REFERENCES `users` (`id`), `last_used_at` DATETIME, `revoked_at` DATETIME, `created_at` DATETIME NOT NULL, `updated_at` DATETIME NOT NULL);

CREATE TABLE `audit_events` (`id` INTEGER PRIMARY KEY AUTOINCREMENT, `shop_id` INTEGER REFERENCES `shops` (`id`), `actor_id` UUID, `actor_name` VARCHAR(120) NOT NULL, `action` VARCHAR(60) NOT NULL, `object_type` VARCHAR(40) NOT NULL, `object_id` VARCHAR(64), `before` TEXT, `after` TEXT, `ip` VARCHAR(64), `user_agent` VARCHAR(300), `at` DATETIME NOT NULL);

CREATE TABLE `booth_links` (`id` INTEGER PRIMARY KEY AUTOINCREMENT, `shop_id` INTEGER NOT NULL REFERENCES `shops` (`id`), `procedure_id` INTEGER NOT NULL REFERENCES `procedures` (`id`), `revision_id` INTEGER NOT NULL REFERENCES `procedure_revisions` (`id`), `token` VARCHAR(40) NOT NULL, `issued_at` DATETIME NOT NULL, `issued_by_id` UUID REFERENCES `users` (`id`), `revoked_at` DATETIME, `revoked_by_id` UUID REFERENCES `users` (`id`), `created_at` DATETIME NOT NULL, `updated_at` DATETIME NOT NULL);

CREATE TABLE `booth_lookups` (`id` INTEGER PRIMARY KEY AUTOINCREMENT, `shop_id` INTEGER REFERENCES `shops` (`id`), `link_id` INTEGER REFERENCES `booth_links` (`id`), `outcome` VARCHAR(12) NOT NULL, `user_id` UUID REFERENCES `users` (`id`), `ip` VARCHAR(64), `user_agent` VARCHAR(300), `at` DATETIME NOT NULL, `bucket` VARCHAR(120), `window_start` BIGINT, `hits` INTEGER NOT NULL DEFAULT 1, `last_at` DATETIME);

CREATE TABLE `continuity_entries` (`id` INTEGER PRIMARY KEY AUTOINCREMENT, `shop_id` INTEGER NOT NULL REFERENCES `shops` (`id`), `welder_id` INTEGER NOT NULL REFERENCES `welders` (`id`), `process` VARCHAR(8) NOT NULL, `used_on` DATE NOT NULL, `source` VARCHAR(8) NOT NULL, `note` VARCHAR(500), `recorded_by_id` UUID REFERENCES `users` (`id`), `recorded_by_name` VARCHAR(120) NOT NULL, `created_at` DATETIME NOT NULL, `updated_at` DATETIME NOT NULL);

CREATE TABLE "continuity_taps" (`id` INTEGER PRIMARY KEY AUTOINCREMENT, `shop_id` INTEGER NOT NULL REFERENCES `shops` (`id`), `user_id` UUID NOT NULL REFERENCES `users` (`id`), `client_id` VARCHAR(64) NOT NULL, `link_id` INTEGER REFERENCES `booth_links` (`id`), `continuity_entry_id` INTEGER REFERENCES `continuity_entries` (`id`), `outcome` VARCHAR(12) NOT NULL, `message` VARCHAR(300), `made_at` DATETIME NOT NULL, `received_at` DATETIME NOT NULL, CONSTRAINT `continuity_taps_user_client_unique` UNIQUE (`user_id`, `client_id`));

CREATE TABLE "data_books" (`id` INTEGER PRIMARY KEY AUTOINCREMENT, `shop_id` INTEGER NOT NULL REFERENCES `shops` (`id`), `job_id` INTEGER NOT NULL REFERENCES `jobs` (`id`), `token` VARCHAR(64) NOT NULL, `manifest` TEXT NOT NULL, `manifest_digest` VARCHAR(64) NOT NULL, `made_by_id` UUID NOT NULL REFERENCES `users` (`id`), `made_at` DATETIME NOT NULL, CONSTRAINT `data_books_token_unique` UNIQUE (`token`));

CREATE TABLE `invites` (`id` INTEGER PRIMARY KEY AUTOINCREMENT, `shop_id` INTEGER NOT NULL REFERENCES `shops` (`id`), `email` VARCHAR(254) NOT NULL, `name` VARCHAR(120) NOT NULL, `role` VARCHAR(20) NOT NULL, `token_hash` VARCHAR(64) NOT NULL UNIQUE, `expires_at` DATETIME NOT NULL, `used_at` DATETIME, `invited_by_id` UUID NOT NULL REFERENCES `users` (`id`), `created_at` DATETIME NOT NULL, `updated_at` DATETIME NOT NULL);

CREATE TABLE "job_joints" (`id` INTEGER PRIMARY KEY AUTOINCREMENT, `shop_id` INTEGER NOT NULL REFERENCES `shops` (`id`), `job_id` INTEGER NOT NULL REFERENCES `jobs` (`id`), `mark` VARCHAR(20) NOT NULL, `joint_type` VARCHAR(12) NOT NULL, `size` VARCHAR(40) NOT NULL, `base_metals` VARCHAR(120) NOT NULL, `position` VARCHAR(4) NOT NULL, `revision_id` INTEGER NOT NULL REFERENCES `procedure_revisions` (`id`), `created_at` DATETIME NOT NULL, `updated_at` DATETIME NOT NULL, `marker_x` REAL, `marker_y` REAL, CONSTRAINT `job_joints_job_mark_unique` UNIQUE (`job_id`, `mark`));

CREATE TABLE `job_leases` (`name` VARCHAR(60) NOT NULL PRIMARY KEY, `holder` VARCHAR(120) NOT NULL DEFAULT '', `lease_until` BIGINT NOT NULL DEFAULT 0, `runs` INTEGER NOT NULL DEFAULT 0, `last_run_at` DATETIME);

CREATE TABLE "jobs" (`id` INTEGER PRIMARY KEY AUTOINCREMENT, `shop_id` INTEGER NOT NULL REFERENCES `shops` (`id`), `number` VARCHAR(40) NOT NULL, `customer` VARCHAR(120) NOT NULL, `part` VARCHAR(120) NOT NULL, `drawing` VARCHAR(60) NOT NULL, `drawing_rev` VARCHAR(20) NOT NULL, `code` VARCHAR(16) NOT NULL, `due_on` DATE, `created_by_id` UUID NOT NULL REFERENCES `users` (`id`), `created_at` DATETIME NOT NULL, `updated_at` DATETIME NOT NULL, `drawing_key` VARCHAR(80), `drawing_name` VARCHAR(200), `drawing_sha256` VARCHAR(64), `drawing_width` INTEGER, `drawing_height` INTEGER, CONSTRAINT `jobs_shop_number_unique` UNIQUE (`shop_id`, `number`));

CREATE TABLE `joint_inspections` (`id` INTEGER PRIMARY KEY AUTOINCREMENT, `shop_id` INTEGER NOT NULL REFERENCES `shops` (`id`), `joint_id` INTEGER NOT NULL REFERENCES `job_joints` (`id`), `method` VARCHAR(2) NOT NULL, `extent` VARCHAR(60) NOT NULL, `result` VARCHAR(8) NOT NULL, `note` VARCHAR(500), `report_key` VARCHAR(80), `report_name` VARCHAR(200), `report_sha256` VARCHAR(64), `signed_by_id` UUID NOT NULL REFERENCES `users` (`id`), `printed_name` VARCHAR(120) NOT NULL, `role` VARCHAR(20) NOT NULL, `signed_at` DATETIME NOT NULL, `digest` VARCHAR(64) NOT NULL, `canonical` TEXT NOT NULL, `seal` VARCHAR(64) NOT NULL);

CREATE TABLE "joint_repairs" (`id` INTEGER PRIMARY KEY AUTOINCREMENT, `shop_id` INTEGER NOT NULL REFERENCES `shops` (`id`), `joint_id` INTEGER NOT NULL REFERENCES `job_joints` (`id`), `inspection_id` INTEGER NOT NULL REFERENCES `joint_inspections` (`id`), `round` INTEGER NOT NULL, `revision_id` INTEGER NOT NULL REFERENCES `procedure_revisions` (`id`), `welder_id` INTEGER NOT NULL REFERENCES `welders` (`id`), `note` VARCHAR(500), `recorded_by_id` UUID NOT NULL REFERENCES `users` (`id`), `recorded_by_name` VARCHAR(120) NOT NULL, `created_at` DATETIME NOT NULL, CONSTRAINT `joint_repairs_joint_round_unique` UNIQUE (`joint_id`, `round`));

CREATE TABLE `lapse_notices` (`id` INTEGER PRIMARY KEY AUTOINCREMENT, `shop_id` INTEGER NOT NULL REFERENCES `shops` (`id`), `qualification_id` INTEGER NOT NULL REFERENCES `qualifications` (`id`), `lapses_on` DATE NOT NULL, `kind` VARCHAR(8) NOT NULL, `recipients` TEXT NOT NULL DEFAULT '', `sent_at` DATETIME, `created_at` DATETIME NOT NULL, `updated_at` DATETIME NOT NULL);

CREATE TABLE `pqr_addenda` (`id` INTEGER PRIMARY KEY AUTOINCREMENT, `shop_id` INTEGER NOT NULL REFERENCES `shops` (`id`), `pqr_id` INTEGER NOT NULL REFERENCES `pqrs` (`id`), `author_id` UUID NOT NULL REFERENCES `users` (`id`), `author_name` VARCHAR(120) NOT NULL, `body` TEXT NOT NULL, `created_at` DATETIME NOT NULL);

CREATE TABLE `pqr_reports` (`id` INTEGER PRIMARY KEY AUTOINCREMENT, `shop_id` INTEGER NOT NULL REFERENCES `shops` (`id`), `pqr_id` INTEGER NOT NULL REFERENCES `pqrs` (`id`), `storage_key` VARCHAR(80) NOT NULL UNIQUE, `original_name` VARCHAR(200) NOT NULL, `bytes` INTEGER NOT NULL, `sha256` VARCHAR(64) NOT NULL, `uploaded_by_id` UUID NOT NULL REFERENCES `users` (`id`), `removed_at` DATETIME, `created_at` DATETIME NOT NULL, `updated_at` DATETIME NOT NULL);

CREATE TABLE `pqrs` (`id` INTEGER PRIMARY KEY AUTOINCREMENT, `shop_id` INTEGER NOT NULL REFERENCES `shops` (`id`), `number` VARCHAR(40) NOT NULL, `title` VARCHAR(120) NOT NULL, `process` VARCHAR(8) NOT NULL, `state` VARCHAR(12) NOT NULL, `actual_values` TEXT NOT NULL, `tests` TEXT NOT NULL, `qualified` TEXT NOT NULL, `author_id` UUID NOT NULL REFERENCES `users` (`id`), `certified_by_id` UUID REFERENCES `users` (`id`), `certified_name` VARCHAR(120), `certified_at` DATETIME, `certified_digest` VARCHAR(64), `created_at` DATETIME NOT NULL, `updated_at` DATETIME NOT NULL, `code` VARCHAR(16) NOT NULL DEFAULT 'asme-ix');

CREATE TABLE `procedure_numbering` (`shop_id` INTEGER PRIMARY KEY REFERENCES `shops` (`id`), `wps_pattern` VARCHAR(40) NOT NULL, `pqr_pattern` VARCHAR(40) NOT NULL, `created_at` DATETIME NOT NULL, `updated_at` DATETIME NOT NULL);

CREATE TABLE `procedure_revision_pqrs` (`id` INTEGER PRIMARY KEY AUTOINCREMENT, `shop_id` INTEGER NOT NULL REFERENCES `shops` (`id`), `revision_id` INTEGER NOT NULL REFERENCES `procedure_revisions` (`id`), `pqr_id` INTEGER NOT NULL REFERENCES `pqrs` (`id`));

CREATE TABLE `procedure_revision_records` (`id` INTEGER PRIMARY KEY AUTOINCREMENT, `shop_id` INTEGER NOT NULL REFERENCES `shops` (`id`), `revision_id` INTEGER NOT NULL REFERENCES `procedure_revisions` (`id`), `record_id` INTEGER NOT NULL REFERENCES `settings_records` (`id`));

CREATE TABLE `procedure_revisions` (`id` INTEGER PRIMARY KEY AUTOINCREMENT, `shop_id` INTEGER NOT NULL REFERENCES `shops` (`id`), `procedure_id` INTEGER NOT NULL REFERENCES `procedures` (`id`), `rev` INTEGER NOT NULL, `state` VARCHAR(12) NOT NULL, `variables` TEXT NOT NULL, `process` VARCHAR(8) NOT NULL, `code` VARCHAR(16) NOT NULL, `base_metal_family` VARCHAR(16), `author_id` UUID NOT NULL REFERENCES `users` (`id`), `submitted_by_id` UUID REFERENCES `users` (`id`), `submitted_at` DATETIME, `decided_at` DATETIME, `return_comment` TEXT, `superseded_at` DATETIME, `superseded_by_rev` INTEGER, `withdrawn_at` DATETIME, `withdrawn_by_id` UUID REFERENCES `users` (`id`), `withdraw_reason` TEXT, `created_at` DATETIME NOT NULL, `updated_at` DATETIME NOT NULL);

CREATE TABLE `procedures` (`id` INTEGER PRIMARY KEY AUTOINCREMENT, `shop_id` INTEGER NOT NULL REFERENCES `shops` (`id`), `number` VARCHAR(40) NOT NULL, `title` VARCHAR(120) NOT NULL, `code` VARCHAR(16) NOT NULL, `process` VARCHAR(8) NOT NULL, `base_metal_family` VARCHAR(16), `state` VARCHAR(12) NOT NULL, `head_rev` INTEGER NOT NULL, `approved_rev` INTEGER, `search_text` TEXT NOT NULL DEFAULT '', `created_by_id` UUID NOT NULL REFERENCES `users` (`id`), `created_at` DATETIME NOT NULL, `updated_at` DATETIME NOT NULL);

CREATE TABLE `qualification_confirmations` (`id` INTEGER PRIMARY KEY AUTOINCREMENT, `shop_id` INTEGER NOT NULL REFERENCES `shops` (`id`), `qualification_id` INTEGER NOT NULL REFERENCES `qualifications` (`id`), `confirmed_on` DATE NOT NULL, `responsible_person` VARCHAR(120) NOT NULL, `note` VARCHAR(500), `recorded_by_id` UUID NOT NULL REFERENCES `users` (`id`), `created_at` DATETIME NOT NULL, `updated_at` DATETIME NOT NULL);

CREATE TABLE `qualifications` (`id` INTEGER PRIMARY KEY AUTOINCREMENT, `shop_id` INTEGER NOT NULL REFERENCES `shops` (`id`), `welder_id` INTEGER NOT NULL REFERENCES `welders` (`id`), `process` VARCHAR(8) NOT NULL, `code` VARCHAR(16) NOT NULL, `test_date` DATE NOT NULL, `wps_ref` VARCHAR(60), `test_positions` VARCHAR(40) NOT NULL, `coupon_type` VARCHAR(8) NOT NULL, `coupon_diameter_mm` REAL, `coupon_thickness_mm` REAL NOT NULL, `deposit_thickness_mm` REAL NOT NULL, `deposit_layers` INTEGER, `length_unit` VARCHAR(4) NOT NULL, `f_number` INTEGER, `filler_class` VARCHAR(40), `backing` VARCHAR(12), `current_type` VARCHAR(8), `results` TEXT, `witnessed_by` VARCHAR(120), `record_key` VARCHAR(80), `record_name` VARCHAR(200), `withdrawn_at` DATETIME, `created_by_id` UUID NOT NULL REFERENCES `users` (`id`), `created_at` DATETIME NOT NULL, `updated_at` DATETIME NOT NULL);

CREATE TABLE `schema_migrations` (`name` VARCHAR(255) NOT NULL UNIQUE PRIMARY KEY);

CREATE TABLE `sessions` (`id` UUID PRIMARY KEY, `expires` DATETIME NOT NULL, `session_token` VARCHAR(255) NOT NULL UNIQUE, `user_id` UUID REFERENCES `users` (`id`) ON DELETE CASCADE);

CREATE TABLE `settings_photos` (`id` INTEGER PRIMARY KEY AUTOINCREMENT, `shop_id` INTEGER NOT NULL REFERENCES `shops` (`id`), `record_id` INTEGER NOT NULL REFERENCES `settings_records` (`id`), `storage_key` VARCHAR(80) NOT NULL UNIQUE, `thumb_key` VARCHAR(80) NOT NULL, `mime` VARCHAR(40) NOT NULL, `original_name` VARCHAR(200) NOT NULL, `bytes` INTEGER NOT NULL, `width` INTEGER NOT NULL, `height` INTEGER NOT NULL, `uploaded_by_id` UUID NOT NULL REFERENCES `users` (`id`), `removed_at` DATETIME, `created_at` DATETIME NOT NULL, `updated_at` DATETIME NOT NULL);

CREATE TABLE settings_record_versions (
		shop_id INTEGER PRIMARY KEY REFERENCES shops(id), version INTEGER NOT NULL);

CREATE TABLE `settings_records` (`id` INTEGER PRIMARY KEY AUTOINCREMENT, `shop_id` INTEGER NOT NULL REFERENCES `shops` (`id`), `author_id` UUID NOT NULL REFERENCES `users` (`id`), `process` VARCHAR(8) NOT NULL, `current_type` VARCHAR(8), `transfer` VARCHAR(16), `amps` REAL, `volts` REAL, `wire_feed_mm_per_s` REAL, `travel_speed_mm_per_s` REAL, `filler_class` VARCHAR(40), `filler_diameter_mm` REAL, `tungsten_class` VARCHAR(20), `tungsten_diameter_mm` REAL, `gas_name` VARCHAR(60), `gas_flow_l_per_min` REAL, `base_metal_spec` VARCHAR(60), `base_metal_family` VARCHAR(16), `p_number` VARCHAR(8), `thickness_mm` REAL, `joint_type` VARCHAR(16), `position` VARCHAR(4), `preheat_c` REAL, `interpass_c` REAL, `machine` VARCHAR(80), `job_ref` VARCHAR(80), `outcome` VARCHAR(60), `outcome_kind` VARCHAR(12), `defects` TEXT, `notes` TEXT, `welded_on` DATE NOT NULL, `entered` TEXT NOT NULL DEFAULT '{}', `findings` TEXT NOT NULL DEFAULT '[]', `derived` TEXT NOT NULL DEFAULT '{}', `caution_count` INTEGER NOT NULL DEFAULT 0, `search_text` TEXT NOT NULL DEFAULT '', `frozen_at` DATETIME, `cited_by_procedure_id` INTEGER, `created_at` DATETIME NOT NULL, `updated_at` DATETIME NOT NULL);

CREATE VIRTUAL TABLE settings_records_fts USING fts5(
		search_text, content='settings_records', content_rowid='id', tokenize='trigram');

CREATE TABLE 'settings_records_fts_config'(k PRIMARY KEY, v) WITHOUT ROWID;

CREATE TABLE 'settings_records_fts_data'(id INTEGER PRIMARY KEY, block BLOB);

CREATE TABLE 'settings_records_fts_docsize'(id INTEGER PRIMARY KEY, sz BLOB);

CREATE TABLE 'settings_records_fts_idx'(segid, term, pgno, PRIMARY KEY(segid, term)) WITHOUT ROWID;

CREATE TABLE `shops` (`id` INTEGER PRIMARY KEY AUTOINCREMENT, `name` VARCHAR(120) NOT NULL, `unit_system` VARCHAR(10) NOT NULL DEFAULT 'imperial', `created_at` DATETIME NOT NULL, `updated_at` DATETIME NOT NULL, `default_code` VARCHAR(16) NOT NULL DEFAULT 'asme-ix', `time_zone` VARCHAR(64) NOT NULL DEFAULT 'UTC');

CREATE TABLE `sign_offs` (`id` INTEGER PRIMARY KEY AUTOINCREMENT, `shop_id` INTEGER NOT NULL REFERENCES `shops` (`id`), `revision_id` INTEGER NOT NULL REFERENCES `procedure_revisions` (`id`), `user_id` UUID NOT NULL REFERENCES `users` (`id`), `printed_name` VARCHAR(120) NOT NULL, `role` VARCHAR(20) NOT NULL, `meaning` VARCHAR(12) NOT NULL, `comment` TEXT, `signed_at` DATETIME NOT NULL, `digest` VARCHAR(64) NOT NULL, `canonical` TEXT NOT NULL, `seal` VARCHAR(64) NOT NULL);

CREATE TABLE sqlite_sequence(name,seq);

CREATE TABLE sqlite_stat1(tbl,idx,stat);

CREATE TABLE `users` (`id` UUID PRIMARY KEY, `shop_id` INTEGER NOT NULL REFERENCES `shops` (`id`) ON DELETE RESTRICT, `name` VARCHAR(120) NOT NULL, `email` VARCHAR(254) NOT NULL UNIQUE, `email_verified` DATETIME, `image` VARCHAR(255), `role` VARCHAR(20) NOT NULL, `active` TINYINT(1) NOT NULL DEFAULT 1, `session_version` INTEGER NOT NULL DEFAULT 1, `password_hash` VARCHAR(100), `unit_system` VARCHAR(10), `created_at` DATETIME NOT NULL, `updated_at` DATETIME NOT NULL);

CREATE TABLE `verification_links` (`id` INTEGER PRIMARY KEY AUTOINCREMENT, `shop_id` INTEGER NOT NULL REFERENCES `shops` (`id`), `welder_id` INTEGER NOT NULL REFERENCES `welders` (`id`), `token` VARCHAR(40) NOT NULL, `created_by_id` UUID NOT NULL REFERENCES `users` (`id`), `revoked_at` DATETIME, `revoked_by_id` UUID REFERENCES `users` (`id`), `created_at` DATETIME NOT NULL, `updated_at` DATETIME NOT NULL);

CREATE TABLE `verification_tokens` (`token` VARCHAR(255) PRIMARY KEY, `identifier` VARCHAR(255) NOT NULL, `expires` DATETIME NOT NULL);

CREATE TABLE "weld_logs" (`id` INTEGER PRIMARY KEY AUTOINCREMENT, `shop_id` INTEGER NOT NULL REFERENCES `shops` (`id`), `joint_id` INTEGER NOT NULL REFERENCES `job_joints` (`id`), `welder_id` INTEGER NOT NULL REFERENCES `welders` (`id`), `pass` VARCHAR(8) NOT NULL, `welded_on` DATE NOT NULL, `revision_id` INTEGER NOT NULL REFERENCES `procedure_revisions` (`id`), `round` INTEGER NOT NULL DEFAULT 0, `override_id` INTEGER REFERENCES `weld_overrides` (`id`), `continuity_entry_id` INTEGER REFERENCES `continuity_entries` (`id`), `recorded_by_id` UUID NOT NULL REFERENCES `users` (`id`), `recorded_by_name` VARCHAR(120) NOT NULL, `created_at` DATETIME NOT NULL, CONSTRAINT `weld_logs_joint_pass_unique` UNIQUE (`joint_id`, `round`, `pass`));

CREATE TABLE `weld_overrides` (`id` INTEGER PRIMARY KEY AUTOINCREMENT, `shop_id` INTEGER NOT NULL REFERENCES `shops` (`id`), `joint_id` INTEGER NOT NULL REFERENCES `job_joints` (`id`), `welder_id` INTEGER NOT NULL REFERENCES `welders` (`id`), `refusal` VARCHAR(500) NOT NULL, `reason` VARCHAR(500) NOT NULL, `signed_by_id` UUID NOT NULL REFERENCES `users` (`id`), `printed_name` VARCHAR(120) NOT NULL, `role` VARCHAR(20) NOT NULL, `signed_at` DATETIME NOT NULL, `digest` VARCHAR(64) NOT NULL, `canonical` TEXT NOT NULL, `seal` VARCHAR(64) NOT NULL);

CREATE TABLE `welders` (`id` INTEGER PRIMARY KEY AUTOINCREMENT, `shop_id` INTEGER NOT NULL REFERENCES `shops` (`id`), `name` VARCHAR(120) NOT NULL, `stamp` VARCHAR(20) NOT NULL, `user_id` UUID REFERENCES `users` (`id`), `email` VARCHAR(254), `active` TINYINT(1) NOT NULL DEFAULT 1, `created_at` DATETIME NOT NULL, `updated_at` DATETIME NOT NULL);

CREATE TABLE `window_counters` (`key` VARCHAR(320) NOT NULL PRIMARY KEY, `hits` INTEGER NOT NULL DEFAULT 0, `window_end` BIGINT NOT NULL);

CREATE TRIGGER audit_events_no_delete BEFORE DELETE ON audit_events
		BEGIN SELECT RAISE(ABORT, 'audit events are append-only'); END;

CREATE TRIGGER audit_events_no_update BEFORE UPDATE ON audit_events
		BEGIN SELECT RAISE(ABORT, 'audit events are append-only'); END;

CREATE TRIGGER data_books_no_delete BEFORE DELETE ON data_books
			BEGIN SELECT RAISE(ABORT, 'data_books are append-only'); END;

CREATE TRIGGER data_books_no_update BEFORE UPDATE ON data_books
			BEGIN SELECT RAISE(ABORT, 'data_books are append-only'); END;

CREATE TRIGGER joint_inspections_no_delete BEFORE DELETE ON joint_inspections
			BEGIN SELECT RAISE(ABORT, 'joint_inspections are append-only'); END;

CREATE TRIGGER joint_inspections_no_update BEFORE UPDATE ON joint_inspections
			BEGIN SELECT RAISE(ABORT, 'joint_inspections are append-only'); END;

CREATE TRIGGER joint_repairs_no_delete BEFORE DELETE ON joint_repairs
			BEGIN SELECT RAISE(ABORT, 'joint_repairs are append-only'); END;

CREATE TRIGGER joint_repairs_no_update BEFORE UPDATE ON joint_repairs
			BEGIN SELECT RAISE(ABORT, 'joint_repairs are append-only'); END;

CREATE TRIGGER pqr_addenda_no_delete BEFORE DELETE ON pqr_addenda
			BEGIN SELECT RAISE(ABORT, 'pqr_addenda are append-only'); END;

CREATE TRIGGER pqr_addenda_no_update BEFORE UPDATE ON pqr_addenda
			BEGIN SELECT RAISE(ABORT, 'pqr_addenda are append-only'); END;

CREATE TRIGGER settings_record_versions_delete AFTER DELETE ON settings_records
		BEGIN
			INSERT INTO settings_record_versions (shop_id, version) VALUES (old.shop_id, 1)
			ON CONFLICT (shop_id) DO UPDATE SET version = version + 1;
			
		END;

CREATE TRIGGER settings_record_versions_insert AFTER INSERT ON settings_records
		BEGIN
			INSERT INTO settings_record_versions (shop_id, version) VALUES (new.shop_id, 1)
			ON CONFLICT (shop_id) DO UPDATE SET version = version + 1;
			
		END;

CREATE TRIGGER settings_record_versions_update AFTER UPDATE ON settings_records
		BEGIN
			INSERT INTO settings_record_versions (shop_id, version) VALUES (new.shop_id, 1)
			ON CONFLICT (shop_id) DO UPDATE SET version = version + 1;
			UPDATE settings_record_versions SET version = version + 1 WHERE shop_id = old.shop_id AND old.shop_id <> new.shop_id;
		END;

CREATE TRIGGER settings_records_fts_ad AFTER DELETE ON settings_records BEGIN
		INSERT INTO settings_records_fts(settings_records_fts, rowid, search_text)
		VALUES ('delete', old.id, old.search_text);
	END;

CREATE TRIGGER settings_records_fts_ai AFTER INSERT ON settings_records BEGIN
		INSERT INTO settings_records_fts(rowid, search_text) VALUES (new.id, new.search_text);
	END;

CREATE TRIGGER settings_records_fts_au AFTER UPDATE OF search_text ON settings_records BEGIN
		INSERT INTO settings_records_fts(settings_records_fts, rowid, search_text)
		VALUES ('delete', old.id, old.search_text);
		INSERT INTO settings_records_fts(rowid, search_text) VALUES (new.id, new.search_text);
	END;

CREATE TRIGGER sign_offs_no_delete BEFORE DELETE ON sign_offs
			BEGIN SELECT RAISE(ABORT, 'sign_offs are append-only'); END;

CREATE TRIGGER sign_offs_no_update BEFORE UPDATE ON sign_offs
			BEGIN SELECT RAISE(ABORT, 'sign_offs are append-only'); END;

CREATE TRIGGER weld_logs_no_delete BEFORE DELETE ON weld_logs
			BEGIN SELECT RAISE(ABORT, 'weld_logs are append-only'); END;

CREATE TRIGGER weld_logs_no_update BEFORE UPDATE ON weld_logs
			BEGIN SELECT RAISE(ABORT, 'weld_logs are append-only'); END;

CREATE TRIGGER weld_overrides_no_delete BEFORE DELETE ON weld_overrides
			BEGIN SELECT RAISE(ABORT, 'weld_overrides are append-only'); END;

CREATE TRIGGER weld_overrides_no_update BEFORE UPDATE ON weld_overrides
			BEGIN SELECT RAISE(ABORT, 'weld_overrides are append-only'); END;
