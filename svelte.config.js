import adapter from '@sveltejs/adapter-static';
import { vitePreprocess } from '@sveltejs/vite-plugin-svelte';

/** @type {import('@sveltejs/kit').Config} */
const config = {
  preprocess: vitePreprocess(),
  kit: {
    // A client-side app: one static index.html serves every route.
    adapter: adapter({ fallback: 'index.html' }),
  },
};

export default config;
