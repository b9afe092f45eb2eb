/** The jstat package itself (a devDependency of the tests), typed as the part fitgap copies. */
declare module 'jstat' {
  import type { JStatSubset } from '../../src/stats/vendor/jstat-subset.js';

  const jStat: JStatSubset;
  export default jStat;
}
