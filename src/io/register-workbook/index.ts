/** The register workbook: write (register, buyer's shortlist, fleet) and read back the register sheet. */
export {
  exportRegisterWorkbook,
  buildRegisterWorkbook,
  REGISTER_SHEET,
  BUYER_SHORTLIST_SHEET,
  FLEET_SHEET,
  type RegisterWorkbookOptions,
} from './write.ts';
export { readRegisterWorkbook, type RegisterWorkbookRead } from './read.ts';
