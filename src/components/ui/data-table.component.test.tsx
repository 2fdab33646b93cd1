import { render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { type Column, DataTable, figureColumn } from './data-table';

type Hood = { name: string; airflow_m3PerS: number | null };
const rows: Hood[] = [
  { name: 'Booth', airflow_m3PerS: 0.4 },
  { name: 'Slot', airflow_m3PerS: null },
  { name: 'Flanged', airflow_m3PerS: 0.15 },
  { name: 'Canopy', airflow_m3PerS: 0.9 },
];
const columns: Column<Hood>[] = [
  { key: 'name', header: 'Hood', render: (r) => r.name, sortValue: (r) => r.name },
  { key: 'airflow', header: 'Airflow', render: (r) => String(r.airflow_m3PerS ?? '—'), sortValue: (r) => r.airflow_m3PerS, align: 'right' },
  { key: 'note', header: 'Note', render: () => 'ok' },
];

const shownNames = () =>
  screen
    .getAllByRole('row')
    .slice(1)
    .map((row) => within(row).getAllByRole('cell')[0].textContent);
const header = (name: string) => screen.getByRole('columnheader', { name: new RegExp(name) });
const table = () => render(<DataTable rows={rows} columns={columns} rowKey={(r) => r.name} caption="Hoods" />);

// Expected orders are worked out by hand from the rows above; aria-sort values from WAI-ARIA 1.2 (columnheader).
describe('sortable table', () => {
  it('keeps the given order and marks no column until a header is chosen', () => {
    table();
    expect(screen.getByRole('table', { name: 'Hoods' })).toBeTruthy();
    expect(shownNames()).toEqual(['Booth', 'Slot', 'Flanged', 'Canopy']);
    for (const name of ['Hood', 'Airflow', 'Note']) expect(header(name).getAttribute('aria-sort')).toBeNull();
  });

  it('sorts ascending on the first click and descending on the second, unknown values last', async () => {
    const user = userEvent.setup();
    table();
    await user.click(screen.getByRole('button', { name: /Airflow/ }));
    expect(shownNames()).toEqual(['Flanged', 'Booth', 'Canopy', 'Slot']);
    expect(header('Airflow').getAttribute('aria-sort')).toBe('ascending');
    await user.click(screen.getByRole('button', { name: /Airflow/ }));
    expect(shownNames()).toEqual(['Canopy', 'Booth', 'Flanged', 'Slot']);
    expect(header('Airflow').getAttribute('aria-sort')).toBe('descending');
  });

  it('moves the mark to the newly chosen column, starting ascending', async () => {
    const user = userEvent.setup();
    table();
    await user.click(screen.getByRole('button', { name: /Airflow/ }));
    await user.click(screen.getByRole('button', { name: /Hood/ }));
    expect(shownNames()).toEqual(['Booth', 'Canopy', 'Flanged', 'Slot']);
    expect(header('Hood').getAttribute('aria-sort')).toBe('ascending');
    expect(header('Airflow').getAttribute('aria-sort')).toBeNull();
  });

  it('sorts from the keyboard with Enter and Space on a focused header', async () => {
    const user = userEvent.setup();
    table();
    await user.tab();
    expect(document.activeElement).toBe(screen.getByRole('button', { name: /Hood/ }));
    await user.keyboard('{Enter}');
    expect(shownNames()).toEqual(['Booth', 'Canopy', 'Flanged', 'Slot']);
    await user.keyboard(' ');
    expect(shownNames()).toEqual(['Slot', 'Flanged', 'Canopy', 'Booth']);
    expect(header('Hood').getAttribute('aria-sort')).toBe('descending');
  });

  it('offers no sort control on a column without a sort value', () => {
    table();
    expect(within(header('Note')).queryByRole('button')).toBeNull();
  });

  it('sorts a figure column by its number, not by the text shown (9 before 10)', async () => {
    const user = userEvent.setup();
    const points = [
      { id: 1, n: 10 },
      { id: 2, n: 9 },
      { id: 3, n: 100 },
    ];
    const figure = figureColumn<(typeof points)[number]>({ key: 'n', header: 'Count', value: (r) => r.n, show: (v) => `${v} pcs` });
    render(<DataTable rows={points} columns={[figure]} caption="Counts" />);
    await user.click(screen.getByRole('button', { name: /Count/ }));
    expect(shownNames()).toEqual(['9 pcs', '10 pcs', '100 pcs']);
    expect(header('Count').closest('th')?.className).toContain('text-right');
  });
});
