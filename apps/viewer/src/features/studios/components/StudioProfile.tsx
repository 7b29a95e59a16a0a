import type { StudioDetail } from '@vatside/contracts/studios';

const count = new Intl.NumberFormat('en-US');

/** The public face of a studio: who runs it and how many dye along. */
export function StudioProfile({ studio }: { studio: StudioDetail }) {
  return (
    <div className="space-y-3">
      <div
        aria-hidden="true"
        className="h-3 rounded-full"
        style={{ backgroundColor: studio.accentHex }}
      />
      <h1 className="font-display text-4xl leading-tight font-semibold">{studio.name}</h1>
      {studio.tagline ? <p className="text-xl">{studio.tagline}</p> : null}
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-lg">
        <dt className="font-bold">{studio.hostNames.length === 1 ? 'Host' : 'Hosts'}</dt>
        <dd>{studio.hostNames.join(', ') || '—'}</dd>
        <dt className="font-bold">Followers</dt>
        <dd>{count.format(studio.followerCount)}</dd>
      </dl>
    </div>
  );
}
