import type { CaseReviewItem } from '../../analysis/reader-report/case-review';
import type { ReaderReport } from '../../analysis/reader-report/reader-report';
import { esc } from './html';

/** Case id → an image as a data: URL (the coordinator chose to include images); absent ids get none. */
export type CaseImages = ReadonlyMap<string, string>;

const call = (c: 0 | 1 | null): string => (c === null ? '–' : c === 1 ? 'present' : 'absent');

const KIND = { 'followed-wrong': 'Followed a wrong suggestion', 'rejected-right': 'Went against a right suggestion' } as const;

/** Only data: URLs of PNG or JPEG pass, so no address can reach the report through an image. */
const safeImage = (url: string | undefined): string | null =>
  url !== undefined && /^data:image\/(png|jpeg);base64,[A-Za-z0-9+/=]+$/.test(url) ? url : null;

const row = (item: CaseReviewItem, images: CaseImages | null, showFinding: boolean): string => {
  const img = images === null ? null : safeImage(images.get(item.case_id));
  const picture = images === null ? '' : `<td class="review-case">${img === null ? '<span class="sub">no image</span>' : `<img src="${img}" alt="case ${esc(item.case_id)}">`}</td>`;
  return `<tr data-review-case="${esc(item.case_id)}">${picture}<th scope="row">${esc(item.case_id)}${showFinding ? `<span class="sub">${esc(item.finding)}</span>` : ''}<span class="sub">period ${item.period}</span></th>`
    + `<td class="kind">${KIND[item.kind]}</td><td>${call(item.first_call)}</td><td>${call(item.final_call)}</td>`
    + `<td>${call(item.suggestion_call)}${item.suggestion_score === null ? '' : ` <span class="sub">score ${item.suggestion_score.toFixed(2)}</span>`}</td><td><strong>${call(item.truth)}</strong></td></tr>`;
};

/** The case review section: absent (with its reason) while any period is open. */
export const caseReviewHtml = (report: ReaderReport, images: CaseImages | null): string => {
  const items = report.case_review;
  const showFinding = report.findings.length > 1;
  const table = items === null || items.length === 0 ? '' : `<table data-case-review="${items.length}"><thead><tr>${images === null ? '' : '<th scope="col">Image</th>'}<th scope="col">Case</th><th scope="col">What happened</th><th scope="col">Your first call</th><th scope="col">Your final call</th><th scope="col">Suggestion</th><th scope="col">Truth</th></tr></thead>
<tbody>${items.map((i) => row(i, images, showFinding)).join('')}</tbody></table>`;
  return `<section id="case-review" aria-labelledby="case-review-head"><h2 id="case-review-head">Cases to look at again</h2><p class="explain">${esc(report.case_review_note)}</p>${table}</section>`;
};
