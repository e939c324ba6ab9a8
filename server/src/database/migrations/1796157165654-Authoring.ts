import { MigrationInterface, QueryRunner } from "typeorm";

export class Authoring1796157165654 implements MigrationInterface {
    name = 'Authoring1796157165654'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE "banks" ("id" uuid NOT NULL DEFAULT uuid_generate_v4(), "owner_id" uuid NOT NULL, "school_id" uuid NOT NULL, "title" text NOT NULL, "description" text NOT NULL DEFAULT '', "tags" text array NOT NULL DEFAULT '{}', "standards_code" text, "archived_at" TIMESTAMP WITH TIME ZONE, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_3975b5f684ec241e3901db62d77" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "banks_school_id_idx" ON "banks" ("school_id") `);
        await queryRunner.query(`CREATE INDEX "banks_owner_id_idx" ON "banks" ("owner_id") `);
        await queryRunner.query(`CREATE TABLE "bank_shares" ("id" uuid NOT NULL DEFAULT uuid_generate_v4(), "bank_id" uuid NOT NULL, "user_id" uuid NOT NULL, "access" text NOT NULL, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_a6046812329cfe1256deebb0a4f" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "bank_shares_user_id_idx" ON "bank_shares" ("user_id") `);
        await queryRunner.query(`CREATE UNIQUE INDEX "bank_shares_bank_id_user_id_key" ON "bank_shares" ("bank_id", "user_id") `);
        await queryRunner.query(`CREATE TABLE "media" ("id" uuid NOT NULL DEFAULT uuid_generate_v4(), "owner_id" uuid NOT NULL, "school_id" uuid NOT NULL, "mime" text NOT NULL, "byte_size" integer NOT NULL, "sha256" text NOT NULL, "storage_key" text NOT NULL, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_f4e0fcac36e050de337b670d8bd" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "media_school_id_idx" ON "media" ("school_id") `);
        await queryRunner.query(`CREATE INDEX "media_owner_id_idx" ON "media" ("owner_id") `);
        await queryRunner.query(`CREATE TABLE "items" ("id" uuid NOT NULL DEFAULT uuid_generate_v4(), "bank_id" uuid NOT NULL, "position" integer NOT NULL, "type" text NOT NULL, "prompt" text NOT NULL, "options" jsonb NOT NULL DEFAULT '[]', "key" jsonb NOT NULL, "explanation" text NOT NULL DEFAULT '', "tags" text array NOT NULL DEFAULT '{}', "image_id" uuid, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_ba5885359424c15ca6b9e79bcf6" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "items_image_id_idx" ON "items" ("image_id") `);
        await queryRunner.query(`CREATE INDEX "items_bank_id_position_idx" ON "items" ("bank_id", "position") `);
        await queryRunner.query(`CREATE TABLE "classes" ("id" uuid NOT NULL DEFAULT uuid_generate_v4(), "owner_id" uuid NOT NULL, "school_id" uuid NOT NULL, "name" text NOT NULL, "period" text NOT NULL DEFAULT '', "term" text NOT NULL DEFAULT '', "archived_at" TIMESTAMP WITH TIME ZONE, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_e207aa15404e9b2ce35910f9f7f" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "classes_school_id_idx" ON "classes" ("school_id") `);
        await queryRunner.query(`CREATE INDEX "classes_owner_id_idx" ON "classes" ("owner_id") `);
        await queryRunner.query(`CREATE TABLE "class_co_teachers" ("id" uuid NOT NULL DEFAULT uuid_generate_v4(), "class_id" uuid NOT NULL, "user_id" uuid NOT NULL, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_b69f99d88c71a984f9b06e9b6da" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "class_co_teachers_user_id_idx" ON "class_co_teachers" ("user_id") `);
        await queryRunner.query(`CREATE UNIQUE INDEX "class_co_teachers_class_id_user_id_key" ON "class_co_teachers" ("class_id", "user_id") `);
        await queryRunner.query(`CREATE TABLE "roster_entries" ("id" uuid NOT NULL DEFAULT uuid_generate_v4(), "class_id" uuid NOT NULL, "display_name" text NOT NULL, "table_group" text, "seat_number" integer, "time_multiplier" numeric(3,2) NOT NULL DEFAULT '1', "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "roster_entries_time_multiplier_check" CHECK (time_multiplier IN (1, 1.25, 1.5, 2)), CONSTRAINT "PK_c4b86b75e6d6856f877517ef8d1" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE UNIQUE INDEX "roster_entries_class_id_display_name_key" ON "roster_entries" ("class_id", "display_name") `);
        await queryRunner.query(`CREATE TABLE "pair_rules" ("id" uuid NOT NULL DEFAULT uuid_generate_v4(), "class_id" uuid NOT NULL, "kind" text NOT NULL, "entry_a_id" uuid NOT NULL, "entry_b_id" uuid NOT NULL, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_aceb8b90403019bccb881e861c8" PRIMARY KEY ("id"))`);
        await queryRunner.query(`CREATE INDEX "pair_rules_entry_b_id_idx" ON "pair_rules" ("entry_b_id") `);
        await queryRunner.query(`CREATE INDEX "pair_rules_entry_a_id_idx" ON "pair_rules" ("entry_a_id") `);
        await queryRunner.query(`CREATE UNIQUE INDEX "pair_rules_class_id_entry_a_id_entry_b_id_key" ON "pair_rules" ("class_id", "entry_a_id", "entry_b_id") `);
        await queryRunner.query(`ALTER TABLE "banks" ADD CONSTRAINT "FK_99a0ed32b96f9338d4035fb8554" FOREIGN KEY ("owner_id") REFERENCES "users"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "banks" ADD CONSTRAINT "FK_6e3880e63dce37d69ee93dfd864" FOREIGN KEY ("school_id") REFERENCES "schools"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "bank_shares" ADD CONSTRAINT "FK_da3914d52b46ea446d594cb8663" FOREIGN KEY ("bank_id") REFERENCES "banks"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "bank_shares" ADD CONSTRAINT "FK_49703de198cf64cc96c4bb2d845" FOREIGN KEY ("user_id") REFERENCES "users"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "media" ADD CONSTRAINT "FK_c6889397830b5ed0f2a30362065" FOREIGN KEY ("owner_id") REFERENCES "users"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "media" ADD CONSTRAINT "FK_5cc1dba9abc05c6d74ca7d7187a" FOREIGN KEY ("school_id") REFERENCES "schools"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "items" ADD CONSTRAINT "FK_7b469770bb95f371869cdf015d8" FOREIGN KEY ("bank_id") REFERENCES "banks"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "items" ADD CONSTRAINT "FK_66ac498fd7d034957c4fa0edc51" FOREIGN KEY ("image_id") REFERENCES "media"("id") ON DELETE SET NULL ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "classes" ADD CONSTRAINT "FK_30d3f3dc5dc991aa1cfe00e035d" FOREIGN KEY ("owner_id") REFERENCES "users"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "classes" ADD CONSTRAINT "FK_398f3990f5da4a1efda173f576f" FOREIGN KEY ("school_id") REFERENCES "schools"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "class_co_teachers" ADD CONSTRAINT "FK_d448555a899f90be7b773001642" FOREIGN KEY ("class_id") REFERENCES "classes"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "class_co_teachers" ADD CONSTRAINT "FK_9862d2a66cbac995528acdfa16d" FOREIGN KEY ("user_id") REFERENCES "users"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "roster_entries" ADD CONSTRAINT "FK_bce559fd154e63d2684305afc27" FOREIGN KEY ("class_id") REFERENCES "classes"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "pair_rules" ADD CONSTRAINT "FK_360d865e92a67a3de611f5818c3" FOREIGN KEY ("class_id") REFERENCES "classes"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "pair_rules" ADD CONSTRAINT "FK_8a39e165e1857f822fa58c1a096" FOREIGN KEY ("entry_a_id") REFERENCES "roster_entries"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE "pair_rules" ADD CONSTRAINT "FK_236f64d57f17dafbe4e9d5ebb0a" FOREIGN KEY ("entry_b_id") REFERENCES "roster_entries"("id") ON DELETE CASCADE ON UPDATE NO ACTION`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE "pair_rules" DROP CONSTRAINT "FK_236f64d57f17dafbe4e9d5ebb0a"`);
        await queryRunner.query(`ALTER TABLE "pair_rules" DROP CONSTRAINT "FK_8a39e165e1857f822fa58c1a096"`);
        await queryRunner.query(`ALTER TABLE "pair_rules" DROP CONSTRAINT "FK_360d865e92a67a3de611f5818c3"`);
        await queryRunner.query(`ALTER TABLE "roster_entries" DROP CONSTRAINT "FK_bce559fd154e63d2684305afc27"`);
        await queryRunner.query(`ALTER TABLE "class_co_teachers" DROP CONSTRAINT "FK_9862d2a66cbac995528acdfa16d"`);
        await queryRunner.query(`ALTER TABLE "class_co_teachers" DROP CONSTRAINT "FK_d448555a899f90be7b773001642"`);
        await queryRunner.query(`ALTER TABLE "classes" DROP CONSTRAINT "FK_398f3990f5da4a1efda173f576f"`);
        await queryRunner.query(`ALTER TABLE "classes" DROP CONSTRAINT "FK_30d3f3dc5dc991aa1cfe00e035d"`);
        await queryRunner.query(`ALTER TABLE "items" DROP CONSTRAINT "FK_66ac498fd7d034957c4fa0edc51"`);
        await queryRunner.query(`ALTER TABLE "items" DROP CONSTRAINT "FK_7b469770bb95f371869cdf015d8"`);
        await queryRunner.query(`ALTER TABLE "media" DROP CONSTRAINT "FK_5cc1dba9abc05c6d74ca7d7187a"`);
        await queryRunner.query(`ALTER TABLE "media" DROP CONSTRAINT "FK_c6889397830b5ed0f2a30362065"`);
        await queryRunner.query(`ALTER TABLE "bank_shares" DROP CONSTRAINT "FK_49703de198cf64cc96c4bb2d845"`);
        await queryRunner.query(`ALTER TABLE "bank_shares" DROP CONSTRAINT "FK_da3914d52b46ea446d594cb8663"`);
        await queryRunner.query(`ALTER TABLE "banks" DROP CONSTRAINT "FK_6e3880e63dce37d69ee93dfd864"`);
        await queryRunner.query(`ALTER TABLE "banks" DROP CONSTRAINT "FK_99a0ed32b96f9338d4035fb8554"`);
        await queryRunner.query(`DROP INDEX "public"."pair_rules_class_id_entry_a_id_entry_b_id_key"`);
        await queryRunner.query(`DROP INDEX "public"."pair_rules_entry_a_id_idx"`);
        await queryRunner.query(`DROP INDEX "public"."pair_rules_entry_b_id_idx"`);
        await queryRunner.query(`DROP TABLE "pair_rules"`);
        await queryRunner.query(`DROP INDEX "public"."roster_entries_class_id_display_name_key"`);
        await queryRunner.query(`DROP TABLE "roster_entries"`);
        await queryRunner.query(`DROP INDEX "public"."class_co_teachers_class_id_user_id_key"`);
        await queryRunner.query(`DROP INDEX "public"."class_co_teachers_user_id_idx"`);
        await queryRunner.query(`DROP TABLE "class_co_teachers"`);
        await queryRunner.query(`DROP INDEX "public"."classes_owner_id_idx"`);
        await queryRunner.query(`DROP INDEX "public"."classes_school_id_idx"`);
        await queryRunner.query(`DROP TABLE "classes"`);
        await queryRunner.query(`DROP INDEX "public"."items_bank_id_position_idx"`);
        await queryRunner.query(`DROP INDEX "public"."items_image_id_idx"`);
        await queryRunner.query(`DROP TABLE "items"`);
        await queryRunner.query(`DROP INDEX "public"."media_owner_id_idx"`);
        await queryRunner.query(`DROP INDEX "public"."media_school_id_idx"`);
        await queryRunner.query(`DROP TABLE "media"`);
        await queryRunner.query(`DROP INDEX "public"."bank_shares_bank_id_user_id_key"`);
        await queryRunner.query(`DROP INDEX "public"."bank_shares_user_id_idx"`);
        await queryRunner.query(`DROP TABLE "bank_shares"`);
        await queryRunner.query(`DROP INDEX "public"."banks_owner_id_idx"`);
        await queryRunner.query(`DROP INDEX "public"."banks_school_id_idx"`);
        await queryRunner.query(`DROP TABLE "banks"`);
    }

}
