import { stateInWords, type DeviationDetail } from '@tracewright/shared';

import { StepKindLabel } from '../../../components/step-glyphs/step-kind-label';
import { TextLink } from '../../../components/ui/text-link';
import { DetailSection } from './detail-section';

/** Where it happened: the run and its recipe version, the step, the pieces and the lots used. */
export function DeviationContext({ deviation }: { deviation: DeviationDetail }) {
  const { run, step, pieces, lots } = deviation;
  return (
    <DetailSection title="Run, step and material">
      <dl className="grid grid-cols-[auto_1fr] gap-x-6 gap-y-2">
        <dt className="font-bold">Run</dt>
        <dd>
          <TextLink to={`/runs/${run.id}`}>{run.code}</TextLink> ({stateInWords(run.state)})
        </dd>
        <dt className="font-bold">Recipe</dt>
        <dd>
          {run.recipeCode}, version {run.versionNumber}
        </dd>
        <dt className="font-bold">Step</dt>
        <dd>
          {step ? (
            <span className="flex flex-wrap items-center gap-2">
              <span className="tabular">{step.number}.</span> {step.title} <StepKindLabel kind={step.kind} size="sm" />
            </span>
          ) : (
            'The whole run'
          )}
        </dd>
        <dt className="font-bold">Pieces</dt>
        <dd>{pieces.length > 0 ? pieces.map((p) => p.code).join(', ') : 'No single pieces named'}</dd>
      </dl>
      {lots.length > 0 ? (
        <table className="w-full border-collapse text-left text-sm">
          <caption className="mb-1 text-left font-bold">Lots used</caption>
          <thead>
            <tr>
              <th scope="col" className="border-b border-graphite-500 px-2 py-1">Material</th>
              <th scope="col" className="border-b border-graphite-500 px-2 py-1">Lot number</th>
            </tr>
          </thead>
          <tbody>
            {lots.map((lot) => (
              <tr key={lot.lotId}>
                <td className="border-b border-graphite-200 px-2 py-1">{lot.materialName}</td>
                <td className="border-b border-graphite-200 px-2 py-1 tabular">
                  <TextLink to={`/materials/lots/${lot.lotId}`}>{lot.lotNumber}</TextLink>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : null}
    </DetailSection>
  );
}
