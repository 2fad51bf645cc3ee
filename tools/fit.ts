// `npm run fit -- --method METHOD --data FILE.csv [options]`: runs one estimation method on a CSV
// file and prints its result as one JSON object; refusals go to stderr with a non-zero exit.
import { EstimationError } from '@shared/estimation/estimation-error';
import { readDataTable } from './fit/data-table';
import { methods } from './fit/methods';

type Options = Record<string, string | boolean>;

/** "--name value" pairs; a flag followed by another flag (or nothing) is a boolean. */
function parseArguments(args: readonly string[]): Options {
  const options: Options = {};
  for (let i = 0; i < args.length; i++) {
    const arg = args[i];
    if (!arg.startsWith('--') || arg === '--') {
      throw new EstimationError(
        'invalid-option',
        `unexpected argument "${arg}"; options look like --name value`,
      );
    }
    const [name, inline] = arg.slice(2).split(/=(.*)/s, 2);
    const next = args[i + 1];
    if (inline !== undefined) options[name] = inline;
    else if (next === undefined || next.startsWith('--')) options[name] = true;
    else options[name] = args[++i];
  }
  return options;
}

function main(args: readonly string[]): number {
  try {
    const { method: methodName, data, ...options } = parseArguments(args);
    const names = methods.map((m) => m.name).join(', ');
    const method = methods.find((m) => m.name === methodName);
    if (!method) {
      throw new EstimationError('invalid-option', `--method must be one of ${names}`, 'method');
    }
    if (typeof data !== 'string')
      throw new EstimationError('invalid-option', '--data FILE.csv is required', 'data');
    const result = method.run(readDataTable(data), options);
    process.stdout.write(`${JSON.stringify(result, null, 2)}\n`);
    return 0;
  } catch (error) {
    if (error instanceof EstimationError) {
      process.stderr.write(
        `fit: ${error.message} [${error.code}${error.field ? `, ${error.field}` : ''}]\n`,
      );
      return 2;
    }
    process.stderr.write(
      `fit: unexpected failure: ${error instanceof Error ? error.stack : String(error)}\n`,
    );
    return 1;
  }
}

process.exitCode = main(process.argv.slice(2));
