// `rasterize`: reads a boundary file and reports its equal-area patch grid.
import { readFile } from 'node:fs/promises';
import { BoundaryInputError, buildPatchGrid, geodesicArea, readBoundary, type PickOption } from '../../shared/geo';
import { CliInputError, numberOption, parseArgs, requireOption } from './args';

export const summary =
  'rasterize --boundary FILE [--cell-size M] [--min-fraction F] [--pick PROPERTY=VALUE] [--json]: patch grid of a boundary';

const DEFAULT_CELL_SIZE_M = 100;

function pickOption(raw: string | undefined): PickOption | undefined {
  if (raw === undefined) return undefined;
  const at = raw.indexOf('=');
  if (at <= 0) throw new CliInputError(`--pick must look like PROPERTY=VALUE, got '${raw}'`);
  return { property: raw.slice(0, at), value: raw.slice(at + 1) };
}

export async function run(argv: string[]): Promise<void> {
  const args = parseArgs(argv, ['json']);
  const file = requireOption(args, 'boundary');
  const cellSize = numberOption(args, 'cell-size', DEFAULT_CELL_SIZE_M);
  const minFraction = numberOption(args, 'min-fraction', 0);
  const pick = pickOption(args.options.get('pick'));
  let bytes: Buffer;
  try {
    bytes = await readFile(file);
  } catch (err) {
    throw new CliInputError(`cannot read ${file}: ${err instanceof Error ? err.message : String(err)}`);
  }
  try {
    const boundary = await readBoundary(new Uint8Array(bytes), { fileName: file, pick });
    const grid = buildPatchGrid(boundary, { cellSize, minFraction });
    const result = {
      patchCount: grid.cells.length,
      totalAreaM2: grid.totalAreaM2,
      boundaryAreaM2: geodesicArea(boundary),
      cellSizeM: cellSize,
      projection: grid.spec.projection,
      parts: boundary.parts.length,
      holes: boundary.parts.reduce((sum, polygon) => sum + polygon.length - 1, 0),
      warnings: [...boundary.warnings, ...boundary.notes],
    };
    if (args.flags.has('json')) {
      process.stdout.write(`${JSON.stringify(result, null, 2)}\n`);
      return;
    }
    const ha = (m2: number): string => `${(m2 / 1e4).toLocaleString('en-US', { maximumFractionDigits: 2 })} ha`;
    process.stdout.write(
      [
        `${result.patchCount.toLocaleString('en-US')} patches of ${cellSize} m (${result.parts} part(s), ${result.holes} hole(s))`,
        `patch area total ${ha(result.totalAreaM2)}; boundary (WGS84 geodesic) ${ha(result.boundaryAreaM2)}`,
        `projection ${result.projection}`,
        ...result.warnings.map((w) => `note: ${w}`),
      ].join('\n') + '\n',
    );
  } catch (err) {
    if (err instanceof BoundaryInputError) throw new CliInputError(`${file}: ${err.message}`);
    throw err;
  }
}
