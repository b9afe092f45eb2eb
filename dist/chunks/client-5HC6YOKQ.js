import { createRequire as __fitgapCreateRequire } from 'node:module'; const require = __fitgapCreateRequire(import.meta.url);
import{a,b}from"./chunk-4KC5BQLQ.js";import"./chunk-CGJIVPM6.js";import"./chunk-F67OOH2X.js";export{b as createClient,a as fetchWithTimeout};
