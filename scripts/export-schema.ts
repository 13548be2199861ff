// `npm run export:schema`: writes the JSON Schema of the export document,
// generated from its zod schemas, to docs/fourpatch-export.schema.json.
import fs from "node:fs";
import path from "node:path";
import { exportJsonSchema } from "@/lib/export/document";

const out = path.join(process.cwd(), "docs/fourpatch-export.schema.json");
fs.writeFileSync(out, JSON.stringify(exportJsonSchema(), null, 2) + "\n");
console.log(`Wrote ${path.relative(process.cwd(), out)}`);
