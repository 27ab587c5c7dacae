import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { jsonSchemas } from '../../../shared/jsonSchemas';

describe('generated JSON Schemas', () => {
  it.each(Object.keys(jsonSchemas()))('shared/json-schema/%s.schema.json is up to date (run scripts/generateSchemas.ts)', (name) => {
    const file = path.resolve(__dirname, '../../../shared/json-schema', `${name}.schema.json`);
    const committed = JSON.parse(fs.readFileSync(file, 'utf8'));
    expect(committed).toEqual(JSON.parse(JSON.stringify(jsonSchemas()[name])));
  });
});
