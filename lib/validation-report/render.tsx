/** Renders a validation report to PDF bytes with the board pack's fonts and parts. */
import { renderToBuffer } from '@react-pdf/renderer';
import { registerFonts } from '../board-pack/pdf-parts';
import type { ValidationReportData } from './data';
import { ValidationReportDocument } from './document';

export async function renderValidationReport(data: ValidationReportData): Promise<Buffer> {
  registerFonts();
  return renderToBuffer(<ValidationReportDocument data={data} />);
}
