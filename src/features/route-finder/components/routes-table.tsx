import { warningText } from '../../../../shared/contracts/warning-text';
import { Button } from '../../../components/ui/button';
import type { FoundRoute } from '../api/find-routes';

type RoutesTableProps = {
  routes: FoundRoute[];
  /** Null when the reader may not plan (QA looks, analysts plan). */
  onPlan: ((route: FoundRoute, rank: number) => void) | null;
  planningRank: number | null;
};

const percent = (value: number) => `${(value * 100).toPrecision(2)} %`;
const material = (used: FoundRoute['materialUsed']) =>
  'massG' in used ? `${used.massG.toPrecision(4)} g` : `${used.volumeMl.toPrecision(3)} mL`;

/** The ranked routes: lowest relative expanded uncertainty first, then fewer steps, less material, less solution. */
export function RoutesTable({ routes, onPlan, planningRank }: RoutesTableProps) {
  return (
    <div className="overflow-x-auto rounded-lg border border-line bg-surface">
      <table className="w-full text-left">
        <caption className="sr-only">Routes to the target, best first</caption>
        <thead className="border-b border-line bg-paper text-sm text-muted">
          <tr>
            <th scope="col" className="px-3 py-2">
              Rank
            </th>
            <th scope="col" className="px-3 py-2 text-right">
              Relative U
            </th>
            <th scope="col" className="px-3 py-2 text-right">
              Dilutions
            </th>
            <th scope="col" className="px-3 py-2 text-right">
              Material used
            </th>
            <th scope="col" className="px-3 py-2 text-right">
              Solution made
            </th>
            <th scope="col" className="px-3 py-2">
              Route
            </th>
            <th scope="col" className="px-3 py-2">
              <span className="sr-only">Plan</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {routes.map((route, index) => (
            <tr key={route.description} className="border-b border-line align-top last:border-b-0">
              <td className="px-3 py-2 font-bold">{index + 1}</td>
              <td className="numeric px-3 py-2 text-right font-semibold">
                {percent(route.relativeExpandedUncertainty)}
              </td>
              <td className="numeric px-3 py-2 text-right">{route.dilutionSteps}</td>
              <td className="numeric px-3 py-2 text-right">{material(route.materialUsed)}</td>
              <td className="numeric px-3 py-2 text-right">{route.solutionVolumeMl} mL</td>
              <td className="px-3 py-2">
                <span className="block">{route.description}</span>
                <span className="block text-sm text-muted">
                  Gives {route.value.toPrecision(5)} {route.unit}
                </span>
                {route.warnings.map(warningText).map((text) => (
                  <span key={text} className="mt-1 block text-sm font-semibold text-caution">
                    ▲ {text}
                  </span>
                ))}
              </td>
              <td className="px-3 py-2">
                {onPlan ? (
                  <Button
                    size="small"
                    className="whitespace-nowrap"
                    pending={planningRank === index + 1}
                    pendingLabel="Creating…"
                    disabled={planningRank !== null}
                    onClick={() => onPlan(route, index + 1)}
                    aria-label={`Plan route ${index + 1}`}
                  >
                    Plan this route
                  </Button>
                ) : null}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
