// Writes the JSON Schemas of the exchange formats (generated from the zod schemas in shared/) to
// shared/json-schema/. A unit test fails when the committed files are out of date.
import fs from 'node:fs';
import path from 'node:path';
import { jsonSchemas } from '../shared/jsonSchemas';

const outDir = path.resolve(__dirname, '..', 'shared', 'json-schema');
fs.mkdirSync(outDir, { recursive: true });
for (const [name, schema] of Object.entries(jsonSchemas())) {
  const file = path.join(outDir, `${name}.schema.json`);
  fs.writeFileSync(file, JSON.stringify(schema, null, 2) + '\n');
  console.log(`wrote ${path.relative(process.cwd(), file)}`);
}
