import { SectionLayout } from '../components/section-layout';

const LINKS = [
  { to: '/equipment/printers', label: 'Printers' },
  { to: '/equipment/heat-sources', label: 'Heat sources' },
  { to: '/equipment/surface-treaters', label: 'Surface treaters' },
  { to: '/equipment/instruments', label: 'Instruments' },
] as const;

export function EquipmentLayout() {
  return <SectionLayout label="Equipment" links={LINKS} />;
}
