/**
 * How long planBake takes for a bake day with 2,000 orders.
 * Run: pnpm --filter @fryline/production bench   (or: npx tsx bench/plan-bake.bench.ts)
 * Prints the median and 95th percentile over repeated runs; target under 20 ms.
 */
import { performance } from 'node:perf_hooks';
import { DEFAULT_DOUGH_ALLERGENS, DEFAULT_PLAN_SETTINGS, planBake, type OrderLine, type PlanBakeInput } from '../src/index.js';

const ORDERS = 2_000;
const WARMUP_RUNS = 50;
const RUNS = 500;
const TARGET_MS = 20;

// Fictional menu and a fixed pseudo-random stream, so every run sees the same orders.
const menu: Array<Omit<OrderLine, 'quantity'>> = [
  { menuItemId: 'vanilla-ring', name: 'Vanilla milk ring', kind: 'ring', glaze: 'vanilla-milk-glaze' },
  { menuItemId: 'cinnamon-ring', name: 'Cinnamon sugar ring', kind: 'ring', glaze: 'cinnamon-sugar' },
  { menuItemId: 'plain-ring', name: 'Plain ring', kind: 'ring', glaze: null },
  { menuItemId: 'cinnamon-holes', name: 'Cinnamon holes', kind: 'hole', glaze: 'cinnamon-sugar' },
];
let seed = 20260613;
const next = () => (seed = (seed * 1103515245 + 12345) % 2 ** 31) / 2 ** 31;
const orders: OrderLine[] = Array.from({ length: ORDERS }, () => ({
  ...menu[Math.floor(next() * menu.length)]!,
  quantity: [6, 12, 15][Math.floor(next() * 3)]!,
}));

const input: PlanBakeInput = {
  orders,
  ...DEFAULT_PLAN_SETTINGS,
  roomTempC: 22,
  firstPickupStartsAt: '2026-06-13T08:30',
  timeZone: 'America/Chicago',
  now: '2026-06-10T12:00:00-05:00',
  prices: { centsPerKg: { 'Bread flour': 190, Water: 0, 'Whole milk': 110, Sugar: 160 }, fryingOilCentsPerKg: 380 },
  boxes: [{ id: 'dozen', name: 'Dozen', rings: 12, holes: 0, glazeId: null, priceCents: 3000 }],
  allergens: { dough: DEFAULT_DOUGH_ALLERGENS },
};

for (let i = 0; i < WARMUP_RUNS; i++) planBake(input);
const times: number[] = [];
let plan = planBake(input);
for (let i = 0; i < RUNS; i++) {
  const start = performance.now();
  plan = planBake(input);
  times.push(performance.now() - start);
}
times.sort((a, b) => a - b);
const at = (q: number) => times[Math.min(times.length - 1, Math.ceil(q * times.length) - 1)]!;

console.log(`planBake, ${ORDERS} orders (${plan.pieces.rings.toMake} rings, ${plan.pieces.holes.toMake} holes, ${Math.round(plan.dough.doughGrams / 1000)} kg dough), ${RUNS} runs after ${WARMUP_RUNS} warm-up`);
console.log(`median ${at(0.5).toFixed(3)} ms   p95 ${at(0.95).toFixed(3)} ms   max ${times.at(-1)!.toFixed(3)} ms   (target < ${TARGET_MS} ms: ${at(0.95) < TARGET_MS ? 'met' : 'NOT met'})`);
