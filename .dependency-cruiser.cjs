// Layer order of fitgap's source: imports run one way only.
//   entries → io → report → analysis → artifact / validate → model / stats
// A module may import its own layer and any layer to its right, never one to its left.
const layers = [
  ['entries'],
  ['io'],
  ['report'],
  ['analysis'],
  ['artifact', 'validate'],
  ['model', 'stats'],
];
const group = (names) => `^src/(${names.join('|')})/`;

const forbidden = layers.slice(1).map((layer, i) => ({
  name: `no-upward-import-from-${layer.join('-')}`,
  comment: `${layer.join(' and ')} must not import ${layers
    .slice(0, i + 1)
    .flat()
    .join(', ')} (layer order: ${layers.map((l) => l.join('/')).join(' → ')})`,
  severity: 'error',
  from: { path: group(layer) },
  to: { path: group(layers.slice(0, i + 1).flat()) },
}));

forbidden.push(
  {
    name: 'pure-core-has-no-io',
    comment:
      'model, stats, artifact, validate, analysis and report do no I/O and read no environment',
    severity: 'error',
    from: {
      path: group(['model', 'stats', 'artifact', 'validate', 'analysis', 'report']),
    },
    to: {
      path: '^(node:)?(fs|fs/promises|child_process|net|http|https|process|readline)$|@actions/|@octokit/',
    },
  },
  {
    name: 'no-circular',
    severity: 'error',
    from: {},
    to: { circular: true },
  },
);

/* global module */
module.exports = {
  forbidden,
  options: {
    doNotFollow: { path: 'node_modules' },
    tsPreCompilationDeps: true,
    tsConfig: { fileName: 'tsconfig.json' },
    enhancedResolveOptions: { extensions: ['.ts', '.js', '.json'] },
  },
};
