// Multipart bodies with a hard size limit: the declared Content-Length is checked before anything is
// read, and the stream is counted as it arrives, so a client that lies or streams without a length
// still cannot make the server buffer more than the limit.
import { PHOTO_MAX_BYTES } from "~/lib/image-type";
import { drainBody } from "../request-limits.server";

/** A 5 MB photo plus the CSV and the fields fit well under this. */
export const MAX_UPLOAD_BYTES = PHOTO_MAX_BYTES + 1024 * 1024;

export class UploadTooLargeError extends Error {
  constructor(readonly limitBytes: number) {
    super(`The upload is larger than ${Math.round(limitBytes / (1024 * 1024))} MB.`);
  }
}

export async function readLimitedFormData(request: Request, maxBytes = MAX_UPLOAD_BYTES): Promise<FormData> {
  if (!request.body) return request.formData();
  const reader = request.body.getReader();
  const declared = Number(request.headers.get("Content-Length") ?? "");
  // The rest is read and thrown away (up to a limit) rather than cancelled: cancelling closes the
  // connection while the client is still sending, and the 413 answer is lost in the reset.
  if (Number.isFinite(declared) && declared > maxBytes) {
    await drainBody(reader);
    throw new UploadTooLargeError(maxBytes);
  }
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > maxBytes) {
      await drainBody(reader, total);
      throw new UploadTooLargeError(maxBytes);
    }
    chunks.push(value);
  }
  return new Request(request.url, { method: request.method, headers: request.headers, body: Buffer.concat(chunks) }).formData();
}
