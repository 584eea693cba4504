import { EDGE_TYPE_LABELS, formatTimeOfDay, TOOL_KIND_LABELS, WEEKDAY_LABELS } from '@keenroute/shared';
import { INTER, INTER_BOLD } from '../../common/pdf/fonts';
import { renderToBuffer } from '../../common/pdf/render-to-buffer';
import type { DaySheetDto, SheetStopDto } from './day-sheet.dto';

const MARGIN = 48;
const TEAL = '#1d5c63';
const GREY = '#555555';

const time = (minute: number | null) => (minute === null ? '–' : formatTimeOfDay(Math.min(minute, 1439)));

/** The printable day sheet: a header with the day's totals, then each stop in order, then the bench cautions. */
export function renderDaySheet(sheet: DaySheetDto): Promise<Buffer> {
  const day = sheet.routeDay;
  const options: PDFKit.PDFDocumentOptions = {
    size: 'LETTER',
    margin: MARGIN,
    info: { Title: `Day sheet ${day.day} – ${day.sharpener.name}`, Creator: 'Keenroute' },
  };
  return renderToBuffer(options, (doc) => drawSheet(doc, sheet));
}

function drawSheet(doc: PDFKit.PDFDocument, sheet: DaySheetDto): void {
  const day = sheet.routeDay;
  doc.font(INTER_BOLD).fontSize(18).fillColor(TEAL).text(`Day sheet · ${WEEKDAY_LABELS[day.weekday]} ${day.day}`);
  doc.font(INTER).fontSize(10).fillColor('#000000');
  doc.text(`${day.sharpener.name} · from and back to ${day.start.label}`);
  const t = sheet.totals;
  doc.text(
    `${t.stops} stops · leave ${time(t.departure)} · back ${time(t.finish)} · ${t.distanceKm.toFixed(1)} km · ` +
      `${t.driveMinutes} min driving · ${t.benchMinutes} min at the bench` +
      (day.lunch ? ` · break ${time(day.lunch.start)} for ${day.lunch.minutes} min` : ''),
  );
  doc.moveDown();
  if (sheet.stops.length === 0) doc.text('No stops on this route day.');
  for (const stop of sheet.stops) drawStop(doc, stop);

  doc.moveDown().font(INTER_BOLD).fontSize(10).fillColor(TEAL).text('At the bench');
  doc.font(INTER).fontSize(8).fillColor(GREY);
  for (const caution of sheet.cautions) doc.text(`• ${caution}`);
}

function drawStop(doc: PDFKit.PDFDocument, stop: SheetStopDto): void {
  if (doc.y > doc.page.height - MARGIN - 110) doc.addPage();
  doc.font(INTER_BOLD).fontSize(12).fillColor('#000000');
  doc.text(`${stop.position + 1}. ${stop.name}   ${time(stop.arrivalWindow.from)}–${time(stop.arrivalWindow.to)}`);
  doc.font(INTER).fontSize(9).fillColor('#000000');
  doc.text([stop.street, stop.city, stop.postalCode].filter(Boolean).join(', '));
  const contact = [stop.phone, stop.email].filter(Boolean).join(' · ');
  if (contact) doc.text(contact);
  doc.text(
    `Planned ${time(stop.arrival)}–${time(stop.leave)} · ${stop.benchMinutes} bench min · ${stop.expectedPairs} pairs expected · ` +
      `${stop.customers.length} customers`,
  );
  for (const booking of stop.bookings) {
    const items = booking.items
      .map((item) => `${item.count} × ${EDGE_TYPE_LABELS[item.edgeType]} ${TOOL_KIND_LABELS[item.toolKind]}`)
      .join(', ');
    doc.text(`Drop-off: ${booking.name}${booking.phone ? ` (${booking.phone})` : ''}: ${items}`);
  }
  doc.fillColor(GREY);
  if (stop.accessParking) doc.text(`Parking: ${stop.accessParking}`);
  if (stop.accessDoor) doc.text(`Door: ${stop.accessDoor}`);
  if (stop.accessBestTime) doc.text(`Best time: ${stop.accessBestTime}`);
  doc.moveDown(0.8);
}
