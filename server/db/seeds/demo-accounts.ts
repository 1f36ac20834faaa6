import type { Role } from '../../../shared/roles';

/** An invented account of the demo scenario. Demo only: never seeded in production. */
export interface DemoAccount {
  role: Role;
  displayName: string;
  email: string;
  password: string;
  about: string;
}

/** The four demo sign-ins, one per role, printed by `npm start`. */
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

/**
 * More invented sellers (members, clubs and builders) whose listings fill the demo; their sign-ins are not printed.
 * Clubs sell through one account run by their secretary.
 */
export const DEMO_SELLERS: readonly DemoAccount[] = [
  {
    role: 'member',
    displayName: 'Hollinbridge & District Railway Modellers',
    email: 'sales@hollinbridge-modellers.test',
    password: 'demo-club-exhibition-legs-8',
    about: 'sells boards from the club’s retired exhibition layouts',
  },
  {
    role: 'member',
    displayName: 'Thornholme & Wexby Model Railway Group',
    email: 'secretary@thornholme-wexby-mrg.test',
    password: 'demo-club-fenland-drain-5',
    about: 'sells surplus modules to fund new ones',
  },
  {
    role: 'member',
    displayName: 'Priya Castellane',
    email: 'priya.castellane@lansdown-sidings.test',
    password: 'demo-member-city-terminus-6',
    about: 'models in N gauge and is making room for a new layout',
  },
  {
    role: 'member',
    displayName: 'Declan Moylett',
    email: 'declan@moylett-mail.test',
    password: 'demo-member-harbour-quay-4',
    about: 'builds west-of-Ireland scenes and prices in euro',
  },
  {
    role: 'member',
    displayName: 'Gwen Llewerth',
    email: 'gwen@llewerth.test',
    password: 'demo-member-slate-incline-2',
    about: 'models narrow gauge lines in several scales',
  },
  {
    role: 'member',
    displayName: 'Hamish Corrie',
    email: 'hamish@corrie-workshop.test',
    password: 'demo-member-goods-shed-11',
    about: 'builds big 7 mm scale boards',
  },
  {
    role: 'member',
    displayName: 'Ruth Tenterby',
    email: 'ruth@tenterby.test',
    password: 'demo-member-wolds-cutting-9',
    about: 'models in TT and S',
  },
  {
    role: 'member',
    displayName: 'Ivo Stannard',
    email: 'ivo@stannard-home.test',
    password: 'demo-member-shelf-bracket-1',
    about: 'is clearing a spare room',
  },
  {
    role: 'builder',
    displayName: 'Aoife Brennock',
    email: 'orders@kestrel-lane-joinery.test',
    password: 'demo-builder-folding-legs-14',
    about: 'runs Kestrel Lane Joinery near Kilkenny',
  },
  {
    role: 'builder',
    displayName: 'Bryn Hallowes',
    email: 'bryn@brackenfold-baseboards.test',
    password: 'demo-builder-loft-benchwork-6',
    about: 'fits benchwork in lofts and sheds as Brackenfold Baseboards',
  },
];
