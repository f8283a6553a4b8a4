import 'server-only';
import {
  Document,
  Font,
  Image,
  Line,
  Page,
  Rect,
  StyleSheet,
  Svg,
  Text,
  View,
  renderToBuffer,
} from '@react-pdf/renderer';
import { translatorFor } from '@/i18n/translator';
import { formatInZone } from '@/lib/time/dates';
import { formatDay } from '@/lib/time/dates-locale';
import type { ReportData, ReportRepair } from '@/lib/data/report';
import type { ReportImage } from './images';
import { timelineLayout } from './timeline';

// The repair report as a PDF (A4), drawn with @react-pdf's primitives; the timeline is plain Svg.
// The built-in Helvetica only knows the WinAnsi characters, so text goes through pdfText first.

// Whole words only: a split "profes-sional" helps nobody reading a report (or searching it).
Font.registerHyphenationCallback((word) => [word]);

export async function renderReportPdf(data: ReportData): Promise<Buffer> {
  return renderToBuffer(<ReportDocument data={data} />);
}

export const reportFileName = (jobNumber: string) => `repair-report-${jobNumber.replace(/[^\w-]/g, '_')}.pdf`;

const BRAND = '#115e59';
const MUTED = '#475569';
const s = StyleSheet.create({
  page: { padding: 36, fontSize: 9.5, fontFamily: 'Helvetica', color: '#0f172a', lineHeight: 1.35 },
  header: { borderBottomWidth: 2, borderBottomColor: BRAND, paddingBottom: 8, marginBottom: 12 },
  company: { fontSize: 10, color: BRAND, fontFamily: 'Helvetica-Bold' },
  title: { fontSize: 18, fontFamily: 'Helvetica-Bold', marginTop: 2, marginBottom: 4, lineHeight: 1.2 },
  muted: { color: MUTED },
  h2: { fontSize: 12, fontFamily: 'Helvetica-Bold', color: BRAND, marginTop: 12, marginBottom: 4 },
  h3: { fontSize: 10.5, fontFamily: 'Helvetica-Bold', marginBottom: 3 },
  grid: { flexDirection: 'row', flexWrap: 'wrap' },
  cell: { width: '50%', marginBottom: 4, paddingRight: 8 },
  label: { fontSize: 8, color: MUTED, textTransform: 'uppercase' },
  repair: { borderWidth: 1, borderColor: '#cbd5e1', borderRadius: 4, padding: 8, marginBottom: 10 },
  images: { flexDirection: 'row', flexWrap: 'wrap', marginTop: 6 },
  image: { width: 160, marginRight: 8, marginBottom: 6 },
  caution: { marginBottom: 4 },
  footer: {
    position: 'absolute',
    bottom: 18,
    left: 36,
    right: 36,
    fontSize: 7.5,
    color: MUTED,
    flexDirection: 'row',
    justifyContent: 'space-between',
  },
});

type ReportWords = ReturnType<typeof translatorFor<'report'>>;

function ReportDocument({ data }: { data: ReportData }) {
  const t = pdfText;
  const w = translatorFor(data.locale, 'report');
  return (
    <Document
      title={t(w('docTitle', { number: data.job.number }))}
      author={t(data.company.name)}
      creator="Setline"
      producer="Setline"
      language={data.locale}
    >
      <Page size="A4" style={s.page}>
        <View style={s.header}>
          <Text style={s.company}>{t(data.company.name)}</Text>
          <Text style={s.title}>{t(w('title', { number: data.job.number }))}</Text>
          {data.job.title ? <Text style={s.muted}>{t(data.job.title)}</Text> : null}
        </View>
        <View style={s.grid}>
          <Field name={w('customer')} value={data.customer.name} />
          <Field name={w('site')} value={`${data.site.name} — ${data.site.address}`} />
          <Field
            name={w('workDate')}
            value={data.job.scheduledDate ? formatDay(data.job.scheduledDate, data.locale) : '—'}
          />
          <Field name={w('prepared')} value={data.preparedAt} />
        </View>

        <Text style={s.h2}>{t(w('repairsHeading', { count: data.repairs.length }))}</Text>
        {data.repairs.map((repair) => (
          <RepairBlock key={repair.id} repair={repair} data={data} w={w} />
        ))}
        {data.jobImages.length > 0 ? (
          <View wrap={false}>
            <Text style={s.h2}>{t(w('images'))}</Text>
            <Images images={data.jobImages} w={w} />
          </View>
        ) : null}

        <View wrap={false}>
          <Text style={s.h2}>{t(w('cautions'))}</Text>
          {data.cautions.map((c) => (
            <Text key={c.title} style={s.caution}>
              <Text style={{ fontFamily: 'Helvetica-Bold' }}>{t(c.title)}. </Text>
              {t(c.text)}
            </Text>
          ))}
          <Text style={[s.caution, s.muted]}>{t(data.deferral)}</Text>
        </View>
        <View style={s.footer} fixed>
          <Text>{t(w('footer', { company: data.company.name, number: data.job.number }))}</Text>
          <Text render={({ pageNumber, totalPages }) => t(w('page', { page: pageNumber, total: totalPages }))} />
        </View>
      </Page>
    </Document>
  );
}

function RepairBlock({ repair, data, w }: { repair: ReportRepair; data: ReportData; w: ReportWords }) {
  const t = pdfText;
  const install = repair.install;
  return (
    <View style={s.repair} wrap={false}>
      <Text style={s.h3}>
        {t(
          w('repairHeading', {
            position: repair.position,
            defect: repair.defect,
            length: repair.defectLength,
            grade: repair.conditionGrade,
          }),
        )}
      </Text>
      <View style={s.grid}>
        <Field
          name={w('where')}
          value={
            w('whereText', {
              segment: repair.segment.label,
              distance: repair.distance,
              accessPoint: repair.accessPoint,
            }) + (repair.clockPosition ? w('atClock', { clock: repair.clockPosition }) : '')
          }
        />
        <Field
          name={w('pipe')}
          value={w('pipeText', { material: repair.segment.material, diameter: repair.segment.insideDiameter })}
        />
        <Field name={w('patchLength')} value={repair.patchLength ?? '—'} />
        <Field
          name={w('resin')}
          value={install ? w('resinText', { resin: install.resinSystem ?? '—', lot: install.kitLot ?? '—' }) : '—'}
        />
        {install ? (
          <Field
            name={w('conditions')}
            value={
              w('conditionsText', { mix: install.mixTemperature ?? '—', pipe: install.pipeTemperature ?? '—' }) +
              (install.inflatePressure ? w('inflatedTo', { pressure: install.inflatePressure }) : '')
            }
          />
        ) : null}
        {install ? (
          <Field
            name={w('inspection')}
            value={
              install.inspection
                ? `${install.inspection.result === 'pass' ? w('passed') : w('notPassed')}${install.inspection.notes ? ` — ${install.inspection.notes}` : ''}`
                : w('notRecorded')
            }
          />
        ) : null}
        {install?.returnToService ? <Field name={w('backInService')} value={install.returnToService} /> : null}
        {install?.makerHold ? <Field name={w('holdTime')} value={w('makerHold', { hold: install.makerHold })} /> : null}
        {repair.earlierAttempts.length > 0 ? (
          <Field
            name={w('earlier')}
            value={repair.earlierAttempts
              .map((a) => w('earlierText', { started: a.started ?? '—', outcome: a.outcome }))
              .join('; ')}
          />
        ) : null}
      </View>
      {install && install.timeline.marks.length > 0 ? (
        <TimelineChart timeline={install.timeline} zone={data.company.timeZone} w={w} />
      ) : null}
      {install ? (
        <Text style={[s.muted, { marginTop: 4 }]}>
          {t(install.steps.map((step) => `${step.label} ${step.time}`).join(' · '))}
        </Text>
      ) : null}
      {repair.images.length > 0 ? <Images images={repair.images} w={w} /> : null}
    </View>
  );
}

const CHART_WIDTH = 515;
const BAND_COLOURS: Record<string, string> = { window: '#f59e0b', held: BRAND, cure: '#16a34a' };

function TimelineChart({
  timeline,
  zone,
  w,
}: {
  timeline: NonNullable<ReportRepair['install']>['timeline'];
  zone: string;
  w: ReportWords;
}) {
  const g = timelineLayout(timeline.marks, timeline.bands, { width: CHART_WIDTH, charWidth: 3.6 });
  const height = g.height + 4;
  return (
    <View style={{ marginTop: 6 }}>
      <Text style={s.label}>{pdfText(w('timeline', { zone }))}</Text>
      <Svg width={CHART_WIDTH} height={height} viewBox={`0 0 ${CHART_WIDTH} ${height}`}>
        <Line x1={g.left} y1={g.axisY} x2={g.right} y2={g.axisY} stroke="#94a3b8" strokeWidth={1} />
        {g.ticks.map((tick) => (
          <Line
            key={`t${tick.x}`}
            x1={tick.x}
            y1={g.axisY}
            x2={tick.x}
            y2={g.axisY + 3}
            stroke="#94a3b8"
            strokeWidth={0.75}
          />
        ))}
        {g.ticks.map((tick) => (
          <Text key={`l${tick.x}`} x={tick.x - 9} y={g.axisY + 11} style={{ fontSize: 6 }} fill={MUTED}>
            {formatInZone(tick.at, zone, 'HH:mm')}
          </Text>
        ))}
        {g.marks.map((mark) => (
          <Line
            key={`m${mark.id}`}
            x1={mark.x}
            y1={mark.labelY + 2}
            x2={mark.x}
            y2={g.axisY}
            stroke={BRAND}
            strokeWidth={0.75}
          />
        ))}
        {g.marks.map((mark) => (
          <Text
            key={`n${mark.id}`}
            x={mark.x - (mark.label.length * 3.6) / 2}
            y={mark.labelY}
            style={{ fontSize: 6.5 }}
            fill="#0f172a"
          >
            {mark.label}
          </Text>
        ))}
        {g.bands.map((band) => (
          <Rect
            key={`b${band.id}`}
            x={band.x}
            y={band.y}
            width={band.width}
            height={band.height}
            fill={BAND_COLOURS[band.id] ?? MUTED}
            opacity={0.55}
          />
        ))}
        {g.bands.map((band) => (
          <Text key={`bl${band.id}`} x={band.x + 2} y={band.y + band.height - 2} style={{ fontSize: 6 }} fill="#0f172a">
            {band.label}
          </Text>
        ))}
      </Svg>
    </View>
  );
}

function Images({ images, w }: { images: ReportImage[]; w: ReportWords }) {
  return (
    <View style={s.images}>
      {images.map((image) => (
        <View key={image.id} style={s.image}>
          {/* eslint-disable-next-line jsx-a11y/alt-text -- a PDF image, not an HTML one: react-pdf has no alt */}
          <Image
            src={{ data: image.data, format: image.format }}
            style={{ width: 160, maxHeight: 120, objectFit: 'contain' }}
          />
          <Text style={[s.muted, { fontSize: 7.5 }]}>
            {pdfText(
              `${image.kind === 'before' ? w('before') : image.kind === 'after' ? w('after') : w('inspectionImage')}${
                image.caption ? `: ` + `${image.caption}` : ''
              }`,
            )}
          </Text>
        </View>
      ))}
    </View>
  );
}

function Field({ name, value }: { name: string; value: string }) {
  return (
    <View style={s.cell}>
      <Text style={s.label}>{name}</Text>
      <Text>{pdfText(value)}</Text>
    </View>
  );
}

/** Text the standard PDF fonts can show: arrows spelled out, anything outside WinAnsi replaced. */
// Characters the PDF's standard fonts (WinAnsi: Latin-1 plus the Windows-1252 extras) cannot draw.
const WIN1252_MISSING = new RegExp(
  '[^\\u0000-\\u00ff\\u20ac\\u201a\\u0192\\u201e\\u2026\\u2020\\u2021\\u02c6\\u2030\\u0160\\u2039\\u0152\\u017d' +
    '\\u2018\\u2019\\u201c\\u201d\\u2022\\u2013\\u2014\\u02dc\\u2122\\u0161\\u203a\\u0153\\u017e\\u0178]',
  'g',
);

export function pdfText(value: string): string {
  return value
    .replace(/\u2192/g, '->')
    .replace(/\u2190/g, '<-')
    .replace(/\u2264/g, '<=')
    .replace(/\u2265/g, '>=')
    .replace(WIN1252_MISSING, '?');
}
