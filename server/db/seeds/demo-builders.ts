import type { BuildKind } from '../../../shared/listings/vocabulary';
import { TOWN } from './data/kit';

/** An invented builder's approved profile: what lets them list build services. */
export interface DemoBuilderProfile {
  email: string;
  businessName: string;
  about: string;
  townId: number;
  builds: BuildKind[];
}

export const DEMO_BUILDER_PROFILES: readonly DemoBuilderProfile[] = [
  {
    email: 'nell@ashgrove-benchworks.test',
    businessName: 'Ashgrove Benchworks',
    about: 'Benchwork built to order in a small workshop: portable modules, fixed frames and fiddle yards.',
    townId: TOWN.matlock,
    builds: ['portable-modules', 'fixed-benchwork', 'fiddle-yards', 'wiring'],
  },
  {
    email: 'orders@kestrel-lane-joinery.test',
    businessName: 'Kestrel Lane Joinery',
    about: 'A joinery workshop that builds exhibition modules, folding legs and storage frames for clubs.',
    townId: TOWN.kilkenny,
    builds: ['portable-modules', 'legs-and-trestles', 'fiddle-yards', 'two-level-benchwork'],
  },
  {
    email: 'bryn@brackenfold-baseboards.test',
    businessName: 'Brackenfold Baseboards',
    about: 'Around-the-room benchwork measured and fitted on site, with lift-outs across doorways.',
    townId: TOWN.shrewsbury,
    builds: ['fixed-benchwork', 'two-level-benchwork', 'legs-and-trestles'],
  },
];
