export { toGrams, toMillilitres, costPerGram } from './units.js';
export { developerPercent, developerVolumeFromPercent, oxygenVolumeStrength, mixDevelopers } from './developer.js';
export { costBowl } from './bowl.js';
export type { Bowl, BowlCost } from './bowl.js';
export { computePay } from './pay/compute-pay.js';
export type { PayInput, PayResult } from './pay/types.js';
export { roundMoney, sumMoney, parseDecimal } from './money.js';
export { DomainError } from './errors.js';
export type { DomainErrorKind } from './errors.js';
