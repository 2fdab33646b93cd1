import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import '@fontsource/manrope/400.css';
import '@fontsource/manrope/600.css';
import '@fontsource/manrope/700.css';
import '../../../styles.css';
import { ResultsPreview } from './results-preview';

createRoot(document.getElementById('root')!).render(
  <StrictMode>
    <ResultsPreview />
  </StrictMode>,
);
