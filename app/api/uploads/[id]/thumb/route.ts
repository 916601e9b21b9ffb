import { route } from "@/lib/http/route";
import { serveUpload } from "@/lib/storage/serve";

export const GET = route<{ id: string }>("home:read", async (_request, { user, params }) => serveUpload(params.id, user, "thumb"));
