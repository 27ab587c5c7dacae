import { z } from 'zod';
import { LibraryFileSchema } from './libraryEntry';
import { MixtureSchema } from './mixture';

/** JSON Schemas (draft 2020-12) of the exchange formats, generated from the zod schemas. */
export function jsonSchemas(): Record<string, unknown> {
  return {
    'library-file': { $id: 'https://tessera.test/schema/library-file.json', title: 'Tessera library file', ...z.toJSONSchema(LibraryFileSchema, { io: 'input', unrepresentable: 'any' }) },
    mixture: { $id: 'https://tessera.test/schema/mixture.json', title: 'Tessera mixture (peak list or spectrum)', ...z.toJSONSchema(MixtureSchema, { io: 'input', unrepresentable: 'any' }) },
  };
}
