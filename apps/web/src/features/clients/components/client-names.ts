import type { Client } from '../api/client-queries';

export const fullName = (client: Pick<Client, 'firstName' | 'lastName'>): string => `${client.firstName} ${client.lastName}`;
