import type { Config } from "@react-router/dev/config";
import { buildDirectory } from "./scripts/lib/build-dir";

export default {
  ssr: true,
  // npm test builds into its own folder (KITWRIGHT_BUILD_DIR=build-test, set by scripts/test.ts), so a
  // test run never replaces the files a running `npm start` serves from build/.
  buildDirectory: buildDirectory(),
} satisfies Config;
