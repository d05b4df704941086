import { lightSpans, type Span } from "@/lib/sun/spans";
import type { SunYear } from "@/lib/sun/year";

const W = 720;
const H = 340;
const M = { left: 40, right: 12, top: 22, bottom: 26 };
const PW = W - M.left - M.right;
const PH = H - M.top - M.bottom;
const MONTHS = ["Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep", "Oct", "Nov", "Dec"];
const HOURS = [0, 3, 6, 9, 12, 15, 18, 21, 24];

const COLOURS = { night: "#231c3a", twilight: "#8270bd", day: "#f0d68a", marker: "#c4512d", dst: "#fbf2d9" };

/** The year's daylight as an inline SVG: x = day of year, y = local time of day, 00:00 at the top. */
export function SunYearChart({ year, selectedDate }: { year: SunYear; selectedDate: string }) {
  const n = year.days.length;
  const colW = PW / n;
  const x = (i: number) => M.left + i * colW;
  const y = (minute: number) => M.top + (minute / 1440) * PH;
  const band = (i: number, spans: Span[], fill: string, key: string) =>
    spans.map(([from, to], k) => <rect key={`${key}${i}-${k}`} x={x(i)} y={y(from)} width={colW + 0.4} height={y(to) - y(from)} fill={fill} />);
  const selected = year.days.findIndex((d) => d.date === selectedDate);
  const monthStarts = year.days.flatMap((d, i) => (d.date.endsWith("-01") ? [i] : []));
  const offsetChanges = year.days.flatMap((d, i) => (i > 0 && d.utcOffset !== year.days[i - 1]!.utcOffset ? [{ i, offset: d.utcOffset }] : []));
  const place = `${year.latitude.toFixed(2)}°, ${year.longitude.toFixed(2)}°`;

  return (
    <figure>
      <svg viewBox={`0 0 ${W} ${H}`} role="img" aria-labelledby="sun-chart-title sun-chart-desc" className="h-auto w-full">
        <title id="sun-chart-title">{`Daylight and civil twilight through ${year.year} at ${place}, ${year.timeZone}`}</title>
        <desc id="sun-chart-desc">
          {`Each column is one day of the year; the vertical axis is local clock time from midnight at the top to midnight at the bottom. Yellow is daylight between sunrise and sunset, violet is civil twilight, dark is night. Steps in the bands are daylight-saving changes. The table below gives the same times for the first of each month.`}
        </desc>
        <rect x={M.left} y={M.top} width={PW} height={PH} fill={COLOURS.night} />
        <g shapeRendering="crispEdges">
          {year.days.map((d, i) => band(i, lightSpans(d.civilDawn, d.civilDusk), COLOURS.twilight, "t"))}
          {year.days.map((d, i) => band(i, lightSpans(d.sunrise, d.sunset), COLOURS.day, "d"))}
        </g>
        <g stroke="#ffffff" strokeOpacity={0.18}>
          {HOURS.slice(1, -1).map((h) => (
            <line key={h} x1={M.left} x2={M.left + PW} y1={y(h * 60)} y2={y(h * 60)} />
          ))}
        </g>
        <g className="fill-loam-600 dark:fill-loam-400" fontSize={11}>
          {HOURS.map((h) => (
            <text key={h} x={M.left - 6} y={y(h * 60) + 4} textAnchor="end">
              {String(h).padStart(2, "0")}:00
            </text>
          ))}
          {monthStarts.map((i, m) => (
            <g key={i}>
              <line x1={x(i)} x2={x(i)} y1={M.top + PH} y2={M.top + PH + 5} className="stroke-loam-400" />
              <text x={x(i) + colW * 15} y={H - 8} textAnchor="middle">
                {MONTHS[m]}
              </text>
            </g>
          ))}
        </g>
        {offsetChanges.map(({ i, offset }) => (
          <g key={`dst${i}`}>
            <line x1={x(i)} x2={x(i)} y1={M.top} y2={M.top + PH} stroke={COLOURS.dst} strokeDasharray="3 3" strokeOpacity={0.8} />
            <text x={x(i)} y={M.top - 6} textAnchor="middle" fontSize={10} className="fill-loam-600 dark:fill-loam-400">
              UTC{offset}
            </text>
          </g>
        ))}
        {selected >= 0 && (
          <g>
            <line x1={x(selected) + colW / 2} x2={x(selected) + colW / 2} y1={M.top} y2={M.top + PH} stroke={COLOURS.marker} strokeWidth={2} />
            <circle cx={x(selected) + colW / 2} cy={M.top + PH} r={4} fill={COLOURS.marker} />
          </g>
        )}
      </svg>
      <figcaption className="mt-2 flex flex-wrap gap-x-5 gap-y-1 text-sm text-loam-600 dark:text-loam-400">
        <Swatch colour={COLOURS.day} label="Daylight (sunrise to sunset)" />
        <Swatch colour={COLOURS.twilight} label="Civil twilight" />
        <Swatch colour={COLOURS.night} label="Night" />
        <Swatch colour={COLOURS.marker} label={`Chosen date (${selectedDate})`} />
        {offsetChanges.length > 0 && <span>Dashed lines: clock changes (new UTC offset above)</span>}
      </figcaption>
    </figure>
  );
}

function Swatch({ colour, label }: { colour: string; label: string }) {
  return (
    <span className="inline-flex items-center gap-1.5">
      <span aria-hidden className="inline-block h-3 w-3 rounded-sm border border-loam-400" style={{ backgroundColor: colour }} />
      {label}
    </span>
  );
}
