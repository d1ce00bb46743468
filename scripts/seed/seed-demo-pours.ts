import { and, eq } from 'drizzle-orm';
import sharp from 'sharp';
import { converter } from 'culori';
import { getMemberByUserId } from '../../db/queries/members';
import type { DB } from '../../db/open';
import { colorants, matches, molds, pours, users } from '../../db/schema';
import { addPour } from '../../lib/matches/addPour';
import { setTarget } from '../../lib/matches/setTarget';
import { savePhotoBytes } from '../../lib/uploads/savePhoto';

// Demo photos of invented colours: a two-tone bait (back over belly) with
// black flake in the back and a grey card beside it, generated here, stored
// through the upload service and measured by the real pipeline.
const toRgb = converter('rgb');
export const rgb8 = (l: number, a: number, b: number) => {
  const c = toRgb({ mode: 'lab65', l, a, b });
  return [c.r, c.g, c.b].map((v) => Math.max(0, Math.min(255, Math.round(v * 255)))) as [number, number, number];
};

function rng(seed: number) {
  let s = seed >>> 0;
  return () => ((s = (s * 1664525 + 1013904223) >>> 0) / 2 ** 32);
}

export async function baitPhoto(back: [number, number, number], belly: [number, number, number], seed: number, speck: [number, number, number] | null = [22, 20, 20]): Promise<Buffer> {
  const w = 480;
  const h = 320;
  const px = Buffer.alloc(w * h * 3);
  const rand = rng(seed);
  const grey = rgb8(50, 0, 0);
  for (let y = 0; y < h; y++) {
    for (let x = 0; x < w; x++) {
      let c: [number, number, number] = [236, 233, 228];
      if (x >= 380 && x < 460 && y >= 120 && y < 200) c = grey;
      else if (x >= 40 && x < 340 && y >= 60 && y < 260) {
        c = y < 160 ? back : belly;
        if (speck && y < 160 && rand() < 0.06) c = speck;
      }
      const n = Math.round((rand() - 0.5) * 4);
      px[(y * w + x) * 3] = Math.max(0, Math.min(255, c[0] + n));
      px[(y * w + x) * 3 + 1] = Math.max(0, Math.min(255, c[1] + n));
      px[(y * w + x) * 3 + 2] = Math.max(0, Math.min(255, c[2] + n));
    }
  }
  return sharp(px, { raw: { width: w, height: h, channels: 3 } }).jpeg({ quality: 92 }).toBuffer();
}

export const ZONES = [
  { name: 'back', shape: { type: 'rect' as const, x: 0.125, y: 0.22, w: 0.55, h: 0.24 } },
  { name: 'belly', shape: { type: 'rect' as const, x: 0.125, y: 0.53, w: 0.55, h: 0.24 } },
];
export const CARD = { shape: { type: 'rect' as const, x: 0.8, y: 0.4, w: 0.15, h: 0.22 } };

// Target, then pours closing in on it, recipe changes in step.
const TARGET = { back: rgb8(38.2, 9.5, 22.4), belly: rgb8(61.5, 12.1, 30.8) };
const POURS = [
  { back: rgb8(44, 6, 16), belly: rgb8(58, 15, 35), brown: 4, red: 1, notes: 'First try: too light and too yellow in the back.' },
  { back: rgb8(40.5, 8, 20), belly: rgb8(60, 13.5, 33), brown: 5, red: 1.5, notes: 'One more drop of marsh brown.' },
  { back: rgb8(38.8, 9.2, 22), belly: rgb8(61.2, 12.4, 31.2), brown: 5.5, red: 1.5, notes: 'Close; belly a touch less orange.' },
];

export async function seedDemoPours(database: DB, teamId: string): Promise<boolean> {
  const match = database.select().from(matches).where(and(eq(matches.teamId, teamId), eq(matches.name, 'Dusk crawdad'))).get();
  if (!match || database.select({ id: pours.id }).from(pours).where(eq(pours.matchId, match.id)).get()) return false;
  const makerId = database.select({ id: users.id }).from(users).where(eq(users.email, 'maker@demo.test')).get()!.id;
  const maker = getMemberByUserId(database, makerId)!;
  const col = (name: string) => database.select({ id: colorants.id }).from(colorants).where(and(eq(colorants.teamId, teamId), eq(colorants.name, name))).get()!.id;
  const mold = database.select({ id: molds.id }).from(molds).where(and(eq(molds.teamId, teamId), eq(molds.name, 'Craw 3.5 in, 2 cavity'))).get()?.id;
  const who = (kind: 'reference' | 'pour') => ({ teamId, userId: makerId, kind });

  const ref = await savePhotoBytes(database, who('reference'), await baitPhoto(TARGET.back, TARGET.belly, 1), 'dusk-crawdad-reference.jpg');
  await setTarget(database, maker, match.id, { photoId: ref.photoId, zones: ZONES, neutral: CARD });
  for (const [i, p] of POURS.entries()) {
    const photo = await savePhotoBytes(database, who('pour'), await baitPhoto(p.back, p.belly, 10 + i), `dusk-crawdad-pour-${i + 1}.jpg`);
    await addPour(database, maker, match.id, {
      photoId: photo.photoId,
      recipe: [
        { zone: 'back', colorantId: col('Pigment, marsh brown'), amount: p.brown, unit: 'drops' },
        { zone: 'back', colorantId: col('Flake, black 0.015 in'), amount: 0.25, unit: 'tsp' },
        { zone: 'belly', colorantId: col('Pigment, brick red'), amount: p.red, unit: 'drops' },
        { zone: 'belly', colorantId: col('Pigment, chalk white'), amount: 2, unit: 'drops' },
      ],
      moldId: mold,
      batchCups: 1,
      tempF: 335,
      notes: p.notes,
      zones: ZONES,
      neutral: CARD,
    });
  }
  return true;
}
