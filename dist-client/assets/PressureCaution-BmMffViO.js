import{A as e,An as t,E as n,En as r,Rn as i,Xt as a,Yt as o,bn as s,dt as c,et as l,fn as u,gn as d,ot as f,t as p,tn as m,wn as h}from"./_plugin-vue_export-helper-C4XqT5Hd.js";import{o as g}from"./Button-CqYvzYpP.js";import{F as _}from"./light-B367S0Uq.js";var v=!1;function y(){if(g&&window.CSS&&!v&&(v=!0,`registerProperty`in window?.CSS))try{CSS.registerProperty({name:`--n-color-start`,syntax:`<color>`,inherits:!1,initialValue:`#0000`}),CSS.registerProperty({name:`--n-color-end`,syntax:`<color>`,inherits:!1,initialValue:`#0000`})}catch{}}function b(e){let{heightSmall:t,heightMedium:n,heightLarge:r,borderRadius:i}=e;return{color:`#eee`,colorEnd:`#ddd`,borderRadius:i,heightSmall:t,heightMedium:n,heightLarge:r}}var x={name:`Skeleton`,common:e,self:b},S=o([a(`skeleton`,`
 height: 1em;
 width: 100%;
 transition:
 --n-color-start .3s var(--n-bezier),
 --n-color-end .3s var(--n-bezier),
 background-color .3s var(--n-bezier);
 animation: 2s skeleton-loading infinite cubic-bezier(0.36, 0, 0.64, 1);
 background-color: var(--n-color-start);
 `),o(`@keyframes skeleton-loading`,`
 0% {
 background: var(--n-color-start);
 }
 40% {
 background: var(--n-color-end);
 }
 80% {
 background: var(--n-color-start);
 }
 100% {
 background: var(--n-color-start);
 }
 `)]),C={...n.props,text:Boolean,round:Boolean,circle:Boolean,height:[String,Number],width:[String,Number],size:String,repeat:{type:Number,default:1},animated:{type:Boolean,default:!0},sharp:{type:Boolean,default:!0}},w=h({name:`Skeleton`,inheritAttrs:!1,props:C,setup(e){y();let{mergedClsPrefixRef:t,mergedComponentPropsRef:r}=c(e),i=d(()=>e.size||r?.value?.Skeleton?.size),a=n(`Skeleton`,`-skeleton`,S,x,e,t);return{mergedClsPrefix:t,style:d(()=>{let t=a.value,{common:{cubicBezierEaseInOut:n}}=t,r=t.self,{color:o,colorEnd:s,borderRadius:c}=r,u,{circle:d,sharp:f,round:p,width:h,height:g,text:_,animated:v}=e,y=i.value;y!==void 0&&(u=r[m(`height`,y)]);let b=d?h??g??u:h,x=(d?h??g:g)??u;return{display:_?`inline-block`:``,verticalAlign:_?`-0.125em`:``,borderRadius:d?`50%`:p?`4096px`:f?``:c,width:typeof b==`number`?l(b):b,height:typeof x==`number`?l(x):x,animation:v?``:`none`,"--n-bezier":n,"--n-color-start":o,"--n-color-end":s}})}},render(){let{repeat:e,style:n,mergedClsPrefix:a,$attrs:o}=this,c=r(`div`,t({class:`${a}-skeleton`,style:n},o));return e>1?(i(),s(u,{key:1},[f(()=>_(e,null).map(e=>[c,`
`]))],64)):c}}),T={},E={class:`pressure-caution`,role:`note`,"data-testid":`pressure-caution`};function D(e,t){return i(),s(`p`,E,` Predictions and measured values guide decisions; verify with the responsible licensed engineer and local regulations. `)}var O=p(T,[[`render`,D],[`__scopeId`,`data-v-96fdb34b`],[`__file`,`/work/wt/client/src/components/well/PressureCaution.vue`]]);export{w as n,O as t};