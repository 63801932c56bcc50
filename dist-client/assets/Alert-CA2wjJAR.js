import{$ as e,$t as t,A as n,An as r,D as i,E as a,Gn as o,M as s,Qt as c,Rn as l,Xt as u,Yt as d,_ as f,_n as p,bn as m,dt as h,gn as g,i as _,j as v,m as y,ot as b,rr as x,rt as S,tn as C,vn as w,w as T,wn as E,y as D,yt as O}from"./_plugin-vue_export-helper-C4XqT5Hd.js";import{B as k,R as A,V as j,z as M}from"./index-KegDRDt8.js";import{p as N}from"./Button-CqYvzYpP.js";import{n as P,t as F}from"./fade-in-height-expand.cssr-GJ6wFvWw.js";function I(e){let{lineHeight:t,borderRadius:n,fontWeightStrong:r,baseColor:i,dividerColor:a,actionColor:o,textColor1:c,textColor2:l,closeColorHover:u,closeColorPressed:d,closeIconColor:f,closeIconColorHover:p,closeIconColorPressed:m,infoColor:h,successColor:g,warningColor:_,errorColor:y,fontSize:b}=e;return{...P,fontSize:b,lineHeight:t,titleFontWeight:r,borderRadius:n,border:`1px solid ${a}`,color:o,titleTextColor:c,iconColor:l,contentTextColor:l,closeBorderRadius:n,closeColorHover:u,closeColorPressed:d,closeIconColor:f,closeIconColorHover:p,closeIconColorPressed:m,borderInfo:`1px solid ${s(i,v(h,{alpha:.25}))}`,colorInfo:s(i,v(h,{alpha:.08})),titleTextColorInfo:c,iconColorInfo:h,contentTextColorInfo:l,closeColorHoverInfo:u,closeColorPressedInfo:d,closeIconColorInfo:f,closeIconColorHoverInfo:p,closeIconColorPressedInfo:m,borderSuccess:`1px solid ${s(i,v(g,{alpha:.25}))}`,colorSuccess:s(i,v(g,{alpha:.08})),titleTextColorSuccess:c,iconColorSuccess:g,contentTextColorSuccess:l,closeColorHoverSuccess:u,closeColorPressedSuccess:d,closeIconColorSuccess:f,closeIconColorHoverSuccess:p,closeIconColorPressedSuccess:m,borderWarning:`1px solid ${s(i,v(_,{alpha:.33}))}`,colorWarning:s(i,v(_,{alpha:.08})),titleTextColorWarning:c,iconColorWarning:_,contentTextColorWarning:l,closeColorHoverWarning:u,closeColorPressedWarning:d,closeIconColorWarning:f,closeIconColorHoverWarning:p,closeIconColorPressedWarning:m,borderError:`1px solid ${s(i,v(y,{alpha:.25}))}`,colorError:s(i,v(y,{alpha:.08})),titleTextColorError:c,iconColorError:y,contentTextColorError:l,closeColorHoverError:u,closeColorPressedError:d,closeIconColorError:f,closeIconColorHoverError:p,closeIconColorPressedError:m}}var L={name:`Alert`,common:n,self:I},R=u(`alert`,`
 line-height: var(--n-line-height);
 border-radius: var(--n-border-radius);
 position: relative;
 transition: background-color .3s var(--n-bezier);
 background-color: var(--n-color);
 text-align: start;
 word-break: break-word;
`,[c(`border`,`
 border-radius: inherit;
 position: absolute;
 left: 0;
 right: 0;
 top: 0;
 bottom: 0;
 transition: border-color .3s var(--n-bezier);
 border: var(--n-border);
 pointer-events: none;
 `),t(`closable`,[u(`alert-body`,[c(`title`,`
 padding-right: 24px;
 `)])]),c(`icon`,{color:`var(--n-icon-color)`}),u(`alert-body`,{padding:`var(--n-padding)`},[c(`title`,{color:`var(--n-title-text-color)`}),c(`content`,{color:`var(--n-content-text-color)`})]),F({originalTransition:`transform .3s var(--n-bezier)`,enterToProps:{transform:`scale(1)`},leaveToProps:{transform:`scale(0.9)`}}),c(`icon`,`
 position: absolute;
 left: 0;
 top: 0;
 align-items: center;
 justify-content: center;
 display: flex;
 width: var(--n-icon-size);
 height: var(--n-icon-size);
 font-size: var(--n-icon-size);
 margin: var(--n-icon-margin);
 `),c(`close`,`
 transition:
 color .3s var(--n-bezier),
 background-color .3s var(--n-bezier);
 position: absolute;
 right: 0;
 top: 0;
 margin: var(--n-close-margin);
 `),t(`show-icon`,[u(`alert-body`,{paddingLeft:`calc(var(--n-icon-margin-left) + var(--n-icon-size) + var(--n-icon-margin-right))`})]),t(`right-adjust`,[u(`alert-body`,{paddingRight:`calc(var(--n-close-size) + var(--n-padding) + 2px)`})]),u(`alert-body`,`
 border-radius: var(--n-border-radius);
 transition: border-color .3s var(--n-bezier);
 `,[c(`title`,`
 transition: color .3s var(--n-bezier);
 font-size: 16px;
 line-height: 19px;
 font-weight: var(--n-title-font-weight);
 `,[d(`& +`,[c(`content`,{marginTop:`9px`})])]),c(`content`,{transition:`color .3s var(--n-bezier)`,fontSize:`var(--n-font-size)`})]),c(`icon`,{transition:`color .3s var(--n-bezier)`})]),z={...a.props,title:String,showIcon:{type:Boolean,default:!0},type:{type:String,default:`default`},bordered:{type:Boolean,default:!0},closable:Boolean,onClose:Function,onAfterLeave:Function,onAfterHide:Function},B=E({name:`Alert`,inheritAttrs:!1,props:z,slots:Object,setup(t){o(()=>{t.onAfterHide!==void 0&&O(`alert`,"`on-after-hide` is deprecated, please use `on-after-leave` instead.")});let{mergedClsPrefixRef:n,mergedBorderedRef:r,inlineThemeDisabled:s,mergedRtlRef:c}=h(t),l=a(`Alert`,`-alert`,R,L,t,n),u=y(`Alert`,c,n),d=g(()=>{let{common:{cubicBezierEaseInOut:n},self:r}=l.value,{fontSize:i,borderRadius:a,titleFontWeight:o,lineHeight:s,iconSize:c,iconMargin:u,iconMarginRtl:d,closeIconSize:f,closeBorderRadius:p,closeSize:m,closeMargin:h,closeMarginRtl:g,padding:_}=r,{type:v}=t,{left:y,right:b}=e(u);return{"--n-bezier":n,"--n-color":r[C(`color`,v)],"--n-close-icon-size":f,"--n-close-border-radius":p,"--n-close-color-hover":r[C(`closeColorHover`,v)],"--n-close-color-pressed":r[C(`closeColorPressed`,v)],"--n-close-icon-color":r[C(`closeIconColor`,v)],"--n-close-icon-color-hover":r[C(`closeIconColorHover`,v)],"--n-close-icon-color-pressed":r[C(`closeIconColorPressed`,v)],"--n-icon-color":r[C(`iconColor`,v)],"--n-border":r[C(`border`,v)],"--n-title-text-color":r[C(`titleTextColor`,v)],"--n-content-text-color":r[C(`contentTextColor`,v)],"--n-line-height":s,"--n-border-radius":a,"--n-font-size":i,"--n-title-font-weight":o,"--n-icon-size":c,"--n-icon-margin":u,"--n-icon-margin-rtl":d,"--n-close-size":m,"--n-close-margin":h,"--n-close-margin-rtl":g,"--n-padding":_,"--n-icon-margin-left":y,"--n-icon-margin-right":b}}),f=s?i(`alert`,g(()=>t.type[0]),d,t):void 0,p=x(!0),m=()=>{let{onAfterLeave:e,onAfterHide:n}=t;e&&e(),n&&n()};return{rtlEnabled:u,mergedClsPrefix:n,mergedBordered:r,visible:p,handleCloseClick:()=>{Promise.resolve(t.onClose?.()).then(e=>{e!==!1&&(p.value=!1)})},handleAfterLeave:()=>{m()},mergedTheme:l,cssVars:s?void 0:d,themeClass:f?.themeClass,onRender:f?.onRender}},render(){return this.onRender?.(),l(),w(N,{onAfterLeave:this.handleAfterLeave},{default:()=>{let{mergedClsPrefix:e,$slots:t}=this,n={class:[`${e}-alert`,this.themeClass,this.closable&&`${e}-alert--closable`,this.showIcon&&`${e}-alert--show-icon`,!this.title&&this.closable&&`${e}-alert--right-adjust`,this.rtlEnabled&&`${e}-alert--rtl`],style:this.cssVars,role:`alert`};return this.visible?(l(),m(`div`,r({key:1},r(this.$attrs,n)),[b(()=>this.closable&&(l(),w(_,{clsPrefix:e,class:S(`${e}-alert__close`),onClick:this.handleCloseClick},null,8,[`clsPrefix`,`class`,`onClick`]))),b(()=>this.bordered&&(l(),m(`div`,{class:S(`${e}-alert__border`)},null,2))),b(()=>this.showIcon&&(l(),m(`div`,{class:S(`${e}-alert__icon`),"aria-hidden":`true`},[b(()=>f(t.icon,()=>[(l(),w(T,{clsPrefix:e},{default:()=>{switch(this.type){case`success`:return l(),w(M,{key:3});case`info`:return l(),w(k,{key:4});case`warning`:return l(),w(A,{key:5});case`error`:return l(),w(j,{key:6});default:return null}}},1032,[`clsPrefix`]))]))],2))),p(`div`,{class:S([`${e}-alert-body`,this.mergedBordered&&`${e}-alert-body--bordered`])},[b(()=>D(t.header,t=>{let n=t||this.title;return n?(l(),m(`div`,{key:2,class:S(`${e}-alert-body__title`)},[b(()=>n)],2)):null})),b(()=>t.default&&(l(),m(`div`,{class:S(`${e}-alert-body__content`)},[b(()=>t.default())],2)))],2)],16)):null}},1032,[`onAfterLeave`])}});export{B as t};