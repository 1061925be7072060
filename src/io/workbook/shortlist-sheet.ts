import type { Workbook } from 'exceljs';
import type { Project } from '../../ledger/model.ts';
import type { WorkbookExportOptions } from './index.ts';
export function writeShortlistSheet(wb: Workbook, project: Project, options: WorkbookExportOptions): void {
  wb.addWorksheet('shortlist');
  void project; void options;
}
