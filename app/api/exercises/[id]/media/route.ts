import { getDb } from "@/db/client";
import { MEDIA_RULE, VIDEO_MAX_BYTES } from "@/db/exerciseRules";
import { getExercise, removeExerciseMedia, setExerciseMedia } from "@/db/exercises";
import { AppError } from "@/server/errors";
import { requireViewer } from "@/server/guard";
import { getStorage } from "@/server/storage";
import { answer, exerciseNotFound, ok, parseWith } from "../../_lib/http";
import { idParamsSchema, mediaFormSchema } from "./schema";

type Ctx = { params: Promise<{ id: string }> };

// Room for the multipart envelope around the largest allowed file.
const BODY_MAX_BYTES = VIDEO_MAX_BYTES + 64 * 1024;

/** Uploads (or replaces) the exercise's picture or short clip: multipart field `file`. */
export async function POST(req: Request, ctx: Ctx) {
  return answer(async () => {
    const viewer = await requireViewer(["coach"]);
    const { id } = parseWith(idParamsSchema, await ctx.params);
    const db = getDb();
    // Another coach's exercise is not found before anything about the file is said.
    if (!(await getExercise(db, viewer, id))) throw exerciseNotFound();
    if (Number(req.headers.get("content-length") ?? "0") > BODY_MAX_BYTES) {
      throw new AppError("invalid_input", `That file is too large. ${MEDIA_RULE}`, { file: "Over the 25 MB limit" });
    }
    let form: FormData;
    try {
      form = await req.formData();
    } catch {
      throw new AppError("invalid_input", `Send the file as multipart/form-data in a field named file. ${MEDIA_RULE}`, { file: "No file received" });
    }
    const { file } = parseWith(mediaFormSchema, { file: form.get("file") ?? undefined });
    if (file.size > BODY_MAX_BYTES) throw new AppError("invalid_input", `That file is too large. ${MEDIA_RULE}`, { file: "Over the 25 MB limit" });
    const bytes = new Uint8Array(await file.arrayBuffer());
    const exercise = await setExerciseMedia(db, getStorage(), viewer, id, { bytes, declaredType: file.type });
    return ok({ exercise }, 201);
  });
}

/** Removes the exercise's media (and its file). */
export async function DELETE(_req: Request, ctx: Ctx) {
  return answer(async () => {
    const viewer = await requireViewer(["coach"]);
    const { id } = parseWith(idParamsSchema, await ctx.params);
    return ok({ exercise: await removeExerciseMedia(getDb(), getStorage(), viewer, id) });
  });
}
