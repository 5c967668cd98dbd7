CREATE TABLE "alert_hits" (
	"alert_id" uuid NOT NULL,
	"listing_id" uuid NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "alert_hits_alert_id_listing_id_pk" PRIMARY KEY("alert_id","listing_id")
);
--> statement-breakpoint
CREATE TABLE "garage_vehicles" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"owner_id" uuid NOT NULL,
	"vehicle_model_id" uuid NOT NULL,
	"nickname" text DEFAULT '' NOT NULL,
	"serial_printed" text DEFAULT '' NOT NULL,
	"serial_number" integer,
	"build_date" text,
	"variant" text,
	"originality_target" text DEFAULT 'as_built' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "notices" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"user_id" uuid NOT NULL,
	"kind" text NOT NULL,
	"title" text NOT NULL,
	"body" text DEFAULT '' NOT NULL,
	"link" text,
	"read_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "teardown_items" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"garage_vehicle_id" uuid NOT NULL,
	"bom_line_id" uuid NOT NULL,
	"status" text DEFAULT 'not_inspected' NOT NULL,
	"usable_on_hand" integer DEFAULT 0 NOT NULL,
	"policy" text DEFAULT 'any' NOT NULL,
	"note" text DEFAULT '' NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "teardown_usable_nonneg" CHECK ("teardown_items"."usable_on_hand" >= 0)
);
--> statement-breakpoint
CREATE TABLE "teardown_log" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"garage_vehicle_id" uuid NOT NULL,
	"teardown_item_id" uuid,
	"author_id" uuid,
	"text" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "teardown_photos" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"teardown_item_id" uuid NOT NULL,
	"thumb_key" text NOT NULL,
	"medium_key" text NOT NULL,
	"large_key" text NOT NULL,
	"placeholder_color" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "wanted_alerts" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"user_id" uuid NOT NULL,
	"part_id" uuid NOT NULL,
	"number_printed" text NOT NULL,
	"policy" text DEFAULT 'any' NOT NULL,
	"max_price_cents" integer,
	"active" boolean DEFAULT true NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "wants" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"garage_vehicle_id" uuid NOT NULL,
	"part_id" uuid NOT NULL,
	"quantity" integer NOT NULL,
	"policy" text DEFAULT 'any' NOT NULL,
	"note" text DEFAULT '' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "alert_hits" ADD CONSTRAINT "alert_hits_alert_id_wanted_alerts_id_fk" FOREIGN KEY ("alert_id") REFERENCES "public"."wanted_alerts"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "alert_hits" ADD CONSTRAINT "alert_hits_listing_id_listings_id_fk" FOREIGN KEY ("listing_id") REFERENCES "public"."listings"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "garage_vehicles" ADD CONSTRAINT "garage_vehicles_owner_id_users_id_fk" FOREIGN KEY ("owner_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "garage_vehicles" ADD CONSTRAINT "garage_vehicles_vehicle_model_id_vehicle_models_id_fk" FOREIGN KEY ("vehicle_model_id") REFERENCES "public"."vehicle_models"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "notices" ADD CONSTRAINT "notices_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "teardown_items" ADD CONSTRAINT "teardown_items_garage_vehicle_id_garage_vehicles_id_fk" FOREIGN KEY ("garage_vehicle_id") REFERENCES "public"."garage_vehicles"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "teardown_items" ADD CONSTRAINT "teardown_items_bom_line_id_bom_lines_id_fk" FOREIGN KEY ("bom_line_id") REFERENCES "public"."bom_lines"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "teardown_log" ADD CONSTRAINT "teardown_log_garage_vehicle_id_garage_vehicles_id_fk" FOREIGN KEY ("garage_vehicle_id") REFERENCES "public"."garage_vehicles"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "teardown_log" ADD CONSTRAINT "teardown_log_teardown_item_id_teardown_items_id_fk" FOREIGN KEY ("teardown_item_id") REFERENCES "public"."teardown_items"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "teardown_log" ADD CONSTRAINT "teardown_log_author_id_users_id_fk" FOREIGN KEY ("author_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "teardown_photos" ADD CONSTRAINT "teardown_photos_teardown_item_id_teardown_items_id_fk" FOREIGN KEY ("teardown_item_id") REFERENCES "public"."teardown_items"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "wanted_alerts" ADD CONSTRAINT "wanted_alerts_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "wanted_alerts" ADD CONSTRAINT "wanted_alerts_part_id_parts_id_fk" FOREIGN KEY ("part_id") REFERENCES "public"."parts"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "wants" ADD CONSTRAINT "wants_garage_vehicle_id_garage_vehicles_id_fk" FOREIGN KEY ("garage_vehicle_id") REFERENCES "public"."garage_vehicles"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "wants" ADD CONSTRAINT "wants_part_id_parts_id_fk" FOREIGN KEY ("part_id") REFERENCES "public"."parts"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "garage_vehicles_owner_idx" ON "garage_vehicles" USING btree ("owner_id");--> statement-breakpoint
CREATE INDEX "notices_user_idx" ON "notices" USING btree ("user_id","created_at");--> statement-breakpoint
CREATE UNIQUE INDEX "teardown_items_vehicle_line" ON "teardown_items" USING btree ("garage_vehicle_id","bom_line_id");--> statement-breakpoint
CREATE INDEX "teardown_log_vehicle_idx" ON "teardown_log" USING btree ("garage_vehicle_id","created_at");--> statement-breakpoint
CREATE INDEX "wanted_alerts_part_idx" ON "wanted_alerts" USING btree ("part_id") WHERE "wanted_alerts"."active";--> statement-breakpoint
CREATE INDEX "wanted_alerts_user_idx" ON "wanted_alerts" USING btree ("user_id");