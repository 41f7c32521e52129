// Seat balance in the browser for npm run bench:ui (scripts/bench-ui.ts): prints, asserts nothing. Opens the editor on
// a System carried in the page address (no sign-in, nothing saved), runs Seat balance in its Web Worker and reads the
// time the page measured from posting the run to the answer (data-elapsed-ms on the run's figures line). Two Systems:
// the demo "Juniper Lane screening room" (2 subs × 3 seats) and the spec's case, 4 subs × 8 seats, the "Four-by-eight
// theater (invented)" of scripts/lib/seat-balance-bench.ts made into a System.
import type { Browser } from '@playwright/test';
import { encodeDocument } from '../../lib/client/url-state';
import { juniperLaneDocument } from '../../lib/demo/systems';
import type { SystemDocument } from '../../lib/validations/system';

export interface SeatBalanceUiFigure {
  label: string;
  placement: boolean;
  elapsedMs: number;
  evaluated: number;
}

/** The demo room with the subs at the four wall midpoints and two rows of four seats (invented). */
function fourByEight(): SystemDocument {
  const doc = juniperLaneDocument();
  const sub = doc.subs[0]!;
  const spots = [
    { xM: 2.45, yM: 0.25 },
    { xM: 4.65, yM: 3.2 },
    { xM: 2.45, yM: 6.15 },
    { xM: 0.25, yM: 3.2 },
  ];
  return {
    ...doc,
    seats: [3.6, 4.6].flatMap((yM, row) => [1.3, 2.0, 2.9, 3.6].map((xM, i) => ({ id: `r${row + 1}s${i + 1}`, name: `Row ${row + 1} seat ${i + 1}`, xM, yM, zM: 1.1 }))),
    mlpSeatId: 'r1s2',
    subs: spots.map((p, i) => ({ ...sub, id: `sub${i + 1}`, name: `Sub ${i + 1}`, ...p, zM: 0.25 })),
    notes: 'Four-by-eight theater (invented), for the benchmark.',
  };
}

async function timeOne(browser: Browser, base: string, label: string, doc: SystemDocument, placement: boolean): Promise<SeatBalanceUiFigure> {
  const page = await browser.newPage({ viewport: { width: 1440, height: 900 } });
  try {
    await page.goto(`${base}/systems/new?panel=seat-balance&s=${encodeDocument(doc)}`, { waitUntil: 'networkidle' });
    await page.getByTestId('sb-run').waitFor({ timeout: 60_000 });
    if (placement) await page.getByTestId('sb-rank-positions').check();
    await page.getByTestId('sb-run').click();
    const stats = page.getByTestId('sb-run-stats');
    // The answer's figures, or the notice that says why the search stopped.
    await page.locator('[data-testid=sb-run-stats], [role=tabpanel] [role=alert]').first().waitFor({ timeout: 300_000 });
    if (!(await stats.count())) throw new Error(`Seat balance stopped on ${label}: ${await page.locator('[role=tabpanel] [role=alert]').first().textContent()}`);
    return { label, placement, elapsedMs: Number(await stats.getAttribute('data-elapsed-ms')), evaluated: Number(await stats.getAttribute('data-evaluated')) };
  } finally {
    await page.close();
  }
}

/** Each case once for the settings search and once with the placement search (as many subs as the System has). */
export async function benchSeatBalanceUi(browser: Browser, base: string): Promise<SeatBalanceUiFigure[]> {
  const figures: SeatBalanceUiFigure[] = [];
  for (const [label, doc] of [
    ['Juniper Lane screening room, 2 subs × 3 seats', juniperLaneDocument()],
    ['Four-by-eight theater, 4 subs × 8 seats', fourByEight()],
  ] as const) {
    for (const placement of [false, true]) figures.push(await timeOne(browser, base, label, doc, placement));
  }
  return figures;
}
