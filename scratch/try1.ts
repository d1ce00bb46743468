import { deltaE2000 } from '@/lib/color';
import { measurePhoto } from '@/lib/image';
import { makePhoto } from '../tests/support/photoGen';
async function main() {
  const bases = [{l:55,a:-30,b:25},{l:80,a:-5,b:60},{l:35,a:5,b:-25},{l:70,a:25,b:15},{l:88,a:0,b:4}];
  const flakes = { black: {l:8,a:0,b:0}, blue: {l:35,a:15,b:-60}, silver: {l:92,a:0,b:0} };
  for (const [name, f] of Object.entries(flakes)) for (const cov of [0.05, 0.2]) for (const b of bases) {
    const p = await makePhoto({ seed: 1, base: b, flake: { colours: [f], coverage: cov, sizes: [1,3] }, blur: 0.6, format: 'jpeg75' });
    const t0 = performance.now();
    const m = (await measurePhoto(p.file, [{ name: 'r', shape: p.region }])).regions[0];
    console.log(name, cov, JSON.stringify(b), 'dE', deltaE2000(m.lab, p.lab).toFixed(2), 'cov', m.flake.coverage.toFixed(3), 'true', p.coverage.toFixed(3), 'glare', m.glare.toFixed(3), (performance.now()-t0).toFixed(0)+'ms');
  }
}
main();
