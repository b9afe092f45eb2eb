import { createRequire as __fitgapCreateRequire } from 'node:module'; const require = __fitgapCreateRequire(import.meta.url);
import{a,b,c,d}from"./chunk-JYZOVXHU.js";import"./chunk-ZGDVYQ3H.js";import"./chunk-DUOFI3TR.js";import"./chunk-F67OOH2X.js";export{c as downloadArtifact,b as findArtifact,d as pickRunFiles,a as workflowFileFromRef};
