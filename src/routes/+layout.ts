// A client-side app: no server rendering, prerender the shell for the static adapter.
export const ssr = false;
export const prerender = true;
