import { MigrationInterface, QueryRunner } from "typeorm";

export class LiveSessions1796158009970 implements MigrationInterface {
    name = 'LiveSessions1796158009970'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "sessions" ("id" uuid NOT NULL DEFAULT uuid_generate_v4(), "owner_id" uuid NOT NULL, "school_id" uuid NOT NULL, "bank_id" uuid, "bank_title" text NOT NULL, "class_id" uuid, "join_code" text NOT NULL, "status" text NOT NULL, "format" text NOT NULL, "settings" jsonb NOT NULL, "item_ids" uuid array NOT NULL, "items" jsonb NOT NULL, "seed" text NOT NULL, "mixer_seed" text, "mixer_summary" jsonb, "joining_locked" boolean NOT NULL DEFAULT false, "snapshot" jsonb NOT NULL, "snapshot_version" integer NOT NULL DEFAULT '1', "snapshot_seq" bigint NOT NULL DEFAULT '0', "snapshot_at" TIMESTAMP WITH TIME ZONE, "started_at" TIMESTAMP WITH TIME ZONE, "ended_at" TIMESTAMP WITH TIME ZONE, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_3238ef96f18b355b671619111bc" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "sessions_status_idx" ON "sessions" ("status") `);
        await queryRunner.query(`CREATE INDEX "sessions_school_id_idx" ON "sessions" ("school_id") `);
        await queryRunner.query(`CREATE INDEX "sessions_class_id_idx" ON "sessions" ("class_id") `);
        await queryRunner.query(`CREATE INDEX "sessions_owner_id_idx" ON "sessions" ("owner_id") `);
        await queryRunner.query(`CREATE UNIQUE INDEX "sessions_join_code_live_key" ON "sessions" ("join_code") WHERE status <> 'ended'`);
        await queryRunner.query(`CREATE TABLE "session_teams" ("id" uuid NOT NULL DEFAULT uuid_generate_v4(), "session_id" uuid NOT NULL, "position" integer NOT NULL, "name" text NOT NULL, "colour" text NOT NULL, "pattern" text NOT NULL, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_62d08168ad5b9876c59fa169e13" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE UNIQUE INDEX "session_teams_session_id_position_key" ON "session_teams" ("session_id", "position") `);
        await queryRunner.query(`CREATE TABLE "session_players" ("id" uuid NOT NULL DEFAULT uuid_generate_v4(), "session_id" uuid NOT NULL, "nickname" text NOT NULL, "nickname_key" text NOT NULL, "roster_entry_id" uuid, "table_group" text, "time_multiplier" double precision NOT NULL DEFAULT '1', "team_id" uuid, "number" integer, "status" text NOT NULL, "removed_at" TIMESTAMP WITH TIME ZONE, "token_version" integer NOT NULL DEFAULT '1', "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_553400b7551b527e9452e67f5ee" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "session_players_team_id_idx" ON "session_players" ("team_id") `);
        await queryRunner.query(`CREATE INDEX "session_players_roster_entry_id_idx" ON "session_players" ("roster_entry_id") `);
        await queryRunner.query(`CREATE UNIQUE INDEX "session_players_session_id_roster_entry_id_key" ON "session_players" ("session_id", "roster_entry_id") WHERE removed_at IS NULL AND roster_entry_id IS NOT NULL`);
        await queryRunner.query(`CREATE UNIQUE INDEX "session_players_session_id_nickname_key" ON "session_players" ("session_id", "nickname_key") WHERE removed_at IS NULL`);
        await queryRunner.query(`CREATE TABLE "responses" ("id" uuid NOT NULL DEFAULT uuid_generate_v4(), "seq" BIGSERIAL NOT NULL, "session_id" uuid NOT NULL, "round_index" integer NOT NULL, "player_id" uuid NOT NULL, "team_id" uuid, "client_message_id" text NOT NULL, "kind" text NOT NULL DEFAULT 'answer', "response" jsonb, "locked" boolean NOT NULL DEFAULT false, "credit" double precision, "correct" boolean, "points" integer, "final" boolean NOT NULL DEFAULT false, "elapsed_ms" integer NOT NULL, "received_at" TIMESTAMP WITH TIME ZONE NOT NULL, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_be3bdac59bd243dff421ad7bf70" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "responses_session_id_round_index_idx" ON "responses" ("session_id", "round_index") `);
        await queryRunner.query(`CREATE INDEX "responses_session_id_seq_idx" ON "responses" ("session_id", "seq") `);
        await queryRunner.query(`CREATE UNIQUE INDEX "responses_player_id_client_message_id_key" ON "responses" ("player_id", "client_message_id") `);
        await queryRunner.query(`CREATE TABLE "session_rounds" ("id" uuid NOT NULL DEFAULT uuid_generate_v4(), "session_id" uuid NOT NULL, "index" integer NOT NULL, "item_id" uuid NOT NULL, "status" text NOT NULL, "opened_at" TIMESTAMP WITH TIME ZONE, "closed_at" TIMESTAMP WITH TIME ZONE, "revealed_at" TIMESTAMP WITH TIME ZONE, "close_reason" text, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_7bb6691c140907018d420b99f34" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE UNIQUE INDEX "session_rounds_session_id_index_key" ON "session_rounds" ("session_id", "index") `);
        await queryRunner.query(`ALTER TABLE "sessions" ADD CONSTRAINT "FK_9b62a28ab0bc9ab3c882ab55afa" FOREIGN KEY ("owner_id") REFERENCES "users"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "sessions" ADD CONSTRAINT "FK_ccedaf9dfa0503fa7b03b08d126" FOREIGN KEY ("school_id") REFERENCES "schools"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "sessions" ADD CONSTRAINT "FK_3d3df5b9245874bd44d09e4b6b7" FOREIGN KEY ("bank_id") REFERENCES "banks"("id") ON DELETE SET NULL ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "sessions" ADD CONSTRAINT "FK_a2081350098b32dc73451b8bba9" FOREIGN KEY ("class_id") REFERENCES "classes"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "session_teams" ADD CONSTRAINT "FK_d8dbda80e4de4f9ccf74fb1bd8e" FOREIGN KEY ("session_id") REFERENCES "sessions"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "session_players" ADD CONSTRAINT "FK_6611d88b21374f0d4ec3bea0afa" FOREIGN KEY ("session_id") REFERENCES "sessions"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "session_players" ADD CONSTRAINT "FK_0df2eb47a0d1c206077762439d2" FOREIGN KEY ("roster_entry_id") REFERENCES "roster_entries"("id") ON DELETE SET NULL ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "session_players" ADD CONSTRAINT "FK_fca4ce08b0280592eb23e29fd13" FOREIGN KEY ("team_id") REFERENCES "session_teams"("id") ON DELETE SET NULL ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "responses" ADD CONSTRAINT "FK_2f90e23a972fd36124d7e76e77d" FOREIGN KEY ("session_id") REFERENCES "sessions"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "responses" ADD CONSTRAINT "FK_bff92da179dd9b1858277b12ca8" FOREIGN KEY ("player_id") REFERENCES "session_players"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "session_rounds" ADD CONSTRAINT "FK_1202627e001a924439b717ab5f1" FOREIGN KEY ("session_id") REFERENCES "sessions"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "session_rounds" DROP CONSTRAINT "FK_1202627e001a924439b717ab5f1"`);
        await queryRunner.query(`ALTER TABLE "responses" DROP CONSTRAINT "FK_bff92da179dd9b1858277b12ca8"`);
        await queryRunner.query(`ALTER TABLE "responses" DROP CONSTRAINT "FK_2f90e23a972fd36124d7e76e77d"`);
        await queryRunner.query(`ALTER TABLE "session_players" DROP CONSTRAINT "FK_fca4ce08b0280592eb23e29fd13"`);
        await queryRunner.query(`ALTER TABLE "session_players" DROP CONSTRAINT "FK_0df2eb47a0d1c206077762439d2"`);
        await queryRunner.query(`ALTER TABLE "session_players" DROP CONSTRAINT "FK_6611d88b21374f0d4ec3bea0afa"`);
        await queryRunner.query(`ALTER TABLE "session_teams" DROP CONSTRAINT "FK_d8dbda80e4de4f9ccf74fb1bd8e"`);
        await queryRunner.query(`ALTER TABLE "sessions" DROP CONSTRAINT "FK_a2081350098b32dc73451b8bba9"`);
        await queryRunner.query(`ALTER TABLE "sessions" DROP CONSTRAINT "FK_3d3df5b9245874bd44d09e4b6b7"`);
        await queryRunner.query(`ALTER TABLE "sessions" DROP CONSTRAINT "FK_ccedaf9dfa0503fa7b03b08d126"`);
        await queryRunner.query(`ALTER TABLE "sessions" DROP CONSTRAINT "FK_9b62a28ab0bc9ab3c882ab55afa"`);
        await queryRunner.query(`DROP INDEX "public"."session_rounds_session_id_index_key"`);
        await queryRunner.query(`DROP TABLE "session_rounds"`);
        await queryRunner.query(`DROP INDEX "public"."responses_player_id_client_message_id_key"`);
        await queryRunner.query(`DROP INDEX "public"."responses_session_id_seq_idx"`);
        await queryRunner.query(`DROP INDEX "public"."responses_session_id_round_index_idx"`);
        await queryRunner.query(`DROP TABLE "responses"`);
        await queryRunner.query(`DROP INDEX "public"."session_players_session_id_nickname_key"`);
        await queryRunner.query(`DROP INDEX "public"."session_players_session_id_roster_entry_id_key"`);
        await queryRunner.query(`DROP INDEX "public"."session_players_roster_entry_id_idx"`);
        await queryRunner.query(`DROP INDEX "public"."session_players_team_id_idx"`);
        await queryRunner.query(`DROP TABLE "session_players"`);
        await queryRunner.query(`DROP INDEX "public"."session_teams_session_id_position_key"`);
        await queryRunner.query(`DROP TABLE "session_teams"`);
        await queryRunner.query(`DROP INDEX "public"."sessions_join_code_live_key"`);
        await queryRunner.query(`DROP INDEX "public"."sessions_owner_id_idx"`);
        await queryRunner.query(`DROP INDEX "public"."sessions_class_id_idx"`);
        await queryRunner.query(`DROP INDEX "public"."sessions_school_id_idx"`);
        await queryRunner.query(`DROP INDEX "public"."sessions_status_idx"`);
        await queryRunner.query(`DROP TABLE "sessions"`);
    }

}
