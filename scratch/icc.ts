import sharp from 'sharp';
import { parseIccProfile, SRGB_TO_XYZ, SRGB8_TO_LINEAR } from '@/lib/color';
async function main(){
 for (const p of ['p3','srgb']) {
  const icc = (await sharp({ create: { width: 1, height: 1, channels: 3, background: '#808080' } }).withIccProfile(p).png().toBuffer().then((b) => sharp(b).metadata())).icc!;
  const r = parseIccProfile(icc)!;
  console.log(p, icc.length, r.toXyz, [10,50,128,200,255].map(i=>[r.linear[0][i], SRGB8_TO_LINEAR[i]]));
 }
 console.log(SRGB_TO_XYZ);
}
main();
