import { BoxIcon, ConfirmIcon, GridViewIcon, OfficeIcon, PeopleIcon, PersonIcon, PropertiesIcon } from '@blueprintjs/icons';
import { NavLink } from 'react-router';
import { useAbility } from '../lib/ability';
import { routePaths } from '../lib/route-paths';

export function MainNav() {
  const ability = useAbility();
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
      </ul>
    </nav>
  );
}
