import sharp from 'sharp';
import { photos } from '@/db/schema';
import { db } from '@/db/client';
import { processPhoto } from '@/lib/photos/process-photo';
import type { PhotoFileStore } from '@/lib/photos/ingest-survey-photo';
import type { Random } from './random';

/**
 * Demo photos: drawn pictures of a lathe and its parts (no real machines are photographed), put
 * through the same pipeline as an inspector's upload so sizes and stripping are the real ones.
 */
const SCENES = [
  { section: 'identity', caption: 'Machine as found, seen from the operator side', draw: overallView },
  { section: 'bedAndWays', caption: 'Ways near the chuck: wear step visible at the front way', draw: waysView },
  { section: 'spindle', caption: 'Spindle nose with the indicator on the centring diameter', draw: spindleView },
] as const;

const PAINT = ['#5d6f63', '#6a7583', '#7b6d52', '#4f6470'];

function frame(body: string, background: string) {
  return `<svg xmlns="http://www.w3.org/2000/svg" width="1600" height="1200" viewBox="0 0 1600 1200">
    <defs><linearGradient id="floor" x1="0" y1="0" x2="0" y2="1"><stop offset="0" stop-color="#b9b3a6"/><stop offset="1" stop-color="#8d877b"/></linearGradient></defs>
    <rect width="1600" height="1200" fill="${background}"/><rect y="900" width="1600" height="300" fill="url(#floor)"/>${body}</svg>`;
}

function overallView(paint: string) {
  return frame(
    `<rect x="180" y="640" width="1240" height="90" rx="10" fill="${paint}"/>
     <rect x="220" y="730" width="120" height="200" fill="${paint}"/><rect x="1260" y="730" width="120" height="200" fill="${paint}"/>
     <rect x="180" y="420" width="330" height="230" rx="14" fill="${paint}"/>
     <circle cx="540" cy="540" r="80" fill="#9aa3a8" stroke="#4a5156" stroke-width="10"/>
     <rect x="760" y="560" width="190" height="90" rx="8" fill="${paint}"/><rect x="800" y="520" width="90" height="50" fill="#3c4247"/>
     <rect x="1150" y="500" width="180" height="150" rx="10" fill="${paint}"/><rect x="1040" y="545" width="120" height="26" fill="#9aa3a8"/>
     <rect x="180" y="760" width="1240" height="14" fill="#3c4247"/>`,
    '#d8d2c4',
  );
}

function waysView(paint: string) {
  return frame(
    `<polygon points="100,1100 1500,1100 1200,300 400,300" fill="${paint}"/>
     <polygon points="330,1100 470,1100 640,300 590,300" fill="#b6bcc0"/><polygon points="1130,1100 1270,1100 1010,300 960,300" fill="#b6bcc0"/>
     <polygon points="360,1100 440,1100 520,780 470,780" fill="#8e959a"/>
     <rect x="560" y="200" width="480" height="110" rx="10" fill="#3c4247"/>`,
    '#cfc8b8',
  );
}

function spindleView(paint: string) {
  return frame(
    `<rect x="0" y="250" width="700" height="650" rx="20" fill="${paint}"/>
     <circle cx="760" cy="560" r="210" fill="#a4abb0" stroke="#3c4247" stroke-width="16"/>
     <circle cx="760" cy="560" r="70" fill="#2f3539"/>
     <rect x="1050" y="330" width="60" height="300" fill="#3c4247"/><circle cx="1080" cy="300" r="80" fill="#f2efe6" stroke="#3c4247" stroke-width="12"/>
     <line x1="1080" y1="300" x2="1120" y2="250" stroke="#a4481f" stroke-width="8"/><rect x="980" y="540" width="100" height="24" fill="#3c4247"/>`,
    '#d4cdbd',
  );
}

/** Adds the three demo photos to each of the given inspections through the photo store. */
export async function seedDemoPhotos(store: PhotoFileStore, inspections: Array<{ inspectionId: number; machineId: number; uploadedById: string }>, random: Random) {
  let stored = 0;
  for (const target of inspections) {
    const paint = random.pick(PAINT);
    for (const scene of SCENES) {
      const jpeg = await sharp(Buffer.from(scene.draw(paint))).jpeg({ quality: 85 }).toBuffer();
      const processed = await processPhoto(jpeg);
      const stem = `demo-inspection-${target.inspectionId}-${scene.section}`;
      const [full, display, thumb] = await store.put([
        { name: `${stem}-full.jpg`, contentType: processed.full.contentType, bytes: processed.full.bytes },
        { name: `${stem}-display.jpg`, contentType: processed.display.contentType, bytes: processed.display.bytes },
        { name: `${stem}-thumb.${processed.thumb.extension}`, contentType: processed.thumb.contentType, bytes: processed.thumb.bytes },
      ]);
      await db.insert(photos).values({
        machineId: target.machineId,
        inspectionId: target.inspectionId,
        section: scene.section,
        caption: scene.caption,
        fileKey: full!.key,
        originalUrl: full!.url,
        displayKey: display!.key,
        thumbKey: thumb!.key,
        widthPx: processed.full.widthPx,
        heightPx: processed.full.heightPx,
        bytes: processed.full.bytes.byteLength,
        uploadedById: target.uploadedById,
      });
      stored += 1;
    }
  }
  return stored;
}
