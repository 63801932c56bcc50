import{$t as e,D as t,E as n,Rn as r,Xt as i,Yt as a,_n as o,an as s,at as c,bn as l,dt as u,fn as d,gn as f,ot as p,pr as m,rt as h,tn as g,vn as _,w as v,wn as y}from"./_plugin-vue_export-helper-C4XqT5Hd.js";import{B as b,R as x,V as S,h as C,z as w}from"./index-KegDRDt8.js";import{f as T}from"./Suffix-CEyhj_Z0.js";var E=[`id`],D=[`stop-color`],O=[`stop-color`],k=[`viewBox`],A=[`d`,`stroke-width`],j=[`d`,`stroke-width`],M={success:(r(),_(w)),error:(r(),_(S)),warning:(r(),_(x)),info:(r(),_(b))},N=y({name:`ProgressCircle`,props:{clsPrefix:{type:String,required:!0},status:{type:String,required:!0},strokeWidth:{type:Number,required:!0},fillColor:[String,Object],railColor:String,railStyle:[String,Object],percentage:{type:Number,default:0},offsetDegree:{type:Number,default:0},showIndicator:{type:Boolean,required:!0},indicatorTextColor:String,unit:String,viewBoxWidth:{type:Number,required:!0},gapDegree:{type:Number,required:!0},gapOffsetDegree:{type:Number,default:0}},setup(e,{slots:t}){let n=f(()=>{let t=`gradient`,{fillColor:n}=e;return typeof n==`object`?`${t}-${s(JSON.stringify(n))}`:t});function i(t,r,i,a){let{gapDegree:o,viewBoxWidth:s,strokeWidth:c}=e,l=50+c/2,u=`M ${l},${l} m 0,50
      a 50,50 0 1 1 0,-100
      a 50,50 0 1 1 0,100`,d=Math.PI*2*50;return{pathString:u,pathStyle:{stroke:a===`rail`?i:typeof e.fillColor==`object`?`url(#${n.value})`:i,strokeDasharray:`${Math.min(t,100)/100*(d-o)}px ${s*8}px`,strokeDashoffset:`-${o/2}px`,transformOrigin:r?`center`:void 0,transform:r?`rotate(${r}deg)`:void 0}}}let a=()=>{let t=typeof e.fillColor==`object`,i=t?e.fillColor.stops[0]:``,a=t?e.fillColor.stops[1]:``;return t&&(r(),l(`defs`,null,[o(`linearGradient`,{id:n.value,x1:`0%`,y1:`100%`,x2:`100%`,y2:`0%`},[o(`stop`,{offset:`0%`,"stop-color":i},null,8,D),o(`stop`,{offset:`100%`,"stop-color":a},null,8,O)],8,E)]))};return()=>{let{fillColor:n,railColor:s,strokeWidth:c,offsetDegree:u,status:f,percentage:g,showIndicator:y,indicatorTextColor:b,unit:x,gapOffsetDegree:S,clsPrefix:C}=e,{pathString:w,pathStyle:T}=i(100,0,s,`rail`),{pathString:E,pathStyle:D}=i(g,u,n,`fill`),O=100+c;return r(),l(`div`,{class:h(`${C}-progress-content`),role:`none`},[o(`div`,{class:h(`${C}-progress-graph`),"aria-hidden":!0},[o(`div`,{class:h(`${C}-progress-graph-circle`),style:m({transform:S?`rotate(${S}deg)`:void 0})},[(r(),l(`svg`,{viewBox:`0 0 ${O} ${O}`},[p(()=>a()),o(`g`,null,[o(`path`,{class:h(`${C}-progress-graph-circle-rail`),d:w,"stroke-width":c,"stroke-linecap":`round`,fill:`none`,style:m(T)},null,14,A)]),o(`g`,null,[o(`path`,{class:h([`${C}-progress-graph-circle-fill`,g===0&&`${C}-progress-graph-circle-fill--empty`]),d:E,"stroke-width":c,"stroke-linecap":`round`,fill:`none`,style:m(D)},null,14,j)])],8,k))],6)],2),y?(r(),l(`div`,{key:0},[t.default?(r(),l(`div`,{key:0,class:h(`${C}-progress-custom-content`),role:`none`},[p(()=>t.default())],2)):(r(),l(d,{key:1},[f==="default"?(r(),l(`div`,{key:1,class:h(`${C}-progress-text`),style:m({color:b}),role:`none`},[o(`span`,{class:h(`${C}-progress-text__percentage`)},[p(()=>g)],2),o(`span`,{class:h(`${C}-progress-text__unit`)},[p(()=>x)],2)],6)):(r(),l(`div`,{key:0,class:h(`${C}-progress-icon`),"aria-hidden":!0},[(r(),_(v,{clsPrefix:C},{default:()=>M[f]},1032,[`clsPrefix`]))],2))],64))])):p(()=>null)],2)}}}),P={success:(r(),_(w)),error:(r(),_(S)),warning:(r(),_(x)),info:(r(),_(b))},F=y({name:`ProgressLine`,props:{clsPrefix:{type:String,required:!0},percentage:{type:Number,default:0},railColor:String,railStyle:[String,Object],fillColor:[String,Object],status:{type:String,required:!0},indicatorPlacement:{type:String,required:!0},indicatorTextColor:String,unit:{type:String,default:`%`},processing:{type:Boolean,required:!0},showIndicator:{type:Boolean,required:!0},height:[String,Number],railBorderRadius:[String,Number],fillBorderRadius:[String,Number]},setup(e,{slots:t}){let n=f(()=>T(e.height)),i=f(()=>typeof e.fillColor==`object`?`linear-gradient(to right, ${e.fillColor?.stops[0]} , ${e.fillColor?.stops[1]})`:e.fillColor),a=f(()=>e.railBorderRadius===void 0?e.height===void 0?``:T(e.height,{c:.5}):T(e.railBorderRadius)),s=f(()=>e.fillBorderRadius===void 0?e.railBorderRadius===void 0?e.height===void 0?``:T(e.height,{c:.5}):T(e.railBorderRadius):T(e.fillBorderRadius));return()=>{let{indicatorPlacement:c,railColor:u,railStyle:f,percentage:g,unit:y,indicatorTextColor:b,status:x,showIndicator:S,processing:C,clsPrefix:w}=e;return r(),l(`div`,{class:h(`${w}-progress-content`),role:`none`},[o(`div`,{class:h(`${w}-progress-graph`),"aria-hidden":!0},[o(`div`,{class:h([`${w}-progress-graph-line`,{[`${w}-progress-graph-line--indicator-${c}`]:!0}])},[o(`div`,{class:h(`${w}-progress-graph-line-rail`),style:m([{backgroundColor:u,height:n.value,borderRadius:a.value},f])},[o(`div`,{class:h([`${w}-progress-graph-line-fill`,C&&`${w}-progress-graph-line-fill--processing`]),style:m({maxWidth:`${e.percentage}%`,background:i.value,height:n.value,lineHeight:n.value,borderRadius:s.value})},[c===`inside`?(r(),l(`div`,{key:0,class:h(`${w}-progress-graph-line-indicator`),style:m({color:b})},[t.default?(r(),l(d,{key:0},[p(()=>t.default())],64)):(r(),l(d,{key:1},[p(()=>`${g}${y}`)],64))],6)):p(()=>null)],6)],6)],2)],2),S&&c===`outside`?(r(),l(`div`,{key:0},[t.default?(r(),l(`div`,{key:0,class:h(`${w}-progress-custom-content`),style:m({color:b}),role:`none`},[p(()=>t.default())],6)):(r(),l(d,{key:1},[x==="default"?(r(),l(`div`,{key:0,role:`none`,class:h(`${w}-progress-icon ${w}-progress-icon--as-text`),style:m({color:b})},[p(()=>g),p(()=>y)],6)):(r(),l(`div`,{key:1,class:h(`${w}-progress-icon`),"aria-hidden":!0},[(r(),_(v,{clsPrefix:w},{default:()=>P[x]},1032,[`clsPrefix`]))],2))],64))])):p(()=>null)],2)}}}),I=[`id`],L=[`stop-color`],R=[`stop-color`],z=[`d`,`stroke-width`],B=[`d`,`stroke-width`],V=[`viewBox`];function H(e,t,n=100){return`m ${n/2} ${n/2-e} a ${e} ${e} 0 1 1 0 ${2*e} a ${e} ${e} 0 1 1 0 -${2*e}`}var U=y({name:`ProgressMultipleCircle`,props:{clsPrefix:{type:String,required:!0},viewBoxWidth:{type:Number,required:!0},percentage:{type:Array,default:[0]},strokeWidth:{type:Number,required:!0},circleGap:{type:Number,required:!0},showIndicator:{type:Boolean,required:!0},fillColor:{type:Array,default:()=>[]},railColor:{type:Array,default:()=>[]},railStyle:{type:Array,default:()=>[]}},setup(e,{slots:t}){let n=f(()=>e.percentage.map((t,n)=>`${Math.PI*t/100*(e.viewBoxWidth/2-e.strokeWidth/2*(1+2*n)-e.circleGap*n)*2}, ${e.viewBoxWidth*8}`)),i=(t,n)=>{let i=e.fillColor[n],a=typeof i==`object`?i.stops[0]:``,s=typeof i==`object`?i.stops[1]:``;return typeof e.fillColor[n]==`object`&&(r(),l(`linearGradient`,{id:`gradient-${n}`,x1:`100%`,y1:`0%`,x2:`0%`,y2:`100%`},[o(`stop`,{offset:`0%`,"stop-color":a},null,8,L),o(`stop`,{offset:`100%`,"stop-color":s},null,8,R)],8,I))};return()=>{let{viewBoxWidth:a,strokeWidth:s,circleGap:c,showIndicator:u,fillColor:d,railColor:f,railStyle:g,percentage:_,clsPrefix:v}=e;return r(),l(`div`,{class:h(`${v}-progress-content`),role:`none`},[o(`div`,{class:h(`${v}-progress-graph`),"aria-hidden":!0},[o(`div`,{class:h(`${v}-progress-graph-circle`)},[(r(),l(`svg`,{viewBox:`0 0 ${a} ${a}`},[o(`defs`,null,[p(()=>_.map((e,t)=>i(e,t)))]),p(()=>_.map((e,t)=>(r(),l(`g`,{key:t},[o(`path`,{class:h(`${v}-progress-graph-circle-rail`),d:H(a/2-s/2*(1+2*t)-c*t,s,a),"stroke-width":s,"stroke-linecap":`round`,fill:`none`,style:m([{strokeDashoffset:0,stroke:f[t]},g[t]])},null,14,z),o(`path`,{class:h([`${v}-progress-graph-circle-fill`,e===0&&`${v}-progress-graph-circle-fill--empty`]),d:H(a/2-s/2*(1+2*t)-c*t,s,a),"stroke-width":s,"stroke-linecap":`round`,fill:`none`,style:m({strokeDasharray:n.value[t],strokeDashoffset:0,stroke:typeof d[t]==`object`?`url(#gradient-${t})`:d[t]})},null,14,B)]))))],8,V))],2)],2),u&&t.default?(r(),l(`div`,{key:0},[o(`div`,{class:h(`${v}-progress-text`)},[p(()=>t.default())],2)])):p(()=>null)],2)}}}),W=a([i(`progress`,{display:`inline-block`},[i(`progress-icon`,`
 color: var(--n-icon-color);
 transition: color .3s var(--n-bezier);
 `),e(`line`,`
 width: 100%;
 display: block;
 `,[i(`progress-content`,`
 display: flex;
 align-items: center;
 `,[i(`progress-graph`,{flex:1})]),i(`progress-custom-content`,{marginLeft:`14px`}),i(`progress-icon`,`
 width: 30px;
 padding-left: 14px;
 height: var(--n-icon-size-line);
 line-height: var(--n-icon-size-line);
 font-size: var(--n-icon-size-line);
 `,[e(`as-text`,`
 color: var(--n-text-color-line-outer);
 text-align: center;
 width: 40px;
 font-size: var(--n-font-size);
 padding-left: 4px;
 transition: color .3s var(--n-bezier);
 `)])]),e(`circle, dashboard`,{width:`120px`},[i(`progress-custom-content`,`
 position: absolute;
 left: 50%;
 top: 50%;
 transform: translateX(-50%) translateY(-50%);
 display: flex;
 align-items: center;
 justify-content: center;
 `),i(`progress-text`,`
 position: absolute;
 left: 50%;
 top: 50%;
 transform: translateX(-50%) translateY(-50%);
 display: flex;
 align-items: center;
 color: inherit;
 font-size: var(--n-font-size-circle);
 color: var(--n-text-color-circle);
 font-weight: var(--n-font-weight-circle);
 transition: color .3s var(--n-bezier);
 white-space: nowrap;
 `),i(`progress-icon`,`
 position: absolute;
 left: 50%;
 top: 50%;
 transform: translateX(-50%) translateY(-50%);
 display: flex;
 align-items: center;
 color: var(--n-icon-color);
 font-size: var(--n-icon-size-circle);
 `)]),e(`multiple-circle`,`
 width: 200px;
 color: inherit;
 `,[i(`progress-text`,`
 font-weight: var(--n-font-weight-circle);
 color: var(--n-text-color-circle);
 position: absolute;
 left: 50%;
 top: 50%;
 transform: translateX(-50%) translateY(-50%);
 display: flex;
 align-items: center;
 justify-content: center;
 transition: color .3s var(--n-bezier);
 `)]),i(`progress-content`,{position:`relative`}),i(`progress-graph`,{position:`relative`},[i(`progress-graph-circle`,[a(`svg`,{verticalAlign:`bottom`}),i(`progress-graph-circle-fill`,`
 stroke: var(--n-fill-color);
 transition:
 opacity .3s var(--n-bezier),
 stroke .3s var(--n-bezier),
 stroke-dasharray .3s var(--n-bezier);
 `,[e(`empty`,{opacity:0})]),i(`progress-graph-circle-rail`,`
 transition: stroke .3s var(--n-bezier);
 overflow: hidden;
 stroke: var(--n-rail-color);
 `)]),i(`progress-graph-line`,[e(`indicator-inside`,[i(`progress-graph-line-rail`,`
 height: 16px;
 line-height: 16px;
 border-radius: 10px;
 `,[i(`progress-graph-line-fill`,`
 height: inherit;
 border-radius: 10px;
 `),i(`progress-graph-line-indicator`,`
 background: #0000;
 white-space: nowrap;
 text-align: right;
 margin-left: 14px;
 margin-right: 14px;
 height: inherit;
 font-size: 12px;
 color: var(--n-text-color-line-inner);
 transition: color .3s var(--n-bezier);
 `)])]),e(`indicator-inside-label`,`
 height: 16px;
 display: flex;
 align-items: center;
 `,[i(`progress-graph-line-rail`,`
 flex: 1;
 transition: background-color .3s var(--n-bezier);
 `),i(`progress-graph-line-indicator`,`
 background: var(--n-fill-color);
 font-size: 12px;
 transform: translateZ(0);
 display: flex;
 vertical-align: middle;
 height: 16px;
 line-height: 16px;
 padding: 0 10px;
 border-radius: 10px;
 position: absolute;
 white-space: nowrap;
 color: var(--n-text-color-line-inner);
 transition:
 right .2s var(--n-bezier),
 color .3s var(--n-bezier),
 background-color .3s var(--n-bezier);
 `)]),i(`progress-graph-line-rail`,`
 position: relative;
 overflow: hidden;
 height: var(--n-rail-height);
 border-radius: 5px;
 background-color: var(--n-rail-color);
 transition: background-color .3s var(--n-bezier);
 `,[i(`progress-graph-line-fill`,`
 background: var(--n-fill-color);
 position: relative;
 border-radius: 5px;
 height: inherit;
 width: 100%;
 max-width: 0%;
 transition:
 background-color .3s var(--n-bezier),
 max-width .2s var(--n-bezier);
 `,[e(`processing`,[a(`&::after`,`
 content: "";
 background-image: var(--n-line-bg-processing);
 animation: progress-processing-animation 2s var(--n-bezier) infinite;
 `)])])])])])]),a(`@keyframes progress-processing-animation`,`
 0% {
 position: absolute;
 left: 0;
 top: 0;
 bottom: 0;
 right: 100%;
 opacity: 1;
 }
 66% {
 position: absolute;
 left: 0;
 top: 0;
 bottom: 0;
 right: 0;
 opacity: 0;
 }
 100% {
 position: absolute;
 left: 0;
 top: 0;
 bottom: 0;
 right: 0;
 opacity: 0;
 }
 `)]),G=[`aria-valuenow`,`role`],K={...n.props,processing:Boolean,type:{type:String,default:`line`},gapDegree:Number,gapOffsetDegree:Number,status:{type:String,default:`default`},railColor:[String,Array],railStyle:[String,Array],color:[String,Array,Object],viewBoxWidth:{type:Number,default:100},strokeWidth:{type:Number,default:7},percentage:[Number,Array],unit:{type:String,default:`%`},showIndicator:{type:Boolean,default:!0},indicatorPosition:{type:String,default:`outside`},indicatorPlacement:{type:String,default:`outside`},indicatorTextColor:String,circleGap:{type:Number,default:1},height:Number,borderRadius:[String,Number],fillBorderRadius:[String,Number],offsetDegree:Number},q=y({name:`Progress`,props:K,setup(e){let r=f(()=>e.indicatorPlacement||e.indicatorPosition),i=f(()=>{if(e.gapDegree||e.gapDegree===0)return e.gapDegree;if(e.type===`dashboard`)return 75}),{mergedClsPrefixRef:a,inlineThemeDisabled:o}=u(e),s=n(`Progress`,`-progress`,W,C,e,a),c=f(()=>{let{status:t}=e,{common:{cubicBezierEaseInOut:n},self:{fontSize:r,fontSizeCircle:i,railColor:a,railHeight:o,iconSizeCircle:c,iconSizeLine:l,textColorCircle:u,textColorLineInner:d,textColorLineOuter:f,lineBgProcessing:p,fontWeightCircle:m,[g(`iconColor`,t)]:h,[g(`fillColor`,t)]:_}}=s.value;return{"--n-bezier":n,"--n-fill-color":_,"--n-font-size":r,"--n-font-size-circle":i,"--n-font-weight-circle":m,"--n-icon-color":h,"--n-icon-size-circle":c,"--n-icon-size-line":l,"--n-line-bg-processing":p,"--n-rail-color":a,"--n-rail-height":o,"--n-text-color-circle":u,"--n-text-color-line-inner":d,"--n-text-color-line-outer":f}}),l=o?t(`progress`,f(()=>e.status[0]),c,e):void 0;return{mergedClsPrefix:a,mergedIndicatorPlacement:r,gapDeg:i,cssVars:o?void 0:c,themeClass:l?.themeClass,onRender:l?.onRender}},render(){let{type:e,cssVars:t,indicatorTextColor:n,showIndicator:i,status:a,railColor:o,railStyle:s,color:u,percentage:f,viewBoxWidth:g,strokeWidth:v,mergedIndicatorPlacement:y,unit:b,borderRadius:x,fillBorderRadius:S,height:C,processing:w,circleGap:T,mergedClsPrefix:E,gapDeg:D,gapOffsetDegree:O,themeClass:k,$slots:A,onRender:j}=this;return j?.(),r(),l(`div`,{class:h([k,`${E}-progress`,`${E}-progress--${e}`,`${E}-progress--${a}`]),style:m(t),"aria-valuemax":100,"aria-valuemin":0,"aria-valuenow":f,role:e===`circle`||e===`line`||e===`dashboard`?`progressbar`:`none`},[e===`circle`||e===`dashboard`?(r(),_(N,{key:0,clsPrefix:E,status:a,showIndicator:i,indicatorTextColor:n,railColor:o,fillColor:u,railStyle:s,offsetDegree:this.offsetDegree,percentage:f,viewBoxWidth:g,strokeWidth:v,gapDegree:D===void 0?e===`dashboard`?75:0:D,gapOffsetDegree:O,unit:b},c(A),1032,[`clsPrefix`,`status`,`showIndicator`,`indicatorTextColor`,`railColor`,`fillColor`,`railStyle`,`offsetDegree`,`percentage`,`viewBoxWidth`,`strokeWidth`,`gapDegree`,`gapOffsetDegree`,`unit`])):(r(),l(d,{key:1},[e===`line`?(r(),_(F,{key:0,clsPrefix:E,status:a,showIndicator:i,indicatorTextColor:n,railColor:o,fillColor:u,railStyle:s,percentage:f,processing:w,indicatorPlacement:y,unit:b,fillBorderRadius:S,railBorderRadius:x,height:C},c(A),1032,[`clsPrefix`,`status`,`showIndicator`,`indicatorTextColor`,`railColor`,`fillColor`,`railStyle`,`percentage`,`processing`,`indicatorPlacement`,`unit`,`fillBorderRadius`,`railBorderRadius`,`height`])):(r(),l(d,{key:1},[e===`multiple-circle`?(r(),_(U,{key:0,clsPrefix:E,strokeWidth:v,railColor:o,fillColor:u,railStyle:s,viewBoxWidth:g,percentage:f,showIndicator:i,circleGap:T},c(A),1032,[`clsPrefix`,`strokeWidth`,`railColor`,`fillColor`,`railStyle`,`viewBoxWidth`,`percentage`,`showIndicator`,`circleGap`])):p(()=>null)],64))],64))],14,G)}});export{q as t};