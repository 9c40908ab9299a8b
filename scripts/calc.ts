// The `calc` command line: `npm run -s calc -- <command> [args]`. Prints JSON on stdout; a bad input exits 1 with
// a message on stderr. Each command lives in scripts/calc/<command>.ts and exports `run(args): Promise<unknown>`.
const commands = ['profiles', 'section', 'beam', 'length', 'report', 'cut', 'drawer', 'sheets'] as const;
type Command = (typeof commands)[number];

class UsageError extends Error {}

async function main(argv: string[]): Promise<number> {
  const [name, ...args] = argv;
  if (!name || !(commands as readonly string[]).includes(name)) {
    throw new UsageError(`usage: calc <${commands.join('|')}> [arguments]${name ? ` (unknown command "${name}")` : ''}`);
  }
  const mod = (await import(`./calc/${name as Command}.ts`)) as { run(args: string[]): Promise<unknown> };
  const out = await mod.run(args);
  process.stdout.write(JSON.stringify(out, null, 2) + '\n');
  return 0;
}

main(process.argv.slice(2)).then(
  (code) => process.exit(code),
  (err: unknown) => {
    process.stderr.write(`calc: ${err instanceof Error ? err.message : String(err)}\n`);
    process.exit(err instanceof UsageError ? 2 : 1);
  },
);
