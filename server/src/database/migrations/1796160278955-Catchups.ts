import { MigrationInterface, QueryRunner } from "typeorm";

export class Catchups1796160278955 implements MigrationInterface {
    name = 'Catchups1796160278955'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "catchups" ("id" uuid NOT NULL DEFAULT uuid_generate_v4(), "session_id" uuid NOT NULL, "class_id" uuid NOT NULL, "code" text NOT NULL, "created_by_id" uuid, "closed_at" TIMESTAMP WITH TIME ZONE, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_3fae10bae7cc25392e3a4fb542a" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "catchups_class_id_idx" ON "catchups" ("class_id") `);
        await queryRunner.query(`CREATE INDEX "catchups_session_id_idx" ON "catchups" ("session_id") `);
        await queryRunner.query(`CREATE UNIQUE INDEX "catchups_code_open_key" ON "catchups" ("code") WHERE closed_at IS NULL`);
        await queryRunner.query(`CREATE TABLE "catchup_cards" ("id" uuid NOT NULL DEFAULT uuid_generate_v4(), "catchup_id" uuid NOT NULL, "roster_entry_id" uuid NOT NULL, "item_id" uuid NOT NULL, "box" integer NOT NULL DEFAULT '1', "due_at" TIMESTAMP WITH TIME ZONE NOT NULL, "last_answered_at" TIMESTAMP WITH TIME ZONE, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "catchup_cards_box_check" CHECK (box BETWEEN 1 AND 5), CONSTRAINT "PK_280902bfcaf6b82a635ae45d7d1" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "catchup_cards_roster_entry_id_idx" ON "catchup_cards" ("roster_entry_id") `);
        await queryRunner.query(`CREATE UNIQUE INDEX "catchup_cards_catchup_id_roster_entry_id_item_id_key" ON "catchup_cards" ("catchup_id", "roster_entry_id", "item_id") `);
        await queryRunner.query(`CREATE TABLE "catchup_answers" ("id" uuid NOT NULL DEFAULT uuid_generate_v4(), "card_id" uuid NOT NULL, "response" jsonb NOT NULL, "credit" double precision NOT NULL, "correct" boolean NOT NULL, "answered_at" TIMESTAMP WITH TIME ZONE NOT NULL, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_f081fb15290bc80a1abf6ae483d" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "catchup_answers_card_id_answered_at_idx" ON "catchup_answers" ("card_id", "answered_at") `);
        await queryRunner.query(`ALTER TABLE "catchups" ADD CONSTRAINT "FK_674552e0dcc55e070ff19a6fa19" FOREIGN KEY ("session_id") REFERENCES "sessions"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "catchups" ADD CONSTRAINT "FK_eb9671ab9506932618142f1f6b0" FOREIGN KEY ("class_id") REFERENCES "classes"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "catchups" ADD CONSTRAINT "FK_a28cccaa90e07d3a67fe2003be1" FOREIGN KEY ("created_by_id") REFERENCES "users"("id") ON DELETE SET NULL ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "catchup_cards" ADD CONSTRAINT "FK_335106be88b5b9f3efad6c1f9f4" FOREIGN KEY ("catchup_id") REFERENCES "catchups"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "catchup_cards" ADD CONSTRAINT "FK_ad7c21a621aedfe512b5bb06705" FOREIGN KEY ("roster_entry_id") REFERENCES "roster_entries"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "catchup_answers" ADD CONSTRAINT "FK_99d391b2351889692069988ecad" FOREIGN KEY ("card_id") REFERENCES "catchup_cards"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "catchup_answers" DROP CONSTRAINT "FK_99d391b2351889692069988ecad"`);
        await queryRunner.query(`ALTER TABLE "catchup_cards" DROP CONSTRAINT "FK_ad7c21a621aedfe512b5bb06705"`);
        await queryRunner.query(`ALTER TABLE "catchup_cards" DROP CONSTRAINT "FK_335106be88b5b9f3efad6c1f9f4"`);
        await queryRunner.query(`ALTER TABLE "catchups" DROP CONSTRAINT "FK_a28cccaa90e07d3a67fe2003be1"`);
        await queryRunner.query(`ALTER TABLE "catchups" DROP CONSTRAINT "FK_eb9671ab9506932618142f1f6b0"`);
        await queryRunner.query(`ALTER TABLE "catchups" DROP CONSTRAINT "FK_674552e0dcc55e070ff19a6fa19"`);
        await queryRunner.query(`DROP INDEX "public"."catchup_answers_card_id_answered_at_idx"`);
        await queryRunner.query(`DROP TABLE "catchup_answers"`);
        await queryRunner.query(`DROP INDEX "public"."catchup_cards_catchup_id_roster_entry_id_item_id_key"`);
        await queryRunner.query(`DROP INDEX "public"."catchup_cards_roster_entry_id_idx"`);
        await queryRunner.query(`DROP TABLE "catchup_cards"`);
        await queryRunner.query(`DROP INDEX "public"."catchups_code_open_key"`);
        await queryRunner.query(`DROP INDEX "public"."catchups_session_id_idx"`);
        await queryRunner.query(`DROP INDEX "public"."catchups_class_id_idx"`);
        await queryRunner.query(`DROP TABLE "catchups"`);
    }

}
