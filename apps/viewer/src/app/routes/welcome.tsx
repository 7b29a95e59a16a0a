import { StudioCards } from '../../features/studios/components/StudioCards.tsx';

/** Welcome: the viewer's first screen, a list of studios to dye along with. */
export function Component() {
  return (
    <div className="space-y-6">
      <div className="space-y-2">
        <h1 className="font-display text-4xl leading-tight font-semibold">Dye along at home</h1>
        <p className="text-lg">
          Each month a studio dyes a colorway live. Prop your phone by the stove and follow the same
          pots, step by step, scaled to your skein.
        </p>
      </div>
      <section aria-labelledby="studios-title" className="space-y-3">
        <h2 id="studios-title" className="font-display text-2xl font-semibold">
          Studios to follow
        </h2>
        <StudioCards />
      </section>
    </div>
  );
}
