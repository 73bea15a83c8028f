/**
 * A seeded simulated read log (docs/formats.md, "The read log") in a fictional scenario of our own: invented
 * readers read invented cases from three fictional scanners (Halden, Veyra, Tamsin) in a
 * two-period crossover, unaided in one period and aided (sequential by default) in the other,
 * so every reader reads every case both ways (fully crossed). No patient data; for benchmarks
 * and tests only.
 *
 * Model (plain and deliberately simple): each case has truth ~ Bernoulli(prevalence) and a
 * latent difficulty; a reader's evidence is truth·skill + N(0,1) − difficulty-noise; the model's
 * score is a logistic of truth-shifted noise, worse on the Tamsin scanner; a planted error flips
 * the suggestion. Aided, a reader follows a disagreeing suggestion with probability `follow`.
 *
 * Example: simulateReadLog({ seed: 1, readers: 50, cases: 1000 }) → a 100,000-read CSV string.
 */
import { uniformFloat64 } from 'pure-rand/distribution/uniformFloat64';
import { xoroshiro128plus } from 'pure-rand/generator/xoroshiro128plus';
import type { Assistance } from '../src/core/design';
import type { Bit, ReadRow } from '../src/core/read-log';
import { readLogCsv } from '../src/io/read-log-export';

export type SimulationOptions = {
  seed: number;
  readers: number;
  cases: number;
  /** assistance of the aided period; default 'sequential' */
  aided?: Exclude<Assistance, 'none'>;
  /** practice cases read first in each period (practice = 1); default 0 */
  practiceCases?: number;
  prevalence?: number;
  /** share of case-findings whose suggestion is a planted error; default 0.1 */
  plantedRate?: number;
  /** probability of following a disagreeing suggestion; default 0.4 */
  follow?: number;
  /** whether readers give a confidence; default true */
  askConfidence?: boolean;
  /** share of aided reads with the caution notice; default 0.5 */
  cautionRate?: number;
  finding?: string;
};

const SCANNERS = ['Halden', 'Veyra', 'Tamsin'] as const;

/** The simulated reads as typed rows (practice cases included, flagged). */
export const simulateReadRows = (o: SimulationOptions): ReadRow[] => {
  const rng = xoroshiro128plus(o.seed);
  const u = () => uniformFloat64(rng);
  const normal = () => Math.sqrt(-2 * Math.log(1 - u())) * Math.cos(2 * Math.PI * u());
  const bit = (p: number): Bit => (u() < p ? 1 : 0);
  const aidedMode = o.aided ?? 'sequential';
  const practice = o.practiceCases ?? 0;
  const finding = o.finding ?? 'target';
  const total = o.cases + practice;
  const cases = Array.from({ length: total }, (_, i) => {
    const truth = bit(o.prevalence ?? 0.4);
    const scanner = SCANNERS[i % 3] as (typeof SCANNERS)[number];
    const noise = scanner === 'Tamsin' ? 1.6 : 0.9;
    let score = 1 / (1 + Math.exp(-((truth === 1 ? 1.4 : -1.4) + noise * normal())));
    const planted = bit(o.plantedRate ?? 0.1);
    if (planted === 1) score = truth === 1 ? 0.1 + 0.3 * u() : 0.6 + 0.3 * u();
    const call: Bit = score >= 0.5 ? 1 : 0;
    return { id: `C${String(i + 1).padStart(4, '0')}`, practice: i < practice ? 1 : 0, truth, scanner, difficulty: 0.5 * normal(), score: Math.round(score * 1000) / 1000, call, planted };
  });
  const rows: ReadRow[] = [];
  const start = Date.UTC(2026, 0, 12, 8, 0, 0);
  for (let r = 0; r < o.readers; r++) {
    const readerId = `R${r + 1}`;
    const skill = 1.2 + 0.8 * u();
    const years = Math.round(1 + 20 * u());
    const sequence = r % 2 === 0 ? 'UA' : 'AU';
    for (let period = 1; period <= 2; period++) {
      const assistance: Assistance = (sequence === 'UA') === (period === 1) ? 'none' : aidedMode;
      let clock = start + (period - 1) * 28 * 86_400_000 + r * 3_600_000;
      cases.forEach((c, k) => {
        const evidence = (c.truth === 1 ? skill : 0) + normal() - c.difficulty - skill / 2;
        const own: Bit = evidence > 0 ? 1 : 0;
        const conf = () => (o.askConfidence ?? true ? Math.min(100, Math.round(Math.abs(evidence) * 40 + 20 * u())) : null);
        const initialConfidence = conf();
        const aided = assistance !== 'none';
        const final: Bit = aided && own !== c.call && u() < (o.follow ?? 0.4) ? c.call : own;
        const totalMs = Math.round(2000 + 4000 * u() + (aided ? 1500 : 0));
        rows.push({
          study_id: 'SIM-1', reader_id: readerId, reader_role: r % 3 === 0 ? 'resident' : 'radiologist', reader_years: years,
          sequence, period, assistance, case_id: c.id, finding, practice: c.practice as Bit, order: k + 1, truth: c.truth,
          ai_call: aided ? c.call : null, ai_score: aided ? c.score : null, ai_planted: aided ? c.planted : 0,
          caution_shown: aided ? bit(o.cautionRate ?? 0.5) : 0,
          initial_call: assistance === 'sequential' ? own : null,
          initial_confidence: assistance === 'sequential' ? initialConfidence : null,
          initial_ms: assistance === 'sequential' ? Math.round(totalMs * 0.7) : null,
          final_call: final, final_confidence: final === own ? initialConfidence : conf(), total_ms: totalMs,
          shown_at: new Date(clock).toISOString(),
          scale: 'call-confidence', initial_rating: null, final_rating: null, training: 0, withdrawn: 0, case_attributes: { scanner: c.scanner },
        });
        clock += totalMs + 500;
      });
    }
  }
  return rows;
};

/** The simulated log as a read-log CSV string (docs/formats.md) (with a case_scanner column). */
export const simulateReadLog = (o: SimulationOptions): string => readLogCsv(simulateReadRows(o), ['scanner']);
