import { createRequire as __fitgapCreateRequire } from 'node:module'; const require = __fitgapCreateRequire(import.meta.url);
import{a as r}from"./chunk-F67OOH2X.js";function e(t){return t==="epochs"?1e6:1e4}r(e,"maxCurvePoints");var n=64;function o(t){return t!==0&&(Math.abs(t)>=1e6||Math.abs(t)<1e-6)?t.toExponential().replace("e+","e"):String(t)}r(o,"formatLimit");export{e as a,n as b,o as c};
