import type { PlannerDraft } from './draft-types';

type Conductor = PlannerDraft['wiring']['busConductor'];

const IEC_AREAS = [0.5, 0.75, 1, 1.5, 2.5] as const;
const AWG_GAUGES = [14, 16, 18, 22] as const;

/** A conductor as one choice in a list: "iec:1.5:1/2", "awg:16", "area:1.2". */
export function conductorKey(c: Conductor): string {
  if (c.kind === 'iec') return `iec:${c.areaMm2}:${c.class}`;
  if (c.kind === 'awg') return `awg:${c.gauge}`;
  return `area:${c.areaMm2}`;
}

/** The conductor a choice stands for. */
export function conductorFromKey(key: string): Conductor {
  const [kind, a, b] = key.split(':');
  if (kind === 'awg') return { kind: 'awg', gauge: Number(a) as (typeof AWG_GAUGES)[number] };
  if (kind === 'area') return { kind: 'area', areaMm2: Number(a) };
  return { kind: 'iec', areaMm2: Number(a) as (typeof IEC_AREAS)[number], class: b === '5/6' ? '5/6' : '1/2' };
}

/** The bus wires offered: metric sizes solid and flexible, and AWG; plus the current one if it is another area. */
export function conductorChoices(current: Conductor): { value: string; label: string }[] {
  const choices = [
    ...IEC_AREAS.map((area) => ({ value: `iec:${area}:1/2`, label: `${area} mm² solid or stranded` })),
    ...IEC_AREAS.map((area) => ({ value: `iec:${area}:5/6`, label: `${area} mm² flexible` })),
    ...AWG_GAUGES.map((gauge) => ({ value: `awg:${gauge}`, label: `AWG ${gauge} solid` })),
  ];
  if (current.kind === 'area') choices.push({ value: conductorKey(current), label: `${current.areaMm2} mm² (other)` });
  return choices;
}
