import { type QueryClient, useSuspenseQuery } from '@tanstack/react-query';
import { data, type LoaderFunctionArgs, useParams } from 'react-router';
import { abilityFor, useAbility } from '../../../lib/ability';
import { routePaths } from '../../../lib/route-paths';
import { requireUser, useSessionUser } from '../../../lib/session';
import { pickerQueries } from '../api/picker-queries';
import { ticketQueries } from '../api/ticket-queries';
import { CheckoutPanel } from '../components/checkout-panel';
import { ManagerActions } from '../components/manager-actions';
import { RetailPanel } from '../components/retail-panel';
import { SafetyCautions } from '../../../components/safety-cautions';
import { ServiceLinesPanel } from '../components/service-lines-panel';
import { patchTestNote, TicketHeader } from '../components/ticket-header';
import { ticketPermissions } from '../components/ticket-permissions';
import { TipsPanel } from '../components/tips-panel';
import '../components/tickets.css';

export function ticketEditorLoader(queryClient: QueryClient) {
  return async ({ request, params }: LoaderFunctionArgs) => {
    const user = await requireUser(request);
    if (!abilityFor(user).can('read', 'Ticket')) throw data({ message: 'Tickets are for the salon floor, the managers and the accountant.' }, { status: 403 });
    const ticket = await queryClient.ensureQueryData(ticketQueries.detail(params.ticketId ?? ''));
    await Promise.all([
      queryClient.ensureQueryData(pickerQueries.services()),
      queryClient.ensureQueryData(pickerQueries.products()),
      queryClient.ensureQueryData(pickerQueries.staff(ticket.branchId)),
    ]);
    return null;
  };
}

export function TicketEditorRoute() {
  const { ticketId = '' } = useParams();
  const { data: ticket } = useSuspenseQuery(ticketQueries.detail(ticketId));
  const { data: services } = useSuspenseQuery(pickerQueries.services());
  const { data: products } = useSuspenseQuery(pickerQueries.products());
  const { data: staff } = useSuspenseQuery(pickerQueries.staff(ticket.branchId));
  const user = useSessionUser();
  const ability = useAbility();
  if (!user) return null;

  const can = ticketPermissions(ticket, user, ability);
  const timeZone = user.branches.find((b) => b.id === ticket.branchId)?.timeZone ?? 'UTC';
  const note = patchTestNote(ticket, timeZone);
  const hasColour = ticket.serviceLines.some((l) => l.isColour);
  // A stylist records her work; checkout is the desk's (DESIGN.md §2).
  const showsCheckout = can.ownStaffId === null;
  const backTo = `${routePaths.today}?${new URLSearchParams({ branch: ticket.branchId, date: ticket.businessDate })}`;

  return (
    <section className="tr-page tr-ticket">
      <TicketHeader ticket={ticket} timeZone={timeZone} backTo={backTo} />
      <div className={showsCheckout || hasColour ? 'tr-ticket-grid' : 'tr-ticket-grid tr-ticket-grid-single'}>
        <div className="tr-ticket-main">
          <ServiceLinesPanel ticket={ticket} services={services} products={products} staff={staff} can={can} patchTestNote={note} />
          <RetailPanel ticket={ticket} products={products} staff={staff} can={can} />
          <TipsPanel ticket={ticket} staff={staff} can={can} />
        </div>
        <aside className="tr-ticket-side" aria-label="Checkout and cautions">
          {showsCheckout && <CheckoutPanel ticket={ticket} can={can} />}
          {showsCheckout && <ManagerActions ticket={ticket} can={can} />}
          {hasColour && <SafetyCautions patchTest={note} />}
        </aside>
      </div>
    </section>
  );
}
