const fs=require('fs');const prof=JSON.parse(fs.readFileSync(process.argv[2],'utf8'));
const byId=new Map(prof.nodes.map(n=>[n.id,n]));const parent=new Map();for(const n of prof.nodes)for(const c of (n.children||[]))parent.set(c,n.id);
const nm=id=>{const cf=byId.get(id).callFrame;return (cf.functionName||'(anon)')+' '+cf.url.replace(/.*node_modules\//,'nm:').replace(/.*\/work\/main\//,'')+':'+(cf.lineNumber+1);};
const self={},incl={};let tot=0;
for(let i=0;i<prof.samples.length;i++){const id=prof.samples[i];const dt=prof.timeDeltas[i+1]||0;tot+=dt;const n=nm(id);self[n]=(self[n]||0)+dt;const seen=new Set();let x=id;while(x!==undefined){const k=nm(x);if(!seen.has(k)){seen.add(k);incl[k]=(incl[k]||0)+dt;}x=parent.get(x);}}
const grp={};for(const [k,v] of Object.entries(self)){let g=k.split(' ')[1]||k;const m=g.match(/^nm:((@[^/]+\/)?[^/]+)/);g=m?m[1]:g.replace(/:\d+$/,'');grp[g]=(grp[g]||0)+v;}
const top=(o,n,f=()=>true)=>Object.entries(o).filter(([k])=>f(k)).sort((a,b)=>b[1]-a[1]).slice(0,n).forEach(([k,v])=>console.log((100*v/tot).toFixed(1).padStart(6)+'%',k));
console.log('total s',(tot/1e6).toFixed(2));console.log('BY FILE/PKG');top(grp,30);console.log('SELF');top(self,30);console.log('INCL own');top(incl,60,k=>/(server|db|lib|shared)\//.test(k));
