import { chainSpec, shackleSpec, weakestLink } from '@app/calc';
import { render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { UnitSystemProvider } from '@/components/units/unit-system-provider';
import { UnitToggle } from '@/components/units/unit-toggle';
import { quantityInputText } from '@/lib/units/format-quantity';
import { DEFAULT_CONDITIONS, sharedLoadN } from '../utils/conditions';
import { ConditionsProvider } from './conditions-provider';
import { AnchorCalculator } from './anchor-calculator';
import { ConditionsBlock } from './conditions-block';
import { ScopeCalculator } from './scope-calculator';
import { WeakestLinkBuilder } from './weakest-link-builder';

const inMetric = (ui: React.ReactNode) =>
  render(
    <UnitSystemProvider memberSystem="metric">
      <UnitToggle />
      {ui}
    </UnitSystemProvider>,
  );

/** The design load of the default boat and wind: what every load field starts from. */
const LOAD = sharedLoadN(DEFAULT_CONDITIONS) ?? Number.NaN;

const chainPath = () =>
  screen.getByTestId('catenary-drawing').querySelector('[data-part="chain"]')?.getAttribute('d');

describe('ScopeCalculator', () => {
  it('redraws the chain as the load is typed', async () => {
    const user = userEvent.setup();
    inMetric(<ScopeCalculator />);
    const before = chainPath();
    expect(before).toMatch(/^M/);
    const load = screen.getByLabelText('Horizontal load');
    await user.clear(load);
    await user.type(load, '9 kN');
    expect(chainPath()).not.toBe(before);
    expect(screen.getByRole('img', { name: /drawn to scale/i })).toBeInTheDocument();
  });

  it("shows the calc library's message next to a bad field instead of crashing", async () => {
    const user = userEvent.setup();
    inMetric(<ScopeCalculator />);
    const depth = screen.getByLabelText('Depth at the anchor');
    await user.clear(depth);
    await user.type(depth, '-3 m');
    expect(depth).toHaveAccessibleDescription(/depthM must be at least 0/);
    expect(screen.queryByTestId('catenary-drawing')).not.toBeInTheDocument();
  });

  it('shows an unreadable entry as such', async () => {
    const user = userEvent.setup();
    inMetric(<ScopeCalculator />);
    const depth = screen.getByLabelText('Depth at the anchor');
    await user.clear(depth);
    await user.type(depth, 'deep');
    expect(depth).toHaveAttribute('aria-invalid', 'true');
    expect(depth).toHaveAccessibleDescription(/enter a number/i);
  });
});

describe('WeakestLinkBuilder', () => {
  it('shows each margin and highlights the part that breaks first', async () => {
    const user = userEvent.setup();
    inMetric(<WeakestLinkBuilder />);
    // Defaults: 3/8 in G43 chain and a 7/16 in shackle at the default boat's design load.
    expect(LOAD).toBeGreaterThan(1000);
    const table = screen.getByRole('table', { name: /weakest-link check/i });
    const chain = chainSpec({ grade: 'G43', tradeSizeIn: 3 / 8 });
    const shackle = shackleSpec({ nominalIn: 7 / 16 });
    const expected = weakestLink({
      loadN: LOAD,
      components: [
        { label: 'chain', ...chain },
        { label: 'shackle', ...shackle },
      ],
    });
    const rows = within(table).getAllByRole('row').slice(1);
    expect(rows).toHaveLength(2);
    const weakestRow = rows[expected.weakest.index];
    expect(weakestRow).toHaveAttribute('aria-current', 'true');
    expect(within(weakestRow as HTMLElement).getByText('Weakest link')).toBeInTheDocument();
    expect(rows[0]).toHaveTextContent(`${(chain.wllN / LOAD).toFixed(2)} ×`);
    expect(rows[1]).toHaveTextContent(`${(shackle.minBreakN / LOAD).toFixed(2)} ×`);

    // A smaller shackle becomes the weakest part.
    await user.selectOptions(screen.getByLabelText('Part 2 shackle size'), String(3 / 16));
    const after = within(screen.getByRole('table')).getAllByRole('row').slice(1);
    expect(after[1]).toHaveAttribute('aria-current', 'true');
    expect(after[1]).toHaveTextContent('3/16 in shackle');
  });

  it('adds a part and shows the load in the other system on the toggle', async () => {
    const user = userEvent.setup();
    inMetric(<WeakestLinkBuilder />);
    await user.selectOptions(screen.getByLabelText('Part to add'), 'shackle');
    await user.click(screen.getByRole('button', { name: 'Add part' }));
    expect(within(screen.getByRole('table')).getAllByRole('row')).toHaveLength(4);
    const load = screen.getByLabelText('Load through the rode');
    const shown = quantityInputText(LOAD, 'force', 'metric');
    expect(load).toHaveValue(shown);
    await user.click(screen.getByRole('radio', { name: 'Imperial' }));
    expect(load).toHaveValue(quantityInputText(LOAD, 'force', 'imperial'));
    await user.clear(load);
    await user.type(load, '720');
    // A bare number is read in the chosen (imperial) units: lbf.
    expect(screen.getByText(/Reads as 720 lbf/)).toBeInTheDocument();
  });
});

describe('one boat and conditions block feeding every calculator', () => {
  const page = () =>
    inMetric(
      <ConditionsProvider>
        <ConditionsBlock />
        <AnchorCalculator />
        <WeakestLinkBuilder />
        <ScopeCalculator />
      </ConditionsProvider>,
    );
  const anchorLoa = () =>
    within(screen.getByRole('region', { name: 'Anchor suggestion' })).getByLabelText(
      'Length overall (LOA)',
    );

  it('carries the boat and its design load into every calculator as it is typed', async () => {
    const user = userEvent.setup();
    page();
    const loa = within(
      screen.getByRole('region', { name: 'Your boat and conditions' }),
    ).getByLabelText('Length overall (LOA)');
    await user.clear(loa);
    await user.type(loa, '14 m');
    expect(anchorLoa()).toHaveValue('14 m');
    const expected = sharedLoadN({ ...DEFAULT_CONDITIONS, loaM: 14 }) ?? Number.NaN;
    expect(expected).toBeGreaterThan(LOAD);
    const shown = quantityInputText(expected, 'force', 'metric');
    // The weakest-link card and the scope card hold the load the block shows, not a default of their own.
    expect(screen.getByLabelText('Load through the rode')).toHaveValue(shown);
    expect(screen.getByLabelText('Horizontal load')).toHaveValue(shown);
    expect(
      screen.getAllByText(/Using the (boat and conditions|design load) at the top/),
    ).toHaveLength(3);
  });

  it('lets one calculator keep its own figure, and go back to the block on request', async () => {
    const user = userEvent.setup();
    page();
    const load = screen.getByLabelText('Load through the rode');
    await user.clear(load);
    await user.type(load, '9 kN');
    const weakest = screen.getAllByRole('region', { name: 'Weakest-link check' })[0] as HTMLElement;
    expect(within(weakest).getByText(/Your own values here/)).toBeInTheDocument();
    const block = screen.getByRole('region', { name: 'Your boat and conditions' });
    const wind = within(block).getByLabelText('Design wind');
    await user.clear(wind);
    await user.type(wind, '60 kn');
    expect(load).toHaveValue('9 kN');
    const at60 = quantityInputText(
      sharedLoadN({ ...DEFAULT_CONDITIONS, windKn: 60 }) ?? Number.NaN,
      'force',
      'metric',
    );
    expect(screen.getByLabelText('Horizontal load')).toHaveValue(at60);
    await user.click(
      within(weakest).getByRole('button', { name: 'Use the values at the top again' }),
    );
    expect(load).toHaveValue(at60);
  });
});
