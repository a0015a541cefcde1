import "server-only";
import {
  CopyObjectCommand,
  DeleteObjectCommand,
  GetObjectCommand,
  HeadObjectCommand,
  ListObjectsV2Command,
  PutObjectCommand,
  S3Client,
  S3ServiceException,
} from "@aws-sdk/client-s3";
import { getSignedUrl } from "@aws-sdk/s3-request-presigner";
import { storageEnv } from "@/lib/env";

/**
 * The one door to S3-compatible storage. Endpoint, bucket and keys come from the environment, so the
 * local fake and a real bucket take the same code path. Checksums only when the API requires them:
 * the fake would store an aws-chunked body as is.
 */
let client: S3Client | undefined;

function s3(): S3Client {
  if (client) return client;
  const config = storageEnv();
  client = new S3Client({
    endpoint: config.S3_ENDPOINT,
    region: config.S3_REGION,
    forcePathStyle: config.S3_FORCE_PATH_STYLE,
    credentials: { accessKeyId: config.S3_ACCESS_KEY_ID, secretAccessKey: config.S3_SECRET_ACCESS_KEY },
    requestChecksumCalculation: "WHEN_REQUIRED",
    responseChecksumValidation: "WHEN_REQUIRED",
  });
  return client;
}

const bucket = () => storageEnv().S3_BUCKET;

/** A presigned PUT for one object; the browser must send exactly `headers`. */
export async function presignPut(key: string, contentType: string, expiresInSeconds: number) {
  const url = await getSignedUrl(s3(), new PutObjectCommand({ Bucket: bucket(), Key: key, ContentType: contentType }), {
    expiresIn: expiresInSeconds,
  });
  return { url, headers: { "content-type": contentType } };
}

/** A short-lived signed GET, served inline under a display name. */
export async function presignGet(key: string, options: { expiresInSeconds: number; contentType: string; fileName?: string | null }) {
  const disposition = options.fileName
    ? `inline; filename*=UTF-8''${encodeURIComponent(options.fileName)}`
    : "inline";
  return getSignedUrl(
    s3(),
    new GetObjectCommand({
      Bucket: bucket(),
      Key: key,
      ResponseContentType: options.contentType,
      ResponseContentDisposition: disposition,
    }),
    { expiresIn: options.expiresInSeconds },
  );
}

function isMissing(error: unknown): boolean {
  if (error instanceof S3ServiceException) {
    return error.$metadata.httpStatusCode === 404 || error.name === "NotFound" || error.name === "NoSuchKey";
  }
  return false;
}

/** The stored object's size in bytes, or null when nothing is there. */
export async function objectSize(key: string): Promise<number | null> {
  try {
    const head = await s3().send(new HeadObjectCommand({ Bucket: bucket(), Key: key }));
    return head.ContentLength ?? 0;
  } catch (error) {
    if (isMissing(error)) return null;
    throw error;
  }
}

/** The first `count` bytes of an object (a ranged GET). */
export async function leadingBytes(key: string, count: number): Promise<Uint8Array> {
  const result = await s3().send(new GetObjectCommand({ Bucket: bucket(), Key: key, Range: `bytes=0-${count - 1}` }));
  const bytes = (await result.Body?.transformToByteArray()) ?? new Uint8Array();
  return bytes.subarray(0, count);
}

export async function copyObject(fromKey: string, toKey: string, contentType: string): Promise<void> {
  await s3().send(
    new CopyObjectCommand({
      Bucket: bucket(),
      Key: toKey,
      CopySource: `${bucket()}/${fromKey.split("/").map(encodeURIComponent).join("/")}`,
      ContentType: contentType,
      MetadataDirective: "REPLACE",
    }),
  );
}

/** Removes an object; removing one that is already gone is fine. */
export async function deleteObject(key: string): Promise<void> {
  try {
    await s3().send(new DeleteObjectCommand({ Bucket: bucket(), Key: key }));
  } catch (error) {
    if (!isMissing(error)) throw error;
  }
}

/** Every key under a prefix (tests and audits; pages through the listing). */
export async function listKeys(prefix: string): Promise<string[]> {
  const keys: string[] = [];
  let token: string | undefined;
  do {
    const page = await s3().send(new ListObjectsV2Command({ Bucket: bucket(), Prefix: prefix, ContinuationToken: token }));
    for (const item of page.Contents ?? []) if (item.Key) keys.push(item.Key);
    token = page.IsTruncated ? page.NextContinuationToken : undefined;
  } while (token);
  return keys;
}

/** Puts bytes directly (seed data and tests; the app's own uploads go through presigned PUTs). */
export async function putObject(key: string, body: Uint8Array, contentType: string): Promise<void> {
  await s3().send(new PutObjectCommand({ Bucket: bucket(), Key: key, Body: body, ContentType: contentType }));
}
