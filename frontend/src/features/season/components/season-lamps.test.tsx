import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { HouseSeasonEstimate } from '../../../api/types';
import { UnitSystemProvider } from '../../../lib/units';
import { SeasonLampsSummary } from './season-lamps';

/** The parts of a season answer the lamps summary reads (the rest of the answer is not needed here). */
function seasonWith(lamps: HouseSeasonEstimate['lamps']): HouseSeasonEstimate {
  return {
    lamps,
    inputsUsed: { currency: 'USD' },
    fuel: {
      fuelId: 'propane',
      label: 'Propane',
      unitSi: 'L',
      unitUs: 'US gal',
      pricePerUnit: 2.2,
      priceUnit: 'us',
      priceUnitLabel: 'US gal',
      heaterEfficiency: 0.8,
    },
  } as unknown as HouseSeasonEstimate;
}

const LAMPS: NonNullable<HouseSeasonEstimate['lamps']> = {
  lampTypeId: 'led-horticultural',
  lampTypeLabel: 'LED horticultural fixture',
  powerDensityWPerM2: 50,
  hoursPerDayByMonth: Array(12).fill(6),
  heatToHouseFraction: 1,
  electricW: 13_500,
  heatW: 13_500,
  electricityKWh: 2511,
  heatToHouseKWh: 2511,
  heatSavedKWh: 2000,
  fuelSaved: { energyKWh: 2000, fuelInputKWh: 2500, fuelQuantitySi: 356.4, fuelQuantityUs: 94.15, cost: 207.13 },
  usefulShareOfHeat: 2000 / 2511,
};

describe('SeasonLampsSummary', () => {
  it('shows the electricity the lamps add and the heat and fuel their heat saves, in SI', () => {
    render(
      <UnitSystemProvider system="si">
        <SeasonLampsSummary season={seasonWith(LAMPS)} />
      </UnitSystemProvider>,
    );
    expect(screen.getByRole('heading', { name: /supplemental lamps: LED horticultural fixture/i })).toBeTruthy();
    expect(screen.getByTestId('season-lamps-electricity').textContent).toMatch(/2,511\s*kWh/);
    expect(screen.getByTestId('season-lamps-heat-saved').textContent).toMatch(/2,000\s*kWh/);
    expect(screen.getByTestId('season-lamps-fuel-saved').textContent).toMatch(/356/);
    // 2000 ÷ 2511 = 79.6 %, shown whole
    expect(screen.getByText(/80\s*% of it replaces heater heat/)).toBeTruthy();
    expect(screen.getByText(/sized without the lamps/)).toBeTruthy();
  });

  it('reads MMBtu for a US user: 2,511 kWh × 3.6 MJ/kWh ÷ 1,055.056 MJ/MMBtu = 8.57 MMBtu', () => {
    render(
      <UnitSystemProvider system="us">
        <SeasonLampsSummary season={seasonWith(LAMPS)} />
      </UnitSystemProvider>,
    );
    expect(screen.getByTestId('season-lamps-electricity').textContent).toMatch(/8\.57\s*MMBtu/);
    // 50 W/m² × 0.09290304 m²/ft² = 4.65 W/ft²
    expect(screen.getByText(/4\.65\s*W\/ft²/)).toBeTruthy();
  });

  it('shows nothing for a house without lamps', () => {
    const { container } = render(
      <UnitSystemProvider system="si">
        <SeasonLampsSummary season={seasonWith(null)} />
      </UnitSystemProvider>,
    );
    expect(container.textContent).toBe('');
  });
});
