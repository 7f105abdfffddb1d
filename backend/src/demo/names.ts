/**
 * Invented names and wording for the demo projects: people, sites, cores, laboratories. None of
 * them is a real person, place, cruise or laboratory; the laboratory prefixes were chosen not to
 * collide with codes that radiocarbon and luminescence laboratories publish under.
 */

import type { Role, TectonicSetting } from '../database/schema/enums';

export type ProjectRole = Role;
export type { TectonicSetting };

export interface DemoPerson {
  readonly name: string;
  readonly email: string;
  readonly role: ProjectRole;
}

export interface DemoProject {
  readonly name: string;
  readonly description: string;
  readonly tectonicSetting: TectonicSetting;
}

/** The demo accounts; their e-mail addresses and roles are fixed, the names invented. */
export const DEMO_PEOPLE: readonly DemoPerson[] = [
  { name: 'Oriel Haskett', email: 'admin@demo.test', role: 'ADMIN' },
  { name: 'Tamsin Oduya', email: 'researcher@demo.test', role: 'RESEARCHER' },
  { name: 'Benedek Marrin', email: 'correlator@demo.test', role: 'CORRELATOR' },
  { name: 'Sefa Lindqvar', email: 'analyst@demo.test', role: 'ANALYST' },
  { name: 'Ione Castellaw', email: 'viewer@demo.test', role: 'VIEWER' },
];

export const VELMORA_PROJECT: DemoProject = {
  name: 'Velmora Margin',
  description:
    'Invented demonstration project: the paleoseismic record of the Velmora Margin, a fictional ' +
    'subduction zone with North, Central and South segments about 600 km along strike. Coastal ' +
    'marshes, lakes, fault trenches and turbidite cores record megathrust earthquakes of the last ' +
    '6,000 years. All sites, samples and people are made up; the data were generated from a known ' +
    'history so the models can be checked against it.',
  tectonicSetting: 'SUBDUCTION_INTERFACE',
};

export const BRANNOCH_PROJECT: DemoProject = {
  name: 'Brannoch Fault',
  description:
    'Invented demonstration project: trenches across the Brannoch Fault, a fictional reverse fault ' +
    'in the hills behind the Velmora coast. Only the administrator is a member, to show that ' +
    'projects keep their data apart.',
  tectonicSetting: 'CRUSTAL',
};

export interface SiteWording {
  readonly name: string;
  readonly notes: string;
}

/** Display names and field notes per site key (see truth.ts for where each site is). */
export const SITE_WORDING: Readonly<Record<string, SiteWording>> = {
  'skarrow-marsh': {
    name: 'Skarrow Marsh',
    notes: 'High marsh behind a gravel barrier at the head of Skarrow Inlet; gouge cores along a 120 m transect, log of core SK-3.',
  },
  'ithvar-lake': {
    name: 'Ithvar Lake',
    notes: 'Small, steep-sided lake in the coastal range; event beds are shaking turbidites from the slopes. Composite of two overlapping cores from the deep basin.',
  },
  'tollhaven-trench': {
    name: 'Tollhaven Scarp trench',
    notes: 'Trench across an upper-plate reverse splay on the Tollhaven terrace; log of the south wall.',
  },
  'merrowick-marsh': {
    name: 'Merrowick Marsh',
    notes: 'Tidal marsh in the Merrowick lowland, cored in a cutbank of a tidal creek. A former channel truncates part of the sequence.',
  },
  'dunlossa-bluff': {
    name: 'Dunlossa Bluff',
    notes: 'Sea-cliff exposure of old lowland deposits under dune sand; logged on a cleaned face 40 m long.',
  },
  'caddrick-trench': {
    name: 'Caddrick Fault trench',
    notes: 'Trench across the Caddrick splay where it crosses a low marine terrace; log of the north wall.',
  },
  'pellisand-lake': {
    name: 'Pellisand Lake',
    notes: 'Coastal lake behind a low beach ridge; tsunami sands thin landward. Percussion core from the lake centre.',
  },
  'orsbeck-marsh': {
    name: 'Orsbeck Marsh',
    notes: 'Narrow marsh on the Orsbeck estuary; outcrop in the river bank and hand cores behind it.',
  },
  'hallow-channel-core': {
    name: 'Hallow Channel core VR17-04PC',
    notes: 'Piston core from the floor of Hallow Channel, cruise VR17 of the invented research vessel Corvane.',
  },
  'tolvane-canyon-core': {
    name: 'Tolvane Canyon core VR17-09PC',
    notes: 'Piston core from the mouth of Tolvane Canyon, cruise VR17.',
  },
  'merrow-fan-core': {
    name: 'Merrow Fan core VR19-02PC',
    notes: 'Long piston core from a channel on the Merrow deep-sea fan, cruise VR19; the reference turbidite sequence of the margin.',
  },
  'caddrick-channel-core': {
    name: 'Caddrick Channel core VR19-07GC',
    notes: 'Gravity core from Caddrick Channel, cruise VR19; short, with only the youngest beds.',
  },
  'pellis-canyon-core': {
    name: 'Pellis Canyon core VR19-12PC',
    notes: 'Piston core below Pellis Canyon, cruise VR19.',
  },
  'orsbeck-basin-core': {
    name: 'Orsbeck Basin core VR19-15PC',
    notes: 'Piston core from a slope basin off Orsbeck, cruise VR19. The upper part of the sequence was lost in coring (no trigger core).',
  },
  'arnsey-burn-trench': {
    name: 'Arnsey Burn trench',
    notes: 'Trench across the Brannoch scarp where Arnsey Burn leaves the hills; log of the east wall.',
  },
  'fallowmere-trench': {
    name: 'Fallowmere trench',
    notes: 'Trench across the scarp at Fallowmere farm; log of the west wall.',
  },
};

/** An invented dating laboratory and the code prefix it issues. */
export interface DemoLaboratory {
  readonly prefix: string;
  readonly name: string;
  /** Conventional ages reported rounded to this many years (1 = whole years). */
  readonly roundingYears: number;
}

/** AMS radiocarbon laboratory for land samples; reports ages and errors to the nearest 5 years. */
export const LAND_RADIOCARBON_LAB: DemoLaboratory = { prefix: 'VKR', name: 'Velmora Coast AMS Laboratory', roundingYears: 5 };
/** Radiocarbon laboratory for the marine samples; reports whole years. */
export const MARINE_RADIOCARBON_LAB: DemoLaboratory = { prefix: 'TSH', name: 'Tessaly Marine Isotope Facility', roundingYears: 1 };
/** Luminescence laboratory; ages to the nearest 5 years. */
export const LUMINESCENCE_LAB: DemoLaboratory = { prefix: 'OLX', name: 'Orrin Luminescence Group', roundingYears: 5 };

/** Titles for the correlation hypotheses. */
export const HYPOTHESIS_WORDING = {
  preferred: {
    name: 'Main along-strike correlation',
    description:
      'Ties each site event to its neighbours along strike where ages overlap and the order of ' +
      'events agrees. Two southern events (about 1.4 and 3.5 ka) and one northern (about 2.0 ka) ' +
      'are read as single-segment ruptures; the rest break the whole margin.',
  },
  alternative: {
    name: 'Southern doublet alternative',
    description:
      'Same ties in the north and centre, but in the South segment the older event of the ' +
      '1.2-1.4 ka pair is taken as the margin-wide rupture and the younger as South-only, and the ' +
      'event near 2.7 ka is split into a northern-central and a separate southern rupture.',
  },
  brannoch: {
    name: 'Trench-to-trench correlation',
    description: 'Ties the three colluvial-wedge events of the two trenches one to one.',
  },
} as const;
