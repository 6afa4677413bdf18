/** Id of the section index, the target of each section's "back" link. */
export const SECTION_INDEX_ID = 'calculator-sections';

/** The page's sections, in order: the index at the top and the page both read this list. */
export const CALCULATOR_SECTIONS = [
  { id: 'jettability', title: 'Jettability', source: 'Source: Reis & Derby 2000; Derby 2010 (alternative window: Jang, Kim & Moon 2009).' },
  { id: 'surface-energy', title: 'Surface energy and wetting', source: 'Source: Owens & Wendt 1969 (OWRK); wetting margin is common practice, no source.' },
  { id: 'line-geometry', title: 'Line geometry', source: 'Source: Stringer & Derby 2009, 2010 (bead width); sphere and spherical-cap geometry.' },
  { id: 'electrical', title: 'Electrical', source: 'Source: R = Rs·L/W; linear temperature coefficient; R/R₀ = (1 + ε)² for an incompressible conductor.' },
  { id: 'thermal', title: 'Thermal', source: 'Source: Arrhenius rate law; equivalent time built like the equivalent age of ASTM C1074.' },
  { id: 'quality', title: 'Quality statistics', source: 'Source: Western Electric run rules (1956) as stated by Montgomery & Runger; capability after Montgomery.' },
] as const;

export type CalculatorSectionId = (typeof CALCULATOR_SECTIONS)[number]['id'];
