CREATE TABLE "comments" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"entry_id" uuid NOT NULL,
	"author_id" uuid NOT NULL,
	"parent_id" uuid,
	"body" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"edited_at" timestamp with time zone,
	"deleted_at" timestamp with time zone
);
--> statement-breakpoint
CREATE TABLE "design_origins" (
	"design_id" uuid PRIMARY KEY NOT NULL,
	"parent_revision_id" uuid NOT NULL,
	"root_entry_id" uuid NOT NULL,
	"remixed_by" uuid NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "entries" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"design_id" uuid,
	"board_id" uuid,
	"author_id" uuid NOT NULL,
	"parent_revision_id" uuid,
	"parent_entry_id" uuid,
	"root_entry_id" uuid NOT NULL,
	"latest_revision" integer DEFAULT 1 NOT NULL,
	"title" text NOT NULL,
	"description" text DEFAULT '' NOT NULL,
	"tags" text[] DEFAULT '{}'::text[] NOT NULL,
	"lobes" integer NOT NULL,
	"wave" text NOT NULL,
	"material" text NOT NULL,
	"cutter_diameter_mm" double precision NOT NULL,
	"search" "tsvector" NOT NULL,
	"rating_count" integer DEFAULT 0 NOT NULL,
	"rating_sum" integer DEFAULT 0 NOT NULL,
	"rating_positive" integer DEFAULT 0 NOT NULL,
	"rating_score" double precision DEFAULT 0 NOT NULL,
	"remix_count" integer DEFAULT 0 NOT NULL,
	"comment_count" integer DEFAULT 0 NOT NULL,
	"published_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	"hidden_at" timestamp with time zone,
	"hidden_reason" text,
	"deleted_at" timestamp with time zone
);
--> statement-breakpoint
CREATE TABLE "entry_ratings" (
	"entry_id" uuid NOT NULL,
	"user_id" uuid NOT NULL,
	"stars" smallint NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "entry_ratings_entry_id_user_id_pk" PRIMARY KEY("entry_id","user_id"),
	CONSTRAINT "entry_ratings_stars_check" CHECK ("entry_ratings"."stars" BETWEEN 1 AND 5)
);
--> statement-breakpoint
CREATE TABLE "entry_revisions" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"entry_id" uuid NOT NULL,
	"number" integer NOT NULL,
	"author_id" uuid NOT NULL,
	"design" jsonb NOT NULL,
	"title" text NOT NULL,
	"description" text NOT NULL,
	"tags" text[] NOT NULL,
	"lobes" integer NOT NULL,
	"wave" text NOT NULL,
	"material" text NOT NULL,
	"cutter_diameter_mm" double precision NOT NULL,
	"thumbnail_svg" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "photos" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"entry_id" uuid,
	"design_id" uuid,
	"uploader_id" uuid NOT NULL,
	"kind" text NOT NULL,
	"caption" text DEFAULT '' NOT NULL,
	"material" text DEFAULT '' NOT NULL,
	"taken_on" date NOT NULL,
	"mime" text NOT NULL,
	"width" integer NOT NULL,
	"height" integer NOT NULL,
	"bytes" integer NOT NULL,
	"file_name" text NOT NULL,
	"thumb_name" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "photos_target_check" CHECK (num_nonnulls("photos"."entry_id", "photos"."design_id") = 1)
);
--> statement-breakpoint
CREATE TABLE "notification_settings" (
	"user_id" uuid PRIMARY KEY NOT NULL,
	"email" text DEFAULT 'immediate' NOT NULL,
	"last_digest_at" timestamp with time zone,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "notifications" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"user_id" uuid NOT NULL,
	"kind" text NOT NULL,
	"actor_id" uuid,
	"entry_id" uuid,
	"board_id" uuid,
	"data" jsonb DEFAULT '{}'::jsonb NOT NULL,
	"read_at" timestamp with time zone,
	"digest_pending" boolean DEFAULT false NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "comments" ADD CONSTRAINT "comments_entry_id_entries_id_fk" FOREIGN KEY ("entry_id") REFERENCES "public"."entries"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "comments" ADD CONSTRAINT "comments_author_id_users_id_fk" FOREIGN KEY ("author_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "comments" ADD CONSTRAINT "comments_parent_id_comments_id_fk" FOREIGN KEY ("parent_id") REFERENCES "public"."comments"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "design_origins" ADD CONSTRAINT "design_origins_design_id_designs_id_fk" FOREIGN KEY ("design_id") REFERENCES "public"."designs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "design_origins" ADD CONSTRAINT "design_origins_parent_revision_id_entry_revisions_id_fk" FOREIGN KEY ("parent_revision_id") REFERENCES "public"."entry_revisions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "design_origins" ADD CONSTRAINT "design_origins_root_entry_id_entries_id_fk" FOREIGN KEY ("root_entry_id") REFERENCES "public"."entries"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "design_origins" ADD CONSTRAINT "design_origins_remixed_by_users_id_fk" FOREIGN KEY ("remixed_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "entries" ADD CONSTRAINT "entries_design_id_designs_id_fk" FOREIGN KEY ("design_id") REFERENCES "public"."designs"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "entries" ADD CONSTRAINT "entries_board_id_boards_id_fk" FOREIGN KEY ("board_id") REFERENCES "public"."boards"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "entries" ADD CONSTRAINT "entries_author_id_users_id_fk" FOREIGN KEY ("author_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "entries" ADD CONSTRAINT "entries_parent_revision_id_entry_revisions_id_fk" FOREIGN KEY ("parent_revision_id") REFERENCES "public"."entry_revisions"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "entries" ADD CONSTRAINT "entries_parent_entry_id_entries_id_fk" FOREIGN KEY ("parent_entry_id") REFERENCES "public"."entries"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "entry_ratings" ADD CONSTRAINT "entry_ratings_entry_id_entries_id_fk" FOREIGN KEY ("entry_id") REFERENCES "public"."entries"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "entry_ratings" ADD CONSTRAINT "entry_ratings_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "entry_revisions" ADD CONSTRAINT "entry_revisions_entry_id_entries_id_fk" FOREIGN KEY ("entry_id") REFERENCES "public"."entries"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "entry_revisions" ADD CONSTRAINT "entry_revisions_author_id_users_id_fk" FOREIGN KEY ("author_id") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "photos" ADD CONSTRAINT "photos_entry_id_entries_id_fk" FOREIGN KEY ("entry_id") REFERENCES "public"."entries"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "photos" ADD CONSTRAINT "photos_design_id_designs_id_fk" FOREIGN KEY ("design_id") REFERENCES "public"."designs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "photos" ADD CONSTRAINT "photos_uploader_id_users_id_fk" FOREIGN KEY ("uploader_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "notification_settings" ADD CONSTRAINT "notification_settings_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "notifications" ADD CONSTRAINT "notifications_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "notifications" ADD CONSTRAINT "notifications_actor_id_users_id_fk" FOREIGN KEY ("actor_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "notifications" ADD CONSTRAINT "notifications_entry_id_entries_id_fk" FOREIGN KEY ("entry_id") REFERENCES "public"."entries"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "notifications" ADD CONSTRAINT "notifications_board_id_boards_id_fk" FOREIGN KEY ("board_id") REFERENCES "public"."boards"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "comments_entry_idx" ON "comments" USING btree ("entry_id","created_at");--> statement-breakpoint
CREATE INDEX "comments_author_idx" ON "comments" USING btree ("author_id","created_at");--> statement-breakpoint
CREATE UNIQUE INDEX "entries_design_live_idx" ON "entries" USING btree ("design_id") WHERE deleted_at IS NULL;--> statement-breakpoint
CREATE INDEX "entries_newest_idx" ON "entries" USING btree ("published_at" DESC NULLS LAST,"id" DESC NULLS LAST) WHERE deleted_at IS NULL AND hidden_at IS NULL;--> statement-breakpoint
CREATE INDEX "entries_top_idx" ON "entries" USING btree ("rating_score" DESC NULLS LAST,"published_at" DESC NULLS LAST,"id" DESC NULLS LAST) WHERE deleted_at IS NULL AND hidden_at IS NULL;--> statement-breakpoint
CREATE INDEX "entries_remixed_idx" ON "entries" USING btree ("remix_count" DESC NULLS LAST,"published_at" DESC NULLS LAST,"id" DESC NULLS LAST) WHERE deleted_at IS NULL AND hidden_at IS NULL;--> statement-breakpoint
CREATE INDEX "entries_discussed_idx" ON "entries" USING btree ("comment_count" DESC NULLS LAST,"published_at" DESC NULLS LAST,"id" DESC NULLS LAST) WHERE deleted_at IS NULL AND hidden_at IS NULL;--> statement-breakpoint
CREATE INDEX "entries_author_idx" ON "entries" USING btree ("author_id","published_at" DESC NULLS LAST);--> statement-breakpoint
CREATE INDEX "entries_lobes_idx" ON "entries" USING btree ("lobes") WHERE deleted_at IS NULL AND hidden_at IS NULL;--> statement-breakpoint
CREATE INDEX "entries_wave_material_idx" ON "entries" USING btree ("wave","material") WHERE deleted_at IS NULL AND hidden_at IS NULL;--> statement-breakpoint
CREATE INDEX "entries_cutter_idx" ON "entries" USING btree ("cutter_diameter_mm") WHERE deleted_at IS NULL AND hidden_at IS NULL;--> statement-breakpoint
CREATE INDEX "entries_tags_idx" ON "entries" USING gin ("tags");--> statement-breakpoint
CREATE INDEX "entries_search_idx" ON "entries" USING gin ("search");--> statement-breakpoint
CREATE INDEX "entries_parent_idx" ON "entries" USING btree ("parent_entry_id");--> statement-breakpoint
CREATE INDEX "entries_root_idx" ON "entries" USING btree ("root_entry_id");--> statement-breakpoint
CREATE INDEX "entry_ratings_user_idx" ON "entry_ratings" USING btree ("user_id");--> statement-breakpoint
CREATE UNIQUE INDEX "entry_revisions_number_idx" ON "entry_revisions" USING btree ("entry_id","number");--> statement-breakpoint
CREATE INDEX "photos_entry_idx" ON "photos" USING btree ("entry_id","created_at");--> statement-breakpoint
CREATE INDEX "photos_design_idx" ON "photos" USING btree ("design_id","created_at");--> statement-breakpoint
CREATE INDEX "photos_uploader_idx" ON "photos" USING btree ("uploader_id","created_at");--> statement-breakpoint
CREATE INDEX "notifications_user_idx" ON "notifications" USING btree ("user_id","created_at" DESC NULLS LAST);--> statement-breakpoint
CREATE INDEX "notifications_unread_idx" ON "notifications" USING btree ("user_id") WHERE read_at IS NULL;--> statement-breakpoint
CREATE INDEX "notifications_digest_idx" ON "notifications" USING btree ("user_id") WHERE digest_pending;