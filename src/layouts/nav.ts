/** Site navigation. A workbench appears here only once it is built. */
export interface NavItem {
  href: string;
  label: string;
}

export const NAV: readonly NavItem[] = [
  { href: '/', label: 'Home' },
  { href: '/resonance/', label: 'Resonance' },
  { href: '/coil/', label: 'Coil' },
  { href: '/tank/', label: 'Tank' },
  { href: '/band/', label: 'Band' },
  { href: '/match/', label: 'Match' },
  { href: '/methods/', label: 'Methods' },
  { href: '/cautions/', label: 'Cautions' },
];
