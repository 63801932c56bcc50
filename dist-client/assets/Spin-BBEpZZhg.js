import{$t as e,Cn as t,D as n,E as r,Gn as i,Rn as a,Xt as o,Yt as s,_n as c,bn as l,d as u,dt as d,et as f,gn as p,on as m,ot as h,pr as g,rr as _,rt as v,tn as y,vn as b,wn as x,yt as S}from"./_plugin-vue_export-helper-C4XqT5Hd.js";import{c as C,s as w}from"./Button-CqYvzYpP.js";import{m as T}from"./index-KegDRDt8.js";import{t as E}from"./use-compitable-Bg3lqppB.js";var D=s([s(`@keyframes spin-rotate`,`
 from {
 transform: rotate(0);
 }
 to {
 transform: rotate(360deg);
 }
 `),o(`spin-container`,`
 position: relative;
 `,[o(`spin-body`,`
 position: absolute;
 top: 50%;
 left: 50%;
 transform: translateX(-50%) translateY(-50%);
 `,[u()])]),o(`spin-body`,`
 display: inline-flex;
 align-items: center;
 justify-content: center;
 flex-direction: column;
 `),o(`spin`,`
 display: inline-flex;
 height: var(--n-size);
 width: var(--n-size);
 font-size: var(--n-size);
 color: var(--n-color);
 `,[e(`rotate`,`
 animation: spin-rotate 2s linear infinite;
 `)]),o(`spin-description`,`
 display: inline-block;
 font-size: var(--n-font-size);
 color: var(--n-text-color);
 transition: color .3s var(--n-bezier);
 margin-top: 8px;
 `),o(`spin-content`,`
 opacity: 1;
 transition: opacity .3s var(--n-bezier);
 pointer-events: all;
 `,[e(`spinning`,`
 user-select: none;
 -webkit-user-select: none;
 pointer-events: none;
 opacity: var(--n-opacity-spinning);
 `)])]),O={small:20,medium:18,large:16},k={...r.props,contentClass:String,contentStyle:[Object,String],description:String,size:{type:[String,Number],default:`medium`},show:{type:Boolean,default:!0},rotate:{type:Boolean,default:!0},spinning:{type:Boolean,validator:()=>!0,default:void 0},delay:Number,...C,strokeWidth:Number},A=x({name:`Spin`,props:k,slots:Object,setup(e){i(()=>{e.spinning!==void 0&&S(`spin`,"`spinning` is deprecated, please use `show` instead.")});let{mergedClsPrefixRef:t,inlineThemeDisabled:a}=d(e),o=r(`Spin`,`-spin`,D,T,e,t),s=p(()=>{let{size:t}=e,{common:{cubicBezierEaseInOut:n},self:r}=o.value,{opacitySpinning:i,color:a,textColor:s}=r;return{"--n-bezier":n,"--n-opacity-spinning":i,"--n-size":typeof t==`number`?f(t):r[y(`size`,t)],"--n-color":a,"--n-text-color":s}}),c=a?n(`spin`,p(()=>{let{size:t}=e;return typeof t==`number`?String(t):t[0]}),s,e):void 0,l=E(e,[`spinning`,`show`]),u=_(!1);return i(t=>{let n;if(l.value){let{delay:r}=e;if(r){n=window.setTimeout(()=>{u.value=!0},r),t(()=>{clearTimeout(n)});return}}u.value=l.value}),{mergedClsPrefix:t,active:u,mergedStrokeWidth:p(()=>{let{strokeWidth:t}=e;if(t!==void 0)return t;let{size:n}=e;return O[typeof n==`number`?`medium`:n]}),cssVars:a?void 0:s,themeClass:c?.themeClass,onRender:c?.onRender}},render(){let{$slots:e,mergedClsPrefix:n,description:r}=this,i=e.icon&&this.rotate,o=(r||e.description)&&(a(),l(`div`,{class:v(`${n}-spin-description`)},[h(()=>r||e.description?.())],2)),s=e.icon?(a(),l(`div`,{key:1,class:v([`${n}-spin-body`,this.themeClass])},[c(`div`,{class:v([`${n}-spin`,i&&`${n}-spin--rotate`]),style:g(e.default?``:this.cssVars)},[h(()=>e.icon())],6),h(()=>o)],2)):(a(),l(`div`,{key:2,class:v([`${n}-spin-body`,this.themeClass])},[(a(),b(w,{clsPrefix:n,style:g(e.default?``:this.cssVars),stroke:this.stroke,"stroke-width":this.mergedStrokeWidth,radius:this.radius,scale:this.scale,class:v(`${n}-spin`)},null,8,[`clsPrefix`,`style`,`stroke`,`stroke-width`,`radius`,`scale`,`class`])),h(()=>o)],2));return this.onRender?.(),e.default?(a(),l(`div`,{key:3,class:v([`${n}-spin-container`,this.themeClass]),style:g(this.cssVars)},[c(`div`,{class:v([`${n}-spin-content`,this.active&&`${n}-spin-content--spinning`,this.contentClass]),style:g(this.contentStyle)},[h(()=>e.default?.())],6),t(m,{name:`fade-in-transition`},{default:()=>this.active?s:null},1024)],6)):s}});export{A as t};