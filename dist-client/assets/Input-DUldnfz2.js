import{$ as e,$t as t,An as n,C as r,D as i,E as a,Gn as o,In as s,On as c,Qt as l,Rn as u,S as d,Tn as ee,Wn as f,Xt as p,Yt as m,_ as h,_n as g,bn as _,dt as te,en as v,fn as y,gn as b,jn as x,l as S,m as ne,mt as C,nt as w,ot as T,pr as E,rr as D,rt as O,s as k,sr as A,st as re,tn as j,v as M,vn as N,w as P,wn as F,x as I,y as L,zn as ie}from"./_plugin-vue_export-helper-C4XqT5Hd.js";import{a as ae,f as oe,h as R}from"./Button-CqYvzYpP.js";import{m as se,r as z,t as B,v as ce}from"./Suffix-CEyhj_Z0.js";import{t as le}from"./light-BQSgUXq-.js";var V=F({name:`Eye`,render(){return(()=>{let e=w(`ae479a1970012861`);return e[0]||=g(`svg`,{xmlns:`http://www.w3.org/2000/svg`,viewBox:`0 0 512 512`},[g(`path`,{d:`M255.66 112c-77.94 0-157.89 45.11-220.83 135.33a16 16 0 0 0-.27 17.77C82.92 340.8 161.8 400 255.66 400c92.84 0 173.34-59.38 221.79-135.25a16.14 16.14 0 0 0 0-17.47C428.89 172.28 347.8 112 255.66 112z`,fill:`none`,stroke:`currentColor`,"stroke-linecap":`round`,"stroke-linejoin":`round`,"stroke-width":`32`}),g(`circle`,{cx:`256`,cy:`256`,r:`80`,fill:`none`,stroke:`currentColor`,"stroke-miterlimit":`10`,"stroke-width":`32`})],-1)})()}}),H=F({name:`EyeOff`,render(){return(()=>{let e=w(`2c06203b450ce879`);return e[0]||=g(`svg`,{xmlns:`http://www.w3.org/2000/svg`,viewBox:`0 0 512 512`},[g(`path`,{d:`M432 448a15.92 15.92 0 0 1-11.31-4.69l-352-352a16 16 0 0 1 22.62-22.62l352 352A16 16 0 0 1 432 448z`,fill:`currentColor`}),g(`path`,{d:`M255.66 384c-41.49 0-81.5-12.28-118.92-36.5c-34.07-22-64.74-53.51-88.7-91v-.08c19.94-28.57 41.78-52.73 65.24-72.21a2 2 0 0 0 .14-2.94L93.5 161.38a2 2 0 0 0-2.71-.12c-24.92 21-48.05 46.76-69.08 76.92a31.92 31.92 0 0 0-.64 35.54c26.41 41.33 60.4 76.14 98.28 100.65C162 402 207.9 416 255.66 416a239.13 239.13 0 0 0 75.8-12.58a2 2 0 0 0 .77-3.31l-21.58-21.58a4 4 0 0 0-3.83-1a204.8 204.8 0 0 1-51.16 6.47z`,fill:`currentColor`}),g(`path`,{d:`M490.84 238.6c-26.46-40.92-60.79-75.68-99.27-100.53C349 110.55 302 96 255.66 96a227.34 227.34 0 0 0-74.89 12.83a2 2 0 0 0-.75 3.31l21.55 21.55a4 4 0 0 0 3.88 1a192.82 192.82 0 0 1 50.21-6.69c40.69 0 80.58 12.43 118.55 37c34.71 22.4 65.74 53.88 89.76 91a.13.13 0 0 1 0 .16a310.72 310.72 0 0 1-64.12 72.73a2 2 0 0 0-.15 2.95l19.9 19.89a2 2 0 0 0 2.7.13a343.49 343.49 0 0 0 68.64-78.48a32.2 32.2 0 0 0-.1-34.78z`,fill:`currentColor`}),g(`path`,{d:`M256 160a95.88 95.88 0 0 0-21.37 2.4a2 2 0 0 0-1 3.38l112.59 112.56a2 2 0 0 0 3.38-1A96 96 0 0 0 256 160z`,fill:`currentColor`}),g(`path`,{d:`M165.78 233.66a2 2 0 0 0-3.38 1a96 96 0 0 0 115 115a2 2 0 0 0 1-3.38z`,fill:`currentColor`})],-1)})()}}),U=C(`n-input`),ue=p(`input`,`
 max-width: 100%;
 cursor: text;
 line-height: 1.5;
 z-index: auto;
 outline: none;
 box-sizing: border-box;
 position: relative;
 display: inline-flex;
 border-radius: var(--n-border-radius);
 background-color: var(--n-color);
 transition: background-color .3s var(--n-bezier);
 font-size: var(--n-font-size);
 font-weight: var(--n-font-weight);
 --n-padding-vertical: calc((var(--n-height) - 1.5 * var(--n-font-size)) / 2);
`,[l(`input, textarea`,`
 overflow: hidden;
 flex-grow: 1;
 position: relative;
 `),l(`input-el, textarea-el, input-mirror, textarea-mirror, separator, placeholder`,`
 box-sizing: border-box;
 font-size: inherit;
 line-height: 1.5;
 font-family: inherit;
 border: none;
 outline: none;
 background-color: #0000;
 text-align: inherit;
 transition:
 -webkit-text-fill-color .3s var(--n-bezier),
 caret-color .3s var(--n-bezier),
 color .3s var(--n-bezier),
 text-decoration-color .3s var(--n-bezier);
 `),l(`input-el, textarea-el`,`
 -webkit-appearance: none;
 scrollbar-width: none;
 width: 100%;
 min-width: 0;
 text-decoration-color: var(--n-text-decoration-color);
 color: var(--n-text-color);
 caret-color: var(--n-caret-color);
 background-color: transparent;
 `,[m(`&::-webkit-scrollbar, &::-webkit-scrollbar-track-piece, &::-webkit-scrollbar-thumb`,`
 width: 0;
 height: 0;
 display: none;
 `),m(`&::placeholder`,`
 color: #0000;
 -webkit-text-fill-color: transparent !important;
 `),m(`&:-webkit-autofill ~`,[l(`placeholder`,`display: none;`)])]),t(`round`,[v(`textarea`,`border-radius: calc(var(--n-height) / 2);`)]),l(`placeholder`,`
 pointer-events: none;
 position: absolute;
 left: 0;
 right: 0;
 top: 0;
 bottom: 0;
 overflow: hidden;
 color: var(--n-placeholder-color);
 `,[m(`span`,`
 width: 100%;
 display: inline-block;
 `)]),t(`textarea`,[l(`placeholder`,`overflow: visible;`)]),v(`autosize`,`width: 100%;`),t(`autosize`,[l(`textarea-el, input-el`,`
 position: absolute;
 top: 0;
 left: 0;
 height: 100%;
 `)]),p(`input-wrapper`,`
 overflow: hidden;
 display: inline-flex;
 flex-grow: 1;
 position: relative;
 padding-left: var(--n-padding-left);
 padding-right: var(--n-padding-right);
 `),l(`input-mirror`,`
 padding: 0;
 height: var(--n-height);
 line-height: var(--n-height);
 overflow: hidden;
 visibility: hidden;
 position: static;
 white-space: pre;
 pointer-events: none;
 `),l(`input-el`,`
 padding: 0;
 height: var(--n-height);
 line-height: var(--n-height);
 `,[m(`&[type=password]::-ms-reveal`,`display: none;`),m(`+`,[l(`placeholder`,`
 display: flex;
 align-items: center; 
 `)])]),v(`textarea`,[l(`placeholder`,`white-space: nowrap;`)]),l(`eye`,`
 display: flex;
 align-items: center;
 justify-content: center;
 transition: color .3s var(--n-bezier);
 `),t(`textarea`,`width: 100%;`,[p(`input-word-count`,`
 position: absolute;
 right: var(--n-padding-right);
 bottom: var(--n-padding-vertical);
 `),t(`resizable`,[p(`input-wrapper`,`
 resize: vertical;
 min-height: var(--n-height);
 `)]),l(`textarea-el, textarea-mirror, placeholder`,`
 height: 100%;
 padding-left: 0;
 padding-right: 0;
 padding-top: var(--n-padding-vertical);
 padding-bottom: var(--n-padding-vertical);
 word-break: break-word;
 display: inline-block;
 vertical-align: bottom;
 box-sizing: border-box;
 line-height: var(--n-line-height-textarea);
 margin: 0;
 resize: none;
 white-space: pre-wrap;
 scroll-padding-block-end: var(--n-padding-vertical);
 `),l(`textarea-mirror`,`
 width: 100%;
 pointer-events: none;
 overflow: hidden;
 visibility: hidden;
 position: static;
 white-space: pre-wrap;
 overflow-wrap: break-word;
 `)]),t(`pair`,[l(`input-el, placeholder`,`text-align: center;`),l(`separator`,`
 display: flex;
 align-items: center;
 transition: color .3s var(--n-bezier);
 color: var(--n-text-color);
 white-space: nowrap;
 `,[p(`icon`,`
 color: var(--n-icon-color);
 `),p(`base-icon`,`
 color: var(--n-icon-color);
 `)])]),t(`disabled`,`
 cursor: not-allowed;
 background-color: var(--n-color-disabled);
 `,[l(`border`,`border: var(--n-border-disabled);`),l(`input-el, textarea-el`,`
 cursor: not-allowed;
 color: var(--n-text-color-disabled);
 text-decoration-color: var(--n-text-color-disabled);
 `),l(`placeholder`,`color: var(--n-placeholder-color-disabled);`),l(`separator`,`color: var(--n-text-color-disabled);`,[p(`icon`,`
 color: var(--n-icon-color-disabled);
 `),p(`base-icon`,`
 color: var(--n-icon-color-disabled);
 `)]),p(`input-word-count`,`
 color: var(--n-count-text-color-disabled);
 `),l(`suffix, prefix`,`color: var(--n-text-color-disabled);`,[p(`icon`,`
 color: var(--n-icon-color-disabled);
 `),p(`internal-icon`,`
 color: var(--n-icon-color-disabled);
 `)])]),v(`disabled`,[l(`eye`,`
 color: var(--n-icon-color);
 cursor: pointer;
 `,[m(`&:hover`,`
 color: var(--n-icon-color-hover);
 `),m(`&:active`,`
 color: var(--n-icon-color-pressed);
 `)]),m(`&:hover`,`background-color: var(--n-color-hover);`,[l(`state-border`,`border: var(--n-border-hover);`)]),t(`focus`,`background-color: var(--n-color-focus);`,[l(`state-border`,`
 border: var(--n-border-focus);
 box-shadow: var(--n-box-shadow-focus);
 `)])]),l(`border, state-border`,`
 box-sizing: border-box;
 position: absolute;
 left: 0;
 right: 0;
 top: 0;
 bottom: 0;
 pointer-events: none;
 border-radius: inherit;
 border: var(--n-border);
 transition:
 box-shadow .3s var(--n-bezier),
 border-color .3s var(--n-bezier);
 `),l(`state-border`,`
 border-color: #0000;
 z-index: 1;
 `),l(`prefix`,`margin-right: 4px;`),l(`suffix`,`
 margin-left: 4px;
 `),l(`suffix, prefix`,`
 transition: color .3s var(--n-bezier);
 flex-wrap: nowrap;
 flex-shrink: 0;
 line-height: var(--n-height);
 white-space: nowrap;
 display: inline-flex;
 align-items: center;
 justify-content: center;
 color: var(--n-suffix-text-color);
 `,[p(`base-loading`,`
 font-size: var(--n-icon-size);
 margin: 0 2px;
 color: var(--n-loading-color);
 `),p(`base-clear`,`
 font-size: var(--n-icon-size);
 `,[l(`placeholder`,[p(`base-icon`,`
 transition: color .3s var(--n-bezier);
 color: var(--n-icon-color);
 font-size: var(--n-icon-size);
 `)])]),m(`>`,[p(`icon`,`
 transition: color .3s var(--n-bezier);
 color: var(--n-icon-color);
 font-size: var(--n-icon-size);
 `)]),p(`base-icon`,`
 font-size: var(--n-icon-size);
 `)]),p(`input-word-count`,`
 pointer-events: none;
 line-height: 1.5;
 font-size: .85em;
 color: var(--n-count-text-color);
 transition: color .3s var(--n-bezier);
 margin-left: 4px;
 font-variant: tabular-nums;
 `),[`warning`,`error`].map(e=>t(`${e}-status`,[v(`disabled`,[p(`base-loading`,`
 color: var(--n-loading-color-${e})
 `),l(`input-el, textarea-el`,`
 caret-color: var(--n-caret-color-${e});
 `),l(`state-border`,`
 border: var(--n-border-${e});
 `),m(`&:hover`,[l(`state-border`,`
 border: var(--n-border-hover-${e});
 `)]),m(`&:focus`,`
 background-color: var(--n-color-focus-${e});
 `,[l(`state-border`,`
 box-shadow: var(--n-box-shadow-focus-${e});
 border: var(--n-border-focus-${e});
 `)]),t(`focus`,`
 background-color: var(--n-color-focus-${e});
 `,[l(`state-border`,`
 box-shadow: var(--n-box-shadow-focus-${e});
 border: var(--n-border-focus-${e});
 `)])])]))]),de=p(`input`,[t(`disabled`,[l(`input-el, textarea-el`,`
 -webkit-text-fill-color: var(--n-text-color-disabled);
 `)])]);function W(e){let t=0;for(let n of e)t++;return t}function G(e){return e===``||e==null}function fe(e){let t=D(null);function n(){let{value:n}=e;if(!n?.focus){i();return}let{selectionStart:r,selectionEnd:a,value:o}=n;r==null||a==null?i():t.value={start:r,end:a,beforeText:o.slice(0,r),afterText:o.slice(a)}}function r(){let{value:n}=t,{value:r}=e;if(!n||!r)return;let{value:i}=r,{start:a,beforeText:o,afterText:s}=n,c=i.length;if(i.endsWith(s))c=i.length-s.length;else if(i.startsWith(o))c=o.length;else{let e=o[a-1],t=i.indexOf(e,a-1);t!==-1&&(c=t+1)}r.setSelectionRange?.(c,c)}function i(){t.value=null}return f(e,i),{recordCursor:n,restoreCursor:r}}var K=F({name:`InputWordCount`,setup(e,{slots:t}){let{mergedValueRef:n,maxlengthRef:r,mergedClsPrefixRef:i,countGraphemesRef:a}=c(U),o=b(()=>{let{value:e}=n;return e===null||Array.isArray(e)?0:(a.value||W)(e)});return()=>{let{value:e}=r,{value:a}=n;return u(),_(`span`,{class:O(`${i.value}-input-word-count`)},[T(()=>M(t.default,{value:a===null||Array.isArray(a)?``:a},()=>[e===void 0?o.value:`${o.value} / ${e}`]))],2)}}}),pe=[`autofocus`,`rows`,`placeholder`,`value`,`disabled`,`maxlength`,`minlength`,`readonly`,`tabindex`,`onBlur`,`onFocus`,`onInput`,`onChange`,`onScroll`],me=[`type`,`tabindex`,`placeholder`,`disabled`,`maxlength`,`minlength`,`value`,`readonly`,`autofocus`,`size`,`onBlur`,`onFocus`,`onInput`,`onChange`],q=[`onMousedown`,`onClick`],he=[`type`,`tabindex`,`placeholder`,`disabled`,`maxlength`,`minlength`,`value`,`readonly`,`onBlur`,`onFocus`,`onInput`,`onChange`],J=[`tabindex`,`onFocus`,`onBlur`,`onClick`,`onMousedown`,`onMouseenter`,`onMouseleave`,`onCompositionstart`,`onCompositionend`,`onKeyup`,`onKeydown`],Y={...a.props,bordered:{type:Boolean,default:void 0},type:{type:String,default:`text`},placeholder:[Array,String],defaultValue:{type:[String,Array],default:null},value:[String,Array],disabled:{type:Boolean,default:void 0},size:String,rows:{type:[Number,String],default:3},round:Boolean,minlength:[String,Number],maxlength:[String,Number],clearable:Boolean,autosize:{type:[Boolean,Object],default:!1},pair:Boolean,separator:String,readonly:{type:[String,Boolean],default:!1},passivelyActivated:Boolean,showPasswordOn:String,stateful:{type:Boolean,default:!0},autofocus:Boolean,inputProps:Object,resizable:{type:Boolean,default:!0},showCount:Boolean,loading:{type:Boolean,default:void 0},allowInput:Function,renderCount:Function,onMousedown:Function,onKeydown:Function,onKeyup:[Function,Array],onInput:[Function,Array],onFocus:[Function,Array],onBlur:[Function,Array],onClick:[Function,Array],onChange:[Function,Array],onClear:[Function,Array],countGraphemes:Function,status:String,"onUpdate:value":[Function,Array],onUpdateValue:[Function,Array],textDecoration:[String,Array],attrSize:{type:Number,default:20},onInputBlur:[Function,Array],onInputFocus:[Function,Array],onDeactivate:[Function,Array],onActivate:[Function,Array],onWrapperFocus:[Function,Array],onWrapperBlur:[Function,Array],internalDeactivateOnEnter:Boolean,internalForceFocus:Boolean,internalLoadingBeforeSuffix:{type:Boolean,default:!0},showPasswordToggle:Boolean},ge=F({name:`Input`,props:Y,slots:Object,setup(t){let{mergedClsPrefixRef:n,mergedBorderedRef:c,inlineThemeDisabled:l,mergedRtlRef:u,mergedComponentPropsRef:p}=te(t),m=a(`Input`,`-input`,ue,le,t,n);ae&&re(`-input-safari`,de,n);let h=D(null),g=D(null),_=D(null),v=D(null),y=D(null),S=D(null),C=D(null),w=fe(C),T=D(null),{localeRef:E}=ce(`Input`),O=D(t.defaultValue),k=A(t,`value`),M=se(k,O),N=oe(t,{mergedSize:e=>{let{size:n}=t;if(n)return n;let{mergedSize:r}=e||{};return r?.value?r.value:p?.value?.Input?.size||`medium`}}),{mergedSizeRef:P,mergedDisabledRef:F,mergedStatusRef:L}=N,z=D(!1),B=D(!1),V=D(!1),H=D(!1),W=null,K=b(()=>{let{placeholder:e,pair:n}=t;return n?Array.isArray(e)?e:e===void 0?[``,``]:[e,e]:e===void 0?[E.value.placeholder]:[e]}),pe=b(()=>{let{value:e}=V,{value:t}=M,{value:n}=K;return!e&&(G(t)||Array.isArray(t)&&G(t[0]))&&n[0]}),me=b(()=>{let{value:e}=V,{value:t}=M,{value:n}=K;return!e&&n[1]&&(G(t)||Array.isArray(t)&&G(t[1]))}),q=R(()=>t.internalForceFocus||z.value),he=R(()=>{if(F.value||t.readonly||!t.clearable||!q.value&&!B.value)return!1;let{value:e}=M,{value:n}=q;return t.pair?!!(Array.isArray(e)&&(e[0]||e[1]))&&(B.value||n):!!e&&(B.value||n)}),J=b(()=>{let{showPasswordOn:e}=t;if(e)return e;if(t.showPasswordToggle)return`click`}),Y=D(!1),ge=b(()=>{let{textDecoration:e}=t;return e?Array.isArray(e)?e.map(e=>({textDecoration:e})):[{textDecoration:e}]:[``,``]}),_e=D(void 0),ve=()=>{if(t.type===`textarea`){let{autosize:e}=t;if(e&&(_e.value=T.value?.$el?.offsetWidth),!g.value||typeof e==`boolean`)return;let{paddingTop:n,paddingBottom:r,lineHeight:i}=window.getComputedStyle(g.value),a=Number(n.slice(0,-2)),o=Number(r.slice(0,-2)),s=Number(i.slice(0,-2)),{value:c}=_;if(!c)return;if(e.minRows){let t=Math.max(e.minRows,1),n=`${a+o+s*t}px`;c.style.minHeight=n}if(e.maxRows){let t=`${a+o+s*e.maxRows}px`;c.style.maxHeight=t}}},ye=b(()=>{let{maxlength:e}=t;return e===void 0?void 0:Number(e)});s(()=>{let{value:e}=M;Array.isArray(e)||rt(e)});let be=ee().proxy;function X(e,n){let{onUpdateValue:r,"onUpdate:value":i,onInput:a}=t,{nTriggerFormInput:o}=N;r&&I(r,e,n),i&&I(i,e,n),a&&I(a,e,n),O.value=e,o()}function Z(e,n){let{onChange:r}=t,{nTriggerFormChange:i}=N;r&&I(r,e,n),O.value=e,i()}function xe(e){let{onBlur:n}=t,{nTriggerFormBlur:r}=N;n&&I(n,e),r()}function Se(e){let{onFocus:n}=t,{nTriggerFormFocus:r}=N;n&&I(n,e),r()}function Ce(e){let{onClear:n}=t;n&&I(n,e)}function we(e){let{onInputBlur:n}=t;n&&I(n,e)}function Te(e){let{onInputFocus:n}=t;n&&I(n,e)}function Ee(){let{onDeactivate:e}=t;e&&I(e)}function De(){let{onActivate:e}=t;e&&I(e)}function Oe(e){let{onClick:n}=t;n&&I(n,e)}function ke(e){let{onWrapperFocus:n}=t;n&&I(n,e)}function Ae(e){let{onWrapperBlur:n}=t;n&&I(n,e)}function je(){V.value=!0}function Me(e){V.value=!1,e.target===S.value?Q(e,1):Q(e,0)}function Q(e,n=0,r=`input`){let i=e.target.value;if(rt(i),e instanceof InputEvent&&!e.isComposing&&(V.value=!1),t.type===`textarea`){let{value:e}=T;e&&e.syncUnifiedContainer()}if(W=i,V.value)return;w.recordCursor();let a=Ne(i);if(a){if(!t.pair)r===`input`?X(i,{source:n}):Z(i,{source:n});else{let{value:e}=M;e=Array.isArray(e)?[e[0],e[1]]:[``,``],e[n]=i,r===`input`?X(e,{source:n}):Z(e,{source:n})}}be.$forceUpdate(),a||x(w.restoreCursor)}function Ne(e){let{countGraphemes:n,maxlength:r,minlength:i}=t;if(n){let t;if(r!==void 0&&(t===void 0&&(t=n(e)),t>Number(r))||i!==void 0&&(t===void 0&&(t=n(e)),t<Number(r)))return!1}let{allowInput:a}=t;return typeof a!=`function`||a(e)}function Pe(e){we(e),e.relatedTarget===h.value&&Ee(),(e.relatedTarget===null||e.relatedTarget!==y.value&&e.relatedTarget!==S.value&&e.relatedTarget!==g.value)&&(H.value=!1),$(e,`blur`),C.value=null}function Fe(e,t){Te(e),z.value=!0,H.value=!0,De(),$(e,`focus`),t===0?C.value=y.value:t===1?C.value=S.value:t===2&&(C.value=g.value)}function Ie(e){t.passivelyActivated&&(Ae(e),$(e,`blur`))}function Le(e){t.passivelyActivated&&(z.value=!0,ke(e),$(e,`focus`))}function $(e,t){e.relatedTarget!==null&&(e.relatedTarget===y.value||e.relatedTarget===S.value||e.relatedTarget===g.value||e.relatedTarget===h.value)||(t===`focus`?(Se(e),z.value=!0):t===`blur`&&(xe(e),z.value=!1))}function Re(e,t){Q(e,t,`change`)}function ze(e){Oe(e)}function Be(e){Ce(e),Ve()}function Ve(){t.pair?(X([``,``],{source:`clear`}),Z([``,``],{source:`clear`})):(X(``,{source:`clear`}),Z(``,{source:`clear`}))}function He(e){let{onMousedown:n}=t;n&&n(e);let{tagName:r}=e.target;if(r!==`INPUT`&&r!==`TEXTAREA`){if(t.resizable){let{value:t}=h;if(t){let{left:n,top:r,width:i,height:a}=t.getBoundingClientRect();if(n+i-14<e.clientX&&e.clientX<n+i&&r+a-14<e.clientY&&e.clientY<r+a)return}}e.preventDefault(),z.value||Ze()}}function Ue(){B.value=!0,t.type===`textarea`&&T.value?.handleMouseEnterWrapper()}function We(){B.value=!1,t.type===`textarea`&&T.value?.handleMouseLeaveWrapper()}function Ge(){F.value||J.value===`click`&&(Y.value=!Y.value)}function Ke(e){if(F.value)return;e.preventDefault();let t=e=>{e.preventDefault(),d(`mouseup`,document,t)};if(r(`mouseup`,document,t),J.value!==`mousedown`)return;Y.value=!0;let n=()=>{Y.value=!1,d(`mouseup`,document,n)};r(`mouseup`,document,n)}function qe(e){t.onKeyup&&I(t.onKeyup,e)}function Je(e){switch(t.onKeydown&&I(t.onKeydown,e),e.key){case`Escape`:Xe();break;case`Enter`:Ye(e)}}function Ye(e){if(t.passivelyActivated){let{value:n}=H;if(n){t.internalDeactivateOnEnter&&Xe();return}e.preventDefault(),t.type===`textarea`?g.value?.focus():y.value?.focus()}}function Xe(){t.passivelyActivated&&(H.value=!1,x(()=>{h.value?.focus()}))}function Ze(){F.value||(t.passivelyActivated?h.value?.focus():(g.value?.focus(),y.value?.focus()))}function Qe(){h.value?.contains(document.activeElement)&&document.activeElement.blur()}function $e(){g.value?.select(),y.value?.select()}function et(){F.value||(g.value?g.value.focus():y.value&&y.value.focus())}function tt(){let{value:e}=h;e?.contains(document.activeElement)&&e!==document.activeElement&&Xe()}function nt(e){if(t.type===`textarea`){let{value:t}=g;t?.scrollTo(e)}else{let{value:t}=y;t?.scrollTo(e)}}function rt(e){let{type:n,pair:r,autosize:i}=t;if(!r&&i){if(n===`textarea`){let{value:t}=_;t&&(t.textContent=`${e??``}\r\n`)}else{let{value:t}=v;t&&(e?t.textContent=e:t.innerHTML=`&nbsp;`)}}}function it(){ve()}let at=D({top:`0`});function ot(e){let{scrollTop:t}=e.target;at.value.top=`${-t}px`,T.value?.syncUnifiedContainer()}let st=null;o(()=>{let{autosize:e,type:n}=t;e&&n===`textarea`?st=f(M,e=>{!Array.isArray(e)&&e!==W&&rt(e)}):st?.()});let ct=null;o(()=>{t.type===`textarea`?ct=f(M,e=>{!Array.isArray(e)&&e!==W&&T.value?.syncUnifiedContainer()}):ct?.()}),ie(U,{mergedValueRef:M,maxlengthRef:ye,mergedClsPrefixRef:n,countGraphemesRef:A(t,`countGraphemes`)});let lt={wrapperElRef:h,inputElRef:y,textareaElRef:g,isCompositing:V,clear:Ve,focus:Ze,blur:Qe,select:$e,deactivate:tt,activate:et,scrollTo:nt},ut=ne(`Input`,u,n),dt=b(()=>{let{value:t}=P,{common:{cubicBezierEaseInOut:n},self:{color:r,colorHover:i,borderRadius:a,textColor:o,caretColor:s,caretColorError:c,caretColorWarning:l,textDecorationColor:u,border:d,borderDisabled:ee,borderHover:f,borderFocus:p,placeholderColor:h,placeholderColorDisabled:g,lineHeightTextarea:_,colorDisabled:te,colorFocus:v,textColorDisabled:y,boxShadowFocus:b,iconSize:x,colorFocusWarning:S,boxShadowFocusWarning:ne,borderWarning:C,borderFocusWarning:w,borderHoverWarning:T,colorFocusError:E,boxShadowFocusError:D,borderError:O,borderFocusError:k,borderHoverError:A,clearSize:re,clearColor:M,clearColorHover:N,clearColorPressed:F,iconColor:I,iconColorDisabled:L,suffixTextColor:ie,countTextColor:ae,countTextColorDisabled:oe,iconColorHover:R,iconColorPressed:se,loadingColor:z,loadingColorError:B,loadingColorWarning:ce,fontWeight:le,[j(`padding`,t)]:V,[j(`fontSize`,t)]:H,[j(`height`,t)]:U}}=m.value,{left:ue,right:de}=e(V);return{"--n-bezier":n,"--n-count-text-color":ae,"--n-count-text-color-disabled":oe,"--n-color":r,"--n-color-hover":i,"--n-font-size":H,"--n-font-weight":le,"--n-border-radius":a,"--n-height":U,"--n-padding-left":ue,"--n-padding-right":de,"--n-text-color":o,"--n-caret-color":s,"--n-text-decoration-color":u,"--n-border":d,"--n-border-disabled":ee,"--n-border-hover":f,"--n-border-focus":p,"--n-placeholder-color":h,"--n-placeholder-color-disabled":g,"--n-icon-size":x,"--n-line-height-textarea":_,"--n-color-disabled":te,"--n-color-focus":v,"--n-text-color-disabled":y,"--n-box-shadow-focus":b,"--n-loading-color":z,"--n-caret-color-warning":l,"--n-color-focus-warning":S,"--n-box-shadow-focus-warning":ne,"--n-border-warning":C,"--n-border-focus-warning":w,"--n-border-hover-warning":T,"--n-loading-color-warning":ce,"--n-caret-color-error":c,"--n-color-focus-error":E,"--n-box-shadow-focus-error":D,"--n-border-error":O,"--n-border-focus-error":k,"--n-border-hover-error":A,"--n-loading-color-error":B,"--n-clear-color":M,"--n-clear-size":re,"--n-clear-color-hover":N,"--n-clear-color-pressed":F,"--n-icon-color":I,"--n-icon-color-hover":R,"--n-icon-color-pressed":se,"--n-icon-color-disabled":L,"--n-suffix-text-color":ie}}),ft=l?i(`input`,b(()=>{let{value:e}=P;return e[0]}),dt,t):void 0;return{...lt,wrapperElRef:h,inputElRef:y,inputMirrorElRef:v,inputEl2Ref:S,textareaElRef:g,textareaMirrorElRef:_,textareaScrollbarInstRef:T,rtlEnabled:ut,uncontrolledValue:O,mergedValue:M,passwordVisible:Y,mergedPlaceholder:K,showPlaceholder1:pe,showPlaceholder2:me,mergedFocus:q,isComposing:V,activated:H,showClearButton:he,mergedSize:P,mergedDisabled:F,textDecorationStyle:ge,mergedClsPrefix:n,mergedBordered:c,mergedShowPasswordOn:J,placeholderStyle:at,mergedStatus:L,textAreaScrollContainerWidth:_e,handleTextAreaScroll:ot,handleCompositionStart:je,handleCompositionEnd:Me,handleInput:Q,handleInputBlur:Pe,handleInputFocus:Fe,handleWrapperBlur:Ie,handleWrapperFocus:Le,handleMouseEnter:Ue,handleMouseLeave:We,handleMouseDown:He,handleChange:Re,handleClick:ze,handleClear:Be,handlePasswordToggleClick:Ge,handlePasswordToggleMousedown:Ke,handleWrapperKeydown:Je,handleWrapperKeyup:qe,handleTextAreaMirrorResize:it,getTextareaScrollContainer:()=>g.value,mergedTheme:m,cssVars:l?void 0:dt,themeClass:ft?.themeClass,onRender:ft?.onRender}},render(){let{mergedClsPrefix:e,mergedStatus:t,themeClass:r,type:i,countGraphemes:a,onRender:o}=this,s=this.$slots;return o?.(),u(),_(`div`,{ref:`wrapperElRef`,class:O([`${e}-input`,`${e}-input--${this.mergedSize}-size`,r,t&&`${e}-input--${t}-status`,{[`${e}-input--rtl`]:this.rtlEnabled,[`${e}-input--disabled`]:this.mergedDisabled,[`${e}-input--textarea`]:i===`textarea`,[`${e}-input--resizable`]:this.resizable&&!this.autosize,[`${e}-input--autosize`]:this.autosize,[`${e}-input--round`]:this.round&&i!==`textarea`,[`${e}-input--pair`]:this.pair,[`${e}-input--focus`]:this.mergedFocus,[`${e}-input--stateful`]:this.stateful}]),style:E(this.cssVars),tabindex:!this.mergedDisabled&&this.passivelyActivated&&!this.activated?0:void 0,onFocus:this.handleWrapperFocus,onBlur:this.handleWrapperBlur,onClick:this.handleClick,onMousedown:this.handleMouseDown,onMouseenter:this.handleMouseEnter,onMouseleave:this.handleMouseLeave,onCompositionstart:this.handleCompositionStart,onCompositionend:this.handleCompositionEnd,onKeyup:this.handleWrapperKeyup,onKeydown:this.handleWrapperKeydown},[g(`div`,{class:O(`${e}-input-wrapper`)},[T(()=>L(s.prefix,t=>t&&(u(),_(`div`,{class:O(`${e}-input__prefix`)},[T(()=>t)],2)))),i===`textarea`?(u(),N(k,{key:0,ref:`textareaScrollbarInstRef`,class:O(`${e}-input__textarea`),container:this.getTextareaScrollContainer,theme:this.theme?.peers?.Scrollbar,themeOverrides:this.themeOverrides?.peers?.Scrollbar,triggerDisplayManually:!0,useUnifiedContainer:!0,internalHoistYRail:!0},{default:()=>{let{textAreaScrollContainerWidth:t}=this,r={width:this.autosize&&t&&`${t}px`};return u(),_(y,null,[g(`textarea`,n(this.inputProps,{ref:`textareaElRef`,class:[`${e}-input__textarea-el`,this.inputProps?.class],autofocus:this.autofocus,rows:Number(this.rows),placeholder:this.placeholder,value:this.mergedValue,disabled:this.mergedDisabled,maxlength:a?void 0:this.maxlength,minlength:a?void 0:this.minlength,readonly:this.readonly,tabindex:this.passivelyActivated&&!this.activated?-1:void 0,style:[this.textDecorationStyle[0],this.inputProps?.style,r],onBlur:this.handleInputBlur,onFocus:e=>{this.handleInputFocus(e,2)},onInput:this.handleInput,onChange:this.handleChange,onScroll:this.handleTextAreaScroll}),null,16,pe),this.showPlaceholder1?(u(),_(`div`,{class:O(`${e}-input__placeholder`),style:E([this.placeholderStyle,r]),key:`placeholder`},[T(()=>this.mergedPlaceholder[0])],6)):T(()=>null),this.autosize?(u(),N(S,{key:2,onResize:this.handleTextAreaMirrorResize},{default:()=>(u(),_(`div`,{ref:`textareaMirrorElRef`,class:O(`${e}-input__textarea-mirror`),key:`mirror`},null,2))},1032,[`onResize`])):T(()=>null)],64)}},1032,[`class`,`container`,`theme`,`themeOverrides`])):(u(),_(`div`,{key:1,class:O(`${e}-input__input`)},[g(`input`,n({type:i===`password`&&this.mergedShowPasswordOn&&this.passwordVisible?`text`:i},this.inputProps,{ref:`inputElRef`,class:[`${e}-input__input-el`,this.inputProps?.class],style:[this.textDecorationStyle[0],this.inputProps?.style],tabindex:this.passivelyActivated&&!this.activated?-1:this.inputProps?.tabindex,placeholder:this.mergedPlaceholder[0],disabled:this.mergedDisabled,maxlength:a?void 0:this.maxlength,minlength:a?void 0:this.minlength,value:Array.isArray(this.mergedValue)?this.mergedValue[0]:this.mergedValue,readonly:this.readonly,autofocus:this.autofocus,size:this.attrSize,onBlur:this.handleInputBlur,onFocus:e=>{this.handleInputFocus(e,0)},onInput:e=>{this.handleInput(e,0)},onChange:e=>{this.handleChange(e,0)}}),null,16,me),this.showPlaceholder1?(u(),_(`div`,{key:0,class:O(`${e}-input__placeholder`)},[g(`span`,null,[T(()=>this.mergedPlaceholder[0])])],2)):T(()=>null),this.autosize?(u(),_(`div`,{class:O(`${e}-input__input-mirror`),key:`mirror`,ref:`inputMirrorElRef`},`\xA0`,2)):T(()=>null)],2)),T(()=>!this.pair&&L(s.suffix,t=>t||this.clearable||this.showCount||this.mergedShowPasswordOn||this.loading!==void 0?(u(),_(`div`,{key:1,class:O(`${e}-input__suffix`)},[T(()=>[L(s[`clear-icon-placeholder`],t=>(this.clearable||t)&&(u(),N(z,{clsPrefix:e,show:this.showClearButton,onClear:this.handleClear},{placeholder:()=>t,icon:()=>this.$slots[`clear-icon`]?.()},1032,[`clsPrefix`,`show`,`onClear`]))),this.internalLoadingBeforeSuffix?null:t,this.loading===void 0?null:(u(),N(B,{key:2,clsPrefix:e,loading:this.loading,showArrow:!1,showClear:!1,style:E(this.cssVars)},null,8,[`clsPrefix`,`loading`,`style`])),this.internalLoadingBeforeSuffix?t:null,this.showCount&&this.type!==`textarea`?(u(),N(K,{key:3},{default:e=>{let{renderCount:t}=this;return t?t(e):s.count?.(e)}},1024)):null,this.mergedShowPasswordOn&&this.type===`password`?(u(),_(`div`,{key:4,class:O(`${e}-input__eye`),onMousedown:this.handlePasswordToggleMousedown,onClick:this.handlePasswordToggleClick},[this.passwordVisible?(u(),_(y,{key:0},[T(()=>h(s[`password-visible-icon`],()=>[(u(),N(P,{clsPrefix:e},{default:()=>(u(),N(V))},1032,[`clsPrefix`]))]))],64)):(u(),_(y,{key:1},[T(()=>h(s[`password-invisible-icon`],()=>[(u(),N(P,{clsPrefix:e},{default:()=>(u(),N(H))},1032,[`clsPrefix`]))]))],64))],42,q)):null])],2)):null))],2),this.pair?(u(),_(`span`,{key:0,class:O(`${e}-input__separator`)},[T(()=>h(s.separator,()=>[this.separator]))],2)):T(()=>null),this.pair?(u(),_(`div`,{key:2,class:O(`${e}-input-wrapper`)},[g(`div`,{class:O(`${e}-input__input`)},[g(`input`,{ref:`inputEl2Ref`,type:this.type,class:O(`${e}-input__input-el`),tabindex:this.passivelyActivated&&!this.activated?-1:void 0,placeholder:this.mergedPlaceholder[1],disabled:this.mergedDisabled,maxlength:a?void 0:this.maxlength,minlength:a?void 0:this.minlength,value:Array.isArray(this.mergedValue)?this.mergedValue[1]:void 0,readonly:this.readonly,style:E(this.textDecorationStyle[1]),onBlur:this.handleInputBlur,onFocus:e=>{this.handleInputFocus(e,1)},onInput:e=>{this.handleInput(e,1)},onChange:e=>{this.handleChange(e,1)}},null,46,he),this.showPlaceholder2?(u(),_(`div`,{key:0,class:O(`${e}-input__placeholder`)},[g(`span`,null,[T(()=>this.mergedPlaceholder[1])])],2)):T(()=>null)],2),T(()=>L(s.suffix,t=>(this.clearable||t)&&(u(),_(`div`,{class:O(`${e}-input__suffix`)},[T(()=>[this.clearable&&(u(),N(z,{clsPrefix:e,show:this.showClearButton,onClear:this.handleClear},{icon:()=>s[`clear-icon`]?.(),placeholder:()=>s[`clear-icon-placeholder`]?.()},1032,[`clsPrefix`,`show`,`onClear`])),t])],2))))],2)):T(()=>null),this.mergedBordered?(u(),_(`div`,{key:4,class:O(`${e}-input__border`)},null,2)):T(()=>null),this.mergedBordered?(u(),_(`div`,{key:6,class:O(`${e}-input__state-border`)},null,2)):T(()=>null),this.showCount&&i===`textarea`?(u(),N(K,{key:8},{default:e=>{let{renderCount:t}=this;return t?t(e):s.count?.(e)}},1024)):T(()=>null)],46,J)}});export{V as n,ge as t};