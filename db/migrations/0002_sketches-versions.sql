CREATE TABLE "sketch" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workspace_id" uuid NOT NULL,
	"title" text NOT NULL,
	"description" text DEFAULT '' NOT NULL,
	"tags" text[] DEFAULT '{}'::text[] NOT NULL,
	"forked_from_version_id" uuid,
	"forked_from_title" text,
	"latest_version" integer DEFAULT 0 NOT NULL,
	"created_by" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_by" text,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "sketch_version" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"sketch_id" uuid NOT NULL,
	"number" integer NOT NULL,
	"message" text DEFAULT '' NOT NULL,
	"document" jsonb NOT NULL,
	"format_version" integer NOT NULL,
	"status" text,
	"largest_reaction" double precision,
	"summary" jsonb NOT NULL,
	"author_id" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "sketch_version_number_positive" CHECK ("sketch_version"."number" >= 1)
);
--> statement-breakpoint
ALTER TABLE "sketch" ADD CONSTRAINT "sketch_workspace_id_workspace_id_fk" FOREIGN KEY ("workspace_id") REFERENCES "public"."workspace"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sketch" ADD CONSTRAINT "sketch_forked_from_version_id_sketch_version_id_fk" FOREIGN KEY ("forked_from_version_id") REFERENCES "public"."sketch_version"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sketch" ADD CONSTRAINT "sketch_created_by_user_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sketch" ADD CONSTRAINT "sketch_updated_by_user_id_fk" FOREIGN KEY ("updated_by") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sketch_version" ADD CONSTRAINT "sketch_version_sketch_id_sketch_id_fk" FOREIGN KEY ("sketch_id") REFERENCES "public"."sketch"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sketch_version" ADD CONSTRAINT "sketch_version_author_id_user_id_fk" FOREIGN KEY ("author_id") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "sketch_workspace_updated_idx" ON "sketch" USING btree ("workspace_id","updated_at" DESC NULLS LAST);--> statement-breakpoint
CREATE INDEX "sketch_workspace_title_idx" ON "sketch" USING btree ("workspace_id","title");--> statement-breakpoint
CREATE INDEX "sketch_tags_idx" ON "sketch" USING gin ("tags");--> statement-breakpoint
CREATE INDEX "sketch_forked_from_idx" ON "sketch" USING btree ("forked_from_version_id");--> statement-breakpoint
CREATE UNIQUE INDEX "sketch_version_number_idx" ON "sketch_version" USING btree ("sketch_id","number");--> statement-breakpoint
CREATE INDEX "sketch_version_author_idx" ON "sketch_version" USING btree ("author_id");