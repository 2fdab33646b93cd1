import type { Knex } from 'knex';
import * as createPeople from '../../migrations/20261202000100_create_people';
import * as createSessions from '../../migrations/20261202000200_create_sessions';
import * as createAuditLog from '../../migrations/20261202000300_create_audit_log';
import * as createOutbox from '../../migrations/20261202000400_create_outbox';
import * as createWorkspace from '../../migrations/20261202000500_create_workspace';
import * as createSizeProfiles from '../../migrations/20261202000600_create_size_profiles';
import * as createScenarios from '../../migrations/20261202000700_create_scenarios';
import * as createApprovals from '../../migrations/20261202000800_create_approvals';
import * as addRunVerdictNumbers from '../../migrations/20261202000900_add_run_verdict_numbers';
import * as moveReleaseTypeToSource from '../../migrations/20261202150000_move_release_type_to_source';
import * as addPlaceVersions from '../../migrations/20261203110001_add_place_versions';
import * as addRoomSupplyAirflow from '../../migrations/20261203110002_add_room_supply_airflow';
import * as createRunTickets from '../../migrations/20261203120001_create_run_tickets';
import * as compressRunResults from '../../migrations/20261203120002_compress_run_results';

type Migration = { up: (k: Knex) => Promise<void>; down: (k: Knex) => Promise<void> };

// Static imports: knex's own dynamic import of .ts files fails under vitest. Names keep ".ts" so the
// CLI (which reads the folder) and the app agree on what has run.
const MIGRATIONS: Record<string, Migration> = {
  '20261202000100_create_people.ts': createPeople,
  '20261202000200_create_sessions.ts': createSessions,
  '20261202000300_create_audit_log.ts': createAuditLog,
  '20261202000400_create_outbox.ts': createOutbox,
  '20261202000500_create_workspace.ts': createWorkspace,
  '20261202000600_create_size_profiles.ts': createSizeProfiles,
  '20261202000700_create_scenarios.ts': createScenarios,
  '20261202000800_create_approvals.ts': createApprovals,
  '20261202000900_add_run_verdict_numbers.ts': addRunVerdictNumbers,
  '20261202150000_move_release_type_to_source.ts': moveReleaseTypeToSource,
  '20261203110001_add_place_versions.ts': addPlaceVersions,
  '20261203110002_add_room_supply_airflow.ts': addRoomSupplyAirflow,
  '20261203120001_create_run_tickets.ts': createRunTickets,
  '20261203120002_compress_run_results.ts': compressRunResults,
};

export const migrationSource: Knex.MigrationSource<string> = {
  getMigrations: async () => Object.keys(MIGRATIONS).sort(),
  getMigrationName: (name) => name,
  getMigration: async (name) => MIGRATIONS[name],
};
