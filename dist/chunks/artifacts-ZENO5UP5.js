import { createRequire as __fitgapCreateRequire } from 'node:module'; const require = __fitgapCreateRequire(import.meta.url);
import{a,b,c,d}from"./chunk-4QTZANXT.js";import"./chunk-BRHSB4YX.js";import"./chunk-7O6VL7DT.js";import"./chunk-EQD7KD66.js";export{c as downloadArtifact,b as findArtifact,d as pickRunFiles,a as workflowFileFromRef};
