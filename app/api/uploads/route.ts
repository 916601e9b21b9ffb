import { NextResponse } from "next/server";
import { route } from "@/lib/http/route";
import { receivePhotoUpload } from "@/lib/storage/receive";
import { thumbUrl, uploadUrl } from "@/lib/storage/urls";

// Any signed-in user reaches the handler; receivePhotoUpload applies the upload rule (403 otherwise).
export const POST = route("home:read", async (request, { user }) => {
  const upload = await receivePhotoUpload(request, user);
  const alt = upload.originalName.replace(/\.[a-z0-9]+$/i, "").replace(/[[\]]/g, "");
  return NextResponse.json(
    {
      id: upload.id, url: uploadUrl(upload.id), thumbUrl: thumbUrl(upload.id), mime: upload.mime, bytes: upload.bytes,
      width: upload.width, height: upload.height, markdown: `![${alt}](${uploadUrl(upload.id)})`,
    },
    { status: 201 },
  );
});
