import { StrictMode, useState } from 'react';
import { createRoot } from 'react-dom/client';
import '@fontsource/manrope/400.css';
import '@fontsource/manrope/600.css';
import '../../../styles.css';
import { ScenarioEditor } from '@/features/scenario-editor/components/scenario-editor';
import { SAMPLE_AGENTS, SAMPLE_PROFILES, sampleScenario } from './sample-data';

// Dev-only: holds the state a route module would hold, so the editor can be seen and driven by the browser test.
function Preview() {
  const [value, setValue] = useState(sampleScenario);
  const [agentId, setAgentId] = useState<number | null>(null);
  const [sizeProfileId, setSizeProfileId] = useState<number | null>(null);
  const readOnly = new URLSearchParams(window.location.search).has('readonly');
  return (
    <main className="mx-auto w-full max-w-[1600px] px-4 py-8 sm:px-6">
      <h1 className="mb-6">Scenario editor preview</h1>
      <ScenarioEditor
        value={value}
        onChange={setValue}
        agents={SAMPLE_AGENTS}
        agentId={agentId}
        onAgentChange={setAgentId}
        sizeProfiles={SAMPLE_PROFILES}
        sizeProfileId={sizeProfileId}
        onSizeProfileChange={setSizeProfileId}
        readOnly={readOnly}
        serverErrors={readOnly ? {} : undefined}
      />
      <details className="mt-8 text-sm">
        <summary className="cursor-pointer text-muted">Scenario as stored</summary>
        <pre data-testid="scenario-json" className="mt-2 overflow-x-auto rounded-md bg-white p-3 text-xs text-muted">
          {JSON.stringify(value, null, 2)}
        </pre>
      </details>
    </main>
  );
}

createRoot(document.getElementById('root')!).render(
  <StrictMode>
    <Preview />
  </StrictMode>,
);
