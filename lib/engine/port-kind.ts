/** What a cylinder port does; blowdown is measured between the first exhaust and the first transfer to open. */
export const PORT_KINDS = ['exhaust', 'transfer', 'boost', 'inlet', 'other'] as const;
export type PortKind = (typeof PORT_KINDS)[number];

const NAME_HINTS: ReadonlyArray<[RegExp, PortKind]> = [
  [/exh/i, 'exhaust'],
  [/boost/i, 'boost'],
  [/trans|\btr\b/i, 'transfer'],
  [/inlet|intake|induct/i, 'inlet'],
];

/** A port's kind guessed from its name ("Exhaust", "Transfer A", "Boost", "Inlet"), else "other". */
export function portKindFromName(name: string): PortKind {
  return NAME_HINTS.find(([hint]) => hint.test(name))?.[1] ?? 'other';
}
