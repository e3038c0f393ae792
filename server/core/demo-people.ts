import type { DemoUser } from '../../shared/schemas/config.ts';

// An invented maker and invented people; `.example` is a reserved domain.
export const DEMO_WORKSPACE_NAME = 'Tallis & Brume — Chassis';
export const DEMO_PASSWORD = 'ridewright-demo';

export const DEMO_USERS: DemoUser[] = [
  { role: 'admin', name: 'Ada Quill', email: 'ada.quill@tallisbrume.example', password: DEMO_PASSWORD },
  { role: 'lead', name: 'Tomas Reeve', email: 'tomas.reeve@tallisbrume.example', password: DEMO_PASSWORD },
  { role: 'engineer', name: 'Ines Marlow', email: 'ines.marlow@tallisbrume.example', password: DEMO_PASSWORD },
  { role: 'viewer', name: 'Olu Fenwick', email: 'olu.fenwick@tallisbrume.example', password: DEMO_PASSWORD },
];
