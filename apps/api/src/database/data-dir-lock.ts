import { closeSync, mkdirSync, openSync, readFileSync, unlinkSync, writeSync } from 'node:fs';
import { dirname } from 'node:path';

export class DataDirLockedError extends Error {}

function processAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (error) {
    return (error as NodeJS.ErrnoException).code === 'EPERM';
  }
}

/** PGlite has no lock of its own: two processes on one data directory corrupt it. */
export function lockDataDir(dataDir: string): () => void {
  const lockPath = `${dataDir}.lock`;
  mkdirSync(dirname(lockPath), { recursive: true });
  for (let attempt = 0; attempt < 2; attempt++) {
    try {
      const fd = openSync(lockPath, 'wx');
      writeSync(fd, String(process.pid));
      closeSync(fd);
      return () => {
        try {
          unlinkSync(lockPath);
        } catch {
          // already gone
        }
      };
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code !== 'EEXIST') throw error;
      const holder = Number(readFileSync(lockPath, 'utf8').trim());
      if (Number.isInteger(holder) && holder > 0 && processAlive(holder)) {
        throw new DataDirLockedError(`The data directory ${dataDir} is in use by process ${holder}; stop it first.`);
      }
      unlinkSync(lockPath); // left by a process that is gone
    }
  }
  throw new DataDirLockedError(`Could not lock ${lockPath}`);
}
