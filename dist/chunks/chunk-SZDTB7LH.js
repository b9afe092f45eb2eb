import { createRequire as __fitgapCreateRequire } from 'node:module'; const require = __fitgapCreateRequire(import.meta.url);
var o="review.json",s="pull-request.json",t="run.json",e="predictions.csv";export{o as a,s as b,t as c,e as d};
