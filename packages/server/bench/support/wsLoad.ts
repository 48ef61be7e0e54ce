/**
 * Co-editing under load: y-websocket clients on a set of sheets, some of them typing, a few per
 * sheet timing how long each keystroke of someone else takes to show up in their copy.
 */
import { performance } from 'node:perf_hooks';
import { WebsocketProvider } from 'y-websocket';
import * as Y from 'yjs';
import { cellText } from '../../src/collab/sheetDoc';
import { percentile, socketClass, until } from './clients';
import type { ServerProcess } from './serverProcess';

export interface EditorScenario {
  sheetIds: string[];
  clientsPerSheet: number;
  /** The first this many clients of each sheet type. */
  typistsPerSheet: number;
  /** The last this many clients of each sheet time the others' keystrokes. */
  observersPerSheet: number;
  /** Each typist types one character this often. */
  editIntervalMs: number;
  seconds: number;
}

export interface EditorFigures {
  clients: number;
  connectSeconds: number;
  edits: number;
  samples: number;
  /** Keystroke-to-remote-view, ms. */
  p50: number;
  p95: number;
  p99: number;
  /** Observations still missing 5 s after the last keystroke. */
  lost: number;
  /** Server CPU while typing, % of one core. */
  serverCpuPercent: number;
  serverRssBeforeBytes: number;
  serverRssAfterBytes: number;
  /** CPU of this process (the clients) while typing, % of one core. */
  clientCpuPercent: number;
}

/** Private-use characters: each keystroke of a sheet is a different one, so observers know which arrived. */
const FIRST_MARK = 0xe000;
const MARKS = 0x1900;

interface Client {
  index: number;
  doc: Y.Doc;
  provider: WebsocketProvider;
}

export async function runEditors(url: string, cookies: string[], server: ServerProcess, scenario: EditorScenario): Promise<EditorFigures> {
  const collabUrl = `${url.replace(/^http/, 'ws')}/collab`;
  const rssBefore = server.usage().rssBytes;
  const connectStarted = performance.now();
  const rooms = scenario.sheetIds.map((sheetId, sheetIndex) =>
    Array.from({ length: scenario.clientsPerSheet }, (_, index): Client => {
      const doc = new Y.Doc();
      const cookie = cookies[(sheetIndex * scenario.clientsPerSheet + index) % cookies.length]!;
      const provider = new WebsocketProvider(collabUrl, sheetId, doc, {
        WebSocketPolyfill: socketClass(cookie, url) as unknown as typeof globalThis.WebSocket,
        disableBc: true,
        maxBackoffTime: 5_000,
      });
      return { index, doc, provider };
    }),
  );
  const all = rooms.flat();
  if (!(await until(() => all.every((client) => client.provider.synced), 180_000))) {
    throw new Error(`only ${all.filter((client) => client.provider.synced).length} of ${all.length} clients synced within 3 minutes`);
  }
  const connectSeconds = (performance.now() - connectStarted) / 1000;

  const samples: number[] = [];
  let expected = 0;
  let edits = 0;
  const observerStops: Array<() => void> = [];
  const typistStops: Array<() => void> = [];
  for (const room of rooms) {
    const sent = new Map<string, { at: number; writer: number }>();
    let counter = 0;
    for (const observer of room.slice(room.length - scenario.observersPerSheet)) {
      const text = cellText(observer.doc, 'k1', 'text')!;
      const listener = (event: Y.YTextEvent): void => {
        const now = performance.now();
        for (const change of event.delta) {
          if (typeof change.insert !== 'string') continue;
          for (const mark of change.insert) {
            const edit = sent.get(mark);
            if (edit !== undefined && edit.writer !== observer.index) samples.push(now - edit.at);
          }
        }
      };
      text.observe(listener);
      observerStops.push(() => text.unobserve(listener));
    }
    for (const typist of room.slice(0, scenario.typistsPerSheet)) {
      const type = (): void => {
        const mark = String.fromCharCode(FIRST_MARK + (counter++ % MARKS));
        sent.set(mark, { at: performance.now(), writer: typist.index });
        expected += room.slice(room.length - scenario.observersPerSheet).filter((o) => o.index !== typist.index).length;
        edits++;
        cellText(typist.doc, 'k1', 'text')!.insert(0, mark);
      };
      const phase = Math.random() * scenario.editIntervalMs;
      let interval: NodeJS.Timeout | undefined;
      const start = setTimeout(() => {
        type();
        interval = setInterval(type, scenario.editIntervalMs);
      }, phase);
      typistStops.push(() => {
        clearTimeout(start);
        clearInterval(interval);
      });
    }
  }

  const cpuBefore = server.usage().cpuSeconds;
  const clientCpuBefore = process.cpuUsage();
  const typingStarted = performance.now();
  await new Promise((resolve) => setTimeout(resolve, scenario.seconds * 1000));
  // Stop typing, then let the last keystrokes arrive.
  for (const stop of typistStops) stop();
  const typingSeconds = (performance.now() - typingStarted) / 1000;
  const serverCpu = server.usage().cpuSeconds - cpuBefore;
  const clientCpu = process.cpuUsage(clientCpuBefore);
  await until(() => samples.length >= expected, 5_000);
  for (const stop of observerStops) stop();
  const rssAfter = server.usage().rssBytes;
  for (const client of all) {
    client.provider.destroy();
    client.doc.destroy();
  }
  samples.sort((a, b) => a - b);
  return {
    clients: all.length,
    connectSeconds,
    edits,
    samples: samples.length,
    p50: percentile(samples, 0.5),
    p95: percentile(samples, 0.95),
    p99: percentile(samples, 0.99),
    lost: Math.max(0, expected - samples.length),
    serverCpuPercent: (serverCpu / typingSeconds) * 100,
    serverRssBeforeBytes: rssBefore,
    serverRssAfterBytes: rssAfter,
    clientCpuPercent: ((clientCpu.user + clientCpu.system) / 1e6 / typingSeconds) * 100,
  };
}
