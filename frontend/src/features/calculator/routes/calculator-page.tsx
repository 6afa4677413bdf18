import type { ReactNode } from 'react';

import { PageHeader } from '../../../components/ui/page-header';
import { ArrheniusCard } from '../components/arrhenius-card';
import { BeadWidthCard } from '../components/bead-width-card';
import { CalcSection } from '../components/calc-section';
import { ContactAngleCard } from '../components/contact-angle-card';
import { CureDoseCard } from '../components/cure-dose-card';
import { DropDiameterCard } from '../components/drop-diameter-card';
import { DropSpacingCard } from '../components/drop-spacing-card';
import { FilmThicknessCard } from '../components/film-thickness-card';
import { FootprintCard } from '../components/footprint-card';
import { GaugeFactorCard } from '../components/gauge-factor-card';
import { JettabilityCard } from '../components/jettability-card';
import { OwrkCard } from '../components/owrk-card';
import { QualityCard } from '../components/quality-card';
import { ReferenceResistanceCard } from '../components/reference-resistance-card';
import { SectionIndex } from '../components/section-index';
import { StretchedResistanceCard } from '../components/stretched-resistance-card';
import { TraceResistanceCard } from '../components/trace-resistance-card';
import { WettingMarginCard } from '../components/wetting-margin-card';
import { CALCULATOR_SECTIONS, type CalculatorSectionId } from '../utils/calculator-sections';

const CARDS: Record<CalculatorSectionId, ReactNode> = {
  jettability: <JettabilityCard />,
  'surface-energy': (
    <>
      <OwrkCard />
      <ContactAngleCard />
      <WettingMarginCard />
    </>
  ),
  'line-geometry': (
    <>
      <DropSpacingCard />
      <DropDiameterCard />
      <BeadWidthCard />
      <FootprintCard />
      <FilmThicknessCard />
    </>
  ),
  electrical: (
    <>
      <TraceResistanceCard />
      <ReferenceResistanceCard />
      <StretchedResistanceCard />
      <GaugeFactorCard />
    </>
  ),
  thermal: (
    <>
      <ArrheniusCard />
      <CureDoseCard />
    </>
  ),
  quality: <QualityCard />,
};

/** Free entry for every calculation in the process library; nothing here is saved or sent. */
export function CalculatorPage() {
  return (
    <>
      <PageHeader
        title="Process calculator"
        description="Type numbers into any calculation: results follow as you type, each with its unit and the source it rests on. Nothing here is saved."
      />
      <SectionIndex />
      <div className="flex flex-col gap-10">
        {CALCULATOR_SECTIONS.map((section) => (
          <CalcSection key={section.id} id={section.id} title={section.title} source={section.source}>
            {CARDS[section.id]}
          </CalcSection>
        ))}
      </div>
    </>
  );
}
