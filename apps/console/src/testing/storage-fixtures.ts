import type { StudioStorage } from '@vatside/contracts/storage';

// Kelpwhistle's store: sizes in binary megabytes so the panel's figures can be checked by hand.

const MB = 1024 * 1024;

export const kelpwhistleStorage: StudioStorage = {
  workbenchImages: { bytes: 3 * MB, images: 4 },
  skeinPhotos: { bytes: 1.5 * MB, skeins: 3, photos: 5 },
  totalBytes: 4.5 * MB,
  limits: { sharesPerHour: 12, storageQuotaBytes: 100 * MB },
  topSharers: [
    { userId: 'u-ada', name: 'Ada Quill', bytes: 1 * MB, skeins: 2, photos: 4 },
    { userId: 'u-ito', name: 'Ito Brack', bytes: 0.5 * MB, skeins: 1, photos: 1 },
  ],
};
