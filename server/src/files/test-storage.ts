import { ListObjectsV2Command, S3Client } from '@aws-sdk/client-s3';
import { eq, files, sql, withTenant } from '@layerbook/db';
import type { AppContext } from '../context';

/** What a firm has stored, seen from outside the app: object keys in the bucket and file rows. */
export async function storedFor(ctx: AppContext, tenantId: string): Promise<{ keys: string[]; rows: number }> {
  const { config } = ctx;
  const client = new S3Client({
    endpoint: config.S3_ENDPOINT,
    region: config.S3_REGION,
    forcePathStyle: true,
    credentials: { accessKeyId: config.S3_ACCESS_KEY_ID, secretAccessKey: config.S3_SECRET_ACCESS_KEY },
  });
  try {
    const listed = await client.send(new ListObjectsV2Command({ Bucket: config.S3_BUCKET, Prefix: `${tenantId}/` }));
    const rows = await withTenant(
      ctx.pool,
      tenantId,
      async (tx) =>
        (
          await tx.db
            .select({ n: sql<number>`count(*)::int` })
            .from(files)
            .where(eq(files.tenantId, tenantId))
        )[0].n,
    );
    return { keys: (listed.Contents ?? []).map((o) => o.Key ?? '').sort(), rows };
  } finally {
    client.destroy();
  }
}
