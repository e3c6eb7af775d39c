ALTER TABLE "workspace" ADD COLUMN "deleted_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "workspace" ADD COLUMN "deleted_by" text;--> statement-breakpoint
ALTER TABLE "workspace" ADD CONSTRAINT "workspace_deleted_by_user_id_fk" FOREIGN KEY ("deleted_by") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;