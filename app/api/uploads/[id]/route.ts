import { route } from "@/lib/http/route";
import { serveUpload } from "@/lib/storage/serve";

// Signed-in users only; findViewableUpload decides per file (write-up, case or the uploader's own).
export const GET = route<{ id: string }>("home:read", async (_request, { user, params }) => serveUpload(params.id, user, "original"));
