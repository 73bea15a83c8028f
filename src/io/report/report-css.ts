// The report's own stylesheet, inlined into the page; every rule is under .heed-report so the
// same markup sits inside the app without touching its styles. Print rules make it a clean PDF.
export const REPORT_CSS = `
.heed-report { font-family: system-ui, -apple-system, "Segoe UI", Roboto, sans-serif; color: #1d1d1f; background: #fff; line-height: 1.5; max-width: 980px; margin: 0 auto; padding: 24px 28px 40px; font-size: 16px; }
.heed-report h1 { font-size: 1.7rem; margin: 0 0 4px; }
.heed-report h2 { font-size: 1.3rem; margin: 32px 0 8px; padding-top: 12px; border-top: 2px solid #e3e3e8; }
.heed-report h3 { font-size: 1.05rem; margin: 20px 0 6px; }
.heed-report .meta { color: #555; margin: 0 0 12px; }
.heed-report .caution { border-left: 4px solid #0072B2; background: #f2f7fb; padding: 10px 14px; margin: 12px 0; font-size: 0.95rem; }
.heed-report .lead { font-size: 1.25rem; font-weight: 600; margin: 8px 0; }
.heed-report .sure { color: #333; margin: 4px 0 8px; }
.heed-report .explain { color: #333; margin: 6px 0 10px; max-width: 72ch; }
.heed-report .note { color: #555; font-style: italic; }
.heed-report table { border-collapse: collapse; margin: 8px 0 12px; font-size: 0.95rem; }
.heed-report th, .heed-report td { border-bottom: 1px solid #ddd; padding: 6px 12px 6px 0; text-align: left; vertical-align: top; }
.heed-report th[scope=col] { font-weight: 600; color: #333; }
.heed-report td.num { font-variant-numeric: tabular-nums; }
.heed-report .ci { color: #555; white-space: nowrap; }
.heed-report .sub { display: block; color: #666; font-size: 0.82rem; }
.heed-report .few { display: block; color: #8a4b00; font-size: 0.82rem; font-weight: 600; }
.heed-report .plot { margin: 6px 0 4px; max-width: 100%; overflow: hidden; }
.heed-report .plot svg { max-width: 100%; height: auto; }
.heed-report .review-case img { width: 96px; height: 96px; object-fit: cover; border: 1px solid #ccc; }
.heed-report .kind { font-weight: 600; }
.heed-report .rule { background: #f7f7f9; padding: 10px 14px; border-radius: 6px; font-size: 0.95rem; }
.heed-report .sr { position: absolute; width: 1px; height: 1px; overflow: hidden; clip: rect(0 0 0 0); white-space: nowrap; }
.heed-report footer { margin-top: 36px; color: #555; font-size: 0.9rem; }
@media print {
  @page { size: A4; margin: 14mm; }
  .no-print { display: none !important; }
  .heed-report { max-width: none; padding: 0; font-size: 11pt; }
  .heed-report .plot, .heed-report tr, .heed-report .lead { break-inside: avoid; }
  .heed-report h2, .heed-report h3 { break-after: avoid; }
  .heed-report .caution, .heed-report .rule { -webkit-print-color-adjust: exact; print-color-adjust: exact; }
}
`;
