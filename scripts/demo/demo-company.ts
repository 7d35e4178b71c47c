// The demo scenario: an invented maker of small linear actuators. Every name here is made up.
import type { Role } from '../../lib/roles';

export const DEMO_SITE_NAME = 'Corvel Motion Works · Bench Hall 2';

export const DEMO_USERS: Array<{ role: Role; name: string }> = [
  { role: 'admin', name: 'Mira Okafor' },
  { role: 'planner', name: 'Tomasz Reyes' },
  { role: 'operator', name: 'Jun Halvorsen' },
  { role: 'clerk', name: 'Priya Dunmore' },
  { role: 'quality', name: 'Elliot Vance' },
];
