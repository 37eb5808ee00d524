/** Names of Loftline's own icon set, drawn in components/ui/icon.tsx on a 24-unit grid. */
export const ICON_NAMES = [
  'pencil', 'hourglass', 'return', 'check-shield', 'arrow-up', 'arrow-down', 'octagon-x', 'triangle-alert', 'check-circle',
  'cloud-check', 'cloud-up', 'calendar', 'map-pin', 'drafting', 'shield', 'clipboard', 'people', 'gear', 'more', 'plus',
  'chevron-right', 'chevron-down', 'back', 'mail', 'sign-out', 'crosshair', 'trash', 'close', 'tree', 'logo',
] as const;
export type IconName = (typeof ICON_NAMES)[number];
