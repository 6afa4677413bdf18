import {
  HeatSourceListSchema,
  HeatSourceViewSchema,
  InkListSchema,
  InkSchema,
  InstrumentListSchema,
  InstrumentViewSchema,
  LotListSchema,
  LotViewSchema,
  PrinterListSchema,
  PrinterSchema,
  SubstrateListSchema,
  SubstrateSchema,
  SurfaceTreaterListSchema,
  SurfaceTreaterViewSchema,
  type HeatSourceInput,
  type HeatSourceView,
  type InkInput,
  type Ink,
  type InstrumentInput,
  type InstrumentView,
  type LotInput,
  type LotView,
  type PrinterInput,
  type Printer,
  type SubstrateInput,
  type Substrate,
  type SurfaceTreaterInput,
  type SurfaceTreaterView,
} from '@tracewright/shared';

/** What the API answers for one record of each catalogue (lots and calibrated equipment carry a status). */
export type CatalogueRecords = {
  inks: Ink;
  substrates: Substrate;
  lots: LotView;
  printers: Printer;
  heatSources: HeatSourceView;
  surfaceTreaters: SurfaceTreaterView;
  instruments: InstrumentView;
};

/** What a create sends; an update sends the same plus the version it was based on. */
export type CatalogueInputs = {
  inks: InkInput;
  substrates: SubstrateInput;
  lots: LotInput;
  printers: PrinterInput;
  heatSources: HeatSourceInput;
  surfaceTreaters: SurfaceTreaterInput;
  instruments: InstrumentInput;
};

export type CatalogueKind = keyof CatalogueRecords;

type Resource<K extends CatalogueKind> = {
  path: string;
  /** How messages name one record, e.g. "heat source". */
  noun: string;
  parseList: (body: unknown) => CatalogueRecords[K][];
  parseRecord: (body: unknown) => CatalogueRecords[K];
};

/** Every catalogue has the same six routes; only the path, the noun and the schemas differ. */
export const CATALOGUE_RESOURCES: { [K in CatalogueKind]: Resource<K> } = {
  inks: { path: '/api/inks', noun: 'ink', parseList: (b) => InkListSchema.parse(b).inks, parseRecord: (b) => InkSchema.parse(b) },
  substrates: {
    path: '/api/substrates',
    noun: 'substrate',
    parseList: (b) => SubstrateListSchema.parse(b).substrates,
    parseRecord: (b) => SubstrateSchema.parse(b),
  },
  lots: { path: '/api/lots', noun: 'lot', parseList: (b) => LotListSchema.parse(b).lots, parseRecord: (b) => LotViewSchema.parse(b) },
  printers: {
    path: '/api/printers',
    noun: 'printer',
    parseList: (b) => PrinterListSchema.parse(b).printers,
    parseRecord: (b) => PrinterSchema.parse(b),
  },
  heatSources: {
    path: '/api/heat-sources',
    noun: 'heat source',
    parseList: (b) => HeatSourceListSchema.parse(b).heatSources,
    parseRecord: (b) => HeatSourceViewSchema.parse(b),
  },
  surfaceTreaters: {
    path: '/api/surface-treaters',
    noun: 'surface treater',
    parseList: (b) => SurfaceTreaterListSchema.parse(b).surfaceTreaters,
    parseRecord: (b) => SurfaceTreaterViewSchema.parse(b),
  },
  instruments: {
    path: '/api/instruments',
    noun: 'instrument',
    parseList: (b) => InstrumentListSchema.parse(b).instruments,
    parseRecord: (b) => InstrumentViewSchema.parse(b),
  },
};
