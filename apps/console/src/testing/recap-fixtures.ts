import type { GalleryColorway, GallerySkein, Recap } from '@vatside/contracts/gallery';
import { dyeAlongApi, dyeAlongId } from './dye-along-fixtures.ts';

// A recap of three invented items: two viewers' featured skeins and the host's own colorway.

export const recapApi = `${dyeAlongApi}/recap`;
export { dyeAlongId };

const skein = (id: string, makerName: string, baseName: string, dyes: string[]): GallerySkein => ({
  id,
  makerName,
  colorway: { id: '1a2b3c4d-5e6f-4a7b-8c9d-0e1f2a3b4c5d', name: 'Pool Teal' },
  baseName,
  fiberContent: [{ fiber: 'wool', pct: 100 }],
  dyesUsed: dyes,
  notes: '',
  featured: true,
  closeness: null,
  photos: [
    {
      id: `${id.slice(0, -4)}f0f0`,
      width: 1200,
      height: 800,
      thumbWidth: 300,
      thumbHeight: 200,
      webUrl: `/api/studios/kelpwhistle-dyeworks/submissions/${id}/photos/p/web`,
      thumbUrl: `/api/studios/kelpwhistle-dyeworks/submissions/${id}/photos/p/thumb`,
    },
  ],
  sharedAt: '2026-12-02T10:00:00.000Z',
});

export const wrenSkein = skein('5b1e0000-0000-4000-8000-00000000a001', 'Wren Tallow', 'Harbor DK', [
  'Brinewell Blue',
]);
export const ottoSkein = skein('5b1e0000-0000-4000-8000-00000000a002', 'Otto Marsh', 'Dune Sock', [
  'Moss gel',
  'Lemon gel',
]);
export const spareSkein = skein(
  '5b1e0000-0000-4000-8000-00000000a003',
  'Ines Shore',
  'Reef Worsted',
  ['Kelp gel'],
);

export const poolTeal: GalleryColorway = {
  id: '1a2b3c4d-5e6f-4a7b-8c9d-0e1f2a3b4c5d',
  name: 'Pool Teal',
  technique: 'immersion',
  swatches: [{ hex: '#2d6f86', name: 'Deep pool' }],
  photo: null,
};

export const threeItemRecap: Recap = {
  dyeAlongId,
  items: [
    {
      id: 'c0de0000-0000-4000-8000-000000000001',
      position: 1,
      kind: 'skein',
      note: 'Say hi to Wren.',
      skein: wrenSkein,
    },
    {
      id: 'c0de0000-0000-4000-8000-000000000002',
      position: 2,
      kind: 'colorway',
      note: 'My own skein.',
      colorway: poolTeal,
    },
    {
      id: 'c0de0000-0000-4000-8000-000000000003',
      position: 3,
      kind: 'skein',
      note: '',
      skein: ottoSkein,
    },
  ],
  candidates: { skeins: [spareSkein], colorways: [] },
};
