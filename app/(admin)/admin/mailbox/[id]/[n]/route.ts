import { requireViewer } from "@/server/guard";
import { AppError } from "@/server/errors";
import { answer, parseWith } from "@/server/http";
import { mailboxDir, readAttachment } from "@/server/mailbox";
import { attachmentParamsSchema } from "./schema";

type Ctx = { params: Promise<{ id: string; n: string }> };

/** Downloads one attachment of a message caught by the local mail fake. Admins only. */
export async function GET(_req: Request, ctx: Ctx) {
  return answer(async () => {
    await requireViewer(["admin"]);
    if (!mailboxDir()) throw new AppError("not_found", "There is no local mailbox: mail goes to the real provider.");
    const { id, n } = parseWith(attachmentParamsSchema, await ctx.params);
    const file = await readAttachment(id, n);
    if (!file) throw new AppError("not_found", "That message or attachment is not in the mailbox.");
    const type = /^[\w!#$&^.+-]+\/[\w!#$&^.+-]+$/.test(file.contentType) ? file.contentType : "application/octet-stream";
    const ascii = file.filename.replace(/[^\x20-\x7e]|["\\]/g, "_");
    return new Response(new Uint8Array(file.content), {
      headers: {
        "content-type": type,
        // Always a download, never rendered in our origin, whatever type the message claimed.
        "content-disposition": `attachment; filename="${ascii}"; filename*=UTF-8''${encodeURIComponent(file.filename)}`,
        "x-content-type-options": "nosniff",
        "content-security-policy": "sandbox",
        "cache-control": "no-store",
      },
    });
  });
}
