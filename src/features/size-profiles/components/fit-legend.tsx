import { formatSig } from '../../../../shared/format/index';
import { metresToMicrometres } from '../../../../shared/units';
import { LegendKey } from '@/components/charts/legend-key';

export type Fit = { mmad_m: number; gsd: number };

/** The data's own key beside the fitted curve's, which names the fit it draws. */
export function FitLegend({ fit, data, swatch }: { fit: Fit | null; data: string; swatch: string }) {
  return (
    <span className="mt-1 flex flex-wrap gap-x-5 gap-y-1" data-testid="fit-legend">
      <LegendKey swatch={swatch}>{data}</LegendKey>
      {fit ? (
        <LegendKey swatch="w-5 border-t-2 border-dashed border-ink">
          Lognormal fit: MMAD {formatSig(metresToMicrometres(fit.mmad_m), 3)} µm, GSD {formatSig(fit.gsd, 3)}
        </LegendKey>
      ) : (
        <span className="text-muted">No lognormal fit to draw</span>
      )}
    </span>
  );
}
