// Component test: the legend shows, for each state, the area and share of the frame it is given.
import { render, screen } from '@testing-library/react-native';

import { MapLegend } from './MapLegend';
import { frameTotals } from './frameTotals';

const coverStates = [
  { code: 'SS', name: 'Shrub steppe', colour: '#E69F00' },
  { code: 'PG', name: 'Perennial grassland', colour: '#009E73' },
];

test('when a frame is shown, then each legend row carries that state’s total area and share, and the rows add up to the frame', () => {
  // Five patches, two of them clipped at the boundary (areas in m²; 10,000 m² = 1 ha).
  const states = Uint8Array.from([0, 1, 1, 0, 1]);
  const areas = Float32Array.from([10_000, 10_000, 5_000, 2_500, 10_000]);
  const totals = frameTotals(states, areas, 2);
  render(<MapLegend coverStates={coverStates} totals={totals} unit="ha" />);

  // Worked by hand: SS = 1.25 ha of 3.75 ha (33.3 %), PG = 2.5 ha (66.7 %).
  expect(screen.getByText(/^1\.25 ha · 33\.3 %$/)).toBeTruthy();
  expect(screen.getByText(/^2\.50 ha · 66\.7 %$/)).toBeTruthy();
  expect(totals[0].areaM2 + totals[1].areaM2).toBe(areas.reduce((a, b) => a + b, 0));
});
