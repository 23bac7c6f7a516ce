export { startCardProcessorFake } from './card-processor-fake.js';
export type { CardProcessorFake, CardProcessorFakeOptions } from './card-processor-fake.js';
