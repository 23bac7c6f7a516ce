import { ApiProperty } from '@nestjs/swagger';
import { cashChange, ticketTotals } from '@tressury/domain';
import Big from 'big.js';
import type { LoadedBowl, LoadedTicket } from '../tickets.repository.js';

export class BowlComponentView {
  productId: string;
  productName: string;
  @ApiProperty({ enum: ['colour', 'lightener', 'developer', 'additive'] })
  kind: 'colour' | 'lightener' | 'developer' | 'additive';
  grams: string;
  /** Developers only: the strength in volumes. */
  developerVolume: string | null;
  /** The product's cost per gram when the bowl was mixed. */
  costPerGram: string;
}

export class BowlView {
  id: string;
  mixedByStaffId: string;
  mixedByName: string;
  components: BowlComponentView[];
  leftoverGrams: string;
  processingMinutes: number | null;
  note: string;
  totalGrams: string;
  /** Developer grams per gram of colour or lightener, e.g. "1.50" for 1:1.5; null without colour. */
  ratio: string | null;
  /** Weighted mean strength of the developers in the bowl, in volumes. */
  developerVolume: string | null;
  cost: string;
  wasteGrams: string;
  wasteCost: string;
  createdAt: string;
}

export class ServiceLineView {
  id: string;
  serviceId: string;
  serviceName: string;
  isColour: boolean;
  staffId: string;
  staffName: string;
  assistantStaffId: string | null;
  assistantName: string | null;
  /** The assistant's part of the line, 0..1. */
  assistantShare: string | null;
  listPrice: string;
  discount: string;
  price: string;
  noProductReason: string | null;
  /** The business date the line counts on (a refund's own date). */
  bookedOn: string;
  /** Set on a refund line: the line it reverses. */
  refundOfLineId: string | null;
  bowls: BowlView[];
}

export class RetailLineView {
  id: string;
  productId: string;
  productName: string;
  quantity: number;
  unitPrice: string;
  amount: string;
  taxRate: string;
  tax: string;
  sellerStaffId: string;
  sellerName: string;
  bookedOn: string;
  refundOfLineId: string | null;
}

export class TipView {
  id: string;
  staffId: string;
  staffName: string;
  amount: string;
  bookedOn: string;
}

export class PaymentView {
  id: string;
  @ApiProperty({ enum: ['cash', 'card'] })
  method: 'cash' | 'card';
  @ApiProperty({ enum: ['charge', 'refund'] })
  kind: 'charge' | 'refund';
  @ApiProperty({ enum: ['pending', 'succeeded', 'failed'] })
  status: 'pending' | 'succeeded' | 'failed';
  amount: string;
  tendered: string | null;
  /** Cash handed back: tendered − amount. */
  change: string | null;
  bookedOn: string;
  createdAt: string;
}

export class TicketTotalsView {
  services: string;
  retail: string;
  tax: string;
  tips: string;
  total: string;
  paid: string;
  due: string;
}

export class TicketClientView {
  id: string;
  name: string;
  allergyNotes: string;
  lastPatchTestOn: string | null;
}

export class PatchTestCautionView {
  /** The client has no patch test within the branch's window for this ticket's date. */
  needed: boolean;
  lastPatchTestOn: string | null;
  acknowledgedAt: string | null;
}

export class TicketView {
  id: string;
  branchId: string;
  branchName: string;
  businessDate: string;
  number: number;
  @ApiProperty({ enum: ['open', 'closed', 'void'] })
  status: 'open' | 'closed' | 'void';
  client: TicketClientView | null;
  openedAt: string;
  closedAt: string | null;
  voidReason: string | null;
  /** The ticket's day is closed: changes go in as dated adjustments on a later open day. */
  locked: boolean;
  /** Some services were refunded after the ticket closed. */
  refunded: boolean;
  serviceLines: ServiceLineView[];
  retailLines: RetailLineView[];
  tips: TipView[];
  payments: PaymentView[];
  totals: TicketTotalsView;
  patchTest: PatchTestCautionView;
}

const iso = (value: Date | null) => (value ? value.toISOString() : null);

function toBowlView(bowl: LoadedBowl, names: Map<string, string>): BowlView {
  return {
    id: bowl.id,
    mixedByStaffId: bowl.mixedByStaffId,
    mixedByName: names.get(bowl.mixedByStaffId) ?? '',
    components: bowl.components.map((c) => ({
      productId: c.productId,
      productName: c.productName,
      kind: c.kind,
      grams: new Big(c.grams).toFixed(),
      developerVolume: c.developerVolume === null ? null : new Big(c.developerVolume).toFixed(),
      costPerGram: c.costPerGram,
    })),
    leftoverGrams: new Big(bowl.leftoverGrams).toFixed(),
    processingMinutes: bowl.processingMinutes,
    note: bowl.note,
    totalGrams: new Big(bowl.totalGrams).toFixed(),
    ratio: bowl.ratio,
    developerVolume: bowl.developerVolume,
    cost: bowl.cost,
    wasteGrams: new Big(bowl.wasteGrams).toFixed(),
    wasteCost: bowl.wasteCost,
    createdAt: bowl.createdAt.toISOString(),
  };
}

export function toTicketView(loaded: LoadedTicket, patchTestNeeded: boolean): TicketView {
  const { ticket, staffNames: names } = loaded;
  const totals = ticketTotals({
    serviceLines: loaded.serviceLines,
    retailLines: loaded.retailLines,
    tips: loaded.tips,
    payments: loaded.payments,
  });
  return {
    id: ticket.id,
    branchId: ticket.branchId,
    branchName: loaded.branch.name,
    businessDate: ticket.businessDate,
    number: ticket.number,
    status: ticket.status,
    client: loaded.client
      ? {
          id: loaded.client.id,
          name: `${loaded.client.firstName} ${loaded.client.lastName}`,
          allergyNotes: loaded.client.allergyNotes,
          lastPatchTestOn: loaded.client.lastPatchTestOn,
        }
      : null,
    openedAt: ticket.openedAt.toISOString(),
    closedAt: iso(ticket.closedAt),
    voidReason: ticket.voidReason,
    locked: loaded.dayClosed,
    refunded: loaded.serviceLines.some((l) => l.refundOfLineId !== null) || loaded.retailLines.some((l) => l.refundOfLineId !== null),
    serviceLines: loaded.serviceLines.map((line) => ({
      id: line.id,
      serviceId: line.serviceId,
      serviceName: line.serviceName,
      isColour: line.isColour,
      staffId: line.staffId,
      staffName: names.get(line.staffId) ?? '',
      assistantStaffId: line.assistantStaffId,
      assistantName: line.assistantStaffId ? (names.get(line.assistantStaffId) ?? '') : null,
      assistantShare: line.assistantShare === null ? null : new Big(line.assistantShare).toFixed(),
      listPrice: line.listPrice,
      discount: line.discount,
      price: line.price,
      noProductReason: line.noProductReason,
      bookedOn: line.bookedOn,
      refundOfLineId: line.refundOfLineId,
      bowls: line.bowls.map((bowl) => toBowlView(bowl, names)),
    })),
    retailLines: loaded.retailLines.map((line) => ({
      id: line.id,
      productId: line.productId,
      productName: line.productName,
      quantity: line.quantity,
      unitPrice: line.unitPrice,
      amount: line.amount,
      taxRate: new Big(line.taxRate).toFixed(),
      tax: line.tax,
      sellerStaffId: line.sellerStaffId,
      sellerName: names.get(line.sellerStaffId) ?? '',
      bookedOn: line.bookedOn,
      refundOfLineId: line.refundOfLineId,
    })),
    tips: loaded.tips.map((tip) => ({ id: tip.id, staffId: tip.staffId, staffName: names.get(tip.staffId) ?? '', amount: tip.amount, bookedOn: tip.bookedOn })),
    payments: loaded.payments.map((p) => ({
      id: p.id,
      method: p.method,
      kind: p.kind,
      status: p.status,
      amount: p.amount,
      tendered: p.tendered,
      change: p.tendered === null ? null : cashChange(p.tendered, p.amount),
      bookedOn: p.bookedOn,
      createdAt: p.createdAt.toISOString(),
    })),
    totals,
    patchTest: {
      needed: patchTestNeeded,
      lastPatchTestOn: loaded.client?.lastPatchTestOn ?? null,
      acknowledgedAt: iso(ticket.patchTestAcknowledgedAt),
    },
  };
}
