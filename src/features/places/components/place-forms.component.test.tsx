import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import type { RoomRecord, SiteTree, WorkstationRecord } from '../../../../shared/schemas/workspace-views';
import { POSTURE_BREATHING_HEIGHT_m } from '../../../../shared/vocabulary/index';
import * as create from '@/features/places/api/create-place';
import * as update from '@/features/places/api/update-place';
import { RoomForm } from './room-form';
import { WorkstationForm } from './workstation-form';

vi.mock('@/features/places/api/create-place', () => ({ useCreateSite: vi.fn(), useCreateRoom: vi.fn(), useCreateWorkstation: vi.fn() }));
vi.mock('@/features/places/api/update-place', () => ({ useUpdateSite: vi.fn(), useUpdateRoom: vi.fn(), useUpdateWorkstation: vi.fn() }));

const createMutate = vi.fn();
const updateMutate = vi.fn();
const mutation = (mutate: typeof createMutate) => ({ mutate, reset: vi.fn(), error: null, isPending: false, isSuccess: false }) as never;
beforeEach(() => {
  createMutate.mockReset();
  updateMutate.mockReset();
  for (const hook of [create.useCreateRoom, create.useCreateWorkstation]) vi.mocked(hook).mockReturnValue(mutation(createMutate));
  for (const hook of [update.useUpdateRoom, update.useUpdateWorkstation]) vi.mocked(hook).mockReturnValue(mutation(updateMutate));
});

const stamps = { createdAt: '2026-12-01T00:00:00Z', updatedAt: '2026-12-01T00:00:00Z' };
// 8 × 6 × 3 m = 144 m³; ACH = supply airflow / volume (definition).
const room: RoomRecord = {
  id: 5,
  siteId: 1,
  name: 'Hall',
  version: 3,
  ...stamps,
  data: {
    length_m: 8,
    width_m: 6,
    height_m: 3,
    ventilationEntered: 'airChanges',
    airChanges_perH: 4,
    supplyAirflow_m3PerH: 576,
    draftSpeed_mPerS: 0.1,
    draftDirection_deg: 0,
    temperature_K: 293.15,
  },
};
const sites: SiteTree[] = [
  { id: 1, name: 'Works', version: 1, ...stamps, data: { address: '', notes: '' }, rooms: [{ ...room, workstations: [] }] },
];
const bench: WorkstationRecord = {
  id: 9,
  roomId: 5,
  name: 'Bench',
  version: 4,
  ...stamps,
  data: {
    description: '',
    source: { x_m: 2, y_m: 2, z_m: 0.9 },
    worker: { x_m: 2.5, y_m: 2, z_m: 1.5, posture: 'standing' },
    releaseType: 'active',
  },
};
const value = (label: string) => (screen.getByLabelText(label) as HTMLInputElement).value;

describe('room form ventilation', () => {
  it('carries the air changes across as supply airflow when the unit is switched, and sends what was typed', async () => {
    const user = userEvent.setup();
    render(<RoomForm sites={sites} room={room} onDone={() => {}} />);
    expect(screen.getByText('= 576 m³/h of supply air')).toBeTruthy();
    await user.selectOptions(screen.getByLabelText('General ventilation given as'), 'supplyAirflow');
    expect(value('Supply airflow')).toBe('576');
    await user.clear(screen.getByLabelText('Supply airflow'));
    await user.type(screen.getByLabelText('Supply airflow'), '720');
    expect(screen.getByText('= 5 air changes per hour')).toBeTruthy();
    await user.click(screen.getByRole('button', { name: 'Save changes' }));
    expect(updateMutate.mock.calls[0][0]).toMatchObject({
      id: 5,
      version: 3,
      body: { data: { ventilationEntered: 'supplyAirflow', supplyAirflow_m3PerH: 720, airChanges_perH: 5 } },
    });
  });
});

describe('workstation form posture', () => {
  it('moves the breathing zone to the typical seated height when the posture changes to seated, and sends both', async () => {
    const user = userEvent.setup();
    render(<WorkstationForm sites={sites} workstation={bench} onDone={() => {}} />);
    await user.selectOptions(screen.getByLabelText("Worker's posture"), 'seated');
    expect(value('Breathing-zone height')).toBe(String(POSTURE_BREATHING_HEIGHT_m.seated));
    await user.click(screen.getByRole('button', { name: 'Save changes' }));
    expect(updateMutate.mock.calls[0][0]).toMatchObject({
      id: 9,
      version: 4,
      body: { data: { worker: { posture: 'seated', z_m: POSTURE_BREATHING_HEIGHT_m.seated } } },
    });
  });

  it('keeps a breathing-zone height the person typed when the posture changes', async () => {
    const user = userEvent.setup();
    render(<WorkstationForm sites={sites} />);
    await user.clear(screen.getByLabelText('Breathing-zone height'));
    await user.type(screen.getByLabelText('Breathing-zone height'), '1.62');
    await user.selectOptions(screen.getByLabelText("Worker's posture"), 'seated');
    expect(value('Breathing-zone height')).toBe('1.62');
  });
});
