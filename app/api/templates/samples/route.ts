import { requireViewer } from "@/server/guard";
import { answer, ok } from "../_lib/http";
import { listSamples } from "../_lib/samples";

/** The sample programmes a coach can start from: { samples: [{ name, title, description }] }. */
export async function GET() {
  return answer(async () => {
    await requireViewer(["coach"]);
    return ok({ samples: await listSamples() });
  });
}
