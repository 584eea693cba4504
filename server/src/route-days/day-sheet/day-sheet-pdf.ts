import { EDGE_TYPE_LABELS, formatTimeOfDay, TOOL_KIND_LABELS, WEEKDAY_LABELS } from '@keenroute/shared';
import PDFDocument from 'pdfkit';
import type { DaySheetDto, SheetStopDto } from './day-sheet.dto';

// The same Inter the web app ships; pdfkit embeds the .woff files (it cannot read woff2).
const INTER_REGULAR = require.resolve('@fontsource/inter/files/inter-latin-400-normal.woff');
const INTER_BOLD = require.resolve('@fontsource/inter/files/inter-latin-700-normal.woff');

const MARGIN = 48;
const TEAL = '#1d5c63';
const GREY = '#555555';

const time = (minute: number | null) => (minute === null ? '–' : formatTimeOfDay(Math.min(minute, 1439)));

/** The printable day sheet: a header with the day's totals, then each stop in order, then the bench cautions. */
export function renderDaySheet(sheet: DaySheetDto): Promise<Buffer> {
  const day = sheet.routeDay;
  const doc = new PDFDocument({
    size: 'LETTER',
    margin: MARGIN,
    info: { Title: `Day sheet ${day.day} – ${day.sharpener.name}`, Creator: 'Keenroute' },
  });
  const chunks: Buffer[] = [];
  doc.on('data', (chunk: Buffer) => chunks.push(chunk));
  const finished = new Promise<Buffer>((done, fail) => {
    doc.on('end', () => done(Buffer.concat(chunks)));
    doc.on('error', fail);
  });
  doc.registerFont('Inter', INTER_REGULAR);
  doc.registerFont('Inter-Bold', INTER_BOLD);

  doc.font('Inter-Bold').fontSize(18).fillColor(TEAL).text(`Day sheet · ${WEEKDAY_LABELS[day.weekday]} ${day.day}`);
  doc.font('Inter').fontSize(10).fillColor('#000000');
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

  doc.moveDown().font('Inter-Bold').fontSize(10).fillColor(TEAL).text('At the bench');
  doc.font('Inter').fontSize(8).fillColor(GREY);
  for (const caution of sheet.cautions) doc.text(`• ${caution}`);
  doc.end();
  return finished;
}

function drawStop(doc: PDFKit.PDFDocument, stop: SheetStopDto): void {
  if (doc.y > doc.page.height - MARGIN - 110) doc.addPage();
  doc.font('Inter-Bold').fontSize(12).fillColor('#000000');
  doc.text(`${stop.position + 1}. ${stop.name}   ${time(stop.arrivalWindow.from)}–${time(stop.arrivalWindow.to)}`);
  doc.font('Inter').fontSize(9).fillColor('#000000');
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
