CREATE TABLE "design_rack_origins" (
	"design_id" uuid PRIMARY KEY NOT NULL,
	"rack_rosette_id" uuid,
	"rosette_name" text NOT NULL
);
--> statement-breakpoint
CREATE TABLE "rack_rosettes" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"owner_id" uuid NOT NULL,
	"name" text NOT NULL,
	"units" text NOT NULL,
	"rosette" jsonb NOT NULL,
	"tags" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "rack_shops" (
	"owner_id" uuid PRIMARY KEY NOT NULL,
	"shop" jsonb NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "saved_sweeps" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"owner_id" uuid NOT NULL,
	"name" text NOT NULL,
	"choices" jsonb NOT NULL,
	"shortlist" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"candidates" integer NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "vote_answers" (
	"vote_id" uuid NOT NULL,
	"user_id" uuid NOT NULL,
	"low_id" uuid NOT NULL,
	"high_id" uuid NOT NULL,
	"pick" text NOT NULL,
	"answered_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "vote_answers_vote_id_user_id_low_id_high_id_pk" PRIMARY KEY("vote_id","user_id","low_id","high_id"),
	CONSTRAINT "vote_answers_order" CHECK ("vote_answers"."low_id" < "vote_answers"."high_id")
);
--> statement-breakpoint
CREATE TABLE "votes" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"board_id" uuid NOT NULL,
	"question" text NOT NULL,
	"design_ids" jsonb NOT NULL,
	"created_by" uuid NOT NULL,
	"closes_at" timestamp with time zone NOT NULL,
	"closed_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "design_rack_origins" ADD CONSTRAINT "design_rack_origins_design_id_designs_id_fk" FOREIGN KEY ("design_id") REFERENCES "public"."designs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "design_rack_origins" ADD CONSTRAINT "design_rack_origins_rack_rosette_id_rack_rosettes_id_fk" FOREIGN KEY ("rack_rosette_id") REFERENCES "public"."rack_rosettes"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "rack_rosettes" ADD CONSTRAINT "rack_rosettes_owner_id_users_id_fk" FOREIGN KEY ("owner_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "rack_shops" ADD CONSTRAINT "rack_shops_owner_id_users_id_fk" FOREIGN KEY ("owner_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "saved_sweeps" ADD CONSTRAINT "saved_sweeps_owner_id_users_id_fk" FOREIGN KEY ("owner_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "vote_answers" ADD CONSTRAINT "vote_answers_vote_id_votes_id_fk" FOREIGN KEY ("vote_id") REFERENCES "public"."votes"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "vote_answers" ADD CONSTRAINT "vote_answers_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "votes" ADD CONSTRAINT "votes_board_id_boards_id_fk" FOREIGN KEY ("board_id") REFERENCES "public"."boards"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "votes" ADD CONSTRAINT "votes_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "rack_rosettes_owner_idx" ON "rack_rosettes" USING btree ("owner_id","created_at");--> statement-breakpoint
CREATE INDEX "saved_sweeps_owner_idx" ON "saved_sweeps" USING btree ("owner_id","updated_at");--> statement-breakpoint
CREATE INDEX "votes_board_idx" ON "votes" USING btree ("board_id","created_at");