import { createRequire as __fitgapCreateRequire } from 'node:module'; const require = __fitgapCreateRequire(import.meta.url);
function r(t){return t==="epochs"?1e6:1e4}var e=64;function n(t){return t!==0&&(Math.abs(t)>=1e6||Math.abs(t)<1e-6)?t.toExponential().replace("e+","e"):String(t)}export{r as a,e as b,n as c};
