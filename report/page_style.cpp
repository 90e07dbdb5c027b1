// The report's stylesheet, inline in the page: system fonts only (nothing to fetch), tabular
// figures, verdict badges that pair a colour with a word, and a print layout on A4 or Letter.
#include "report/page_model.h"

namespace tenure::report {

std::string page_style() {
  return R"css(
:root { --ink: #1d2733; --muted: #5a6672; --line: #d5dbe1; --panel: #f5f7f9; --accent: #0072B2; }
* { box-sizing: border-box; }
html { -webkit-print-color-adjust: exact; print-color-adjust: exact; }
body { margin: 0; background: #fff; color: var(--ink);
  font: 15px/1.5 system-ui, -apple-system, "Segoe UI", Roboto, "Noto Sans", "DejaVu Sans",
  "Liberation Sans", Arial, sans-serif; font-variant-numeric: tabular-nums; }
main { max-width: 1120px; margin: 0 auto; padding: 28px 32px 48px; }
header.run { border-top: 6px solid var(--accent); padding-top: 18px; margin-bottom: 8px; }
header.run .kicker { text-transform: uppercase; letter-spacing: .08em; font-size: 12px;
  color: var(--muted); margin: 0; }
h1 { font-size: 28px; line-height: 1.2; margin: 4px 0 10px; }
h2 { font-size: 21px; margin: 36px 0 10px; padding-bottom: 6px; border-bottom: 2px solid var(--line); }
h3 { font-size: 17px; margin: 22px 0 6px; }
p { margin: 6px 0 10px; }
.facts { display: flex; flex-wrap: wrap; gap: 6px 22px; margin: 0; padding: 0; list-style: none;
  color: var(--muted); font-size: 14px; }
.facts b { color: var(--ink); font-weight: 600; }
.tiles { display: grid; grid-template-columns: repeat(auto-fit, minmax(150px, 1fr)); gap: 12px;
  margin: 16px 0; }
.tile { background: var(--panel); border-left: 5px solid #9aa4ae; padding: 10px 14px; }
.tile .n { font-size: 30px; font-weight: 700; line-height: 1.1; }
.tile .what { font-size: 13px; color: var(--muted); }
.tile.keep { border-left-color: #009E73; } .tile.review { border-left-color: #E69F00; }
.tile.replace { border-left-color: #D55E00; } .tile.newly { border-left-color: #CC79A7; }
.tile.rejected { border-left-color: #5a6672; }
.bar { display: flex; height: 30px; margin: 4px 0 4px; border: 1px solid var(--line); }
.bar span { display: flex; align-items: center; justify-content: center; font-size: 13px;
  font-weight: 600; overflow: hidden; white-space: nowrap; }
.bar .keep { background: #009E73; color: #fff; }
.bar .review { background: #E69F00; color: #1d2733; }
.bar .replace { background: #D55E00; color: #fff; }
.bar-key { font-size: 13px; color: var(--muted); margin: 0 0 8px; }
table { border-collapse: collapse; width: 100%; margin: 8px 0 14px; font-size: 13.5px; }
th, td { padding: 6px 8px; border-bottom: 1px solid var(--line); vertical-align: top; text-align: left; }
th { font-size: 12px; text-transform: uppercase; letter-spacing: .04em; color: var(--muted);
  border-bottom: 2px solid var(--ink); }
td.num { text-align: right; white-space: nowrap; }
th.num { text-align: right; }
table:not(.due) tbody tr:nth-child(even) { background: #fafbfc; }
td.id { white-space: nowrap; }
table.due tbody.item tr:first-child td { border-bottom: 0; padding-bottom: 2px; }
table.due tbody.item:nth-child(even) { background: #fafbfc; }
td.reason { font-size: 12.5px; color: #34404c; padding-top: 0; }
.badge { display: inline-block; padding: 1px 8px; border-radius: 10px; font-size: 11.5px;
  font-weight: 700; letter-spacing: .05em; border: 1px solid; white-space: nowrap; }
.badge.keep { background: #d7f1e7; color: #00573f; border-color: #009E73; }
.badge.review { background: #fcefd2; color: #6b4600; border-color: #E69F00; }
.badge.replace { background: #fbe1d3; color: #8a3300; border-color: #D55E00; }
.new { display: inline-block; font-size: 11px; font-weight: 700; color: #7a2d5a;
  border: 1px dashed #CC79A7; padding: 0 5px; border-radius: 8px; margin-left: 4px; }
.close { display: inline-block; font-size: 11px; font-weight: 700; color: #004f7c;
  border: 1px dotted #0072B2; padding: 0 5px; border-radius: 8px; margin-left: 4px; }
.caution { border: 2px solid #E69F00; background: #fffaf0; padding: 12px 16px; margin: 18px 0;
  font-size: 14px; }
.caution strong { display: block; margin-bottom: 4px; }
.warn { border-left: 5px solid #D55E00; background: #fff4ee; padding: 8px 12px; }
.charts { display: grid; grid-template-columns: repeat(auto-fit, minmax(420px, 1fr)); gap: 16px; }
figure { margin: 0; }
svg.chart { width: 100%; height: auto; display: block; border: 1px solid var(--line); background: #fff;
  font-family: inherit; }
figcaption { font-size: 12.5px; color: var(--muted); margin-top: 4px; }
.cards { display: grid; grid-template-columns: repeat(auto-fill, minmax(320px, 1fr)); gap: 14px; }
.card { border: 1px solid var(--line); padding: 10px 12px 12px; background: #fff; }
.card h3 { margin: 0 0 2px; font-size: 15.5px; display: flex; align-items: center; gap: 8px;
  flex-wrap: wrap; }
.card .sub { font-size: 12.5px; color: var(--muted); margin: 0 0 6px; }
.card p.reason { font-size: 12.5px; margin: 6px 0 0; color: #34404c; }
.card svg.chart { border: 0; }
.card > summary { cursor: pointer; }
.card > summary > h3 { display: inline-flex; }
.card > summary > .sub { margin: 2px 0 0 18px; }
.card:not([open]) { padding: 6px 10px; }
.card[open] { grid-column: 1 / -1; max-width: 560px; }
details.glossary > summary, details.more-due > summary { cursor: pointer;
  font-weight: 600; }
details.more-due { margin-top: 10px; }
nav#contents ol { margin: 4px 0; }
nav#contents ol ol { display: inline; padding: 0; }
nav#contents ol ol li { display: inline; margin-left: 12px; }
table.capital tfoot th, table.capital tfoot td { border-top: 2px solid var(--line);
  font-weight: 600; }
dl.guide { display: grid; grid-template-columns: max-content 1fr; gap: 4px 16px; font-size: 14px; }
dl.guide dt { font-weight: 600; } dl.guide dd { margin: 0; }
footer { margin-top: 32px; font-size: 12px; color: var(--muted); border-top: 1px solid var(--line);
  padding-top: 8px; }
a { color: #00558a; }
@media print {
  @page { margin: 14mm 12mm; }
  body { font-size: 10.5pt; }
  main { max-width: none; padding: 0; }
  h2 { break-after: avoid; page-break-after: avoid; }
  h3 { break-after: avoid; }
  figure, .card, .tile, .caution, tr, tbody.item { break-inside: avoid; page-break-inside: avoid; }
  section.class { break-before: auto; }
  .charts { grid-template-columns: 1fr 1fr; }
  .cards { grid-template-columns: 1fr 1fr 1fr; }
  a { color: inherit; text-decoration: none; }
}
)css";
}

}  // namespace tenure::report
