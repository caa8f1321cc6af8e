// `npm start`: build the app quietly, serve it, print its address and open a browser when
// there is a display to open it on. A browser that cannot be opened is a one-line note, never
// a stack trace: the address is printed either way.
import { spawn } from 'node:child_process';
import { build, preview } from 'vite';

const PORT = Number(process.env.PORT ?? 4173);

/** The command that opens a URL on this platform, or undefined where there is no display. */
function opener() {
  if (process.platform === 'darwin') return 'open';
  if (process.platform === 'win32') return 'explorer';
  if (process.env.DISPLAY || process.env.WAYLAND_DISPLAY) return 'xdg-open';
  return undefined;
}

function openBrowser(url) {
  const command = opener();
  if (!command || process.env.HEADROUTE_NO_OPEN) return;
  try {
    const child = spawn(command, [url], { stdio: 'ignore', detached: true });
    child.on('error', () => console.log(`(Could not open a browser: open ${url} yourself.)`));
    child.unref();
  } catch {
    console.log(`(Could not open a browser: open ${url} yourself.)`);
  }
}

/** Runs `work` with what it writes to stdout held back; shown only if it fails. */
async function quietly(work) {
  const held = [];
  const write = process.stdout.write.bind(process.stdout);
  process.stdout.write = (chunk, ...rest) => {
    held.push(String(chunk));
    const callback = rest.find((r) => typeof r === 'function');
    if (callback) callback();
    return true;
  };
  try {
    return await work();
  } catch (error) {
    process.stdout.write = write;
    console.log(held.join(''));
    throw error;
  } finally {
    process.stdout.write = write;
  }
}

console.log('Building Headroute (about a minute)…');
const started = Date.now();
await quietly(() => build({ logLevel: 'error' }));
console.log(`Built in ${((Date.now() - started) / 1000).toFixed(0)} s.`);

const server = await preview({ logLevel: 'error', preview: { port: PORT, strictPort: true } });
const url = server.resolvedUrls?.local[0] ?? `http://localhost:${PORT}/`;
console.log(`\nHeadroute is running at ${url}  (Ctrl+C to stop)\n`);
openBrowser(url);
