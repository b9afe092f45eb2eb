/**
 * The YAML parser, in a module of its own so that `load-config.ts` can load it on first use
 * (`import('./yaml-parser.js')`): a static re-export lets the bundler bridge the package's
 * CommonJS build, which a dynamic `import('yaml')` of a split bundle does not.
 */
export { parseDocument } from 'yaml';
