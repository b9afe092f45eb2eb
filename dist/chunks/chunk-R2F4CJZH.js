import { createRequire as __fitgapCreateRequire } from 'node:module'; const require = __fitgapCreateRequire(import.meta.url);
import{a as r}from"./chunk-F67OOH2X.js";function n(t){return t!==0&&(Math.abs(t)>=1e6||Math.abs(t)<1e-6)?t.toExponential().replace("e+","e"):String(t)}r(n,"formatLimit");export{n as a};
