CREATE TABLE "listing_events" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"listing_id" uuid NOT NULL,
	"actor_id" uuid,
	"action" text NOT NULL,
	"from_state" text,
	"to_state" text NOT NULL,
	"message" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "listing_flags" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"listing_id" uuid NOT NULL,
	"code" text NOT NULL,
	"severity" text NOT NULL,
	"message" text NOT NULL,
	"details" jsonb,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "listing_photos" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"listing_id" uuid NOT NULL,
	"position" integer NOT NULL,
	"thumb_key" text NOT NULL,
	"medium_key" text NOT NULL,
	"large_key" text NOT NULL,
	"width" integer NOT NULL,
	"height" integer NOT NULL,
	"placeholder_color" text NOT NULL,
	"dhash" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "listings" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"seller_id" uuid NOT NULL,
	"part_id" uuid,
	"title" text NOT NULL,
	"condition" text NOT NULL,
	"used_grade" text,
	"rubber_use" text,
	"makers_marks" boolean DEFAULT false NOT NULL,
	"quantity" integer NOT NULL,
	"price_cents" integer NOT NULL,
	"currency" text DEFAULT 'USD' NOT NULL,
	"weight_grams" integer DEFAULT 0 NOT NULL,
	"length_mm" integer DEFAULT 0 NOT NULL,
	"width_mm" integer DEFAULT 0 NOT NULL,
	"height_mm" integer DEFAULT 0 NOT NULL,
	"shipping_profile_id" uuid,
	"description_md" text DEFAULT '' NOT NULL,
	"description_html" text DEFAULT '' NOT NULL,
	"state" text DEFAULT 'draft' NOT NULL,
	"submitted_at" timestamp with time zone,
	"approved_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "listings_quantity_nonneg" CHECK ("listings"."quantity" >= 0),
	CONSTRAINT "listings_price_positive" CHECK ("listings"."price_cents" > 0)
);
--> statement-breakpoint
CREATE TABLE "seller_profiles" (
	"user_id" uuid PRIMARY KEY NOT NULL,
	"shop_name" text NOT NULL,
	"location" text DEFAULT '' NOT NULL,
	"country" text DEFAULT 'US' NOT NULL,
	"ships_to" text[] DEFAULT '{US}'::text[] NOT NULL,
	"pickup_at_shows" boolean DEFAULT false NOT NULL,
	"shows_note" text DEFAULT '' NOT NULL,
	"return_policy" text DEFAULT '' NOT NULL,
	"stripe_account_id" text,
	"payouts_enabled" boolean DEFAULT false NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "shipping_profiles" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"seller_id" uuid NOT NULL,
	"name" text NOT NULL,
	"rules" jsonb NOT NULL,
	"is_default" boolean DEFAULT false NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "listing_events" ADD CONSTRAINT "listing_events_listing_id_listings_id_fk" FOREIGN KEY ("listing_id") REFERENCES "public"."listings"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "listing_events" ADD CONSTRAINT "listing_events_actor_id_users_id_fk" FOREIGN KEY ("actor_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "listing_flags" ADD CONSTRAINT "listing_flags_listing_id_listings_id_fk" FOREIGN KEY ("listing_id") REFERENCES "public"."listings"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "listing_photos" ADD CONSTRAINT "listing_photos_listing_id_listings_id_fk" FOREIGN KEY ("listing_id") REFERENCES "public"."listings"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "listings" ADD CONSTRAINT "listings_seller_id_users_id_fk" FOREIGN KEY ("seller_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "listings" ADD CONSTRAINT "listings_part_id_parts_id_fk" FOREIGN KEY ("part_id") REFERENCES "public"."parts"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "listings" ADD CONSTRAINT "listings_shipping_profile_id_shipping_profiles_id_fk" FOREIGN KEY ("shipping_profile_id") REFERENCES "public"."shipping_profiles"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "seller_profiles" ADD CONSTRAINT "seller_profiles_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "shipping_profiles" ADD CONSTRAINT "shipping_profiles_seller_id_users_id_fk" FOREIGN KEY ("seller_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "listing_events_listing_idx" ON "listing_events" USING btree ("listing_id","created_at");--> statement-breakpoint
CREATE UNIQUE INDEX "listing_flags_listing_code" ON "listing_flags" USING btree ("listing_id","code");--> statement-breakpoint
CREATE INDEX "listing_flags_code_idx" ON "listing_flags" USING btree ("code");--> statement-breakpoint
CREATE INDEX "listing_photos_listing_idx" ON "listing_photos" USING btree ("listing_id","position");--> statement-breakpoint
CREATE INDEX "listing_photos_dhash_idx" ON "listing_photos" USING btree ("dhash");--> statement-breakpoint
CREATE INDEX "listings_seller_state_idx" ON "listings" USING btree ("seller_id","state");--> statement-breakpoint
CREATE INDEX "listings_part_state_idx" ON "listings" USING btree ("part_id","state");--> statement-breakpoint
CREATE INDEX "listings_state_submitted_idx" ON "listings" USING btree ("state","submitted_at");--> statement-breakpoint
CREATE INDEX "shipping_profiles_seller_idx" ON "shipping_profiles" USING btree ("seller_id");