import { describe, expect, it } from "vitest";
import { parseStorageEnv } from "@/lib/env";

describe("storage settings", () => {
  it("defaults to the local fake and the documented limits", () => {
    const env = parseStorageEnv({});
    expect(env.S3_ENDPOINT).toBe("http://127.0.0.1:4569");
    expect(env.S3_FORCE_PATH_STYLE).toBe(true);
    expect(env.UPLOAD_MAX_VIDEO_BYTES).toBe(200 * 1024 * 1024);
    expect(env.UPLOAD_MAX_IMAGE_BYTES).toBe(15 * 1024 * 1024);
    expect(env.UPLOAD_ATHLETE_QUOTA_BYTES).toBe(2 * 1024 * 1024 * 1024);
  });

  it("reads a real bucket's settings and names a bad one", () => {
    const env = parseStorageEnv({ S3_ENDPOINT: "https://s3.eu-west-1.amazonaws.com", S3_FORCE_PATH_STYLE: "false", UPLOAD_ATHLETE_QUOTA_BYTES: "1000" });
    expect(env.S3_FORCE_PATH_STYLE).toBe(false);
    expect(env.UPLOAD_ATHLETE_QUOTA_BYTES).toBe(1000);
    expect(() => parseStorageEnv({ S3_ENDPOINT: "ftp://files" })).toThrow("S3_ENDPOINT");
    expect(() => parseStorageEnv({ UPLOAD_MAX_VIDEO_BYTES: "lots" })).toThrow("UPLOAD_MAX_VIDEO_BYTES");
  });
});
