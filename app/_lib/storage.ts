import { GetObjectCommand, PutObjectCommand, DeleteObjectCommand, S3Client } from "@aws-sdk/client-s3";
import { env } from "./env";
import { withDeadline } from "./request-guards";

/**
 * Private object storage for uploads, through the S3 API (the local stand-in here). Keys are made
 * by the app, never taken from a user's file name; objects are served back only through routes
 * that check access.
 */
let client: S3Client | undefined;
function s3(): S3Client {
  client ??= new S3Client({
    endpoint: env.s3.endpoint,
    region: env.s3.region,
    forcePathStyle: true,
    credentials: { accessKeyId: env.s3.accessKeyId, secretAccessKey: env.s3.secretAccessKey },
    maxAttempts: 1, // a frozen store must not multiply the wait; the caller retries
  });
  return client;
}

export async function putObject(key: string, body: Uint8Array, contentType: string): Promise<void> {
  await withDeadline("The file store", (abortSignal) => s3().send(new PutObjectCommand({ Bucket: env.s3.bucket, Key: key, Body: body, ContentType: contentType }), { abortSignal }));
}

export async function getObject(key: string): Promise<{ body: Uint8Array; contentType: string }> {
  return withDeadline("The file store", async (abortSignal) => {
    const out = await s3().send(new GetObjectCommand({ Bucket: env.s3.bucket, Key: key }), { abortSignal });
    const body = await out.Body!.transformToByteArray();
    return { body, contentType: out.ContentType ?? "application/octet-stream" };
  });
}

export async function deleteObject(key: string): Promise<void> {
  await withDeadline("The file store", (abortSignal) => s3().send(new DeleteObjectCommand({ Bucket: env.s3.bucket, Key: key }), { abortSignal }));
}
