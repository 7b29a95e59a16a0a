export const cautionNames = {
  none: 'No caution',
  hotBath: 'Hot bath',
  acid: 'Acid',
  powder: 'Dye powder',
} as const;

/** Common-practice cues for a bath's heat, for people without a thermometer. */
export const temperatureCues = [
  'Warm to the touch, like a bath',
  'Too hot to keep a finger in; wisps of steam',
  'Steady steam, tiny bubbles on the pot floor, no rolling boil',
  'Barely simmering: a few bubbles break the surface',
] as const;
