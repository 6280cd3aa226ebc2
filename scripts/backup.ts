// `npm run backup [FOLDER]`: the database and every stored object into one dated archive (default folder backups/).
import path from "node:path";
import { targetFromEnv } from "./backup/config";
import { createBackup } from "./backup/create";

// The SDK warns about Node 20 on every run otherwise.
process.env.AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED ??= "true";

const outDir = path.resolve(process.argv[2] ?? "backups");
try {
  const { archive, manifest } = await createBackup({ target: targetFromEnv(), outDir });
  console.log(`[backup] ${archive}: database ${manifest.database.name} (${manifest.database.bytes} bytes), ${manifest.objects.length} ${manifest.objects.length === 1 ? "object" : "objects"} from bucket ${manifest.bucket}`);
} catch (error) {
  console.error(`[backup] ${(error as Error).message}`);
  process.exitCode = 1;
}
