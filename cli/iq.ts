/**
 * `iq`: the Ironquill command line. `npm run -s iq -- <command> ...`
 *
 * Each command lives in cli/commands/<name>.ts and exports `run(args): Promise<number>`
 * returning the exit code. Errors a user can cause are printed as one clear line;
 * a stack trace is never the answer to bad input.
 */
type Command = { summary: string; load: () => Promise<{ run: (args: string[]) => Promise<number> }> };

const commands: Record<string, Command> = {
  check: { summary: "check FILE...              report problems as FILE:LINE:COL: severity: message", load: () => import("./commands/check") },
  fmt: { summary: "fmt FILE [--write]          print (or rewrite) the canonical form", load: () => import("./commands/fmt") },
  expand: { summary: "expand FILE --athlete PROFILE.json --start YYYY-MM-DD [--days mon,wed,fri] [--weeks N] [--json]", load: () => import("./commands/expand") },
  cards: { summary: "cards FILE --athlete PROFILE.json --start YYYY-MM-DD [--week N] [--size a6|a5|letter] --out cards.pdf", load: () => import("./commands/cards") },
};

function usage(): string {
  return ["usage: iq <command> [options]", "", ...Object.values(commands).map((c) => `  iq ${c.summary}`)].join("\n");
}

async function main(argv: string[]): Promise<number> {
  const [name, ...rest] = argv;
  if (!name || name === "help" || name === "--help" || name === "-h") {
    console.log(usage());
    return name ? 0 : 2;
  }
  const command = commands[name];
  if (!command) {
    console.error(`iq: unknown command '${name}'\n${usage()}`);
    return 2;
  }
  let mod;
  try {
    mod = await command.load();
  } catch {
    console.error(`iq: the '${name}' command is not available in this build`);
    return 2;
  }
  return mod.run(rest);
}

// exitCode rather than exit(): exit() would cut off output still queued for a pipe.
main(process.argv.slice(2)).then(
  (code) => {
    process.exitCode = code;
  },
  (err: unknown) => {
    console.error(`iq: internal error: ${err instanceof Error ? err.message : String(err)}`);
    process.exitCode = 2;
  },
);
