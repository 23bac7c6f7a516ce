import { setFlagsFromString } from 'node:v8';
import { runInNewContext } from 'node:vm';

// V8 lets garbage pile up in the old generation until the heap is far larger than what is alive; a long
// batch job whose every group of work dies at the end of the group would take the process's memory with it.
setFlagsFromString('--expose-gc');
const collectGarbage = runInNewContext('gc') as () => void;

/**
 * A memory allowance for a batch job that works in groups (a payroll run, a workbook): call `settle()`
 * between groups, and once the heap has grown by more than `allowanceMb` since the last settlement the
 * garbage is collected then, while little is alive, instead of whenever V8 would get round to it.
 */
export class HeapBudget {
  private baseline = process.memoryUsage().heapUsed;

  constructor(private readonly allowanceMb: number) {}

  settle(): void {
    if (process.memoryUsage().heapUsed - this.baseline < this.allowanceMb * 1024 * 1024) return;
    collectGarbage();
    this.baseline = process.memoryUsage().heapUsed;
  }
}
