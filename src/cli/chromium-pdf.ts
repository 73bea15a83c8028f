// Printing an HTML file to PDF through a local Chromium (headless), for `heed report --pdf`.
import { spawn } from 'node:child_process';
import { access, constants, stat } from 'node:fs/promises';
import { pathToFileURL } from 'node:url';
import { CliError } from './cli-error';

/** HEED_CHROMIUM, else Debian's /usr/bin/chromium. */
export const chromiumPath = (): string => process.env.HEED_CHROMIUM ?? '/usr/bin/chromium';

const TIMEOUT_MS = 60_000;

/** Prints htmlFile to pdfFile; a clear CliError when no Chromium is found or printing fails. */
export const printHtmlToPdf = async (htmlFile: string, pdfFile: string, profileDir: string): Promise<void> => {
  const chromium = chromiumPath();
  try {
    await access(chromium, constants.X_OK);
  } catch {
    throw new CliError(`--pdf needs a local Chromium, none found at ${chromium} (set HEED_CHROMIUM to its path, or leave out --pdf and print the HTML from a browser)`);
  }
  const args = ['--headless', '--no-sandbox', '--disable-gpu', '--no-first-run', '--no-pdf-header-footer', `--user-data-dir=${profileDir}`, `--print-to-pdf=${pdfFile}`, pathToFileURL(htmlFile).href];
  const code = await new Promise<number | null>((resolve, reject) => {
    const child = spawn(chromium, args, { stdio: 'ignore' });
    const timer = setTimeout(() => child.kill('SIGKILL'), TIMEOUT_MS);
    child.on('error', (e) => { clearTimeout(timer); reject(e); });
    child.on('exit', (c) => { clearTimeout(timer); resolve(c); });
  }).catch((e: unknown) => { throw new CliError(`--pdf: cannot start Chromium at ${chromium}: ${e instanceof Error ? e.message : String(e)}`); });
  const size = await stat(pdfFile).then((s) => s.size, () => 0);
  if (code !== 0 || size === 0) throw new CliError(`--pdf: Chromium at ${chromium} did not write ${pdfFile} (exit ${code})`);
};
