import { describe, expect, it } from 'vitest';
import { sharingWindow, type SharingFacts } from './sharing-window.ts';

const now = new Date('2026-12-20T12:00:00Z');
const before = new Date('2026-12-19T12:00:00Z');
const after = new Date('2026-12-21T12:00:00Z');
const facts = (f: Partial<SharingFacts>): SharingFacts => ({
  status: 'live',
  shareOpensAt: null,
  shareClosesAt: null,
  ...f,
});

describe('sharing window', () => {
  it('is open in the sharing status with no dates', () => {
    expect(sharingWindow(facts({ status: 'sharing' }), now)).toEqual({ open: true });
  });

  it('is open between the dates whatever the status after announcing', () => {
    for (const status of ['announced', 'live', 'recap'] as const) {
      expect(
        sharingWindow(facts({ status, shareOpensAt: before, shareClosesAt: after }), now).open,
      ).toBe(true);
    }
  });

  it('is closed before it opens and from the close on, and says when', () => {
    const early = sharingWindow(facts({ status: 'sharing', shareOpensAt: after }), now);
    expect(early).toEqual({ open: false, reason: 'Sharing opens on 2026-12-21 12:00 UTC.' });
    const late = sharingWindow(facts({ status: 'sharing', shareClosesAt: now }), now);
    expect(late).toEqual({ open: false, reason: 'Sharing closed on 2026-12-20 12:00 UTC.' });
  });

  it('is closed for drafts, archives, and a live session with no opening date', () => {
    expect(sharingWindow(facts({ status: 'draft', shareOpensAt: before }), now).open).toBe(false);
    expect(sharingWindow(facts({ status: 'archived' }), now).open).toBe(false);
    expect(sharingWindow(facts({ status: 'live' }), now)).toMatchObject({
      open: false,
      reason: expect.stringMatching(/not open yet/),
    });
  });
});
