import { RESEARCH_CAUTION } from '../../core/research-caution';

export const CautionLine = () => <p className="caution-line" role="note">{RESEARCH_CAUTION}</p>;
