import { SectionLayout } from '../components/section-layout';

const LINKS = [
  { to: '/materials/inks', label: 'Inks' },
  { to: '/materials/substrates', label: 'Substrates' },
  { to: '/materials/lots', label: 'Lots' },
] as const;

export function MaterialsLayout() {
  return <SectionLayout label="Materials" links={LINKS} />;
}
