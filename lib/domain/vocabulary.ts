// The closed vocabularies of the job, shared by models, zod schemas and the UI.
// The database enforces the same lists with CHECK constraints (see migrations/).

export const ROLES = ['admin', 'office', 'foreman', 'technician'] as const;
export type Role = (typeof ROLES)[number];
export const DESK_ROLES: readonly Role[] = ['admin', 'office'];
export const FIELD_ROLES: readonly Role[] = ['foreman', 'technician'];
/** Company settings, users and crews: admins only. */
export const ADMIN_ONLY: readonly Role[] = ['admin'];

export const UNIT_SYSTEMS = ['imperial', 'metric'] as const;
export type UnitSystemName = (typeof UNIT_SYSTEMS)[number];

export const CUSTOMER_KINDS = [
  'homeowner',
  'property_manager',
  'municipality',
  'contractor',
  'business',
  'other',
] as const;
export const ACCESS_POINT_KINDS = ['manhole', 'cleanout', 'other'] as const;
export const PIPE_MATERIALS = [
  'vitrified_clay',
  'concrete',
  'pvc',
  'hdpe',
  'cast_iron',
  'ductile_iron',
  'asbestos_cement',
  'bituminous_fibre',
  'brick',
  'other',
] as const;

export const JOB_STATUSES = [
  'draft',
  'scheduled',
  'in_progress',
  'awaiting_review',
  'sent_back',
  'approved',
  'reported',
  'closed',
  'cancelled',
] as const;
export type JobStatus = (typeof JOB_STATUSES)[number];

// Our own plain-English names in natural word order; an owner who requires a coding standard gets its code in
// the repair's free-text ownerDefectCode instead (migrations/20261202001210-own-defect-names.cjs).
export const DEFECT_TYPES = [
  'lengthwise_crack',
  'ring_crack',
  'crazed_cracks',
  'open_fracture',
  'broken_wall',
  'hole',
  'joint_out_of_line',
  'joint_gap',
  'roots',
  'water_getting_in',
  'out_of_round',
  'wall_loss',
  'lateral_sticking_in',
  'other',
] as const;
export type DefectType = (typeof DEFECT_TYPES)[number];
export const REPAIR_STATUSES = ['planned', 'installed', 'failed', 'cancelled'] as const;

export const RESIN_CHEMISTRIES = ['epoxy', 'silicate', 'polyester', 'vinyl_ester', 'other'] as const;
export const SENSITIVITY_KINDS = ['doubling', 'arrhenius'] as const;

export const INSTALL_STATUSES = [
  'not_started',
  'in_progress',
  'awaiting_review',
  'approved',
  'sent_back',
  'abandoned',
] as const;
export type InstallStatus = (typeof INSTALL_STATUSES)[number];

export const INSTALL_EVENT_TYPES = [
  'safety_acknowledged',
  'checks_done',
  'dry_run_started',
  'dry_run_finished',
  'conditions_recorded',
  'go_decision',
  'resin_mixed',
  'patch_loaded',
  'packer_in_position',
  'bladder_inflated',
  'pressure_reading',
  'bladder_deflated',
  'inspection_recorded',
  'signed_off',
  'note',
  'correction',
] as const;
export type InstallEventType = (typeof INSTALL_EVENT_TYPES)[number];

export const ATTACHMENT_KINDS = ['before', 'after', 'inspection', 'document', 'other'] as const;
export const ATTACHMENT_STATUSES = ['pending', 'ready'] as const;
export const REVIEW_DECISIONS = ['approved', 'sent_back'] as const;
export const INVOICE_STATUSES = ['draft', 'issued', 'paid', 'void'] as const;

export const REPORT_SEND_STATUSES = ['queued', 'sending', 'sent', 'failed'] as const;
/** Why a received payment was not applied to its invoice (kept on the payment event and shown as an alert). */
export const PAYMENT_PROBLEMS = ['already_paid', 'amount', 'currency', 'not_open'] as const;
export type PaymentProblem = (typeof PAYMENT_PROBLEMS)[number];
export type ReportSendStatus = (typeof REPORT_SEND_STATUSES)[number];

/** Words shown to people for the codes above. */
export const LABELS: Record<string, string> = {
  admin: 'Admin',
  office: 'Office',
  foreman: 'Foreman',
  technician: 'Technician',
  draft: 'Draft',
  scheduled: 'Scheduled',
  in_progress: 'In progress',
  awaiting_review: 'Awaiting review',
  sent_back: 'Sent back',
  approved: 'Approved',
  reported: 'Report sent',
  closed: 'Closed',
  cancelled: 'Cancelled',
  not_started: 'Not started',
  abandoned: 'Abandoned',
  planned: 'Planned',
  installed: 'Installed',
  failed: 'Failed',
  issued: 'Issued',
  paid: 'Paid',
  void: 'Void',
  manhole: 'Manhole',
  cleanout: 'Cleanout',
  other: 'Other',
  pvc: 'PVC',
  hdpe: 'HDPE',
  lengthwise_crack: 'Lengthwise crack',
  ring_crack: 'Ring crack',
  crazed_cracks: 'Crazed / multiple cracks',
  open_fracture: 'Open fracture',
  broken_wall: 'Broken wall',
  hole: 'Hole',
  joint_out_of_line: 'Joint out of line',
  joint_gap: 'Joint gap',
  roots: 'Roots',
  water_getting_in: 'Water getting in',
  out_of_round: 'Out of round',
  wall_loss: 'Wall loss',
  lateral_sticking_in: 'Side connection sticking in',
};

export const label = (code: string) => LABELS[code] ?? code.replace(/_/g, ' ').replace(/^./, (c) => c.toUpperCase());

/** A closed list as the options of a select or filter: each code with its label. */
export const labelledOptions = (codes: readonly string[]) => codes.map((code) => ({ value: code, label: label(code) }));

/** Rows with an id and a name (customers, crews, resin systems) as the options of a select or filter. */
export const namedOptions = (rows: { id: string; name: string }[]) =>
  rows.map((row) => ({ value: row.id, label: row.name }));
