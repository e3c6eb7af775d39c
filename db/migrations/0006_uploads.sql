CREATE TYPE "public"."upload_purpose" AS ENUM('underlay', 'attachment');--> statement-breakpoint
CREATE TABLE "upload" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"workspace_id" uuid NOT NULL,
	"uploaded_by" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"original_name" text DEFAULT '' NOT NULL,
	"source_type" text NOT NULL,
	"stored_type" text NOT NULL,
	"size" integer NOT NULL,
	"width" integer NOT NULL,
	"height" integer NOT NULL,
	"checksum" text NOT NULL,
	"storage_key" text NOT NULL,
	"thumbnail_key" text NOT NULL,
	"purpose" "upload_purpose" NOT NULL,
	"sketch_id" uuid,
	"comment_id" uuid,
	CONSTRAINT "upload_attachment_has_comment" CHECK (("upload"."purpose" = 'attachment') = ("upload"."comment_id" IS NOT NULL)),
	CONSTRAINT "upload_size_positive" CHECK ("upload"."size" > 0 AND "upload"."width" > 0 AND "upload"."height" > 0)
);
--> statement-breakpoint
ALTER TABLE "upload" ADD CONSTRAINT "upload_workspace_id_workspace_id_fk" FOREIGN KEY ("workspace_id") REFERENCES "public"."workspace"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "upload" ADD CONSTRAINT "upload_uploaded_by_user_id_fk" FOREIGN KEY ("uploaded_by") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "upload" ADD CONSTRAINT "upload_sketch_id_sketch_id_fk" FOREIGN KEY ("sketch_id") REFERENCES "public"."sketch"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "upload" ADD CONSTRAINT "upload_comment_id_comment_id_fk" FOREIGN KEY ("comment_id") REFERENCES "public"."comment"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "upload_workspace_idx" ON "upload" USING btree ("workspace_id","created_at");--> statement-breakpoint
CREATE INDEX "upload_comment_idx" ON "upload" USING btree ("comment_id");--> statement-breakpoint
CREATE INDEX "upload_sketch_idx" ON "upload" USING btree ("sketch_id");--> statement-breakpoint
CREATE UNIQUE INDEX "upload_storage_key_idx" ON "upload" USING btree ("storage_key");