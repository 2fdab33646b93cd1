import { render, screen, waitFor } from '@testing-library/react';
import { MemoryRouter } from 'react-router-dom';
import { describe, expect, it } from 'vitest';
import { scenarioInput } from '../../../../tests/fixtures/workspace';
import { runEngine } from '../../../../tests/helpers/run-engine';
import { RunResults } from './run-results';

const { scenario, result } = runEngine(scenarioInput());

describe('a run’s results', () => {
  it('draw the headline, then everything below it, and say so while they do', async () => {
    render(
      <MemoryRouter>
        <RunResults result={result} scenario={scenario} />
      </MemoryRouter>,
    );
    expect(screen.getByRole('region', { name: 'Headline' })).toBeTruthy();
    await waitFor(() => expect(screen.queryByText('Drawing the charts, maps and tables…')).toBeNull());
    expect(screen.getAllByRole('table').length).toBeGreaterThan(0);
    for (const name of ['Breathing-zone concentration over time', 'Where the dust went', 'Floor deposition and capture velocity'])
      expect(screen.getByRole('region', { name })).toBeTruthy();
  });
});
