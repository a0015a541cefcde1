// Object storage for integration tests. `npm test` starts the S3 fake and exports S3_*; when a file
// runs without it (plain `npx vitest`), this starts an in-process fake on a free port with a temp
// dir. Import it first in a test file: the top-level await finishes before the app reads its env.
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import S3rver from "s3rver";
import { afterAll } from "vitest";

const CORS = `<CORSConfiguration><CORSRule><AllowedOrigin>*</AllowedOrigin><AllowedMethod>GET</AllowedMethod><AllowedMethod>PUT</AllowedMethod><AllowedHeader>*</AllowedHeader><ExposeHeader>ETag</ExposeHeader></CORSRule></CORSConfiguration>`;

if (!process.env.S3_ENDPOINT) {
  const directory = fs.mkdtempSync(path.join(os.tmpdir(), "rungwise-s3-"));
  const bucket = "rungwise-test";
  const server = new S3rver({ address: "127.0.0.1", port: 0, silent: true, directory, configureBuckets: [{ name: bucket, configs: [CORS] }] });
  const { port } = await server.run();
  Object.assign(process.env, {
    S3_ENDPOINT: `http://127.0.0.1:${port}`,
    S3_REGION: "us-east-1",
    S3_BUCKET: bucket,
    S3_ACCESS_KEY_ID: "S3RVER",
    S3_SECRET_ACCESS_KEY: "S3RVER",
    S3_FORCE_PATH_STYLE: "true",
  });
  afterAll(async () => {
    await server.close();
    for (const key of ["S3_ENDPOINT", "S3_REGION", "S3_BUCKET", "S3_ACCESS_KEY_ID", "S3_SECRET_ACCESS_KEY", "S3_FORCE_PATH_STYLE"]) {
      delete process.env[key];
    }
    fs.rmSync(directory, { recursive: true, force: true });
  });
}

export {};
