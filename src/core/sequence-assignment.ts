/**
 * Readers assigned to crossover sequences by seeded permuted-block randomisation: enrolment
 * slots are taken in blocks of S = number of sequences, and each block is a random permutation
 * of the S sequences (stream 'sequence-block/<j>' for block j). After every complete block each
 * sequence has the same number of readers; within an incomplete block they differ by at most 1.
 *
 * A reader's sequence depends only on the seed and their enrolment index (0-based), so readers
 * enrolled later take the next slots and never change the assignment of those before them.
 * Throws RangeError when the index is not a whole number >= 0 or the design has no sequence.
 * Example: with sequences UA, AU and a seed, slots 0 and 1 get UA and AU in some order, slots
 * 2 and 3 again both, in an order of their own.
 */
import type { Sequence, StudyDesign } from './design';
import { createRng } from './rng';

export type SequenceAssignment = { readerId: string; index: number; sequenceIndex: number; sequence: Sequence };

/** The index (into design.sequences) of the sequence of enrolment slot `index`. */
export const sequenceIndexForSlot = (design: StudyDesign, index: number): number => {
  const size = design.sequences.length;
  if (size === 0) throw new RangeError('the design has no sequence to assign');
  if (!Number.isInteger(index) || index < 0) throw new RangeError(`an enrolment index must be a whole number >= 0, got ${index}`);
  const block = Math.floor(index / size);
  const order = createRng(design.seed, `sequence-block/${block}`).shuffle(design.sequences.map((_, i) => i));
  return order[index % size] ?? 0;
};

/** The assignment of one reader enrolled at position `index` (0-based). */
export const assignSequence = (design: StudyDesign, readerId: string, index: number): SequenceAssignment => {
  const sequenceIndex = sequenceIndexForSlot(design, index);
  const sequence = design.sequences[sequenceIndex];
  if (sequence === undefined) throw new RangeError(`no sequence ${sequenceIndex}`);
  return { readerId, index, sequenceIndex, sequence };
};

/** Assignments for readers in enrolment order. Throws RangeError on a repeated reader id. */
export const assignSequences = (design: StudyDesign, readerIds: readonly string[]): SequenceAssignment[] => {
  const seen = new Set<string>();
  return readerIds.map((id, i) => {
    if (seen.has(id)) throw new RangeError(`reader "${id}" is enrolled twice`);
    seen.add(id);
    return assignSequence(design, id, i);
  });
};
