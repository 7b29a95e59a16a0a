/** The invented demo studios and people. Every name here is made up. */
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

/** Every demo person signs in with this password (printed by `npm start`). */
export const demoPassword = 'tidepool-demo-2026';

type DemoRole = 'host' | 'moderator' | 'viewer';
export interface DemoPerson {
  name: string;
  email: string;
  timeZone: string;
  unitSystem: 'us' | 'metric';
  defaultSkeinWeightG: number;
  roles: Partial<Record<(typeof demoStudios)[number]['slug'], DemoRole>>;
}

const viewer = (
  name: string,
  email: string,
  timeZone: string,
  unitSystem: 'us' | 'metric',
  grams: number,
): DemoPerson => ({
  name,
  email,
  timeZone,
  unitSystem,
  defaultSkeinWeightG: grams,
  roles: { 'wrackline-dyehouse': 'viewer' },
});

export const demoPeople: DemoPerson[] = [
  {
    name: 'Isla Marrowby',
    email: 'host@wrackline.example',
    timeZone: 'America/Halifax',
    unitSystem: 'us',
    defaultSkeinWeightG: 100,
    roles: { 'wrackline-dyehouse': 'host' },
  },
  {
    name: 'Tobin Ashgrove',
    email: 'moderator@wrackline.example',
    timeZone: 'America/Chicago',
    unitSystem: 'us',
    defaultSkeinWeightG: 100,
    roles: { 'wrackline-dyehouse': 'moderator' },
  },
  {
    name: 'Perpetua Lind',
    email: 'moderator2@wrackline.example',
    timeZone: 'Europe/Berlin',
    unitSystem: 'metric',
    defaultSkeinWeightG: 100,
    roles: { 'wrackline-dyehouse': 'moderator', 'emberkettle-yarns': 'viewer' },
  },
  {
    name: 'Oren Kettleby',
    email: 'host@emberkettle.example',
    timeZone: 'America/Denver',
    unitSystem: 'us',
    defaultSkeinWeightG: 115,
    roles: { 'emberkettle-yarns': 'host', 'wrackline-dyehouse': 'viewer' },
  },
  viewer('Ada Fenwick', 'ada@viewers.example', 'America/New_York', 'us', 100),
  viewer('Bram Quillon', 'bram@viewers.example', 'Europe/London', 'metric', 50),
  viewer('Cerys Oakhart', 'cerys@viewers.example', 'Europe/Dublin', 'metric', 100),
  viewer('Dov Pellam', 'dov@viewers.example', 'America/Los_Angeles', 'us', 115),
  viewer('Esme Rowntree', 'esme@viewers.example', 'Australia/Sydney', 'metric', 100),
  viewer('Fitz Harrowgate', 'fitz@viewers.example', 'America/Toronto', 'us', 50),
  viewer('Greta Vollmer', 'greta@viewers.example', 'Europe/Vienna', 'metric', 100),
  viewer('Hamish Dunlow', 'hamish@viewers.example', 'Pacific/Auckland', 'metric', 100),
  viewer('Ines Caraway', 'ines@viewers.example', 'Europe/Madrid', 'metric', 50),
  viewer('Jory Penhale', 'jory@viewers.example', 'America/Phoenix', 'us', 100),
  viewer('Kit Maresby', 'kit@viewers.example', 'America/Anchorage', 'us', 100),
  viewer('Lowen Tresize', 'lowen@viewers.example', 'Asia/Tokyo', 'metric', 100),
];
