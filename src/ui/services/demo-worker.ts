/// <reference lib="webworker" />
// Generates the demo case set off the main thread, so the first screen stays responsive.
import { generateDemoCaseSet } from '../../../demo-cases/generator/generate';

self.onmessage = () => {
  const { manifest, images } = generateDemoCaseSet();
  self.postMessage({ manifest, images }, images.map((image) => image.bytes.buffer as ArrayBuffer));
};
