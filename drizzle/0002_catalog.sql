CREATE TABLE "assemblies" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"slug" text NOT NULL,
	"vehicle_id" uuid NOT NULL,
	"system_id" uuid NOT NULL,
	"parent_id" uuid,
	"code" text NOT NULL,
	"name" text NOT NULL,
	"description" text DEFAULT '' NOT NULL,
	"diagram_svg" text,
	"sort_order" integer DEFAULT 0 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "assemblies_slug_unique" UNIQUE("slug")
);
--> statement-breakpoint
CREATE TABLE "assembly_callouts" (
	"assembly_id" uuid NOT NULL,
	"callout" text NOT NULL,
	"x" real NOT NULL,
	"y" real NOT NULL,
	CONSTRAINT "assembly_callouts_assembly_id_callout_pk" PRIMARY KEY("assembly_id","callout")
);
--> statement-breakpoint
CREATE TABLE "bom_lines" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"assembly_id" uuid NOT NULL,
	"callout" text NOT NULL,
	"part_id" uuid NOT NULL,
	"quantity" integer NOT NULL,
	"notes" text,
	"serial_from" integer,
	"serial_to" integer,
	"built_from" date,
	"built_to" date,
	"variants" text[],
	"sort_order" integer DEFAULT 0 NOT NULL,
	CONSTRAINT "bom_lines_qty_positive" CHECK ("bom_lines"."quantity" > 0),
	CONSTRAINT "bom_lines_serial_order" CHECK ("bom_lines"."serial_from" is null or "bom_lines"."serial_to" is null or "bom_lines"."serial_from" <= "bom_lines"."serial_to")
);
--> statement-breakpoint
CREATE TABLE "part_numbers" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"part_id" uuid NOT NULL,
	"printed" text NOT NULL,
	"key" text NOT NULL,
	"folded" text NOT NULL,
	"kind" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "parts" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"seed_key" text,
	"name" text NOT NULL,
	"description" text DEFAULT '' NOT NULL,
	"category" text NOT NULL,
	"specs" jsonb DEFAULT '{}'::jsonb NOT NULL,
	"weight_grams" integer DEFAULT 0 NOT NULL,
	"length_mm" integer DEFAULT 0 NOT NULL,
	"width_mm" integer DEFAULT 0 NOT NULL,
	"height_mm" integer DEFAULT 0 NOT NULL,
	"safety_class" text DEFAULT 'none' NOT NULL,
	"restricted" boolean DEFAULT false NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "parts_seed_key_unique" UNIQUE("seed_key"),
	CONSTRAINT "parts_dims_nonneg" CHECK ("parts"."weight_grams" >= 0 and "parts"."length_mm" >= 0 and "parts"."width_mm" >= 0 and "parts"."height_mm" >= 0)
);
--> statement-breakpoint
CREATE TABLE "supersessions" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"from_part_id" uuid NOT NULL,
	"to_part_id" uuid NOT NULL,
	"interchange" text NOT NULL,
	"note" text,
	"quantity" integer DEFAULT 1 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "supersessions_not_self" CHECK ("supersessions"."from_part_id" <> "supersessions"."to_part_id"),
	CONSTRAINT "supersessions_qty_positive" CHECK ("supersessions"."quantity" > 0),
	CONSTRAINT "supersessions_conditional_note" CHECK ("supersessions"."interchange" <> 'conditional' or "supersessions"."note" is not null)
);
--> statement-breakpoint
CREATE TABLE "systems" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"slug" text NOT NULL,
	"name" text NOT NULL,
	"sort_order" integer DEFAULT 0 NOT NULL,
	CONSTRAINT "systems_slug_unique" UNIQUE("slug")
);
--> statement-breakpoint
CREATE TABLE "vehicle_models" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"slug" text NOT NULL,
	"maker" text NOT NULL,
	"model" text NOT NULL,
	"name" text NOT NULL,
	"year_from" integer NOT NULL,
	"year_to" integer NOT NULL,
	"serial_prefix" text DEFAULT '' NOT NULL,
	"serial_from" integer NOT NULL,
	"serial_to" integer NOT NULL,
	"description" text DEFAULT '' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "vehicle_models_slug_unique" UNIQUE("slug")
);
--> statement-breakpoint
CREATE TABLE "vehicle_variants" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"vehicle_id" uuid NOT NULL,
	"code" text NOT NULL,
	"name" text NOT NULL,
	"description" text DEFAULT '' NOT NULL
);
--> statement-breakpoint
ALTER TABLE "assemblies" ADD CONSTRAINT "assemblies_vehicle_id_vehicle_models_id_fk" FOREIGN KEY ("vehicle_id") REFERENCES "public"."vehicle_models"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "assemblies" ADD CONSTRAINT "assemblies_system_id_systems_id_fk" FOREIGN KEY ("system_id") REFERENCES "public"."systems"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "assemblies" ADD CONSTRAINT "assemblies_parent_id_assemblies_id_fk" FOREIGN KEY ("parent_id") REFERENCES "public"."assemblies"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "assembly_callouts" ADD CONSTRAINT "assembly_callouts_assembly_id_assemblies_id_fk" FOREIGN KEY ("assembly_id") REFERENCES "public"."assemblies"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "bom_lines" ADD CONSTRAINT "bom_lines_assembly_id_assemblies_id_fk" FOREIGN KEY ("assembly_id") REFERENCES "public"."assemblies"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "bom_lines" ADD CONSTRAINT "bom_lines_part_id_parts_id_fk" FOREIGN KEY ("part_id") REFERENCES "public"."parts"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "part_numbers" ADD CONSTRAINT "part_numbers_part_id_parts_id_fk" FOREIGN KEY ("part_id") REFERENCES "public"."parts"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "supersessions" ADD CONSTRAINT "supersessions_from_part_id_parts_id_fk" FOREIGN KEY ("from_part_id") REFERENCES "public"."parts"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "supersessions" ADD CONSTRAINT "supersessions_to_part_id_parts_id_fk" FOREIGN KEY ("to_part_id") REFERENCES "public"."parts"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "vehicle_variants" ADD CONSTRAINT "vehicle_variants_vehicle_id_vehicle_models_id_fk" FOREIGN KEY ("vehicle_id") REFERENCES "public"."vehicle_models"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "assemblies_vehicle_system_idx" ON "assemblies" USING btree ("vehicle_id","system_id");--> statement-breakpoint
CREATE INDEX "assemblies_parent_idx" ON "assemblies" USING btree ("parent_id");--> statement-breakpoint
CREATE INDEX "bom_lines_assembly_idx" ON "bom_lines" USING btree ("assembly_id","sort_order");--> statement-breakpoint
CREATE INDEX "bom_lines_part_idx" ON "bom_lines" USING btree ("part_id");--> statement-breakpoint
CREATE UNIQUE INDEX "part_numbers_part_key_kind" ON "part_numbers" USING btree ("part_id","key","kind");--> statement-breakpoint
CREATE INDEX "part_numbers_key_idx" ON "part_numbers" USING btree ("key");--> statement-breakpoint
CREATE INDEX "part_numbers_folded_idx" ON "part_numbers" USING btree ("folded");--> statement-breakpoint
CREATE INDEX "part_numbers_key_prefix_idx" ON "part_numbers" USING btree ("key" text_pattern_ops);--> statement-breakpoint
CREATE INDEX "part_numbers_key_trgm_idx" ON "part_numbers" USING gin ("key" gin_trgm_ops);--> statement-breakpoint
CREATE INDEX "parts_category_idx" ON "parts" USING btree ("category");--> statement-breakpoint
CREATE UNIQUE INDEX "supersessions_from_to_key" ON "supersessions" USING btree ("from_part_id","to_part_id");--> statement-breakpoint
CREATE INDEX "supersessions_to_idx" ON "supersessions" USING btree ("to_part_id");--> statement-breakpoint
CREATE UNIQUE INDEX "vehicle_variants_code_key" ON "vehicle_variants" USING btree ("vehicle_id","code");