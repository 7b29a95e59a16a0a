import type { PublicDyeAlong } from '@vatside/contracts/dye-alongs';
import { sharingWindow } from '@vatside/contracts/sharing-window';

// The server's sharing rule, said on the reader's own clock.

export type ShareWindowView = { open: boolean; words: string };

/** `timeZone` is the reader's; without it, the device's. */
export function shareWindowOf(
  dyeAlong: PublicDyeAlong,
  { timeZone, now = new Date() }: { timeZone?: string; now?: Date } = {},
): ShareWindowView {
  const when = (iso: string) =>
    new Intl.DateTimeFormat('en-US', { dateStyle: 'full', timeStyle: 'short', timeZone }).format(
      new Date(iso),
    );
  const window = sharingWindow(
    {
      status: dyeAlong.status,
      shareOpensAt: dyeAlong.shareOpensAt ? new Date(dyeAlong.shareOpensAt) : null,
      shareClosesAt: dyeAlong.shareClosesAt ? new Date(dyeAlong.shareClosesAt) : null,
    },
    now,
  );
  if (window.open) {
    return {
      open: true,
      words: dyeAlong.shareClosesAt
        ? `Sharing is open until ${when(dyeAlong.shareClosesAt)}.`
        : 'Sharing is open.',
    };
  }
  if (dyeAlong.shareClosesAt && now >= new Date(dyeAlong.shareClosesAt)) {
    return { open: false, words: `Sharing closed on ${when(dyeAlong.shareClosesAt)}.` };
  }
  if (dyeAlong.shareOpensAt && now < new Date(dyeAlong.shareOpensAt)) {
    return { open: false, words: `Sharing your skein opens on ${when(dyeAlong.shareOpensAt)}.` };
  }
  return { open: false, words: window.reason };
}
