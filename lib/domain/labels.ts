// The label vocabulary the API and the pages share with the renderer in labels/.
export const LABEL_STOCK_IDS = ['4x6in', '4x2in', '2x1in', 'letter-30up'] as const;
export type StockId = (typeof LABEL_STOCK_IDS)[number];

export const LABEL_TEMPLATES = ['bin', 'part', 'kit'] as const;
export type LabelTemplate = (typeof LABEL_TEMPLATES)[number];

// Kit labels carry two GS1-128 rows and a DataMatrix: only the 4 in wide stocks have the room.
export const KIT_LABEL_STOCKS: readonly StockId[] = ['4x6in', '4x2in'];

export const PRINT_JOB_STATUSES = ['queued', 'sent', 'failed'] as const;
export type PrintJobStatus = (typeof PRINT_JOB_STATUSES)[number];
