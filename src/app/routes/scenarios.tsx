import { Link } from 'react-router-dom';
import { Cautions } from '../../components/cautions';
import { Page } from '../../components/ui/page';
import { EmptyState } from '../../components/ui/status';
import { paths } from '../../config/paths';

export function ScenariosRoute() {
  return (
    <Page title="Scenarios" intro="A scenario is one workstation with its controls and dust. Runs estimate what reaches the worker's breathing zone.">
      <EmptyState title="No scenarios yet">
        <p>The scenario workspace is being built. Meanwhile, the calculators give settling, diffusion and hood figures.</p>
        <p className="mt-3 flex justify-center gap-4">
          <Link className="font-semibold text-accent underline" to={paths.particleCalculator}>
            Particle calculator
          </Link>
          <Link className="font-semibold text-accent underline" to={paths.hoodCalculator}>
            Hood calculator
          </Link>
        </p>
      </EmptyState>
      <Cautions />
    </Page>
  );
}
