import adapter from '@sveltejs/adapter-static';
import { vitePreprocess } from '@sveltejs/vite-plugin-svelte';

// The browser tests (HEADROUTE_TEST_BUILD=1) build into folders of their own, so `npm test`
// can run while `npm start` serves the app from build/ and .svelte-kit/ without replacing
// the files under it.
const testBuild = process.env.HEADROUTE_TEST_BUILD === '1';
const pages = testBuild ? 'build-test' : 'build';

/** @type {import('@sveltejs/kit').Config} */
const config = {
  preprocess: vitePreprocess(),
  kit: {
    outDir: testBuild ? '.svelte-kit-test' : '.svelte-kit',
    // A client-side app: one static page serves every route (the shell is prerendered as
    // index.html; the fallback answers any other path).
    adapter: adapter({ pages, assets: pages, fallback: '200.html' }),
  },
};

export default config;
