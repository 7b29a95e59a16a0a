import type { GalleryColorway, GallerySkein, RecapItem } from '@vatside/contracts/gallery';

/** One entry of the running order as the screens show it, before or after saving. */
export type Slide =
  | { key: string; kind: 'skein'; note: string; skein: GallerySkein }
  | { key: string; kind: 'colorway'; note: string; colorway: GalleryColorway };

export const slideOf = (item: RecapItem): Slide =>
  item.kind === 'skein'
    ? { key: item.skein.id, kind: 'skein', note: item.note, skein: item.skein }
    : { key: item.colorway.id, kind: 'colorway', note: item.note, colorway: item.colorway };

export const skeinSlide = (skein: GallerySkein): Slide => ({
  key: skein.id,
  kind: 'skein',
  note: '',
  skein,
});

export const colorwaySlide = (colorway: GalleryColorway): Slide => ({
  key: colorway.id,
  kind: 'colorway',
  note: '',
  colorway,
});

/** "Pool Teal by Vale Viewer" or "Pool Teal (the studio’s own)". */
export const slideTitle = (slide: Slide) =>
  slide.kind === 'skein'
    ? `${slide.skein.colorway?.name ?? 'Own colors'} by ${slide.skein.makerName}`
    : `${slide.colorway.name} (the studio’s own)`;

/** The large photo for a slide, if it has one. */
export const slidePhoto = (slide: Slide) => {
  if (slide.kind === 'skein') {
    const photo = slide.skein.photos[0];
    return photo ? { url: photo.webUrl, width: photo.width, height: photo.height } : null;
  }
  const photo = slide.colorway.photo;
  return photo ? { url: photo.webUrl, width: photo.width, height: photo.height } : null;
};

export const updateOf = (slides: Slide[]) => ({
  items: slides.map((s) =>
    s.kind === 'skein'
      ? { submissionId: s.skein.id, note: s.note }
      : { colorwayId: s.colorway.id, note: s.note },
  ),
});
