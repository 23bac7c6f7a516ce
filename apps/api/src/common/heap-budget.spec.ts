import { HeapBudget } from './heap-budget.js';

const mb = (bytes: number) => bytes / 1024 / 1024;

/** Builds and drops 200,000 strings of ~40 characters, alive together long enough to reach the old generation. */
const leaveGarbage = (): number => Array.from({ length: 200_000 }, (_, i) => `line ${i} `.repeat(4)).length;

describe('HeapBudget', () => {
  it('collects the garbage a group of work left once it exceeds the allowance', () => {
    const budget = new HeapBudget(8);
    expect(leaveGarbage()).toBe(200_000);
    const withGarbage = process.memoryUsage().heapUsed;
    budget.settle();
    expect(mb(withGarbage - process.memoryUsage().heapUsed)).toBeGreaterThan(8);
  });
});
