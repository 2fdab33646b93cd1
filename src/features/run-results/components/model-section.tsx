import type { RunResult } from '../../../../shared/schemas/run-result';
import { modelSentences } from '../lib/model-sentences';
import { Section } from './section';

export function ModelSection({ view }: { view: RunResult }) {
  return (
    <Section
      title="What the simulation assumed"
      intro="Beyond the inputs above; the README's model section gives the methods and their sources."
    >
      <ul className="max-w-3xl list-disc space-y-1 pl-5 text-sm">
        {modelSentences(view.model).map((s) => (
          <li key={s}>{s}</li>
        ))}
      </ul>
    </Section>
  );
}
