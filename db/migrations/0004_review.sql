CREATE TYPE "public"."review_state" AS ENUM('draft', 'submitted', 'returned', 'checked', 'approved', 'withdrawn');--> statement-breakpoint
CREATE TYPE "public"."sign_off_step" AS ENUM('submit', 'check', 'return', 'approve', 'withdraw');--> statement-breakpoint
CREATE TABLE "comment" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"version_id" uuid NOT NULL,
	"parent_id" uuid,
	"author_id" text,
	"body" text NOT NULL,
	"pin" jsonb,
	"mentions" text[] DEFAULT '{}'::text[] NOT NULL,
	"resolved_at" timestamp with time zone,
	"resolved_by" text,
	"edited_at" timestamp with time zone,
	"deleted_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "sign_off" (
	"id" bigint PRIMARY KEY GENERATED ALWAYS AS IDENTITY (sequence name "sign_off_id_seq" INCREMENT BY 1 MINVALUE 1 MAXVALUE 9223372036854775807 START WITH 1 CACHE 1),
	"version_id" uuid NOT NULL,
	"step" "sign_off_step" NOT NULL,
	"from_state" "review_state" NOT NULL,
	"to_state" "review_state" NOT NULL,
	"actor_id" text,
	"actor_name" text NOT NULL,
	"note" text DEFAULT '' NOT NULL,
	"at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "sketch_version" ADD COLUMN "review_state" "review_state" DEFAULT 'draft' NOT NULL;--> statement-breakpoint
ALTER TABLE "sketch_version" ADD COLUMN "checked_by" text;--> statement-breakpoint
ALTER TABLE "comment" ADD CONSTRAINT "comment_version_id_sketch_version_id_fk" FOREIGN KEY ("version_id") REFERENCES "public"."sketch_version"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "comment" ADD CONSTRAINT "comment_parent_id_comment_id_fk" FOREIGN KEY ("parent_id") REFERENCES "public"."comment"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "comment" ADD CONSTRAINT "comment_author_id_user_id_fk" FOREIGN KEY ("author_id") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "comment" ADD CONSTRAINT "comment_resolved_by_user_id_fk" FOREIGN KEY ("resolved_by") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sign_off" ADD CONSTRAINT "sign_off_version_id_sketch_version_id_fk" FOREIGN KEY ("version_id") REFERENCES "public"."sketch_version"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sign_off" ADD CONSTRAINT "sign_off_actor_id_user_id_fk" FOREIGN KEY ("actor_id") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "comment_version_idx" ON "comment" USING btree ("version_id","created_at");--> statement-breakpoint
CREATE INDEX "comment_parent_idx" ON "comment" USING btree ("parent_id");--> statement-breakpoint
CREATE INDEX "sign_off_version_idx" ON "sign_off" USING btree ("version_id","id");--> statement-breakpoint
ALTER TABLE "sketch_version" ADD CONSTRAINT "sketch_version_checked_by_user_id_fk" FOREIGN KEY ("checked_by") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "audit_target_idx" ON "audit_event" USING btree ("target_type","target_id","id");--> statement-breakpoint
CREATE INDEX "sketch_version_review_idx" ON "sketch_version" USING btree ("sketch_id","review_state");