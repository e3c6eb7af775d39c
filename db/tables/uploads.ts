import { sql } from "drizzle-orm";
import { check, index, integer, pgEnum, pgTable, text, timestamp, uniqueIndex, uuid } from "drizzle-orm/pg-core";
import { user } from "./auth";
import { comment } from "./review";
import { sketch } from "./sketches";
import { workspace } from "./workspaces";

/** What an upload is for: the drawing or photo under a sketch, or a file attached to a comment. */
export const uploadPurpose = pgEnum("upload_purpose", ["underlay", "attachment"]);

/**
 * A file someone uploaded: its metadata here, its bytes (cleaned) and a PNG thumbnail in object
 * storage under keys the server made. The row is written only after both objects are stored,
 * so every row has its objects; a failed upload leaves neither. Never changed once written.
 */
export const upload = pgTable(
  "upload",
  {
    id: uuid("id").primaryKey().default(sql`gen_random_uuid()`),
    workspaceId: uuid("workspace_id")
      .notNull()
      .references(() => workspace.id, { onDelete: "cascade" }),
    uploadedBy: text("uploaded_by").references(() => user.id, { onDelete: "set null" }),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    /** the name the file had on the uploader's machine: for display only, never a path */
    originalName: text("original_name").notNull().default(""),
    /** the type sniffed from the bytes that were sent (a PDF stays application/pdf here) */
    sourceType: text("source_type").notNull(),
    /** the type of what is stored (a PDF's first page is stored as image/png) */
    storedType: text("stored_type").notNull(),
    /** bytes stored */
    size: integer("size").notNull(),
    width: integer("width").notNull(),
    height: integer("height").notNull(),
    /** sha256 of the stored bytes, hex */
    checksum: text("checksum").notNull(),
    storageKey: text("storage_key").notNull(),
    thumbnailKey: text("thumbnail_key").notNull(),
    purpose: uploadPurpose("purpose").notNull(),
    /** underlays: the sketch it was uploaded for (deleting the sketch deletes it) */
    sketchId: uuid("sketch_id").references(() => sketch.id, { onDelete: "cascade" }),
    /** attachments: the comment it belongs to */
    commentId: uuid("comment_id").references(() => comment.id, { onDelete: "cascade" }),
  },
  (t) => [
    index("upload_workspace_idx").on(t.workspaceId, t.createdAt),
    index("upload_comment_idx").on(t.commentId),
    index("upload_sketch_idx").on(t.sketchId),
    uniqueIndex("upload_storage_key_idx").on(t.storageKey),
    check("upload_attachment_has_comment", sql`(${t.purpose} = 'attachment') = (${t.commentId} IS NOT NULL)`),
    check("upload_size_positive", sql`${t.size} > 0 AND ${t.width} > 0 AND ${t.height} > 0`),
  ],
);
