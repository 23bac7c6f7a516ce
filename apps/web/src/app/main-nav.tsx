import { BankAccountIcon, BoxIcon, ConfirmIcon, EnvelopeIcon, GridViewIcon, GroupedBarChartIcon, OfficeIcon, PeopleIcon, PersonIcon, PropertiesIcon, TimelineBarChartIcon } from '@blueprintjs/icons';
import { NavLink } from 'react-router';
import { useAbility } from '../lib/ability';
import { routePaths } from '../lib/route-paths';
import { useSessionUser } from '../lib/session';

export function MainNav() {
  const ability = useAbility();
  const user = useSessionUser();
  return (
    <nav aria-label="Main" className="tr-nav">
      <ul>
        <li>
          <NavLink to={routePaths.overview} end className="tr-nav-link">
            <GridViewIcon />
            Overview
          </NavLink>
        </li>
        {ability.can('read', 'Ticket') && (
          <li>
            <NavLink to={routePaths.today} className="tr-nav-link">
              <PropertiesIcon />
              Today
            </NavLink>
          </li>
        )}
        {ability.can('create', 'DayClose') && (
          <li>
            <NavLink to={routePaths.dayClose} className="tr-nav-link">
              <ConfirmIcon />
              Close the day
            </NavLink>
          </li>
        )}
        {ability.can('read', 'Client') && (
          <li>
            <NavLink to={routePaths.clients} className="tr-nav-link">
              <PersonIcon />
              Clients
            </NavLink>
          </li>
        )}
        {user?.staffId && ability.can('read', 'StaffPay') && (
          <li>
            <NavLink to={routePaths.earnings} className="tr-nav-link">
              <TimelineBarChartIcon />
              Earnings
            </NavLink>
          </li>
        )}
        {ability.can('read', 'PayrollRun') && (
          <li>
            <NavLink to={routePaths.payroll} className="tr-nav-link">
              <BankAccountIcon />
              Payroll
            </NavLink>
          </li>
        )}
        {ability.can('read', 'BranchFigures') && (
          <li>
            <NavLink to={routePaths.compare} className="tr-nav-link">
              <GroupedBarChartIcon />
              Compare
            </NavLink>
          </li>
        )}
        {ability.can('read', 'Catalogue') && (
          <li>
            <NavLink to={routePaths.catalogue} className="tr-nav-link">
              <BoxIcon />
              Menu & products
            </NavLink>
          </li>
        )}
        {ability.can('read', 'Staff') && (
          <li>
            <NavLink to={routePaths.staff} className="tr-nav-link">
              <PeopleIcon />
              People
            </NavLink>
          </li>
        )}
        {ability.can('update', 'Branch') && (
          <li>
            <NavLink to={routePaths.branches} className="tr-nav-link">
              <OfficeIcon />
              Branches
            </NavLink>
          </li>
        )}
        {ability.can('read', 'OutboundMessage') && (
          <li>
            <NavLink to={routePaths.outbox} className="tr-nav-link">
              <EnvelopeIcon />
              Outbox
            </NavLink>
          </li>
        )}
      </ul>
    </nav>
  );
}
