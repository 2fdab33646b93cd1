import { AppError } from '../lib/app-error';
import type { StoredScenario } from './scenarios.repo';

// An approved option is refused a move rather than moved with its approval withdrawn. The approval is a
// competent person's sign-off for one station's layout, and it is what that station's operators read as
// their control today. Withdrawing it as a side effect of an edit would turn their board to Act without
// anyone having decided so; keeping it would leave the board vouching for a control that is no longer
// there. Refusing leaves both stations as they were and asks for the two deliberate steps instead: copy the
// option to the other station (Duplicate, then move the copy) and approve a successor here when one exists.
// The same holds for deleting an approved option.
export function assertMayMove(current: Pick<StoredScenario, 'status' | 'workstationId'>, workstationId: number | undefined): void {
  if (workstationId === undefined || workstationId === current.workstationId || current.status !== 'approved') return;
  throw new AppError(
    409,
    'approved',
    'An approved scenario stays with the workstation it was approved for. Duplicate it and move the copy to the other workstation instead.',
  );
}
