import type { MaterialCategory } from '@sheaf/engine';

/** Words for the material categories. */
export const CATEGORY_LABEL: Record<MaterialCategory, string> = {
  'carbon-steel': 'Carbon steels',
  'alloy-steel': 'Alloy steels',
  'stainless-steel': 'Stainless steels',
  aluminium: 'Aluminium alloys',
  titanium: 'Titanium',
  'cast-iron': 'Cast irons',
  soil: 'Soils',
  rock: 'Rocks',
  other: 'Other',
};
