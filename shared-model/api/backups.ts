import { z } from 'zod';
import { operation } from './operation';

export interface BackupEntry {
  path: string;
  fileName: string;
  schemaVersion: number;
  createdAt: string;
  reason: 'migration' | 'daily' | 'manual' | 'before-restore';
  bytes: number;
}

export interface BackupOverview {
  /** The backups folder beside the store. */
  folder: string;
  /** How many backups the folder keeps (the `backups_kept` setting). */
  keep: number;
  backups: BackupEntry[];
}

/** Kept backups: at least one, at most 1,000 (a bound against filling the disk by mistake; common practice). */
export const backupsKeptSchema = z
  .number({ error: 'must be a number' })
  .int('must be a whole number')
  .min(1, 'must keep at least 1 backup')
  .max(1000, 'must be at most 1000');

export const backupOperations = {
  'backups.list': operation<BackupOverview>()({
    kind: 'query',
    summary: 'List the backups of the store and how many are kept',
    input: z.object({}),
  }),
  'backups.create': operation<{ path: string; bytes: number }>()({
    kind: 'command',
    summary: 'Back up the store now (into the backups folder, or to a new file)',
    input: z.object({
      to: z
        .string({ error: 'must be a file path' })
        .trim()
        .min(1, 'must not be empty')
        .max(4096, 'must be at most 4096 characters')
        .refine((path) => !path.includes('\0'), 'must not contain NUL characters')
        .optional(),
    }),
  }),
  'backups.setKeep': operation<{ keep: number; removed: string[] }>()({
    kind: 'command',
    summary: 'Set how many backups the backups folder keeps (older ones are removed)',
    input: z.object({ keep: backupsKeptSchema }),
  }),
};
