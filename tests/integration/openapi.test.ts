import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { openApiDocument } from "@/lib/openapi/document";

const API_ROOT = path.resolve(import.meta.dirname, "../../app/api/v1");
const METHODS = ["GET", "POST", "PUT", "PATCH", "DELETE"] as const;

/** Every route file under app/api/v1 with the methods it exports, as OpenAPI paths. */
function implementedOperations(): string[] {
  const found: string[] = [];
  const walk = (dir: string) => {
    for (const entry of fs.readdirSync(dir, { withFileTypes: true })) {
      const full = path.join(dir, entry.name);
      if (entry.isDirectory()) walk(full);
      else if (entry.name === "route.ts") {
        const rel = path.relative(API_ROOT, path.dirname(full)).split(path.sep).join("/");
        if (rel.includes("[...")) continue; // the JSON 404 catch-all
        const apiPath = `/api/v1${rel ? `/${rel}` : ""}`.replace(/\[(\w+)\]/g, "{$1}");
        const source = fs.readFileSync(full, "utf8");
        for (const method of METHODS) {
          if (new RegExp(`export (const|async function|function) ${method}\\b`).test(source)) {
            found.push(`${method.toLowerCase()} ${apiPath}`);
          }
        }
      }
    }
  };
  walk(API_ROOT);
  return found.sort();
}

describe("OpenAPI document", () => {
  const doc = openApiDocument() as { openapi: string; paths: Record<string, Record<string, unknown>> };

  it("is OpenAPI 3.1", () => {
    expect(doc.openapi).toBe("3.1.0");
  });

  it("documents every implemented /api/v1 operation", () => {
    const documented = new Set(
      Object.entries(doc.paths).flatMap(([p, ops]) => Object.keys(ops).map((m) => `${m} ${p}`)),
    );
    const missing = implementedOperations().filter((op) => !documented.has(op));
    expect(missing).toEqual([]);
  });

  it("documents nothing that is not implemented", () => {
    const implemented = new Set(implementedOperations());
    const documented = Object.entries(doc.paths).flatMap(([p, ops]) => Object.keys(ops).map((m) => `${m} ${p}`));
    expect(documented.filter((op) => !implemented.has(op))).toEqual([]);
  });
});
