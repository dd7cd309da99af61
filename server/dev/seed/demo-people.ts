import type { Role } from '@shared/workflow/statuses';

/** The invented demo company and its customers. Anyone else who signs in becomes a homeowner. */
export const demoPeople: { email: string; name: string; role: Role }[] = [
  { email: 'dana.okafor@gradepass.test', name: 'Dana Okafor', role: 'admin' },
  { email: 'priya.lindqvist@gradepass.test', name: 'Priya Lindqvist', role: 'staff' },
  { email: 'marcus.bell@gradepass.test', name: 'Marcus Bell', role: 'staff' },
  { email: 'tomasz.reyes@gradepass.test', name: 'Tomasz Reyes', role: 'crew' },
  { email: 'jo.haverford@gradepass.test', name: 'Jo Haverford', role: 'crew' },
  { email: 'ellen.marsh@example.test', name: 'Ellen Marsh', role: 'applicant' },
  { email: 'sam.whitcombe@example.test', name: 'Sam Whitcombe', role: 'applicant' },
  { email: 'ravi.castellanos@example.test', name: 'Ravi Castellanos', role: 'applicant' },
  { email: 'nora.fitzgerald@example.test', name: 'Nora Fitzgerald', role: 'applicant' },
];
