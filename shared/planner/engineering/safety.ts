/** The kinds of work a caution applies to. */
export type WorkActivity = 'cutting' | 'drilling' | 'sanding' | 'lifting' | 'wiring' | 'fixing-to-wall';

/** A caution shown beside the plan where it applies. */
export interface Caution {
  id: string;
  text: string;
  appliesTo: readonly WorkActivity[];
}

/** Said after every list of cautions. */
export const FOLLOW_LOCAL_RULES = "Follow your local rules and each tool maker's instructions.";

/** Cautions for building baseboards, each with the work it applies to. All are common practice. */
export const CAUTIONS: readonly Caution[] = [
  {
    id: 'guards',
    text: 'Keep the guards on power tools; never remove or wedge one open.',
    appliesTo: ['cutting', 'drilling', 'sanding'],
  },
  {
    id: 'eyes-ears',
    text: 'Wear eye protection, and ear protection when using power tools.',
    appliesTo: ['cutting', 'drilling', 'sanding', 'fixing-to-wall'],
  },
  {
    id: 'dust',
    text: 'Wear a dust mask when cutting or sanding, above all MDF, and keep the area ventilated.',
    appliesTo: ['cutting', 'sanding'],
  },
  {
    id: 'clamp',
    text: 'Clamp the work down, keep the area clear, and keep both hands away from the cut.',
    appliesTo: ['cutting', 'drilling'],
  },
  {
    id: 'clothing',
    text: 'No loose clothing, jewellery or long hair near a turning tool; wear gloves only where the tool maker allows.',
    appliesTo: ['cutting', 'drilling', 'sanding'],
  },
  {
    id: 'lifting',
    text: 'Get help to lift heavy or awkward boards; lift close to the body and keep your back straight.',
    appliesTo: ['lifting'],
  },
  {
    id: 'mains',
    text: 'Mains wiring (sockets, plugs, fixed lighting) is work for a qualified person only.',
    appliesTo: ['wiring'],
  },
  {
    id: 'low-voltage',
    text: 'Power the layout at low voltage from a proper, approved supply for model railways; never from a home-made one.',
    appliesTo: ['wiring'],
  },
  {
    id: 'hidden-services',
    text: 'Check walls for hidden pipes and cables before drilling.',
    appliesTo: ['fixing-to-wall'],
  },
];

/** The cautions for the work at hand, each once, in the order listed, then the reminder to follow local rules. */
export function cautionsFor(activities: readonly WorkActivity[]): string[] {
  const texts = CAUTIONS.filter((c) => c.appliesTo.some((a) => activities.includes(a))).map((c) => c.text);
  return [...texts, FOLLOW_LOCAL_RULES];
}
