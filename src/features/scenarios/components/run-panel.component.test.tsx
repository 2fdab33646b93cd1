import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { act, render, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { MemoryRouter } from 'react-router-dom';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import { type Scenario, parseScenario } from '../../../../shared/schemas/scenario';
import type { Results } from '../../../../workers/engine/index';
import { referenceScenario } from '../../../../workers/engine/reference-scenario';
import { RunCancelledError, type RunOptions, type RunProgress, runSimulation, warmUpWorkers } from '@/lib/simulation-bridge';
import { RunPanel } from './run-panel';

vi.mock('@/lib/simulation-bridge', async (importOriginal) => ({
  ...(await importOriginal<typeof import('@/lib/simulation-bridge')>()),
  runSimulation: vi.fn(),
  warmUpWorkers: vi.fn(),
}));

type Run = { scenario: Scenario; options: RunOptions; resolve: (r: Results) => void; reject: (e: unknown) => void };
let runs: Run[] = [];

beforeEach(() => {
  runs = [];
  vi.mocked(runSimulation).mockImplementation(
    (scenario, options = {}) =>
      new Promise<Results>((resolve, reject) => {
        runs.push({ scenario, options, resolve, reject });
        // As the real bridge does: an abort rejects the run with RunCancelledError.
        options.signal?.addEventListener('abort', () => reject(new RunCancelledError()), { once: true });
      }),
  );
});

const scenario = parseScenario(referenceScenario);
const fakeResult = { marker: 'result' } as unknown as Results;
const progress = (fraction: number): RunProgress => ({ fraction, particlesPerS: 1000, secondsLeft: 30 });

function renderPanel(input: Scenario | null = scenario) {
  const onResult = vi.fn();
  const utils = render(
    <QueryClientProvider client={new QueryClient({ defaultOptions: { queries: { retry: false } } })}>
      <MemoryRouter>
        <RunPanel scenario={input} onResult={onResult} />
      </MemoryRouter>
    </QueryClientProvider>,
  );
  return { ...utils, onResult, user: userEvent.setup() };
}

const runButton = () => screen.getByRole('button', { name: /run/i });
const cancelButton = () => screen.queryByRole('button', { name: /cancel/i });
const progressBar = () => screen.queryByRole('progressbar');
const lastRun = () => runs[runs.length - 1];

async function startRun() {
  const panel = renderPanel();
  await panel.user.click(runButton());
  return panel;
}

describe('run panel', () => {
  it('has the idle workers warm up on the scenario as it stands once editing pauses, and not without one', async () => {
    vi.mocked(warmUpWorkers).mockClear();
    const { rerender } = renderPanel();
    expect(warmUpWorkers).not.toHaveBeenCalledWith(scenario);
    await waitFor(() => expect(warmUpWorkers).toHaveBeenCalledWith(scenario));
    vi.mocked(warmUpWorkers).mockClear();
    rerender(
      <QueryClientProvider client={new QueryClient()}>
        <MemoryRouter>
          <RunPanel scenario={null} onResult={vi.fn()} />
        </MemoryRouter>
      </QueryClientProvider>,
    );
    await new Promise((r) => setTimeout(r, 400));
    expect(warmUpWorkers).not.toHaveBeenCalledWith(null);
  });

  it('starts idle: Run enabled, no Cancel, no progress bar', () => {
    renderPanel();
    expect(runButton()).toHaveProperty('disabled', false);
    expect(cancelButton()).toBeNull();
    expect(progressBar()).toBeNull();
    expect(runSimulation).not.toHaveBeenCalled();
  });

  it('cannot run a scenario that does not validate', () => {
    renderPanel(null);
    expect(runButton()).toHaveProperty('disabled', true);
  });

  it('while running shows the progress bar, enables Cancel and disables Run', async () => {
    await startRun();
    expect(lastRun().scenario).toBe(scenario);
    expect(runButton()).toHaveProperty('disabled', true);
    expect(cancelButton()).toHaveProperty('disabled', false);
    expect(progressBar()?.getAttribute('aria-valuenow')).toBe('0');
    act(() => lastRun().options.onProgress?.(progress(0.42)));
    // Progress is drawn once per animation frame, not on every report.
    await waitFor(() => expect(progressBar()?.getAttribute('aria-valuenow')).toBe('42'));
  });

  it('moves focus from the disabled Run button to the progress while running', async () => {
    await startRun();
    await waitFor(() => expect(document.activeElement?.getAttribute('aria-label')).toBe('Run progress'));
    expect(document.activeElement?.contains(progressBar())).toBe(true);
  });

  it('when done hands the result on and is ready to run again', async () => {
    const { onResult } = await startRun();
    await act(async () => lastRun().resolve(fakeResult));
    expect(onResult).toHaveBeenCalledWith(fakeResult, scenario);
    expect(progressBar()).toBeNull();
    expect(cancelButton()).toBeNull();
    expect(runButton()).toHaveProperty('disabled', false);
  });

  it('when cancelled says so, drops the progress bar and enables Run again', async () => {
    const { user, onResult } = await startRun();
    await user.click(cancelButton()!);
    expect(lastRun().options.signal?.aborted).toBe(true);
    expect(screen.getByRole('status').textContent).toMatch(/cancelled/i);
    expect(progressBar()).toBeNull();
    expect(cancelButton()).toBeNull();
    expect(runButton()).toHaveProperty('disabled', false);
    expect(onResult).not.toHaveBeenCalled();
  });

  // The bug this guards against: a report after Cancel put the progress bar back and wedged the panel.
  it('ignores a progress report that arrives after the run was cancelled', async () => {
    const { user } = await startRun();
    await user.click(cancelButton()!);
    act(() => lastRun().options.onProgress?.(progress(0.6)));
    await new Promise((resolve) => setTimeout(resolve, 50));
    expect(progressBar()).toBeNull();
    expect(runButton()).toHaveProperty('disabled', false);
  });

  it('when the run fails shows the error and enables Run again', async () => {
    await startRun();
    await act(async () => lastRun().reject(new Error('worker ran out of memory')));
    expect(screen.getByRole('alert').textContent).toMatch(/worker ran out of memory/);
    expect(progressBar()).toBeNull();
    expect(runButton()).toHaveProperty('disabled', false);
  });

  it('stops the run when the panel goes away', async () => {
    const { unmount } = await startRun();
    unmount();
    expect(lastRun().options.signal?.aborted).toBe(true);
  });
});
