// The `calc` command line: `npm run -s calc -- <command> [args]`. Prints JSON on stdout; a bad input exits 1 with
// a message on stderr. Each command lives in scripts/calc/<command>.ts and exports `run(args): Promise<unknown>`.
const commands = ['profiles', 'section', 'beam', 'column', 'length', 'report', 'cut', 'cabinet', 'swap'] as const;
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

// The exit code is set, not forced with process.exit: exiting at once would drop whatever of a long answer is
// still queued for a pipe (stdout to a pipe is asynchronous), cutting it at 64 KiB. Node exits by itself once
// stdout has drained.
main(process.argv.slice(2)).then(
  (code) => {
    process.exitCode = code;
  },
  (err: unknown) => {
    process.stderr.write(`calc: ${err instanceof Error ? err.message : String(err)}\n`);
    process.exitCode = err instanceof UsageError ? 2 : 1;
  },
);
