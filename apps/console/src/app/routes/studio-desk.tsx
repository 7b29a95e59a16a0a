import { ServiceCheck } from '../../features/health/components/ServiceCheck.tsx';
import { StudioList } from '../../features/studios/components/StudioList.tsx';

/** Studio desk: the console's first screen. */
export function Component() {
  return (
    <div className="space-y-8">
      <div>
        <h1 className="font-display text-4xl font-semibold">Studio desk</h1>
        <p className="mt-1 text-lg text-vat-800">
          Your studios, and whether the services behind them are answering.
        </p>
      </div>
      <div className="grid items-start gap-8 lg:grid-cols-[1fr_22rem]">
        <section aria-labelledby="studios-title" className="space-y-4">
          <h2 id="studios-title" className="font-display text-2xl font-semibold">
            Studios
          </h2>
          <StudioList />
        </section>
        <ServiceCheck />
      </div>
    </div>
  );
}
