import type { LiveStep } from '@vatside/contracts/live-program';
import { celsiusToFahrenheit } from '@vatside/dye-kit';
import { StepCaution } from '@vatside/ui/StepCaution';
import { formatAmount } from '../../../lib/format.ts';
import type { StepAmount } from '../utils/amounts.ts';

/** What the current step measures, how hot the bath is and what to watch out for. */
export function StepFacts({ step, amount }: { step: LiveStep; amount: StepAmount | null }) {
  return (
    <div className="space-y-2">
      {amount ? (
        <p className="rounded-xl border-2 border-vat-700 bg-vat-100 px-3 py-2">
          <span className="block text-sm font-bold tracking-wide uppercase">
            Measure for your {formatAmount(amount.weightOfGoodsG)} g skein
          </span>
          <span className="block text-xl font-bold">{amount.name}</span>
          <span className="block text-lg">
            {amount.household ? `${amount.metric} · ${amount.household}` : amount.metric}
          </span>
        </p>
      ) : null}
      {step.temperatureC !== null ? (
        <p className="rounded-xl border-2 border-madder-700 bg-madder-100 px-3 py-2">
          <span className="block text-xl font-bold text-madder-800">
            {formatAmount(step.temperatureC)} °C ·{' '}
            {formatAmount(celsiusToFahrenheit(step.temperatureC))} °F
          </span>
          {step.visualCue ? <span className="block">Looks like: {step.visualCue}</span> : null}
        </p>
      ) : null}
      <StepCaution kind={step.caution} />
    </div>
  );
}
