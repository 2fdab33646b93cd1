import { useState } from 'react';
import type { Fraction } from '../../../../shared/vocabulary/fractions';
import type { RunResult } from '../../../../shared/schemas/run-result';
import { ConcentrationChart } from './concentration-chart';
import { FractionPicker } from '@/components/fraction-picker';
import { FRACTIONS } from '../../../../shared/vocabulary/fractions';
import { Section } from './section';

export function ConcentrationSection({ view }: { view: RunResult }) {
  // The limit's own fraction first, as the headline; respirable where there is no limit.
  const [fraction, setFraction] = useState<Fraction>(view.limit?.fraction ?? 'respirable');
  return (
    <Section
      title="Breathing-zone concentration over time"
      intro="Mean over the batches with its 95 % confidence band, in the breathing zone around the worker's head, during the simulated task."
    >
      <div className="mb-3">
        <FractionPicker
          fractions={FRACTIONS}
          legend="Size fraction shown"
          value={fraction}
          onChange={setFraction}
          limitFraction={view.limit?.fraction}
        />
      </div>
      <ConcentrationChart view={view} fraction={fraction} />
    </Section>
  );
}
