const fs=require('fs');const p=JSON.parse(fs.readFileSync(process.argv[2],'utf8'));
// sampling heap profile: head tree with selfSize; samples list. Sum selfSize by frame (allocation site)
const self={};let tot=0;
(function walk(n,stack){const cf=n.callFrame;const name=(cf.functionName||'(anon)')+' '+cf.url.replace(/.*node_modules\//,'nm:').replace(/.*\/work\/main\//,'')+':'+(cf.lineNumber+1);
 self[name]=(self[name]||0)+n.selfSize;tot+=n.selfSize;for(const c of n.children||[])walk(c);})(p.head,[]);
console.log('total MB (live samples at end, not allocation volume)',(tot/1e6).toFixed(1));
Object.entries(self).sort((a,b)=>b[1]-a[1]).slice(0,30).forEach(([k,v])=>console.log((v/1e3).toFixed(0).padStart(8),'KB',k));
