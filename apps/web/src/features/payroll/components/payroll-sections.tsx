import { Classes } from '@blueprintjs/core';
import { NavLink } from 'react-router';
import { useAbility } from '../../../lib/ability';
import { routePaths } from '../../../lib/route-paths';
import './payroll-sections.css';

const linkClass = ({ isActive }: { isActive: boolean }) => [Classes.BUTTON, Classes.MINIMAL, isActive && Classes.ACTIVE, 'tr-payroll-section'].filter(Boolean).join(' ');

/** The switcher at the top of every payroll page: run and review, plans, hours — each as the person may see it. */
export function PayrollSections() {
  const ability = useAbility();
  const sections = [
    { to: routePaths.payroll, label: 'Run & review', shown: ability.can('read', 'PayrollRun') },
    { to: routePaths.payrollPlans, label: 'Plans', shown: ability.can('read', 'PayPlan') },
    { to: routePaths.payrollHours, label: 'Hours', shown: ability.can('read', 'Timesheet') },
  ].filter((section) => section.shown);
  if (sections.length < 2) return null;
  return (
    <nav aria-label="Payroll sections" className={`${Classes.BUTTON_GROUP} tr-payroll-sections`}>
      {sections.map((section) => (
        <NavLink key={section.to} to={section.to} end className={linkClass}>
          {section.label}
        </NavLink>
      ))}
    </nav>
  );
}
