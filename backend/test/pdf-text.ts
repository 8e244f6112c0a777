import { execFile } from 'node:child_process';

// pdf-parse (pdf.js) loads its worker with a dynamic import, which jest's sandbox refuses; the
// text is read in a plain node process instead.
const SCRIPT = `
const { PDFParse } = require('pdf-parse');
const chunks = [];
process.stdin.on('data', (c) => chunks.push(c));
process.stdin.on('end', async () => {
  const parser = new PDFParse({ data: new Uint8Array(Buffer.concat(chunks)) });
  const result = await parser.getText();
  await parser.destroy();
  process.stdout.write(result.text);
});
`;

/** The PDF's text as pdf-parse extracts it, whitespace runs squashed to one space. */
export function pdfText(pdf: Buffer): Promise<string> {
  return new Promise((resolve, reject) => {
    const child = execFile(
      process.execPath,
      ['-e', SCRIPT],
      { cwd: __dirname, maxBuffer: 20 * 1024 * 1024 },
      (error, stdout, stderr) =>
        error ? reject(new Error(`${error.message}\n${stderr}`)) : resolve(stdout.replace(/\s+/g, ' ')),
    );
    child.stdin?.end(pdf);
  });
}
