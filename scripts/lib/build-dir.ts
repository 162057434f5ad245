// Where the production build lives. `npm start` builds into build/; `npm test` sets
// KITWRIGHT_BUILD_DIR=build-test (react-router.config.ts reads it), so that a test run never
// replaces the files a running `npm start` is serving.
export function buildDirectory(source: Record<string, string | undefined> = process.env) {
  return source.KITWRIGHT_BUILD_DIR || "build";
}

/** The server bundle scripts/serve.ts loads: SERVER_BUILD when set, else the one in the build folder. */
export function serverBuildPath(source: Record<string, string | undefined> = process.env) {
  return source.SERVER_BUILD || `${buildDirectory(source)}/server/index.js`;
}
