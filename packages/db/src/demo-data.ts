/** The invented demo studio. Every name here is made up. */
export const demoStudios = [
  {
    slug: 'wrackline-dyehouse',
    name: 'Wrackline Dyehouse',
    tagline: 'Small-batch yarn dyed on a windy coast. Tide-pool colors every month.',
    accentHex: '#1f6f78',
  },
  {
    slug: 'emberkettle-yarns',
    name: 'Emberkettle Yarns',
    tagline: 'Speckles, gradients and the odd leftover skein.',
    accentHex: '#b5532b',
  },
] as const;
