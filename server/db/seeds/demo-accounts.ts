import type { Role } from '../../../shared/roles';

/** The invented people of the demo scenario, one per role. Demo only: never seeded in production. */
export interface DemoAccount {
  role: Role;
  displayName: string;
  email: string;
  password: string;
  about: string;
}

export const DEMO_ACCOUNTS: readonly DemoAccount[] = [
  {
    role: 'admin',
    displayName: 'Marian Coldfield',
    email: 'marian@hollinbridge-modellers.test',
    password: 'demo-admin-plywood-42',
    about: 'runs Benchwright for the Hollinbridge & District Railway Modellers',
  },
  {
    role: 'moderator',
    displayName: 'Tobias Wrenfold',
    email: 'tobias@hollinbridge-modellers.test',
    password: 'demo-review-crossmember-7',
    about: 'checks new listings and settles problems',
  },
  {
    role: 'builder',
    displayName: 'Nell Ashgrove',
    email: 'nell@ashgrove-benchworks.test',
    password: 'demo-builder-battens-19',
    about: 'builds benchwork to order at Ashgrove Benchworks, Lower Wyndham',
  },
  {
    role: 'member',
    displayName: 'Owen Pellby',
    email: 'owen@cattersby-post.test',
    password: 'demo-member-fiddle-yard-3',
    about: 'is moving house and selling his Cattersby branch-line modules',
  },
];
