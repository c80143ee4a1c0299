/**
 * Backups on request and the kept-backups setting. Automatic backups (before migrations, daily on first open)
 * are taken by the store itself (db/store.ts); restore runs with the store closed (services/workspace.ts).
 */
import { existsSync, statSync } from 'node:fs';
import { dirname, isAbsolute, join, resolve } from 'node:path';
import { backupFileName, backupToFile, ensureBackupsDir, listBackups, pruneBackups } from '../../db/backup';
import { backupsDirOf } from '../../db/integrity';
import { backupsKept, BACKUPS_KEPT_KEY, writeSetting } from '../../db/repositories/settings';
import { invalid } from '../../shared-model/api/result';
import type { HandlerMap } from './context';

export const backupHandlers: HandlerMap<'backups.list' | 'backups.create' | 'backups.setKeep'> = {
  'backups.list': (_input, { store }) => ({
    folder: backupsDirOf(store.dataDir),
    keep: backupsKept(store.db),
    backups: listBackups(store.dataDir),
  }),
  'backups.create': async ({ to }, { store }) => {
    if (to !== undefined) {
      if (!isAbsolute(to)) throw invalid('to', `give the backup file as an absolute path, got "${to}"`);
      const target = resolve(to);
      if (target === store.path) throw invalid('to', 'that is the store itself; choose another file');
      if (existsSync(target)) throw invalid('to', `${target} already exists; choose a new file name`);
      const folder = dirname(target);
      if (!existsSync(folder) || !statSync(folder).isDirectory())
        throw invalid('to', `the folder ${folder} does not exist; create it first or choose another`);
      try {
        return { path: target, bytes: await backupToFile(store.db, target) };
      } catch (error) {
        const code = (error as NodeJS.ErrnoException).code;
        if (code === 'EACCES' || code === 'EPERM' || code === 'EROFS' || code === 'ENAMETOOLONG' || code === 'ENOSPC')
          throw invalid('to', `cannot write the backup to ${target} (${code}); choose another file`);
        throw error;
      }
    }
    const version = store.db.pragma('user_version', { simple: true }) as number;
    const target = join(ensureBackupsDir(store.dataDir), backupFileName(version, 'manual'));
    const bytes = await backupToFile(store.db, target);
    pruneBackups(store.dataDir, backupsKept(store.db));
    return { path: target, bytes };
  },
  'backups.setKeep': ({ keep }, { store }) => {
    writeSetting(store.db, BACKUPS_KEPT_KEY, keep);
    return { keep, removed: pruneBackups(store.dataDir, keep) };
  },
};
