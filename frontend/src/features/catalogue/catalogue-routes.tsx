import type { QueryClient } from '@tanstack/react-query';
import { redirect, type RouteObject } from 'react-router';

import type { Guard, Loader } from '../../lib/route-guard';
import { EditHeatSourcePage } from './routes/edit-heat-source-page';
import { EditInkPage } from './routes/edit-ink-page';
import { EditInstrumentPage } from './routes/edit-instrument-page';
import { EditLotPage } from './routes/edit-lot-page';
import { EditPrinterPage } from './routes/edit-printer-page';
import { EditSubstratePage } from './routes/edit-substrate-page';
import { EditSurfaceTreaterPage } from './routes/edit-surface-treater-page';
import { EquipmentLayout } from './routes/equipment-layout';
import { HeatSourceDetailPage } from './routes/heat-source-detail-page';
import { HeatSourcesPage } from './routes/heat-sources-page';
import { inkDetailLoader } from './routes/ink-detail-loader';
import { InksPage } from './routes/inks-page';
import { InstrumentDetailPage } from './routes/instrument-detail-page';
import { InstrumentsPage } from './routes/instruments-page';
import { LotDetailPage } from './routes/lot-detail-page';
import { LotsPage } from './routes/lots-page';
import { MaterialsLayout } from './routes/materials-layout';
import { NewHeatSourcePage } from './routes/new-heat-source-page';
import { NewInkPage } from './routes/new-ink-page';
import { NewInstrumentPage } from './routes/new-instrument-page';
import { NewLotPage } from './routes/new-lot-page';
import { NewPrinterPage } from './routes/new-printer-page';
import { NewSubstratePage } from './routes/new-substrate-page';
import { NewSurfaceTreaterPage } from './routes/new-surface-treater-page';
import { PrinterDetailPage } from './routes/printer-detail-page';
import { PrintersPage } from './routes/printers-page';
import { recordRoutes } from './routes/record-routes';
import { substrateDetailLoader } from './routes/substrate-detail-loader';
import { SubstrateDetailPage } from './routes/substrate-detail-page';
import { SubstratesPage } from './routes/substrates-page';
import { SurfaceTreaterDetailPage } from './routes/surface-treater-detail-page';
import { SurfaceTreatersPage } from './routes/surface-treaters-page';
import { CATALOGUE_EDITORS } from './utils/catalogue-editors';

/** Materials (inks, substrates, lots) and equipment pages. Reading is for everyone signed in. */
export function catalogueRoutes(queryClient: QueryClient, guarded: Guard): RouteObject[] {
  const forEditors = (loader: Loader) => guarded(CATALOGUE_EDITORS, loader);
  const records = (pages: Parameters<typeof recordRoutes>[2]) => recordRoutes(queryClient, forEditors, pages);

  return [
    {
      path: 'materials',
      Component: MaterialsLayout,
      children: [
        { index: true, loader: () => redirect('/materials/inks') },
        ...records({
          path: 'inks',
          kind: 'inks',
          List: InksPage,
          New: NewInkPage,
          Edit: EditInkPage,
          detail: {
            loader: inkDetailLoader(queryClient),
            // The chart library comes with this page only, not with the first download.
            lazy: { Component: async () => (await import('./routes/ink-detail-page')).InkDetailPage },
          },
        }),
        ...records({
          path: 'substrates',
          kind: 'substrates',
          List: SubstratesPage,
          New: NewSubstratePage,
          Edit: EditSubstratePage,
          detail: { loader: substrateDetailLoader(queryClient), Component: SubstrateDetailPage },
        }),
        ...records({ path: 'lots', kind: 'lots', List: LotsPage, New: NewLotPage, Edit: EditLotPage, detail: { Component: LotDetailPage }, formLists: ['inks', 'substrates'] }),
      ],
    },
    {
      path: 'equipment',
      Component: EquipmentLayout,
      children: [
        { index: true, loader: () => redirect('/equipment/printers') },
        ...records({
          path: 'printers',
          kind: 'printers',
          List: PrintersPage,
          New: NewPrinterPage,
          Edit: EditPrinterPage,
          detail: { Component: PrinterDetailPage },
          formLists: ['inks'],
          detailLists: ['inks'],
        }),
        ...records({ path: 'heat-sources', kind: 'heatSources', List: HeatSourcesPage, New: NewHeatSourcePage, Edit: EditHeatSourcePage, detail: { Component: HeatSourceDetailPage } }),
        ...records({
          path: 'surface-treaters',
          kind: 'surfaceTreaters',
          List: SurfaceTreatersPage,
          New: NewSurfaceTreaterPage,
          Edit: EditSurfaceTreaterPage,
          detail: { Component: SurfaceTreaterDetailPage },
        }),
        ...records({ path: 'instruments', kind: 'instruments', List: InstrumentsPage, New: NewInstrumentPage, Edit: EditInstrumentPage, detail: { Component: InstrumentDetailPage } }),
      ],
    },
  ];
}
