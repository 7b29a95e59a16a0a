import { ServiceCheck } from '../../features/health/components/ServiceCheck.tsx';
import { MyStudios } from '../../features/studios/components/MyStudios.tsx';
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
        <div className="space-y-8">
          <section aria-labelledby="my-studios-title" className="space-y-4">
            <h2 id="my-studios-title" className="font-display text-2xl font-semibold">
              Your studios
            </h2>
            <MyStudios />
          </section>
          <section aria-labelledby="studios-title" className="space-y-4">
            <h2 id="studios-title" className="font-display text-2xl font-semibold">
              All studios on Vatside
            </h2>
            <StudioList />
          </section>
        </div>
        <ServiceCheck />
      </div>
    </div>
  );
}
