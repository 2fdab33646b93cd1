import type { Knex } from 'knex';
import type { RunListItem } from '../../shared/schemas/workspace-views';

// Row types as the migrations in migrations/ create them. knex checks db('<table>') calls against them;
// queries over aliased joins ('scenarios as s') declare their joined row type in the repo.
type Stamps = { created_by: number | null; created_at: string; updated_at: string; deleted_at: string | null };

export type PersonRow = {
  id: number;
  email: string;
  name: string;
  role: string;
  status: string;
  password_hash: string | null;
  created_at: string;
  updated_at: string;
  last_sign_in_at: string | null;
};

export type PasswordTokenRow = {
  id: number;
  person_id: number;
  token_hash: string;
  purpose: string;
  expires_at: string;
  used_at: string | null;
  created_at: string;
};

export type AuditLogRow = {
  id: number;
  actor_id: number | null;
  actor_email: string | null;
  action: string;
  target_type: string | null;
  target_id: string | null;
  detail: string | null;
  created_at: string;
};

export type OutboxRow = {
  id: number;
  to_address: string;
  subject: string;
  text_body: string;
  html_body: string | null;
  created_at: string;
};

export type SiteRow = { id: number; name: string; data: string; version: number } & Stamps;
export type RoomRow = { id: number; site_id: number; name: string; data: string; version: number } & Stamps;
export type WorkstationRow = { id: number; room_id: number; name: string; data: string; version: number } & Stamps;
export type DustAgentRow = { id: number; name: string; data: string; version: number } & Stamps;
export type WorkstationOperatorRow = { workstation_id: number; person_id: number };

export type SizeProfileRow = {
  id: number;
  name: string;
  kind: string;
  input: string;
  bins: string;
  fitted_mmad_m: number | null;
  fitted_gsd: number | null;
  respirable_fraction: number;
  thoracic_fraction: number;
  inhalable_fraction: number;
  created_by: number | null;
  created_at: string;
  deleted_at: string | null;
};

export type ScenarioRow = {
  id: number;
  workstation_id: number;
  agent_id: number | null;
  size_profile_id: number | null;
  name: string;
  control_description: string;
  control_tier: string;
  status: string;
  version: number;
  input: string;
  input_hash: string;
  created_by: number | null;
  updated_by: number | null;
  created_at: string;
  updated_at: string;
  deleted_at: string | null;
};

// The runs table stores every column the API lists (RunListItem spells them with the table's own
// names), the banner as plain text, and what the list leaves out (the list's verdict is judged on every read).
export type RunRow = Omit<RunListItem, 'banner' | 'outOfDate' | 'decided' | 'reasons'> & {
  scenario_id: number;
  banner: string | null;
  /** JSON of server/verdicts/verdict-numbers.ts: what the server judges every read from. */
  verdict_numbers: string | null;
  input: string;
  /** Empty once result_gz holds the gzip-compressed JSON (every run saved after the compression migration). */
  result: string;
  result_gz: Buffer | null;
  deleted_at: string | null;
};

export type RunTicketRow = {
  id: number;
  ticket: string;
  scenario_id: number;
  seed: string;
  engine_version: string;
  issued_to: number;
  issued_at: string;
  used_at: string | null;
  run_id: number | null;
};

export type ApprovalRow = {
  id: number;
  workstation_id: number;
  scenario_id: number;
  run_id: number;
  note: string;
  review_date: string;
  approved_by: number;
  approved_at: string;
  superseded_at: string | null;
  /** The limit the approval was given under; null for approvals from before it was kept, or without a limit. */
  limit_fraction: string | null;
  limit_mgPerM3: number | null;
};

// Inserts leave out the generated id and the columns that have defaults or may stay null.
type Table<Row extends { id?: number }, Defaulted extends keyof Row = never> = Knex.CompositeTableType<
  Row,
  Omit<Row, 'id' | Defaulted> & Partial<Pick<Row, Defaulted>>,
  Partial<Omit<Row, 'id'>>
>;

declare module 'knex/types/tables' {
  interface Tables {
    people: Table<PersonRow, 'status' | 'password_hash' | 'last_sign_in_at'>;
    password_tokens: Table<PasswordTokenRow, 'used_at'>;
    audit_log: Table<AuditLogRow>;
    outbox: Table<OutboxRow>;
    sites: Table<SiteRow, 'deleted_at' | 'created_by' | 'version'>;
    rooms: Table<RoomRow, 'deleted_at' | 'created_by' | 'version'>;
    workstations: Table<WorkstationRow, 'deleted_at' | 'created_by' | 'version'>;
    dust_agents: Table<DustAgentRow, 'deleted_at' | 'created_by' | 'version'>;
    workstation_operators: WorkstationOperatorRow;
    size_profiles: Table<SizeProfileRow, 'deleted_at'>;
    scenarios: Table<
      ScenarioRow,
      'control_description' | 'control_tier' | 'status' | 'version' | 'deleted_at' | 'agent_id' | 'size_profile_id'
    >;
    runs: Table<RunRow, 'deleted_at' | 'verdict_numbers' | 'result_gz'>;
    run_tickets: Table<RunTicketRow, 'used_at' | 'run_id'>;
    approvals: Table<ApprovalRow, 'note' | 'superseded_at' | 'limit_fraction' | 'limit_mgPerM3'>;
  }
}
