import "server-only";
import { DeleteObjectCommand, GetObjectCommand, PutObjectCommand, S3Client } from "@aws-sdk/client-s3";
import { getEnv } from "./env";

// Files go to an S3-compatible store through the AWS SDK: the local fake in development and tests,
// any S3 service in production (set S3_ENDPOINT and the keys).

let client: S3Client | undefined;

function s3(): S3Client {
  if (!client) {
    const env = getEnv();
    client = new S3Client({
      endpoint: env.S3_ENDPOINT,
      region: env.S3_REGION,
      credentials: { accessKeyId: env.S3_ACCESS_KEY_ID, secretAccessKey: env.S3_SECRET_ACCESS_KEY },
      forcePathStyle: true,
      // Without these the SDK streams uploads with checksum framing that S3-compatible fakes store as is.
      requestChecksumCalculation: "WHEN_REQUIRED",
      responseChecksumValidation: "WHEN_REQUIRED",
    });
  }
  return client;
}

export async function putObject(key: string, body: Buffer, contentType: string): Promise<void> {
  await s3().send(new PutObjectCommand({ Bucket: getEnv().S3_BUCKET, Key: key, Body: body, ContentType: contentType }));
}

export async function getObject(key: string): Promise<{ body: Uint8Array; contentType: string } | undefined> {
  try {
    const result = await s3().send(new GetObjectCommand({ Bucket: getEnv().S3_BUCKET, Key: key }));
    if (!result.Body) return undefined;
    return { body: await result.Body.transformToByteArray(), contentType: result.ContentType ?? "application/octet-stream" };
  } catch (error) {
    if ((error as { name?: string }).name === "NoSuchKey") return undefined;
    throw error;
  }
}

export async function deleteObject(key: string): Promise<void> {
  await s3().send(new DeleteObjectCommand({ Bucket: getEnv().S3_BUCKET, Key: key }));
}
