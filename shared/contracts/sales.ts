import { z } from 'zod';

// How the columns of a shop's sales export map to a sale. Every value is a string, so the
// mapping is stored as it is (studios.sales_column_mapping, sales_imports.mapping).
export const salesDateFormats = ['ymd', 'dmy', 'mdy'] as const;
export const salesDateFormatSchema = z.enum(salesDateFormats);
export type SalesDateFormat = z.infer<typeof salesDateFormatSchema>;

export const salesDelimiterSchema = z.enum([',', ';', '\t']);
export type SalesDelimiter = z.infer<typeof salesDelimiterSchema>;

const columnName = z.string().min(1, 'Choose a column').max(200);
const currencyCode = z.string().trim().toUpperCase().regex(/^[A-Z]{3}$/, 'Use a three-letter currency code such as GBP');

export const salesMappingSchema = z
  .object({
    // the columns holding each field, by their header name
    date: columnName,
    sku: columnName,
    quantity: columnName,
    revenue: columnName,
    // a column of ISO 4217 codes, or one code for the whole file
    currency: columnName.optional(),
    fixedCurrency: currencyCode.optional(),
    // the shop's order number: with it, overlapping exports do not count a sale twice
    orderId: columnName.optional(),
    // written order of day, month and year; 12/03/2026 is a choice, never a guess
    dateFormat: salesDateFormatSchema,
    // the revenue's decimal separator; the other of '.' and ',' may group thousands
    decimalSeparator: z.enum(['.', ',']),
    delimiter: salesDelimiterSchema.default(','),
  })
  .strict()
  .refine((m) => (m.currency === undefined) !== (m.fixedCurrency === undefined), {
    message: 'Map a currency column or give one currency for the whole file',
    path: ['currency'],
  });
export type SalesMapping = z.infer<typeof salesMappingSchema>;
export type SalesMappingInput = z.input<typeof salesMappingSchema>;

export const salesFields = ['date', 'sku', 'quantity', 'revenue', 'currency', 'orderId'] as const;
export type SalesField = (typeof salesFields)[number];

export const badSalesRowSchema = z.object({
  // the file's own line number, the header being line 1
  line: z.number().int(),
  reasons: z.array(z.string()),
});
export type BadSalesRow = z.infer<typeof badSalesRowSchema>;

export const salesValidationSchema = z.object({
  rowCount: z.number().int(),
  goodRowCount: z.number().int(),
  badRowCount: z.number().int(),
  // the first bad rows (capped); badRowCount counts them all
  badRows: z.array(badSalesRowSchema),
  unknownSkus: z.array(z.object({ sku: z.string(), rows: z.number().int(), firstLine: z.number().int() })),
  firstDay: z.string().nullable(),
  lastDay: z.string().nullable(),
});
export type SalesValidation = z.infer<typeof salesValidationSchema>;

export const salesPreviewResponseSchema = z.object({
  fileName: z.string(),
  delimiter: salesDelimiterSchema,
  columns: z.array(z.string()),
  // the first data rows as they are, for the mapping screen
  sampleRows: z.array(z.array(z.string())),
  // the studio's saved mapping when its columns are all present, else a guess from the headers
  suggestedMapping: z.record(z.string(), z.string()),
  suggestedFrom: z.enum(['saved', 'headers']),
  // what the mapping still needs the user to choose (e.g. the date order when 03/04 could be either)
  missing: z.array(z.string()),
  // with a complete mapping: the whole file checked against it
  mapping: z.record(z.string(), z.string()).nullable(),
  validation: salesValidationSchema.nullable(),
});
export type SalesPreviewResponse = z.infer<typeof salesPreviewResponseSchema>;

export const salesImportFieldsSchema = z.object({
  mapping: z.string().min(2, 'Send the column mapping as JSON'),
  skipBadRows: z.enum(['true', 'false']).default('false').transform((v) => v === 'true'),
});

export const salesImportReportSchema = z.object({
  badRowCount: z.number().int(),
  // the skipped rows, capped; badRowCount counts them all
  badRows: z.array(badSalesRowSchema),
  unknownSkus: z.array(z.object({ sku: z.string(), rows: z.number().int(), firstLine: z.number().int() })),
  // rows whose order id and SKU an earlier import already holds
  alreadyImported: z.number().int(),
  firstDay: z.string().nullable(),
  lastDay: z.string().nullable(),
  totals: z.array(z.object({ currency: z.string(), units: z.number(), revenueMinor: z.number() })),
});
export type SalesImportReport = z.infer<typeof salesImportReportSchema>;

export const salesImportSchema = z.object({
  id: z.string(),
  fileName: z.string(),
  rowCount: z.number().int(),
  skippedRows: z.number().int(),
  report: salesImportReportSchema,
  importedBy: z.object({ id: z.string(), name: z.string() }).nullable(),
  createdAt: z.string(),
});
export type SalesImport = z.infer<typeof salesImportSchema>;
export const salesImportListSchema = z.object({ imports: z.array(salesImportSchema) });

// A refused import: nothing was written; the report says which rows to fix.
export const salesImportRefusedSchema = z.object({
  error: z.object({ code: z.string(), message: z.string() }),
  validation: salesValidationSchema,
});

export const salesSplitRuleSchema = z.enum(['even', 'area']);
export type SalesSplitRule = z.infer<typeof salesSplitRuleSchema>;

export const salesSettingsRequestSchema = z.object({ splitRule: salesSplitRuleSchema });
export const salesSettingsSchema = z.object({ splitRule: salesSplitRuleSchema, columnMapping: z.record(z.string(), z.string()).nullable() });

const isoDay = z.string().regex(/^\d{4}-\d{2}-\d{2}$/, 'Use a date like 2026-03-14');

export const salesSummaryQuerySchema = z.object({
  from: isoDay.optional(),
  to: isoDay.optional(),
  split: salesSplitRuleSchema.optional(),
  currency: z.string().trim().toUpperCase().regex(/^[A-Z]{3}$/, 'Use a three-letter currency code').optional(),
});
export type SalesSummaryQuery = z.infer<typeof salesSummaryQuerySchema>;

export const salesGranularitySchema = z.enum(['day', 'week', 'month']);
export type SalesGranularity = z.infer<typeof salesGranularitySchema>;

const ranked = z.object({ units: z.number(), revenueMinor: z.number() });

export const salesSummarySchema = z.object({
  from: z.string(),
  to: z.string(),
  splitRule: salesSplitRuleSchema,
  // revenue figures are in this currency's minor units; other currencies' sales are counted in units only
  currency: z.string().nullable(),
  currencies: z.array(z.object({ currency: z.string(), units: z.number(), revenueMinor: z.number() })),
  totals: ranked,
  products: z.array(ranked.extend({ productId: z.string(), name: z.string(), stage: z.string() })),
  variants: z.array(ranked.extend({ variantId: z.string(), productId: z.string(), productName: z.string(), name: z.string(), sku: z.string() })),
  motifs: z.array(ranked.extend({ motifId: z.string(), name: z.string(), shareOfUnits: z.number(), productCount: z.number().int() })),
  // sales whose SKU no variant has any more
  unmatched: z.array(ranked.extend({ sku: z.string() })),
  granularity: salesGranularitySchema,
  series: z.array(ranked.extend({ start: z.string() })),
});
export type SalesSummary = z.infer<typeof salesSummarySchema>;

export const motifSalesQuerySchema = salesSummaryQuerySchema.pick({ from: true, to: true, currency: true, split: true });

export const motifSalesSchema = z.object({
  motifId: z.string(),
  from: z.string(),
  to: z.string(),
  splitRule: salesSplitRuleSchema,
  currency: z.string().nullable(),
  totals: ranked,
  products: z.array(ranked.extend({ productId: z.string(), name: z.string(), share: z.number() })),
  granularity: salesGranularitySchema,
  series: z.array(ranked.extend({ start: z.string() })),
});
export type MotifSales = z.infer<typeof motifSalesSchema>;
