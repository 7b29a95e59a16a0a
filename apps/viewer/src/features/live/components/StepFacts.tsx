import type { LiveStep } from '@vatside/contracts/live-program';
import { StepCaution } from '@vatside/ui/StepCaution';
import { formatTemperature } from '../utils/format.ts';

/** Temperature with what the bath looks like there, and the step's caution in plain words. */
export function StepFacts({ step }: { step: LiveStep }) {
  return (
    <>
      {step.temperatureC !== null ? (
        <div className="rounded-xl border-2 border-madder-700 bg-madder-100 px-4 py-3">
          <p className="text-2xl font-bold text-madder-800">
            {formatTemperature(step.temperatureC)}
          </p>
          {step.visualCue ? (
            <p className="text-lg">
              <span className="font-bold">No thermometer? </span>
              {step.visualCue}
            </p>
          ) : null}
        </div>
      ) : null}
      {step.caution !== 'none' ? (
        <div className="space-y-1">
          <StepCaution kind={step.caution} className="text-lg" />
          <p className="text-base">Follow the safety data sheet from your dye maker.</p>
        </div>
      ) : null}
    </>
  );
}
