import { createRequire as __fitgapCreateRequire } from 'node:module'; const require = __fitgapCreateRequire(import.meta.url);
import{b as a,c as b,d as c,e as d,f as e}from"./chunk-JHAKU6AE.js";import"./chunk-7F7LZESD.js";import"./chunk-CGJIVPM6.js";import"./chunk-F67OOH2X.js";export{d as GitHub,b as context,c as defaults,e as getOctokitOptions,a as getUserAgentWithOrchestrationId};
