// Patchcast command-line tool: `npm run -s cli -- <command> [options]`.
// Each command lives in server/cli/<command>.ts and exports `run(argv): Promise<void> | void`.
// Bad input throws CliInputError: one line on stderr, exit code 2.
import { CliInputError } from './cli/args';

type Command = { run: (argv: string[]) => Promise<void> | void; summary: string };

const commands: Record<string, () => Promise<Command>> = {
  analyze: () => import('./cli/analyze'),
  estimate: () => import('./cli/estimate'),
  simulate: () => import('./cli/simulate'),
  rasterize: () => import('./cli/rasterize'),
};

async function main(argv: string[]): Promise<void> {
  const [name, ...rest] = argv;
  const load = name ? commands[name] : undefined;
  if (!load) {
    throw new CliInputError(
      `unknown command '${name ?? ''}': use one of ${Object.keys(commands).join(', ')}`,
    );
  }
  const command = await load();
  await command.run(rest);
}

main(process.argv.slice(2)).catch((err: unknown) => {
  if (err instanceof CliInputError) {
    process.stderr.write(`error: ${err.message}\n`);
    process.exit(2);
  }
  process.stderr.write(`${err instanceof Error ? (err.stack ?? err.message) : String(err)}\n`);
  process.exit(1);
});
