import { getLocalDb } from './dataSource';
import { LocalSetting } from './entities/LocalSetting';
import { withWriteLock } from './writeLock';

export async function settingGet(key: string): Promise<string | null> {
  const db = await getLocalDb();
  const row = await db.getRepository(LocalSetting).findOneBy({ key });
  return row?.value ?? null;
}

export async function settingSet(key: string, value: string | null): Promise<void> {
  const db = await getLocalDb();
  const repo = db.getRepository(LocalSetting);
  await withWriteLock(async () => {
    if (value === null) await repo.delete({ key });
    else await repo.save(repo.create({ key, value }));
  });
}
