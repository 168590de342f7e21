import type { ReportKind } from '../../../api/reports/report-keys';

interface ReportEntry {
  /** The word on the tab. */
  tab: string;
  title: string;
  /** The question the report answers, in the shop's words. */
  question: string;
}

export const reportCatalogue: Record<ReportKind, ReportEntry> = {
  'booth-use': { tab: 'Booth use', title: 'Booth use', question: 'How busy were the booths? Hours booked against hours spent spraying, per booth and week.' },
  'area-sprayed': { tab: 'Area sprayed', title: 'Area sprayed', question: 'What did we spray? Coated area per week, by product kind or by job.' },
  conditions: { tab: 'Conditions', title: 'Conditions against limits', question: 'Were conditions right? Air temperature, humidity and dew-point margin in one booth, with every coat made outside its product’s limits.' },
  solvent: { tab: 'Solvent & VOC', title: 'Solvent and VOC', question: 'How much solvent did we emit? VOC per month, and the year’s running total against the yearly threshold.' },
  material: { tab: 'Material', title: 'Material against estimate', question: 'What did it take? Litres used against the estimate, per product and per job.' },
  rework: { tab: 'Rework', title: 'Rework', question: 'What had to be done again? Coats re-sprayed or corrected, by reason, per month.' },
  upkeep: { tab: 'Upkeep', title: 'Upkeep done against due', question: 'Did we keep the booths and the crew in order? Filter changes, extraction tests, fire inspections and crew records done, and those due done by their date.' },
};
