// Local stand-in for an S3-compatible store: s3rver on 127.0.0.1:S3_PORT (default 4530), keeping
// objects under S3_DIR (default .data/s3), with the bucket S3_BUCKET (default rootbench) made at start.
// Clients use path-style addressing and any credentials (s3rver does not check them).
import path from "node:path";
import S3rver from "s3rver";
import { exitWithParents } from "../../lib/mail/exit-with-parents";

const port = Number(process.env.S3_PORT ?? 4530);
const directory = path.resolve(process.env.S3_DIR ?? path.join(process.cwd(), ".data", "s3"));
const bucket = process.env.S3_BUCKET ?? "rootbench";

const server = new S3rver({ port, address: "127.0.0.1", directory, silent: true, configureBuckets: [{ name: bucket, configs: [] }] });
server.run()
  .then(() => {
    console.log(`[fake-s3] bucket ${bucket} at http://127.0.0.1:${port}, objects in ${directory}`);
    const stop = () => { server.close().finally(() => process.exit(0)); };
    process.on("SIGTERM", stop);
    process.on("SIGINT", stop);
    exitWithParents(stop);
  })
  .catch((error: unknown) => {
    console.error("[fake-s3] could not start:", error);
    process.exit(1);
  });
