// GET /files/:fileId — an evidence photo, only for signed-in people who may see its reading.
// Served inline with its checked type, never sniffed, cached only by the viewer's browser.
import type { Route } from "./+types/files.$fileId";
import { PHOTO_EXTENSION, type PhotoType } from "~/lib/image-type";
import { findFileForViewer } from "~/server/readings/stored-files.server";
import { requireReadingViewer } from "~/server/readings/reading-viewer.server";

export async function loader({ request, params }: Route.LoaderArgs) {
  const viewer = await requireReadingViewer(request);
  const file = await findFileForViewer(viewer, params.fileId);
  if (!file) throw new Response("No such file, or it is not shared with you.", { status: 404, headers: { "Content-Type": "text/plain; charset=utf-8" } });
  const etag = `"${file.sha256}"`;
  const headers = new Headers({
    "Content-Type": file.content_type,
    "X-Content-Type-Options": "nosniff",
    "Content-Disposition": `inline; filename="reading-photo.${PHOTO_EXTENSION[file.content_type as PhotoType] ?? "bin"}"`,
    "Cache-Control": "private, max-age=3600",
    "Content-Security-Policy": "default-src 'none'; img-src 'self'; sandbox",
    ETag: etag,
  });
  if (request.headers.get("If-None-Match") === etag) return new Response(null, { status: 304, headers });
  headers.set("Content-Length", String(file.byte_size));
  return new Response(new Uint8Array(file.bytes), { status: 200, headers });
}
