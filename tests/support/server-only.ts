// Stand-in for the `server-only` marker package, which throws outside React server bundles.
export {};
