// Evidence photos, kept in PostgreSQL so every app instance can serve them. A file is served only to
// the person who uploaded it and to those who may see the reading it belongs to.
import { createHash } from "node:crypto";
import type { Kysely, Transaction } from "kysely";
import type { Database } from "../db-schema";
import { db } from "../db.server";
import { isUuid } from "./reading-viewer.server";
import type { ReadingViewer } from "./reading-viewer.server";
import type { PhotoType } from "~/lib/image-type";

export async function storePhoto(trx: Kysely<Database> | Transaction<Database>, bytes: Buffer, contentType: PhotoType, uploadedBy: string) {
  const sha256 = createHash("sha256").update(bytes).digest("hex");
  const row = await trx
    .insertInto("stored_file")
    .values({ uploaded_by: uploadedBy, content_type: contentType, byte_size: bytes.byteLength, sha256, bytes })
    .returning("id")
    .executeTakeFirstOrThrow();
  return row.id;
}

/** The file if this viewer may see it: their own upload, or the photo of a reading they may see. */
export async function findFileForViewer(viewer: ReadingViewer, fileId: string) {
  if (!isUuid(fileId)) return undefined;
  return db
    .selectFrom("stored_file")
    .select(["id", "content_type", "byte_size", "sha256", "bytes"])
    .where("id", "=", fileId)
    .where((eb) => {
      const ownUpload = eb("uploaded_by", "=", viewer.userId);
      const readingPhoto = eb.exists(
        eb
          .selectFrom("field_reading")
          .select("field_reading.id")
          .whereRef("field_reading.photo_id", "=", "stored_file.id")
          .$if(!viewer.seesAll, (q) => q.where("field_reading.team_id", "=", viewer.teamId ?? "")),
      );
      return viewer.seesAll || viewer.teamId ? eb.or([ownUpload, readingPhoto]) : ownUpload;
    })
    .executeTakeFirst();
}
