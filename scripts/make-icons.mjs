// Regenerates the app's icons from public/icons/hangarline.svg (our own drawing) with sharp.
// The PNGs are committed; run this only after changing the drawing: `node scripts/make-icons.mjs`.
import path from "node:path";
import sharp from "sharp";

const root = path.resolve(import.meta.dirname, "..");
const svg = path.join(root, "public/icons/hangarline.svg");
const out = (name) => path.join(root, "public/icons", name);

const sizes = [
  // "any" icons: the drawing with rounded corners cut out of the background.
  { file: "icon-192.png", size: 192, rounded: true },
  { file: "icon-512.png", size: 512, rounded: true },
  // Maskable: full bleed, the platform applies its own mask.
  { file: "maskable-512.png", size: 512, rounded: false },
  { file: "maskable-192.png", size: 192, rounded: false },
  // iOS rounds the corners itself and shows transparency as black: full bleed.
  { file: "apple-touch-icon.png", size: 180, rounded: false },
];

for (const { file, size, rounded } of sizes) {
  let image = sharp(svg, { density: Math.ceil((72 * size) / 512) * 2 }).resize(size, size);
  if (rounded) {
    const r = Math.round(size * 0.18);
    const mask = Buffer.from(`<svg xmlns="http://www.w3.org/2000/svg" width="${size}" height="${size}"><rect width="${size}" height="${size}" rx="${r}" ry="${r}"/></svg>`);
    image = image.composite([{ input: mask, blend: "dest-in" }]);
  }
  await image.png({ compressionLevel: 9 }).toFile(out(file));
  console.log(`wrote public/icons/${file}`);
}
// The framework links app/apple-icon.png from every page (<link rel="apple-touch-icon">).
await sharp(out("apple-touch-icon.png")).toFile(path.join(root, "app/apple-icon.png"));
console.log("wrote app/apple-icon.png");
