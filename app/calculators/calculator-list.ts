/** The calculators section: one entry per page, in the order a rebuild needs them. */
export const CALCULATORS = [
  {
    href: '/calculators/tdc',
    title: 'TDC from stop readings',
    summary: 'Two positive-stop readings on any printed wheel give true TDC, the correction to the wheel and the stop angle.',
  },
  {
    href: '/calculators/piston-drop',
    title: 'Piston drop ⇄ crank angle',
    summary: 'Turn a manual’s “mm before TDC” into degrees, or degrees into a dial-gauge reading, from stroke and rod length.',
  },
  {
    href: '/calculators/port-events',
    title: 'Port timing from port heights',
    summary: 'Measured port edge heights and deck height give opening and closing angles, durations and blowdown.',
  },
  {
    href: '/calculators/arc-chord',
    title: 'Divider distances',
    summary: 'Arc round the rim and chord straight across from the TDC mark, for marking a flywheel directly.',
  },
] as const;
