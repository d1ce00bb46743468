import { deltaE2000, srgbToLab } from '@/lib/color';
import { measurePhoto } from '@/lib/image';
import { encode, gauss, rawImage, rng, type Rgb } from '../tests/color/synth';
async function main() {
  const W=480,H=360; const rand = rng(42); const noise = gauss(rand);
  const base: Rgb = [70,125,80], gold: Rgb=[215,170,45], black: Rgb=[22,20,24];
  const label = new Uint8Array(W*H); let fl=0;
  while (fl < 0.1*W*H) { const size = 4+Math.floor(rand()*5); const x0=Math.floor(rand()*(W-size)), y0=Math.floor(rand()*(H-size)); const c=1+Math.floor(rand()*2);
    for (let y=y0;y<y0+size;y++) for (let x=x0;x<x0+size;x++){ if(!label[y*W+x]) fl++; label[y*W+x]=c; } }
  for (let y=0;y<H;y++) for (let x=0;x<W;x++) if (Math.abs(x-0.9*y-50)<2.5) label[y*W+x]=9;
  const raw = rawImage(W,H,(x,y)=>{const l=label[y*W+x]; if(l===9) return [255,255,253]; const c=l===0?base:l===1?gold:black; return [c[0]+2*noise(),c[1]+2*noise(),c[2]+2*noise()];});
  const jpg = await encode(raw,W,H,'jpeg',90);
  const m = (await measurePhoto(jpg, [{name:'b', shape:{type:'rect',x:0.05,y:0.05,w:0.9,h:0.9}}])).regions[0];
  console.log(JSON.stringify(m), srgbToLab(...gold), m.flake.groups.map(g=>deltaE2000(g.lab, srgbToLab(...gold))));
}
main();
