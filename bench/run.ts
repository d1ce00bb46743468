import path from 'node:path';
import { buildApp } from '../scripts/build-app';
import { buildIsStale } from '../scripts/build-stale';
import { run } from '../scripts/run';
import { runDeltaELoad } from './delta-e-load';
import { runMeasureBench } from './measure';
import { printNextPourSim } from './next-pour-sim';
import { printPageWeights, weighPages } from './weigh-pages';

// `npm run bench`: figures and ratios measured in this one run. Nothing here
// passes or fails; the targets are printed beside the figures.
async function main() {
  const root = path.resolve(__dirname, '..');
  // `npm run bench -- load`: only the figures of the running server (build, load, reads).
  if (process.argv[2] !== 'load') await computeFigures(root);
  await serverFigures(root);
}

async function computeFigures(root: string) {
  console.log('== measuring a region: full pipeline vs sharp alone');
  const m = await runMeasureBench();
  console.log(`  ${m.width}×${m.height} JPEG, region ${m.regionPixels.toLocaleString('en')} px (a quarter), median of ${m.runs} runs`);
  console.log(`  measurePhoto (decode + Lab + base/flake/glare): ${m.pipelineMs.toFixed(1)} ms`);
  console.log(`  sharp decode + extract to raw pixels:           ${m.sharpMs.toFixed(1)} ms`);
  console.log(`  in-process / sharp's bare decode + extract: ${m.ratio.toFixed(2)} (goal ≤ 1.25); fastest runs ${m.minRatio.toFixed(2)}; every pixel, no lattice: ${m.exactMs.toFixed(1)} ms, ratio ${m.exactRatio.toFixed(2)}`);

  console.log('\n== next pour on the simulated colorant system (30 targets, two zones each)');
  printNextPourSim();
  console.log('\n== next-pour suggestion on a large shop');
  const s = await run(path.join(root, 'node_modules/.bin/tsx'), ['--conditions=react-server', path.join(root, 'bench/suggestion.ts')]);
  if (s !== 0) process.exit(s);
}

async function serverFigures(root: string) {
  if (buildIsStale(root)) {
    console.log('\n== building the app for the load test');
    const code = await buildApp(root, '.next');
    if (code !== 0) process.exit(code);
  }
  console.log('\n== POST /api/delta-e under load (autocannon, 10 s, 32 connections, next start)');
  const l = await runDeltaELoad(root);
  console.log(`  ${l.rps.toFixed(0)} requests/s (${l.requests} in all, ${l.non2xx} non-2xx, ${l.errors} errors)`);
  console.log(`  latency p50 ${l.p50} ms · p97.5 ${l.p975} ms · p99 ${l.p99} ms`);
  const r = l.reads;
  const big = l.large;
  console.log(`\n== reads on the same server (autocannon, 8 s each); the demo shop and a large shop beside it (${big.matchIds.length} matches, ${big.pours.toLocaleString('en')} pours, ${big.batches} batches, ${big.photos.toLocaleString('en')} photos)`);
  console.log(`  flat out, 32 connections, in turns (${r.rounds} rounds of 2 s each, so the machine's load falls on all three alike):`);
  console.log(`  bare GET /api/health: ${r.healthRps.toFixed(0)} requests/s`);
  console.log(`  POST /api/delta-e / bare health: ${r.deltaRps.toFixed(0)} / ${r.healthRps.toFixed(0)} = ${(r.deltaRps / r.healthRps).toFixed(2)} (goal ≥ 0.7)`);
  console.log(`  GET /api/me (the session check alone) / bare health: ${r.meRps.toFixed(0)} / ${r.healthRps.toFixed(0)} = ${(r.meRps / r.healthRps).toFixed(2)} (goal ≥ 0.8)`);
  console.log('  latency (each route warmed up for 2 s first):');
  for (const x of r.reads) {
    const goal = x.label.startsWith('GET /api/matches/:id') ? 'at a steady 100 requests/s; goal p99 ≤ 50 ms' : 'no goal set; for reference';
    console.log(`  ${x.label}: p50 ${x.p50} ms, p99 ${x.p99} ms (${goal}; ${x.non2xx} non-2xx)`);
  }
  const mh = l.measureHttp;
  console.log('\n== POST /api/measure over HTTP: the same quarter of the 12 MP JPEG, upload included (next start, worker pool)');
  console.log(`  ${(mh.bytes / 1e6).toFixed(1)} MB upload, median of ${mh.runs}: ${mh.httpMs.toFixed(1)} ms; sharp's bare decode + extract ${mh.sharpMs.toFixed(1)} ms (answers ${mh.statuses.join(', ')})`);
  console.log(`  over HTTP / sharp's bare decode + extract: ${mh.ratio.toFixed(2)} (goal ≤ 2.0)`);
  console.log('\n== /api/measure refusing bad photos (slowest of 3; target well under 2 s)');
  for (const r of l.refusals) console.log(`  ${r.label}: ${r.status} in ${r.ms.toFixed(0)} ms`);
  const h = l.health;
  console.log('\n== /api/health while six heavy measurements run (20 MP JPEG, 16 outlines each, three members × two)');
  console.log(`  measurements answered ${h.statuses.join(', ')} in ${h.measureMs.toFixed(0)} ms`);
  console.log(`  health: ${h.healthCount} answers, p50 ${h.healthP50.toFixed(1)} ms, p95 ${h.healthP95.toFixed(1)} ms, max ${h.healthMax.toFixed(1)} ms (goal: every answer ≤ 100 ms)`);
  console.log('\n== JavaScript a phone downloads cold (Chromium at 390 px, empty cache, gzip from next start; the demo shop with its pours)');
  printPageWeights(await weighPages(root));
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
