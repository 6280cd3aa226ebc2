// `npm run restore ARCHIVE`: into the empty database DATABASE_URL names and the empty bucket S3_BUCKET names.
import path from "node:path";
import { targetFromEnv } from "./backup/config";
import { restoreBackup } from "./backup/restore";

// The SDK warns about Node 20 on every run otherwise.
process.env.AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED ??= "true";

const archive = process.argv[2];
if (!archive) {
  console.error("[restore] usage: npm run restore ARCHIVE (a .tar.gz written by npm run backup)");
  process.exit(2);
}
try {
  const target = targetFromEnv();
  const manifest = await restoreBackup({ archive: path.resolve(archive), target });
  console.log(`[restore] ${archive} (made ${manifest.createdAt}): database ${manifest.database.name} and ${manifest.objects.length} ${manifest.objects.length === 1 ? "object" : "objects"} restored into bucket ${target.storage.bucket}`);
} catch (error) {
  console.error(`[restore] ${(error as Error).message}`);
  process.exitCode = 1;
}
