// Preloaded (`tsx --import`) into the migration, seed and worker processes. The `server-only` marker
// throws anywhere but in Next's server bundles, yet those processes reuse lib/server code, so resolve
// it to the package's own empty module, as vitest.config.ts does for tests.
import { createRequire, register } from "node:module";
import Module from "node:module";
import path from "node:path";
import { pathToFileURL } from "node:url";

const require = createRequire(import.meta.url);
// The package's exports hide empty.js behind the "react-server" condition; it sits beside index.js.
const empty = path.join(path.dirname(require.resolve("server-only")), "empty.js");
const emptyUrl = pathToFileURL(empty).href;

const hooks = `
export async function resolve(specifier, context, next) {
  if (specifier === "server-only") return { url: ${JSON.stringify(emptyUrl)}, shortCircuit: true };
  return next(specifier, context);
}`;
register(`data:text/javascript,${encodeURIComponent(hooks)}`);

// require() does not go through the hooks above on Node 20.
const resolveFilename = Module._resolveFilename;
Module._resolveFilename = function (request, ...rest) {
  return request === "server-only" ? empty : resolveFilename.call(this, request, ...rest);
};
