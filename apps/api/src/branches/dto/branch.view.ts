import type { BranchRow } from '@tressury/schema';
import Big from 'big.js';

// numeric columns come back padded to their scale ("40.000"); rates and hours read better without it.
const plain = (value: string): string => new Big(value).toString();

export class BranchView {
  id: string;
  name: string;
  /** IANA time zone; the branch's business dates are counted in it. */
  timeZone: string;
  /** ISO 4217 code. */
  currency: string;
  /** Hourly minimum wage, decimal string. */
  minimumWage: string;
  /** Hours in a workweek after which overtime is due, decimal string. */
  overtimeAfterHours: string;
  /** Overtime rate as a multiple of the regular rate, decimal string (1.5 = time and a half). */
  overtimeMultiplier: string;
  /** Whether the retail/service-establishment commission exemption from overtime is applied. */
  commissionExemption: boolean;
  /** Retail sales tax as a fraction, decimal string (0.0825 = 8.25 %). */
  retailTaxRate: string;
  /** A day close with a variance above this needs a note, decimal string. */
  varianceNoteThreshold: string;
  /** Days a client's patch test stays current for colour. */
  patchTestMaxAgeDays: number;
  /** Franchise royalty on gross sales as a fraction, decimal string (0.06 = 6 %). */
  royaltyRate: string;
  /** Franchise marketing-fund contribution on gross sales as a fraction, decimal string. */
  marketingFundRate: string;
  createdAt: string;
  updatedAt: string;
}

export function toBranchView(row: BranchRow): BranchView {
  return {
    id: row.id,
    name: row.name,
    timeZone: row.timeZone,
    currency: row.currency,
    minimumWage: row.minimumWage,
    overtimeAfterHours: plain(row.overtimeAfterHours),
    overtimeMultiplier: plain(row.overtimeMultiplier),
    commissionExemption: row.commissionExemption,
    retailTaxRate: plain(row.retailTaxRate),
    varianceNoteThreshold: row.varianceNoteThreshold,
    patchTestMaxAgeDays: row.patchTestMaxAgeDays,
    royaltyRate: plain(row.royaltyRate),
    marketingFundRate: plain(row.marketingFundRate),
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}
