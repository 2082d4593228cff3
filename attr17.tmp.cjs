const fs=require('fs');const {SourceMapConsumer}=require('source-map-js');
const f=process.argv[2];const code=fs.readFileSync(f,'utf8');const map=JSON.parse(fs.readFileSync(f+'.map','utf8'));
const c=new SourceMapConsumer(map);const lines=code.split('\n');const sizes={};
let prev=null;
c.eachMapping(m=>{ if(prev&&prev.generatedLine===m.generatedLine){sizes[prev.source]=(sizes[prev.source]||0)+(m.generatedColumn-prev.generatedColumn);} else if(prev){sizes[prev.source]=(sizes[prev.source]||0)+(lines[prev.generatedLine-1].length-prev.generatedColumn);} prev=m;});
const groups={};for(const [s,n] of Object.entries(sizes)){const k=(s||'null').replace(/.*\/src\//,'src/').replace(/.*node_modules\//,'nm/');groups[k]=n;}
const arr=Object.entries(groups).sort((a,b)=>b[1]-a[1]);
const pref=process.argv[3]||'';let tot=0;for(const [k,n] of arr){if(k.startsWith(pref)){tot+=n;}}
console.log('total',pref,tot);
for(const [k,n] of arr.filter(([k])=>k.startsWith(pref)).slice(0,60))console.log(n,k);
