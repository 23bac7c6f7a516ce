import { GridViewIcon, OfficeIcon } from '@blueprintjs/icons';
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
