// Draws Setline's icons from its own mark (components/shell/logo.tsx) and writes them where the app serves them:
//   public/icons/icon-192.png, icon-512.png   "any" purpose: the mark on a rounded brand-teal square
//   public/icons/maskable-512.png             "maskable": full-bleed teal, the mark inside the central safe circle
//   public/favicon.ico                        16, 32 and 48 px PNGs in one ICO container
//   app/icon.svg, app/apple-icon.png          picked up by Next (link rel="icon" / "apple-touch-icon")
// Run: node scripts/make-icons.mjs   (after changing the mark; the outputs are committed)
import { build } from 'esbuild';
import { mkdir, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import sharp from 'sharp';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
// The palette (tailwind.config.ts): brand-700 behind, the mark drawn in white.
const BRAND = '#115e59';
const MARK = '#ffffff';

/** The <svg> of components/shell/logo.tsx, rendered by React exactly as the app renders it. */
async function markSvg() {
  const out = path.join(root, '.data', 'icons', 'logo.mjs');
  await build({
    entryPoints: [path.join(root, 'components/shell/logo.tsx')],
    bundle: true,
    format: 'esm',
    platform: 'node',
    jsx: 'automatic',
    outfile: out,
    external: ['react', 'react/jsx-runtime'],
    logLevel: 'error',
  });
  const { Logo } = await import(pathToFileURL(out).href);
  return renderToStaticMarkup(createElement(Logo, { className: '' })).replaceAll('currentColor', MARK);
}

/** The mark placed in a square of `size` user units: `scale` of the side, on a background with corner radius `radius`. */
function iconSvg(mark, { scale, radius }) {
  const side = 512;
  const offset = Math.round((side * (1 - scale)) / 2);
  const inner = side - 2 * offset;
  const placed = mark
    .replace(/ class="[^"]*"/, '')
    .replace(/ aria-hidden="true"/, '')
    .replace('<svg ', `<svg x="${offset}" y="${offset}" width="${inner}" height="${inner}" `);
  return (
    `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${side} ${side}" width="${side}" height="${side}">` +
    `<rect width="${side}" height="${side}" rx="${radius}" fill="${BRAND}"/>${placed}</svg>`
  );
}

const png = (svg, size) =>
  sharp(Buffer.from(svg), { density: 72 * (size / 512) * 4 })
    .resize(size, size)
    .png()
    .toBuffer();

/** An ICO holding PNG images (the format allows PNG entries; every current browser reads them). */
function ico(images) {
  const header = Buffer.alloc(6);
  header.writeUInt16LE(0, 0);
  header.writeUInt16LE(1, 2);
  header.writeUInt16LE(images.length, 4);
  let offset = 6 + 16 * images.length;
  const entries = images.map(({ size, data }) => {
    const entry = Buffer.alloc(16);
    entry.writeUInt8(size >= 256 ? 0 : size, 0);
    entry.writeUInt8(size >= 256 ? 0 : size, 1);
    entry.writeUInt8(0, 2);
    entry.writeUInt8(0, 3);
    entry.writeUInt16LE(1, 4);
    entry.writeUInt16LE(32, 6);
    entry.writeUInt32LE(data.length, 8);
    entry.writeUInt32LE(offset, 12);
    offset += data.length;
    return entry;
  });
  return Buffer.concat([header, ...entries, ...images.map((image) => image.data)]);
}

const mark = await markSvg();
const any = iconSvg(mark, { scale: 0.78, radius: 96 });
// Maskable: a launcher may cut the icon to a circle of 80 % of its side; the mark stays inside it.
const maskable = iconSvg(mark, { scale: 0.56, radius: 0 });

await mkdir(path.join(root, 'public/icons'), { recursive: true });
await writeFile(path.join(root, 'public/icons/icon-192.png'), await png(any, 192));
await writeFile(path.join(root, 'public/icons/icon-512.png'), await png(any, 512));
await writeFile(path.join(root, 'public/icons/maskable-512.png'), await png(maskable, 512));
await writeFile(path.join(root, 'app/apple-icon.png'), await png(iconSvg(mark, { scale: 0.7, radius: 0 }), 180));
await writeFile(path.join(root, 'app/icon.svg'), `${any}\n`);
await writeFile(
  path.join(root, 'public/favicon.ico'),
  ico(await Promise.all([16, 32, 48].map(async (size) => ({ size, data: await png(any, size) })))),
);
console.log('icons written: public/icons/*.png, public/favicon.ico, app/icon.svg, app/apple-icon.png');
