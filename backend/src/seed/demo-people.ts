import type { Role } from '@tracewright/shared';

/** Demo data only: a fictional lab's people. The shared demo password is printed by `npm start`. */
export const DEMO_PASSWORD = 'larkspur-demo-2026';

export const DEMO_PEOPLE: Array<{ email: string; name: string; role: Role; pin?: string }> = [
  { email: 'admin@larkspur-lab.example', name: 'Rosa Quintero', role: 'admin' },
  { email: 'engineer@larkspur-lab.example', name: 'Teodor Brandt', role: 'engineer' },
  { email: 'engineer2@larkspur-lab.example', name: 'Amaka Lindqvist', role: 'engineer' },
  { email: 'operator@larkspur-lab.example', name: 'Joss Mbeki-Hart', role: 'operator', pin: '2468' },
  { email: 'operator2@larkspur-lab.example', name: 'Noor Falkenrath', role: 'operator', pin: '1357' },
  { email: 'quality@larkspur-lab.example', name: 'Ilse Moreau', role: 'quality' },
];

export const DEMO_SETTINGS = { labName: 'Larkspur Soft Circuits Lab', timeZone: 'Europe/Amsterdam', paperSize: 'A4' as const };
