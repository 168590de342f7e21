import { sessionCautions, type Caution } from '../../../../shared/finishing/cautions';
import type { Booth } from '../../../../shared/schemas/booth';
import type { SessionPlan } from '../hooks/use-session-plan';

/**
 * With no products known the respirator line would read as the mildest level, which is not a
 * finding but a gap; it says so instead.
 */
function cautionsFor(plan: SessionPlan, booth: Booth): Caution[] {
  const cautions = sessionCautions(plan.products, booth);
  if (plan.products.length > 0) return cautions;
  return cautions.map((caution) =>
    caution.code.startsWith('respirator-')
      ? { ...caution, message: 'Not worked out: no products are known for this session yet. Check each product’s safety data sheet before spraying.' }
      : caution,
  );
}

export function SessionCautions({ plan, booth }: { plan: SessionPlan; booth: Booth | undefined }) {
  return (
    <section aria-labelledby="session-cautions" className="mt-4 rounded-panel border-2 border-verdict-caution bg-white p-3">
      <h3 id="session-cautions" className="font-semibold text-verdict-caution">
        Safety cautions
      </h3>
      {plan.gaps.length > 0 && (
        <ul className="mt-1 list-disc pl-5 text-sm font-medium text-verdict-caution">
          {plan.gaps.map((gap) => (
            <li key={gap}>{gap}</li>
          ))}
        </ul>
      )}
      {plan.products.length > 0 && <p className="mt-1 text-sm text-maple-700">For {plan.products.map((p) => p.name).join(', ')}.</p>}
      {!booth ? (
        <p className="mt-2 text-maple-700">The booth could not be read, so its air cautions are not shown.</p>
      ) : plan.pending ? (
        <p role="status" className="mt-2 text-maple-700">
          Working out the cautions…
        </p>
      ) : (
        <ul className="mt-2 space-y-2">
          {cautionsFor(plan, booth).map((caution) => (
            <li key={caution.code}>
              <p className="font-semibold">{caution.title}</p>
              <p>{caution.message}</p>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
