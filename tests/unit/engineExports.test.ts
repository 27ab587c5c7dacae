// A snapshot of the engine's public exports, so that changes to its API are deliberate: when this
// fails, look at the diff, and if the change is meant, update the snapshot with `npx vitest run -u`.
import { expect, it } from 'vitest';
import * as engine from '../../matching';

it('the engine exports exactly its documented functions and constants', async () => {
  const names = Object.keys(engine)
    .sort()
    .map((k) => `${k}: ${typeof (engine as Record<string, unknown>)[k]}`);
  await expect(names.join('\n') + '\n').toMatchFileSnapshot('../fixtures/engine-exports.txt');
});
