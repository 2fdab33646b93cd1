import type { Banner } from '../vocabulary/fractions';
import type { AgentData } from './workspace';
import type { Scenario, ScenarioInput } from './scenario';

// Shapes the API answers with; the server builds them, the client reads them.
export type { Banner };

export type LastRun = {
  id: number;
  createdAt: string;
  outOfDate: boolean;
  respirableTwa8h_mgPerM3: number | null;
  limitFraction: string | null;
  twa8h_mgPerM3: number | null;
  twa8hCi95_mgPerM3: [number | null, number | null];
  percentOfLimit: number | null;
  ratingCategory: number | null;
  banner: Banner | null;
  /** The server's verdict: false while more particles could change the banner (shared/verdict). */
  decided: boolean | null;
  reasons: string[];
};

export type ScenarioSummary = {
  id: number;
  name: string;
  workstationId: number;
  workstationName: string;
  roomName: string;
  siteId: number;
  siteName: string;
  agentId: number | null;
  agentName: string | null;
  sizeProfileId: number | null;
  controlDescription: string;
  controlTier: string;
  status: 'draft' | 'approved';
  version: number;
  createdAt: string;
  updatedAt: string;
  lastRun: LastRun | null;
  needsReview?: boolean;
};

/** Why a banner reads Watch, so the words can say it: near the limit, not decided yet, a hood too slow, or a stale assessment. */
export type WatchCause = 'near-limit' | 'undecided' | 'capture-short' | 'out-of-date';

export type Approval = {
  id: number;
  scenarioId: number;
  scenarioName: string;
  runId: number;
  note: string;
  reviewDate: string;
  approvedAt: string;
  approvedBy: string;
  banner: Banner | null;
  percentOfLimit: number | null;
  expired: boolean;
  outOfDate: boolean;
  /** The approved run came from an engine of an older major version than the one running now. */
  engineChanged: boolean;
  /** The agent's limit is not the one the approval was given under. */
  limitChanged: boolean;
  needsReview: boolean;
  /** Why it needs review, in words ("the engine has changed since this approval"); null when it does not. */
  reviewReason: string | null;
  /** Why the approved run's verdict is Watch; null when it is not Watch. */
  watchCause: WatchCause | null;
};

export type StationBoard = {
  workstationId: number;
  workstationName: string;
  banner: Banner;
  needsReview: boolean;
  reviewDate: string | null;
  control: string | null;
  approvedAt: string | null;
  advice: string[];
  /** Why the banner reads Watch; null for Clear and Act. */
  watchCause: WatchCause | null;
  checkedAt: string;
};

export type RunListItem = {
  id: number;
  seed: string;
  engine_version: string;
  input_hash: string;
  particles: number;
  limit_fraction: string | null;
  twa8h_mgPerM3: number | null;
  twa8h_lo_mgPerM3: number | null;
  twa8h_hi_mgPerM3: number | null;
  respirable_twa8h_mgPerM3: number | null;
  percent_of_limit: number | null;
  rating_category: number | null;
  banner: Banner | null;
  created_by: number | null;
  created_at: string;
  outOfDate: boolean;
  decided: boolean | null;
  reasons: string[];
};

export type ScenarioDetail = ScenarioSummary & { input: ScenarioInput; inputHash: string; approval: Approval | null; runs: RunListItem[] };

export type SavedRun = {
  id: number;
  scenarioId: number;
  scenarioName: string;
  seed: string;
  engineVersion: string;
  particles: number;
  createdAt: string;
  outOfDate: boolean;
  input: Scenario;
  result: unknown;
};

export type Page<T> = { items: T[]; total: number; page: number; pageSize: number };

export type JsonRecord<T> = { id: number; name: string; data: T; version: number; createdAt: string; updatedAt: string };
export type AgentRecord = JsonRecord<AgentData>;
export type RoomData = {
  length_m: number;
  width_m: number;
  height_m: number;
  /** Which of the two the person typed; the other follows from the room's volume. */
  ventilationEntered: 'airChanges' | 'supplyAirflow';
  airChanges_perH: number;
  supplyAirflow_m3PerH: number;
  draftSpeed_mPerS: number;
  draftDirection_deg: number;
  temperature_K: number;
};
export type WorkstationData = {
  description: string;
  source: { x_m: number; y_m: number; z_m: number };
  worker: { x_m: number; y_m: number; z_m: number; posture: 'standing' | 'seated' };
  releaseType: 'quiet' | 'low' | 'active' | 'high';
};
export type SiteRecord = JsonRecord<{ address: string; notes: string }>;
export type RoomRecord = JsonRecord<RoomData> & { siteId: number };
export type WorkstationRecord = JsonRecord<WorkstationData> & { roomId: number };
export type SiteTree = SiteRecord & { rooms: (RoomRecord & { workstations: WorkstationRecord[] })[] };
export type WorkstationDetail = WorkstationRecord & { room: RoomRecord; approval: Approval | null; operatorIds: number[] };
export type OperatorAssignment = { workstationId: number; personIds: number[] };

/** One field an edit changed, as recorded under `detail.changes`. */
export type AuditChange = { field: string; from: unknown; to: unknown };
export type AuditEntry = {
  id: number;
  /** Who acted, by name; null where the address belongs to nobody in Motewalk (a failed sign-in). */
  actorName: string | null;
  /** Only for readers who manage people; null for everyone else, who see names only. */
  actorEmail: string | null;
  action: string;
  targetType: string | null;
  targetId: string | null;
  /** The record's name as it stands now (deleted records keep theirs). */
  targetName: string | null;
  detail: Record<string, unknown> | null;
  createdAt: string;
};
export type OutboxMessage = { id: number; to: string; subject: string; text: string; html: string | null; createdAt: string };
