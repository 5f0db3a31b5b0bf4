// The desks a person can sit at. The words are the trade's; `admin` manages people and projects.
export const roles = [
  'contractor',
  'section_engineer',
  'central_office',
  'engineer_of_record',
  'field_inspector',
  'auditor',
  'admin',
] as const;

export type Role = (typeof roles)[number];

export const roleLabels: Record<Role, string> = {
  contractor: 'Contractor',
  section_engineer: 'Section engineer',
  central_office: 'Central office bridge staff',
  engineer_of_record: 'Engineer of record',
  field_inspector: 'Field inspector',
  auditor: 'Auditor',
  admin: 'Administrator',
};

export function isRole(value: unknown): value is Role {
  return typeof value === 'string' && (roles as readonly string[]).includes(value);
}
