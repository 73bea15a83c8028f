// A DOM document for drawing plots in Node (the CLI's reports), from linkedom.
import { parseHTML } from 'linkedom';

export const plotDocument = (): Document => parseHTML('<!doctype html><html><head></head><body></body></html>').document as unknown as Document;
