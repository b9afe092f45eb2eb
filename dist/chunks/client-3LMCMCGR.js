import { createRequire as __fitgapCreateRequire } from 'node:module'; const require = __fitgapCreateRequire(import.meta.url);
import{a,b}from"./chunk-NFGX43GQ.js";import"./chunk-2WITSP7X.js";import"./chunk-EQD7KD66.js";export{b as createClient,a as fetchWithTimeout};
