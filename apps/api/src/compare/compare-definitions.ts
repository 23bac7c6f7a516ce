import type { CompareDefinitionsView, FigureDefinitionView } from './dto/compare-definitions.view.js';

// The one place the comparison's figures are defined: served at GET /api/compare/definitions for the app's
// tooltips, written into the workbooks, and copied word for word into the README (a test compares them).

export const FIGURE_DEFINITIONS: FigureDefinitionView[] = [
  {
    figure: 'serviceRevenue',
    label: 'Service revenue',
    definition:
      'Prices of services on closed tickets after discounts, counted on the business date each service was booked. A refund counts as a negative amount on the day it was given, and service adjustments on the day they were booked. Excludes tax and tips; void tickets count for nothing.',
  },
  {
    figure: 'retailRevenue',
    label: 'Retail revenue',
    definition: 'Retail products sold on closed tickets before sales tax, less returns (on the day of the return), plus retail adjustments.',
  },
  {
    figure: 'tickets',
    label: 'Tickets',
    definition: 'Closed tickets whose business date is in the range. A refunded ticket still counts; a void one does not.',
  },
  {
    figure: 'averageTicket',
    label: 'Average ticket',
    definition: '(Service revenue + retail revenue) ÷ tickets, to the cent. Empty when there are no tickets.',
  },
  {
    figure: 'colourServiceRevenue',
    label: 'Colour services',
    definition: 'The part of service revenue from services marked as colour on the menu.',
  },
  {
    figure: 'colourProductCost',
    label: 'Colour product cost',
    definition: 'The cost of every bowl mixed on those closed tickets: grams weighed at the cost per gram when the bowl was mixed.',
  },
  {
    figure: 'colourCostShare',
    label: 'Colour cost share',
    definition: 'Colour product cost ÷ colour service revenue. Empty when there is no colour service revenue.',
  },
  {
    figure: 'productChargeRecovered',
    label: 'Product charge recovered',
    definition:
      "Colour product charged back to stylists before their commission, from approved or exported payroll runs whose pay period lies wholly inside the range, counted at each stylist's home branch. Empty when no such run exists.",
  },
  {
    figure: 'retailToServiceRatio',
    label: 'Retail to service',
    definition: 'Retail revenue ÷ service revenue. Empty when there is no service revenue.',
  },
  {
    figure: 'stylistHours',
    label: 'Stylist hours',
    definition: 'Hours entered on timesheets for work at the branch on dates in the range (0 when none were entered).',
  },
  {
    figure: 'revenuePerStylistHour',
    label: 'Revenue per stylist hour',
    definition:
      "Service revenue of the staff members' days that have timesheet hours ÷ those hours, to the cent. Days without hours are left out of both sides, so missing timesheets do not inflate it. Empty when no hours were entered.",
  },
  {
    figure: 'newClients',
    label: 'New clients',
    definition: 'Clients whose first closed ticket anywhere in the organisation falls in the range, counted at the branch of that ticket.',
  },
  {
    figure: 'returningClients',
    label: 'Returning clients',
    definition:
      'The other clients with a closed ticket at the branch in the range: they had been to the organisation before. Tickets without a client are not counted.',
  },
  {
    figure: 'rebookingRate',
    label: 'Rebooking rate',
    definition:
      "Of the clients with a closed ticket at the branch in the range, the share who came back to the same branch within the rebooking window (42 days unless chosen otherwise) after their first visit in the range. The return may fall after the range; a client whose window has not ended yet counts as not come back so far.",
  },
  {
    figure: 'tips',
    label: 'Tips',
    definition: 'Tips on closed tickets on the day they were booked, plus tip adjustments. They belong to the staff and are not revenue.',
  },
  {
    figure: 'commissionCost',
    label: 'Commission cost',
    definition:
      "Service commission + retail commission of approved or exported payroll runs whose pay period lies wholly inside the range (no part periods), counted at each stylist's home branch. Hourly pay, minimum-wage top-ups, overtime and tips are not included. Empty when no such run exists.",
  },
  {
    figure: 'commissionCostShare',
    label: 'Commission share',
    definition: 'Commission cost ÷ the service revenue of the dates those pay periods cover. Empty when there is no commission cost.',
  },
  {
    figure: 'voids',
    label: 'Voids',
    definition: 'Tickets voided whose business date is in the range.',
  },
  {
    figure: 'refunds',
    label: 'Refunds',
    definition: 'Refunds given in the range, each refund counted once on the day it was given.',
  },
  {
    figure: 'refundedAmount',
    label: 'Refunded',
    definition: 'The money given back in those refunds, sales tax included.',
  },
  {
    figure: 'hours',
    label: 'Hours',
    definition: "A staff member's timesheet hours at the branch on dates in the range.",
  },
  {
    figure: 'revenuePerHour',
    label: 'Revenue per hour',
    definition: "The staff member's service revenue on their days with timesheet hours ÷ those hours. Empty when no hours were entered.",
  },
];

export const FEE_DEFINITIONS: FigureDefinitionView[] = [
  {
    figure: 'grossSales',
    label: 'Gross sales',
    definition: 'Service revenue + retail revenue of the business dates in the month, before sales tax and net of refunds; tips are not sales.',
  },
  {
    figure: 'royaltyAmount',
    label: 'Royalty',
    definition: "Gross sales × the branch's royalty rate, rounded half-up to the cent.",
  },
  {
    figure: 'marketingFundAmount',
    label: 'Marketing fund',
    definition: "Gross sales × the branch's marketing-fund rate, rounded half-up to the cent.",
  },
  {
    figure: 'totalFees',
    label: 'Total fees',
    definition: 'Royalty + marketing fund.',
  },
];

export const FEE_NOTE =
  'These fees are worked out from the rates set on each branch and the sales recorded in Tressury. The franchise agreement governs: have them confirmed against it and by an accountant before invoicing or paying.';

export const COMPARE_DEFINITIONS: CompareDefinitionsView = { figures: FIGURE_DEFINITIONS, fees: FEE_DEFINITIONS, feeNote: FEE_NOTE };
