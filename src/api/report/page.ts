/**
 * The self-contained HTML report a lab attaches to a record: one page, inline
 * CSS and inline SVG plots, no script, no font, image or style fetched from
 * anywhere (a Content-Security-Policy in the page forbids it as well), and it
 * prints on A4. Every string that could come from a user is escaped; the
 * plots are SVG from `renderPlot` and are checked before they are inlined.
 */
import type { Warning } from '../../core/notes.js';
import type { Reference } from '../../core/references.js';
import { escapeHtml } from './escape.js';
import { FONT_STACK, scopeSvgIds } from './render.js';

/** How a mechanism fares against its requirement. */
export type MechanismStatus = 'pass' | 'conditional' | 'fail' | 'not-evaluated';

/** The one-line answer for the whole design. */
export type OverallVerdict = 'works' | 'works-with-conditions' | 'fails';

export interface MechanismRow {
  /** Mechanism in plain words, e.g. "lubricant retention". */
  mechanism: string;
  status: MechanismStatus;
  /** The verdict in words, e.g. "calm", "62 % retained after 2 h". */
  verdict: string;
  /** Relative margin to the requirement (0.25 = 25 % to spare, negative = short of it); null where none applies. */
  margin: number | null;
  /** The requirement in words with its value, e.g. "retained ≥ 50 % after 2 h". */
  requirement: string;
}

export interface ReportFigure {
  /** A standalone SVG document from one of the plot builders. */
  svg: string;
  /** What the plot shows and how to read it (plain text). */
  caption: string;
}

export interface ReportPageInput {
  /** Name of the design as the user gave it. */
  title: string;
  /** The design, one row per quantity, values already formatted with their units. */
  design: readonly { label: string; value: string }[];
  /** The normalised SI inputs, printed in an appendix so the record is complete. */
  inputs?: unknown;
  provenance: {
    service: string;
    version: string;
    /** SHA-256 of the canonical normalised inputs. */
    inputsHash: string;
    /** When the assessment ran, ISO 8601. */
    generatedAt: string;
    models?: readonly string[];
  };
  overall?: { verdict: OverallVerdict; limitingMechanism?: string; summary?: string };
  mechanisms: readonly MechanismRow[];
  figures: readonly ReportFigure[];
  assumptions: readonly string[];
  warnings: readonly Warning[];
  references: readonly Reference[];
  /** Replaces the standard safety caution where the caller has a more specific one. */
  safetyCaution?: string;
}

export const STANDARD_SAFETY_CAUTION =
  'The figures in this report are model estimates for screening a design. Each rests on the assumptions listed here and holds ' +
  'only within the validity ranges its warnings name. In service a liquid-infused surface can lose its lubricant, its slip or its ' +
  'heat-transfer change sooner than predicted (contamination, abrasion, flow surges, ageing of the coating). Where such a loss could ' +
  'harm people, equipment or the environment (for example an exchanger sized on the predicted heat transfer, or a medical or food ' +
  'contact surface relying on the lubricant layer), test samples under the real service conditions before relying on the design, ' +
  'and handle the lubricant as its safety data sheet requires.';

const STATUS_WORDS: Record<MechanismStatus, string> = { pass: 'meets', conditional: 'conditional', fail: 'fails', 'not-evaluated': 'not evaluated' };
const OVERALL_WORDS: Record<OverallVerdict, string> = { works: 'works', 'works-with-conditions': 'works with conditions', fails: 'fails' };
const SEVERITY_ORDER: Record<Warning['severity'], number> = { warning: 0, caution: 1, info: 2 };

/** Relative margin as a signed percentage with two significant digits. */
export function formatMargin(margin: number | null): string {
  if (margin === null || !Number.isFinite(margin)) return '—';
  const percent = margin * 100;
  if (percent === 0) return '0 %';
  const text = Math.abs(percent) >= 100 ? percent.toFixed(0) : percent.toPrecision(2);
  return `${percent > 0 ? '+' : ''}${text.replace('-', '−')} %`;
}

/**
 * Refuses anything but an SVG document without script, embedded HTML or an
 * external reference: the page inlines plots unescaped, so this is the gate.
 */
function checkedSvg(svg: string, index: number): string {
  const body = svg.trim();
  // Text content is escaped by the renderer, so only tags can carry markup; look inside them.
  const tags = body.match(/<[^>]*>/g) ?? [];
  const problems = [
    [!body.startsWith('<svg'), 'does not start with <svg'],
    [tags.some((t) => /^<\/?(script|style|foreignObject|iframe|image|use)\b/i.test(t) || /\son[a-z]+\s*=/i.test(t)), 'contains script, embedded content or an event handler'],
    [tags.some((t) => /\b(href|src)\s*=\s*["'](?!#)/i.test(t) || /url\(\s*["']?(?!#)/i.test(t)), 'refers to an external resource'],
  ] as const;
  for (const [bad, why] of problems) if (bad) throw new Error(`figure ${index + 1}: the plot ${why}`);
  return body;
}

const CSS = `
@page { size: A4; margin: 15mm 14mm 17mm; }
:root { color: #1a1a1a; background: #ffffff; font-family: ${FONT_STACK}; font-size: 10.5pt; line-height: 1.45; }
body { max-width: 182mm; margin: 0 auto; padding: 8mm 6mm 12mm; }
header { border-bottom: 2px solid #1a1a1a; padding-bottom: 6pt; margin-bottom: 10pt; }
.kicker { margin: 0; font-size: 9.5pt; letter-spacing: 0.04em; text-transform: uppercase; color: #555555; }
h1 { font-size: 18pt; margin: 2pt 0 6pt; line-height: 1.2; overflow-wrap: anywhere; }
h2 { font-size: 12.5pt; margin: 16pt 0 6pt; padding-bottom: 2pt; border-bottom: 1px solid #bbbbbb; break-after: avoid; }
dl.provenance { display: grid; grid-template-columns: max-content 1fr; gap: 1pt 10pt; margin: 0; font-size: 9.5pt; }
dl.provenance dt { color: #555555; }
dl.provenance dd { margin: 0; overflow-wrap: anywhere; }
code, pre { font-family: ui-monospace, Menlo, Consolas, monospace; font-size: 9pt; }
table { border-collapse: collapse; width: 100%; font-variant-numeric: tabular-nums; }
th, td { text-align: left; vertical-align: top; padding: 3pt 6pt; border-bottom: 1px solid #dddddd; overflow-wrap: anywhere; }
th { border-bottom: 1.5px solid #888888; font-weight: 600; }
tr { break-inside: avoid; }
td.number { text-align: right; white-space: nowrap; }
.status { display: inline-block; padding: 0 5pt; border-radius: 3pt; font-weight: 600; white-space: nowrap; }
.status-pass, .overall-works { background: #dcefe0; color: #17502a; }
.status-conditional, .overall-works-with-conditions { background: #fbefc9; color: #5c4300; }
.status-fail, .overall-fails { background: #f8dcd7; color: #7a1b10; }
.status-not-evaluated { background: #eeeeee; color: #444444; }
.overall { padding: 8pt 12pt; border-radius: 4pt; margin: 10pt 0; break-inside: avoid; }
.overall p { margin: 2pt 0; }
.overall .answer { font-size: 14pt; font-weight: 700; }
.caution { border: 2px solid #a5281b; background: #fdf3f1; padding: 6pt 12pt; margin: 10pt 0; break-inside: avoid; }
.caution h2 { border: 0; margin: 2pt 0; color: #a5281b; }
.caution p { margin: 2pt 0 4pt; }
figure { margin: 12pt 0; break-inside: avoid; }
figure svg { display: block; max-width: 100%; height: auto; }
figcaption { font-size: 9.5pt; color: #333333; margin-top: 3pt; }
.note { font-size: 9.5pt; color: #444444; }
ol.references li, ol.assumptions li { margin-bottom: 3pt; }
.severity-warning { color: #7a1b10; font-weight: 600; }
.severity-caution { color: #5c4300; font-weight: 600; }
pre { white-space: pre-wrap; overflow-wrap: anywhere; background: #f6f6f6; padding: 6pt; }
footer { margin-top: 18pt; padding-top: 4pt; border-top: 1px solid #bbbbbb; font-size: 9pt; color: #555555; }
a { color: #1f4f7a; }
@media print {
  body { max-width: none; padding: 0; }
  a { color: inherit; text-decoration: none; }
  .status, .overall, .caution { print-color-adjust: exact; -webkit-print-color-adjust: exact; }
  .appendix { break-before: page; }
}
`;

/** Policy carried by the page itself: nothing may load from anywhere, no script may run. */
const CONTENT_SECURITY_POLICY = "default-src 'none'; style-src 'unsafe-inline'; img-src data:; base-uri 'none'; form-action 'none'";

function provenanceList(input: ReportPageInput): string {
  const p = input.provenance;
  const rows: [string, string][] = [
    ['Calculated by', `${p.service} ${p.version}`],
    ['Calculated at', p.generatedAt],
    ['Inputs hash (SHA-256)', p.inputsHash],
  ];
  if (p.models && p.models.length > 0) rows.push(['Models', p.models.join(', ')]);
  return `<dl class="provenance">${rows.map(([k, v]) => `<dt>${escapeHtml(k)}</dt><dd>${k.startsWith('Inputs') ? `<code>${escapeHtml(v)}</code>` : escapeHtml(v)}</dd>`).join('')}</dl>`;
}

function overallBlock(overall: NonNullable<ReportPageInput['overall']>): string {
  const limiting = overall.limitingMechanism ? ` — limited by ${escapeHtml(overall.limitingMechanism)}` : '';
  return (
    `<section class="overall overall-${overall.verdict}" aria-label="Overall verdict">` +
    `<p class="answer">This design ${OVERALL_WORDS[overall.verdict]}${limiting}</p>` +
    (overall.summary ? `<p>${escapeHtml(overall.summary)}</p>` : '') +
    `</section>`
  );
}

function designTable(rows: ReportPageInput['design']): string {
  if (rows.length === 0) return '<p class="note">No design quantities were given.</p>';
  return `<table class="design"><tbody>${rows.map((r) => `<tr><th scope="row">${escapeHtml(r.label)}</th><td>${escapeHtml(r.value)}</td></tr>`).join('')}</tbody></table>`;
}

function verdictTable(rows: readonly MechanismRow[]): string {
  if (rows.length === 0) return '<p class="note">No mechanism was evaluated.</p>';
  const body = rows
    .map(
      (r) =>
        `<tr><td>${escapeHtml(r.mechanism)}</td>` +
        `<td><span class="status status-${r.status}">${STATUS_WORDS[r.status]}</span> ${escapeHtml(r.verdict)}</td>` +
        `<td class="number">${formatMargin(r.margin)}</td>` +
        `<td>${escapeHtml(r.requirement)}</td></tr>`,
    )
    .join('');
  return (
    `<table class="verdicts"><thead><tr><th>Mechanism</th><th>Verdict</th><th>Margin</th><th>Requirement</th></tr></thead><tbody>${body}</tbody></table>` +
    '<p class="note">Margin: how far the result lies from its requirement, relative to the requirement; positive means met with that much to spare.</p>'
  );
}

function figures(list: readonly ReportFigure[]): string {
  if (list.length === 0) return '<p class="note">No plots.</p>';
  return list
    .map((f, i) => {
      const id = `figure-${i + 1}`;
      return `<figure id="${id}" data-plot="${i + 1}">${scopeSvgIds(checkedSvg(f.svg, i), id)}<figcaption><strong>Figure ${i + 1}.</strong> ${escapeHtml(f.caption)}</figcaption></figure>`;
    })
    .join('\n');
}

function warningsTable(list: readonly Warning[]): string {
  if (list.length === 0) return '<p>None.</p>';
  const sorted = [...list].sort((a, b) => SEVERITY_ORDER[a.severity] - SEVERITY_ORDER[b.severity]);
  return (
    '<table class="warnings"><thead><tr><th>Severity</th><th>Code</th><th>Message</th></tr></thead><tbody>' +
    sorted.map((w) => `<tr><td class="severity-${w.severity}">${escapeHtml(w.severity)}</td><td><code>${escapeHtml(w.code)}</code></td><td>${escapeHtml(w.message)}</td></tr>`).join('') +
    '</tbody></table>'
  );
}

function referenceList(list: readonly Reference[]): string {
  if (list.length === 0) return '<p>None.</p>';
  const item = (r: Reference) => {
    const doi = r.doi ? ` <a href="https://doi.org/${escapeHtml(encodeURI(r.doi))}" rel="noreferrer">doi:${escapeHtml(r.doi)}</a>` : '';
    return `<li id="ref-${escapeHtml(r.key)}">${escapeHtml(r.citation)}${doi}</li>`;
  };
  return `<ol class="references">${list.map(item).join('')}</ol>`;
}

/** The report as one HTML document (a string); pure and deterministic for the same input. */
export function buildReportPage(input: ReportPageInput): string {
  const title = escapeHtml(input.title);
  const assumptions = input.assumptions.length === 0 ? '<p>None stated.</p>' : `<ol class="assumptions">${input.assumptions.map((a) => `<li>${escapeHtml(a)}</li>`).join('')}</ol>`;
  const appendix =
    input.inputs === undefined
      ? ''
      : `<section class="appendix"><h2>Appendix: normalised inputs (SI)</h2><pre>${escapeHtml(JSON.stringify(input.inputs, null, 2) ?? 'null')}</pre></section>`;
  const generator = `${input.provenance.service} ${input.provenance.version}`;
  return `<!DOCTYPE html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta http-equiv="Content-Security-Policy" content="${CONTENT_SECURITY_POLICY}">
<meta name="viewport" content="width=device-width, initial-scale=1">
<meta name="generator" content="${escapeHtml(generator)}">
<title>${title} — liquid-infused surface assessment</title>
<style>${CSS}</style>
</head>
<body>
<header>
<p class="kicker">Liquid-infused surface assessment</p>
<h1>${title}</h1>
${provenanceList(input)}
</header>
<main>
${input.overall ? overallBlock(input.overall) : ''}
<section class="caution" aria-label="Safety caution"><h2>Safety caution</h2><p>${escapeHtml(input.safetyCaution ?? STANDARD_SAFETY_CAUTION)}</p></section>
<section><h2>Design</h2>${designTable(input.design)}</section>
<section><h2>Verdict by mechanism</h2>${verdictTable(input.mechanisms)}</section>
<section><h2>Plots</h2>
${figures(input.figures)}
</section>
<section><h2>Assumptions</h2>${assumptions}</section>
<section><h2>Warnings</h2>${warningsTable(input.warnings)}</section>
<section><h2>References</h2>${referenceList(input.references)}</section>
${appendix}
</main>
<footer>Calculated by ${escapeHtml(generator)} at ${escapeHtml(input.provenance.generatedAt)}; inputs hash <code>${escapeHtml(input.provenance.inputsHash)}</code>.</footer>
</body>
</html>
`;
}
