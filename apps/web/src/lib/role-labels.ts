import type { Me } from './session';

export const roleLabels: Record<Me['role'], string> = {
  owner: 'Owner',
  manager: 'Manager',
  front_desk: 'Front desk',
  stylist: 'Stylist',
  accountant: 'Accountant',
};
