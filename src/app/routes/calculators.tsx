import { HoodCalculatorPage } from '../../features/calculators/components/hood-calculator-page';
import { ParticleCalculatorPage } from '../../features/calculators/components/particle-calculator-page';

// Route modules compose features; the pages carry no routing knowledge of their own.
export const ParticleCalculatorRoute = () => <ParticleCalculatorPage />;
export const HoodCalculatorRoute = () => <HoodCalculatorPage />;
