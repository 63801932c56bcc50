import{$t as e,A as t,An as n,Cn as r,D as i,E as a,En as o,Gn as s,Kn as c,M as l,O as u,On as d,Qt as f,Rn as p,Sn as m,T as h,Wn as g,Xt as _,Yt as v,_n as y,at as b,bn as x,dt as S,en as C,fn as w,gn as T,ht as E,l as ee,mr as D,mt as O,nt as k,ot as A,p as j,pr as M,rr as N,rt as P,s as F,sr as I,t as L,vn as R,vt as z,w as te,wn as B,x as V,yn as H,yt as U,zn as W}from"./_plugin-vue_export-helper-C4XqT5Hd.js";import{i as ne,r as G,t as re}from"./fade-in-height-expand.cssr-GJ6wFvWw.js";import{f as ie,m as ae}from"./Suffix-CEyhj_Z0.js";import{r as oe,t as se}from"./Dropdown-CNySgWkq.js";import{I as K,_ as ce,a as le,b as ue,i as de,n as fe,r as pe,s as q}from"./index-KegDRDt8.js";import{n as me,t as he}from"./ThemeToggle-B557fRGY.js";import{i as J,o as ge,t as _e}from"./Select-IgK-wPm1.js";import{t as ve}from"./use-message-BugfNDyR.js";import{t as ye}from"./session-jrV2mgL6.js";import{M as Y,h as be,j as xe,p as Se,t as Ce}from"./Button-CqYvzYpP.js";import{t as we}from"./Tag-BRCYpGrO.js";import{t as Te}from"./roleLabels-C-zpQY56.js";import{t as Ee}from"./AreaIcon-BjtV_UCn.js";import{P as De,_ as Oe}from"./light-B367S0Uq.js";import{t as ke}from"./Tooltip-CKKEpSUa.js";import{t as Ae}from"./use-compitable-Bg3lqppB.js";var je=_(`divider`,`
 position: relative;
 display: flex;
 width: 100%;
 box-sizing: border-box;
 font-size: 16px;
 color: var(--n-text-color);
 transition:
 color .3s var(--n-bezier),
 background-color .3s var(--n-bezier);
`,[C(`vertical`,`
 margin-top: 24px;
 margin-bottom: 24px;
 `,[C(`no-title`,`
 display: flex;
 align-items: center;
 `)]),f(`title`,`
 display: flex;
 align-items: center;
 margin-left: 12px;
 margin-right: 12px;
 white-space: nowrap;
 font-weight: var(--n-font-weight);
 `),e(`title-position-left`,[f(`line`,[e(`left`,{width:`28px`})])]),e(`title-position-right`,[f(`line`,[e(`right`,{width:`28px`})])]),e(`dashed`,[f(`line`,`
 background-color: #0000;
 height: 0px;
 width: 100%;
 border-style: dashed;
 border-width: 1px 0 0;
 `)]),e(`vertical`,`
 display: inline-block;
 height: 1em;
 margin: 0 8px;
 vertical-align: middle;
 width: 1px;
 `),f(`line`,`
 border: none;
 transition: background-color .3s var(--n-bezier), border-color .3s var(--n-bezier);
 height: 1px;
 width: 100%;
 margin: 0;
 `),C(`dashed`,[f(`line`,{backgroundColor:`var(--n-color)`})]),e(`dashed`,[f(`line`,{borderColor:`var(--n-color)`})]),e(`vertical`,{backgroundColor:`var(--n-color)`})]),Me={...a.props,titlePlacement:{type:String,default:`center`},dashed:Boolean,vertical:Boolean},Ne=B({name:`Divider`,props:Me,setup(e){let{mergedClsPrefixRef:t,inlineThemeDisabled:n}=S(e),r=a(`Divider`,`-divider`,je,ue,e,t),o=T(()=>{let{common:{cubicBezierEaseInOut:e},self:{color:t,textColor:n,fontWeight:i}}=r.value;return{"--n-bezier":e,"--n-color":t,"--n-text-color":n,"--n-font-weight":i}}),s=n?i(`divider`,void 0,o,e):void 0;return{mergedClsPrefix:t,cssVars:n?void 0:o,themeClass:s?.themeClass,onRender:s?.onRender}},render(){let{$slots:e,titlePlacement:t,vertical:n,dashed:r,cssVars:i,mergedClsPrefix:a}=this;return this.onRender?.(),p(),x(`div`,{role:`separator`,class:P([`${a}-divider`,this.themeClass,{[`${a}-divider--vertical`]:n,[`${a}-divider--no-title`]:!e.default,[`${a}-divider--dashed`]:r,[`${a}-divider--title-position-${t}`]:e.default&&t}]),style:M(i)},[n?A(()=>null):(p(),x(`div`,{key:0,class:P(`${a}-divider__line ${a}-divider__line--left`)},null,2)),!n&&e.default?(p(),x(w,{key:2},[y(`div`,{class:P(`${a}-divider__title`)},[A(()=>this.$slots.default?.())],2),y(`div`,{class:P(`${a}-divider__line ${a}-divider__line--right`)},null,2)],64)):A(()=>null)],6)}});function Pe(e){let{baseColor:t,textColor2:n,bodyColor:r,cardColor:i,dividerColor:a,actionColor:o,scrollbarColor:s,scrollbarColorHover:c,invertedColor:u}=e;return{textColor:n,textColorInverted:`#FFF`,color:r,colorEmbedded:o,headerColor:i,headerColorInverted:u,footerColor:o,footerColorInverted:u,headerBorderColor:a,headerBorderColorInverted:u,footerBorderColor:a,footerBorderColorInverted:u,siderBorderColor:a,siderBorderColorInverted:u,siderColor:i,siderColorInverted:u,siderToggleButtonBorder:`1px solid ${a}`,siderToggleButtonColor:t,siderToggleButtonIconColor:n,siderToggleButtonIconColorInverted:n,siderToggleBarColor:l(r,s),siderToggleBarColorHover:l(r,c),__invertScrollbar:`true`}}var X=h({name:`Layout`,common:t,peers:{Scrollbar:u},self:Pe}),Fe=O(`n-layout-sider`),Z={type:String,default:`static`},Ie=_(`layout`,`
 color: var(--n-text-color);
 background-color: var(--n-color);
 box-sizing: border-box;
 position: relative;
 z-index: auto;
 flex: auto;
 overflow: hidden;
 transition:
 box-shadow .3s var(--n-bezier),
 background-color .3s var(--n-bezier),
 color .3s var(--n-bezier);
`,[_(`layout-scroll-container`,`
 overflow-x: hidden;
 box-sizing: border-box;
 height: 100%;
 `),e(`absolute-positioned`,`
 position: absolute;
 left: 0;
 right: 0;
 top: 0;
 bottom: 0;
 `)]),Le={embedded:Boolean,position:Z,nativeScrollbar:{type:Boolean,default:!0},scrollbarProps:Object,onScroll:Function,contentClass:String,contentStyle:{type:[String,Object],default:``},hasSider:Boolean,siderPlacement:{type:String,default:`left`}},Re=O(`n-layout`);function ze(e){return B({name:e?`LayoutContent`:`Layout`,props:{...a.props,...Le},setup(e){let t=N(null),n=N(null),{mergedClsPrefixRef:r,inlineThemeDisabled:o}=S(e),s=a(`Layout`,`-layout`,Ie,X,e,r);function c(r,i){if(e.nativeScrollbar){let{value:e}=t;e&&(i===void 0?e.scrollTo(r):e.scrollTo(r,i))}else{let{value:e}=n;e&&e.scrollTo(r,i)}}W(Re,e);let l=0,u=0,d=t=>{let n=t.target;l=n.scrollLeft,u=n.scrollTop,e.onScroll?.(t)};j(()=>{if(e.nativeScrollbar){let e=t.value;e&&(e.scrollTop=u,e.scrollLeft=l)}});let f={display:`flex`,flexWrap:`nowrap`,width:`100%`,flexDirection:`row`},p={scrollTo:c},m=T(()=>{let{common:{cubicBezierEaseInOut:t},self:n}=s.value;return{"--n-bezier":t,"--n-color":e.embedded?n.colorEmbedded:n.color,"--n-text-color":n.textColor}}),h=o?i(`layout`,T(()=>e.embedded?`e`:``),m,e):void 0;return{mergedClsPrefix:r,scrollableElRef:t,scrollbarInstRef:n,hasSiderStyle:f,mergedTheme:s,handleNativeElScroll:d,cssVars:o?void 0:m,themeClass:h?.themeClass,onRender:h?.onRender,...p}},render(){let{mergedClsPrefix:t,hasSider:r}=this;this.onRender?.();let i=r?this.hasSiderStyle:void 0,a=[this.themeClass,e&&`${t}-layout-content`,`${t}-layout`,`${t}-layout--${this.position}-positioned`];return p(),x(`div`,{class:P(a),style:M(this.cssVars)},[this.nativeScrollbar?(p(),x(`div`,{key:0,ref:`scrollableElRef`,class:P([`${t}-layout-scroll-container`,this.contentClass]),style:M([this.contentStyle,i]),onScroll:this.handleNativeElScroll},[A(()=>this.$slots.default?.())],46,[`onScroll`])):(p(),R(F,n({key:1},this.scrollbarProps,{onScroll:this.onScroll,ref:`scrollbarInstRef`,theme:this.mergedTheme.peers.Scrollbar,themeOverrides:this.mergedTheme.peerOverrides.Scrollbar,contentClass:this.contentClass,contentStyle:[this.contentStyle,i]}),b(this.$slots),1040,[`onScroll`,`theme`,`themeOverrides`,`contentClass`,`contentStyle`]))],6)}})}var Be=ze(!1),Ve=_(`layout-footer`,`
 transition:
 box-shadow .3s var(--n-bezier),
 color .3s var(--n-bezier),
 background-color .3s var(--n-bezier),
 border-color .3s var(--n-bezier);
 color: var(--n-text-color);
 background-color: var(--n-color);
 box-sizing: border-box;
`,[e(`absolute-positioned`,`
 position: absolute;
 left: 0;
 right: 0;
 bottom: 0;
 `),e(`bordered`,`
 border-top: solid 1px var(--n-border-color);
 `)]),He={...a.props,inverted:Boolean,position:Z,bordered:Boolean},Ue=B({name:`LayoutFooter`,props:He,setup(e){let{mergedClsPrefixRef:t,inlineThemeDisabled:n}=S(e),r=a(`Layout`,`-layout-footer`,Ve,X,e,t),o=T(()=>{let{common:{cubicBezierEaseInOut:t},self:n}=r.value,i={"--n-bezier":t};return e.inverted?(i[`--n-color`]=n.footerColorInverted,i[`--n-text-color`]=n.textColorInverted,i[`--n-border-color`]=n.footerBorderColorInverted):(i[`--n-color`]=n.footerColor,i[`--n-text-color`]=n.textColor,i[`--n-border-color`]=n.footerBorderColor),i}),s=n?i(`layout-footer`,T(()=>e.inverted?`a`:`b`),o,e):void 0;return{mergedClsPrefix:t,cssVars:n?void 0:o,themeClass:s?.themeClass,onRender:s?.onRender}},render(){let{mergedClsPrefix:e}=this;return this.onRender?.(),p(),x(`div`,{class:P([`${e}-layout-footer`,this.themeClass,this.position&&`${e}-layout-footer--${this.position}-positioned`,this.bordered&&`${e}-layout-footer--bordered`]),style:M(this.cssVars)},[A(()=>this.$slots.default?.())],6)}}),We=_(`layout-header`,`
 transition:
 color .3s var(--n-bezier),
 background-color .3s var(--n-bezier),
 box-shadow .3s var(--n-bezier),
 border-color .3s var(--n-bezier);
 box-sizing: border-box;
 width: 100%;
 background-color: var(--n-color);
 color: var(--n-text-color);
`,[e(`absolute-positioned`,`
 position: absolute;
 left: 0;
 right: 0;
 top: 0;
 `),e(`bordered`,`
 border-bottom: solid 1px var(--n-border-color);
 `)]),Ge={position:Z,inverted:Boolean,bordered:Boolean},Ke=B({name:`LayoutHeader`,props:{...a.props,...Ge},setup(e){let{mergedClsPrefixRef:t,inlineThemeDisabled:n}=S(e),r=a(`Layout`,`-layout-header`,We,X,e,t),o=T(()=>{let{common:{cubicBezierEaseInOut:t},self:n}=r.value,i={"--n-bezier":t};return e.inverted?(i[`--n-color`]=n.headerColorInverted,i[`--n-text-color`]=n.textColorInverted,i[`--n-border-color`]=n.headerBorderColorInverted):(i[`--n-color`]=n.headerColor,i[`--n-text-color`]=n.textColor,i[`--n-border-color`]=n.headerBorderColor),i}),s=n?i(`layout-header`,T(()=>e.inverted?`a`:`b`),o,e):void 0;return{mergedClsPrefix:t,cssVars:n?void 0:o,themeClass:s?.themeClass,onRender:s?.onRender}},render(){let{mergedClsPrefix:e}=this;return this.onRender?.(),p(),x(`div`,{class:P([`${e}-layout-header`,this.themeClass,this.position&&`${e}-layout-header--${this.position}-positioned`,this.bordered&&`${e}-layout-header--bordered`]),style:M(this.cssVars)},[A(()=>this.$slots.default?.())],6)}}),qe=_(`layout-sider`,`
 flex-shrink: 0;
 box-sizing: border-box;
 position: relative;
 z-index: 1;
 color: var(--n-text-color);
 transition:
 color .3s var(--n-bezier),
 border-color .3s var(--n-bezier),
 min-width .3s var(--n-bezier),
 max-width .3s var(--n-bezier),
 transform .3s var(--n-bezier),
 background-color .3s var(--n-bezier);
 background-color: var(--n-color);
 display: flex;
 justify-content: flex-end;
`,[e(`bordered`,[f(`border`,`
 content: "";
 position: absolute;
 top: 0;
 bottom: 0;
 width: 1px;
 background-color: var(--n-border-color);
 transition: background-color .3s var(--n-bezier);
 `)]),f(`left-placement`,[e(`bordered`,[f(`border`,`
 right: 0;
 `)])]),e(`right-placement`,`
 justify-content: flex-start;
 `,[e(`bordered`,[f(`border`,`
 left: 0;
 `)]),e(`collapsed`,[_(`layout-toggle-button`,[_(`base-icon`,`
 transform: rotate(180deg);
 `)]),_(`layout-toggle-bar`,[v(`&:hover`,[f(`top`,{transform:`rotate(-12deg) scale(1.15) translateY(-2px)`}),f(`bottom`,{transform:`rotate(12deg) scale(1.15) translateY(2px)`})])])]),_(`layout-toggle-button`,`
 left: 0;
 transform: translateX(-50%) translateY(-50%);
 `,[_(`base-icon`,`
 transform: rotate(0);
 `)]),_(`layout-toggle-bar`,`
 left: -28px;
 transform: rotate(180deg);
 `,[v(`&:hover`,[f(`top`,{transform:`rotate(12deg) scale(1.15) translateY(-2px)`}),f(`bottom`,{transform:`rotate(-12deg) scale(1.15) translateY(2px)`})])])]),e(`collapsed`,[_(`layout-toggle-bar`,[v(`&:hover`,[f(`top`,{transform:`rotate(-12deg) scale(1.15) translateY(-2px)`}),f(`bottom`,{transform:`rotate(12deg) scale(1.15) translateY(2px)`})])]),_(`layout-toggle-button`,[_(`base-icon`,`
 transform: rotate(0);
 `)])]),_(`layout-toggle-button`,`
 transition:
 color .3s var(--n-bezier),
 right .3s var(--n-bezier),
 left .3s var(--n-bezier),
 border-color .3s var(--n-bezier),
 background-color .3s var(--n-bezier);
 cursor: pointer;
 width: 24px;
 height: 24px;
 position: absolute;
 top: 50%;
 right: 0;
 border-radius: 50%;
 display: flex;
 align-items: center;
 justify-content: center;
 font-size: 18px;
 color: var(--n-toggle-button-icon-color);
 border: var(--n-toggle-button-border);
 background-color: var(--n-toggle-button-color);
 box-shadow: 0 2px 4px 0px rgba(0, 0, 0, .06);
 transform: translateX(50%) translateY(-50%);
 z-index: 1;
 `,[_(`base-icon`,`
 transition: transform .3s var(--n-bezier);
 transform: rotate(180deg);
 `)]),_(`layout-toggle-bar`,`
 cursor: pointer;
 height: 72px;
 width: 32px;
 position: absolute;
 top: calc(50% - 36px);
 right: -28px;
 `,[f(`top, bottom`,`
 position: absolute;
 width: 4px;
 border-radius: 2px;
 height: 38px;
 left: 14px;
 transition: 
 background-color .3s var(--n-bezier),
 transform .3s var(--n-bezier);
 `),f(`bottom`,`
 position: absolute;
 top: 34px;
 `),v(`&:hover`,[f(`top`,{transform:`rotate(12deg) scale(1.15) translateY(-2px)`}),f(`bottom`,{transform:`rotate(-12deg) scale(1.15) translateY(2px)`})]),f(`top, bottom`,{backgroundColor:`var(--n-toggle-bar-color)`}),v(`&:hover`,[f(`top, bottom`,{backgroundColor:`var(--n-toggle-bar-color-hover)`})])]),f(`border`,`
 position: absolute;
 top: 0;
 right: 0;
 bottom: 0;
 width: 1px;
 transition: background-color .3s var(--n-bezier);
 `),_(`layout-sider-scroll-container`,`
 flex-grow: 1;
 flex-shrink: 0;
 box-sizing: border-box;
 height: 100%;
 opacity: 0;
 transition: opacity .3s var(--n-bezier);
 max-width: 100%;
 `),e(`show-content`,[_(`layout-sider-scroll-container`,{opacity:1})]),e(`absolute-positioned`,`
 position: absolute;
 left: 0;
 top: 0;
 bottom: 0;
 `)]),Je=[`onClick`],Ye=B({props:{clsPrefix:{type:String,required:!0},onClick:Function},render(){let{clsPrefix:e}=this;return p(),x(`div`,{onClick:this.onClick,class:P(`${e}-layout-toggle-bar`)},[y(`div`,{class:P(`${e}-layout-toggle-bar__top`)},null,2),y(`div`,{class:P(`${e}-layout-toggle-bar__bottom`)},null,2)],10,Je)}}),Xe=[`onClick`],Ze=B({name:`LayoutToggleButton`,props:{clsPrefix:{type:String,required:!0},onClick:Function},render(){let{clsPrefix:e}=this;return p(),x(`div`,{class:P(`${e}-layout-toggle-button`),onClick:this.onClick},[(p(),R(te,{clsPrefix:e},{default:()=>(p(),R(oe))},1032,[`clsPrefix`]))],10,Xe)}}),Qe=[`onTransitionend`],$e={position:Z,bordered:Boolean,collapsedWidth:{type:Number,default:48},width:{type:[Number,String],default:272},contentClass:String,contentStyle:{type:[String,Object],default:``},collapseMode:{type:String,default:`transform`},collapsed:{type:Boolean,default:void 0},defaultCollapsed:Boolean,showCollapsedContent:{type:Boolean,default:!0},showTrigger:{type:[Boolean,String],default:!1},nativeScrollbar:{type:Boolean,default:!0},inverted:Boolean,scrollbarProps:Object,triggerClass:String,triggerStyle:[String,Object],collapsedTriggerClass:String,collapsedTriggerStyle:[String,Object],"onUpdate:collapsed":[Function,Array],onUpdateCollapsed:[Function,Array],onAfterEnter:Function,onAfterLeave:Function,onExpand:[Function,Array],onCollapse:[Function,Array],onScroll:Function},et=B({name:`LayoutSider`,props:{...a.props,...$e},setup(e){let t=d(Re);t?t.hasSider||z(`layout-sider`,"You are putting `n-layout-sider` in a `n-layout` but haven't set `has-sider` on the `n-layout`."):z(`layout-sider`,`Layout sider is not allowed to be put outside layout.`);let n=N(null),r=N(null),o=N(e.defaultCollapsed),s=ae(I(e,`collapsed`),o),c=T(()=>ie(s.value?e.collapsedWidth:e.width)),l=T(()=>e.collapseMode===`transform`?{minWidth:ie(e.width)}:{}),u=T(()=>t?t.siderPlacement:`left`);function f(t,i){if(e.nativeScrollbar){let{value:e}=n;e&&(i===void 0?e.scrollTo(t):e.scrollTo(t,i))}else{let{value:e}=r;e&&e.scrollTo(t,i)}}function p(){let{"onUpdate:collapsed":t,onUpdateCollapsed:n,onExpand:r,onCollapse:i}=e,{value:a}=s;n&&V(n,!a),t&&V(t,!a),o.value=!a,a?r&&V(r):i&&V(i)}let m=0,h=0,g=t=>{let n=t.target;m=n.scrollLeft,h=n.scrollTop,e.onScroll?.(t)};j(()=>{if(e.nativeScrollbar){let e=n.value;e&&(e.scrollTop=h,e.scrollLeft=m)}}),W(Fe,{collapsedRef:s,collapseModeRef:I(e,`collapseMode`)});let{mergedClsPrefixRef:_,inlineThemeDisabled:v}=S(e),y=a(`Layout`,`-layout-sider`,qe,X,e,_);function b(t){t.propertyName===`max-width`&&(s.value?e.onAfterLeave?.():e.onAfterEnter?.())}let x={scrollTo:f},C=T(()=>{let{common:{cubicBezierEaseInOut:t},self:n}=y.value,{siderToggleButtonColor:r,siderToggleButtonBorder:i,siderToggleBarColor:a,siderToggleBarColorHover:o}=n,s={"--n-bezier":t,"--n-toggle-button-color":r,"--n-toggle-button-border":i,"--n-toggle-bar-color":a,"--n-toggle-bar-color-hover":o};return e.inverted?(s[`--n-color`]=n.siderColorInverted,s[`--n-text-color`]=n.textColorInverted,s[`--n-border-color`]=n.siderBorderColorInverted,s[`--n-toggle-button-icon-color`]=n.siderToggleButtonIconColorInverted,s.__invertScrollbar=n.__invertScrollbar):(s[`--n-color`]=n.siderColor,s[`--n-text-color`]=n.textColor,s[`--n-border-color`]=n.siderBorderColor,s[`--n-toggle-button-icon-color`]=n.siderToggleButtonIconColor),s}),w=v?i(`layout-sider`,T(()=>e.inverted?`a`:`b`),C,e):void 0;return{scrollableElRef:n,scrollbarInstRef:r,mergedClsPrefix:_,mergedTheme:y,styleMaxWidth:c,mergedCollapsed:s,scrollContainerStyle:l,siderPlacement:u,handleNativeElScroll:g,handleTransitionend:b,handleTriggerClick:p,inlineThemeDisabled:v,cssVars:C,themeClass:w?.themeClass,onRender:w?.onRender,...x}},render(){let{mergedClsPrefix:e,mergedCollapsed:t,showTrigger:r}=this;return this.onRender?.(),p(),x(`aside`,{class:P([`${e}-layout-sider`,this.themeClass,`${e}-layout-sider--${this.position}-positioned`,`${e}-layout-sider--${this.siderPlacement}-placement`,this.bordered&&`${e}-layout-sider--bordered`,t&&`${e}-layout-sider--collapsed`,(!t||this.showCollapsedContent)&&`${e}-layout-sider--show-content`]),onTransitionend:this.handleTransitionend,style:M([this.inlineThemeDisabled?void 0:this.cssVars,{maxWidth:this.styleMaxWidth,width:ie(this.width)}])},[this.nativeScrollbar?(p(),x(`div`,{key:1,class:P([`${e}-layout-sider-scroll-container`,this.contentClass]),onScroll:this.handleNativeElScroll,style:M([this.scrollContainerStyle,{overflow:`auto`},this.contentStyle]),ref:`scrollableElRef`},[A(()=>this.$slots.default?.())],46,[`onScroll`])):(p(),R(F,n({key:0},this.scrollbarProps,{onScroll:this.onScroll,ref:`scrollbarInstRef`,style:this.scrollContainerStyle,contentStyle:this.contentStyle,contentClass:this.contentClass,theme:this.mergedTheme.peers.Scrollbar,themeOverrides:this.mergedTheme.peerOverrides.Scrollbar,builtinThemeOverrides:this.inverted&&this.cssVars.__invertScrollbar===`true`?{colorHover:`rgba(255, 255, 255, .4)`,color:`rgba(255, 255, 255, .3)`}:void 0}),b(this.$slots),1040,[`onScroll`,`style`,`contentStyle`,`contentClass`,`theme`,`themeOverrides`,`builtinThemeOverrides`])),r?(p(),x(w,{key:2},[r===`bar`?(p(),R(Ye,{key:0,clsPrefix:e,class:P(t?this.collapsedTriggerClass:this.triggerClass),style:M(t?this.collapsedTriggerStyle:this.triggerStyle),onClick:this.handleTriggerClick},null,8,[`clsPrefix`,`class`,`style`,`onClick`])):(p(),R(Ze,{key:1,clsPrefix:e,class:P(t?this.collapsedTriggerClass:this.triggerClass),style:M(t?this.collapsedTriggerStyle:this.triggerStyle),onClick:this.handleTriggerClick},null,8,[`clsPrefix`,`class`,`style`,`onClick`]))],64)):A(()=>null),this.bordered?(p(),x(`div`,{key:4,class:P(`${e}-layout-sider__border`)},null,2)):A(()=>null)],46,Qe)}}),Q=O(`n-menu`),tt=O(`n-submenu`),nt=O(`n-menu-item-group`),rt=[v(`&::before`,`background-color: var(--n-item-color-hover);`),f(`arrow`,`
 color: var(--n-arrow-color-hover);
 `),f(`icon`,`
 color: var(--n-item-icon-color-hover);
 `),_(`menu-item-content-header`,`
 color: var(--n-item-text-color-hover);
 `,[v(`a`,`
 color: var(--n-item-text-color-hover);
 `),f(`extra`,`
 color: var(--n-item-text-color-hover);
 `)])],it=[f(`icon`,`
 color: var(--n-item-icon-color-hover-horizontal);
 `),_(`menu-item-content-header`,`
 color: var(--n-item-text-color-hover-horizontal);
 `,[v(`a`,`
 color: var(--n-item-text-color-hover-horizontal);
 `),f(`extra`,`
 color: var(--n-item-text-color-hover-horizontal);
 `)])],at=v([_(`menu`,`
 background-color: var(--n-color);
 color: var(--n-item-text-color);
 overflow: hidden;
 transition: background-color .3s var(--n-bezier);
 box-sizing: border-box;
 font-size: var(--n-font-size);
 padding-bottom: 6px;
 `,[e(`horizontal`,`
 max-width: 100%;
 width: 100%;
 display: flex;
 overflow: hidden;
 padding-bottom: 0;
 `,[_(`submenu`,`margin: 0;`),_(`menu-item`,`margin: 0;`),_(`menu-item-content`,`
 padding: 0 20px;
 border-bottom: 2px solid #0000;
 `,[v(`&::before`,`display: none;`),e(`selected`,`border-bottom: 2px solid var(--n-border-color-horizontal)`)]),_(`menu-item-content`,[e(`selected`,[f(`icon`,`color: var(--n-item-icon-color-active-horizontal);`),_(`menu-item-content-header`,`
 color: var(--n-item-text-color-active-horizontal);
 `,[v(`a`,`color: var(--n-item-text-color-active-horizontal);`),f(`extra`,`color: var(--n-item-text-color-active-horizontal);`)])]),e(`child-active`,`
 border-bottom: 2px solid var(--n-border-color-horizontal);
 `,[_(`menu-item-content-header`,`
 color: var(--n-item-text-color-child-active-horizontal);
 `,[v(`a`,`
 color: var(--n-item-text-color-child-active-horizontal);
 `),f(`extra`,`
 color: var(--n-item-text-color-child-active-horizontal);
 `)]),f(`icon`,`
 color: var(--n-item-icon-color-child-active-horizontal);
 `)]),C(`disabled`,[C(`selected, child-active`,[v(`&:focus-within`,it)]),e(`selected`,[$(null,[f(`icon`,`color: var(--n-item-icon-color-active-hover-horizontal);`),_(`menu-item-content-header`,`
 color: var(--n-item-text-color-active-hover-horizontal);
 `,[v(`a`,`color: var(--n-item-text-color-active-hover-horizontal);`),f(`extra`,`color: var(--n-item-text-color-active-hover-horizontal);`)])])]),e(`child-active`,[$(null,[f(`icon`,`color: var(--n-item-icon-color-child-active-hover-horizontal);`),_(`menu-item-content-header`,`
 color: var(--n-item-text-color-child-active-hover-horizontal);
 `,[v(`a`,`color: var(--n-item-text-color-child-active-hover-horizontal);`),f(`extra`,`color: var(--n-item-text-color-child-active-hover-horizontal);`)])])]),$(`border-bottom: 2px solid var(--n-border-color-horizontal);`,it)]),_(`menu-item-content-header`,[v(`a`,`color: var(--n-item-text-color-horizontal);`)])])]),C(`responsive`,[_(`menu-item-content-header`,`
 overflow: hidden;
 text-overflow: ellipsis;
 `)]),e(`collapsed`,[_(`menu-item-content`,[e(`selected`,[v(`&::before`,`
 background-color: var(--n-item-color-active-collapsed) !important;
 `)]),_(`menu-item-content-header`,`opacity: 0;`),f(`arrow`,`opacity: 0;`),f(`icon`,`color: var(--n-item-icon-color-collapsed);`)])]),_(`menu-item`,`
 height: var(--n-item-height);
 margin-top: 6px;
 position: relative;
 `),_(`menu-item-content`,`
 box-sizing: border-box;
 line-height: 1.75;
 height: 100%;
 display: grid;
 grid-template-areas: "icon content arrow";
 grid-template-columns: auto 1fr auto;
 align-items: center;
 cursor: pointer;
 position: relative;
 padding-right: 18px;
 transition:
 background-color .3s var(--n-bezier),
 padding-left .3s var(--n-bezier),
 border-color .3s var(--n-bezier);
 `,[v(`> *`,`z-index: 1;`),v(`&::before`,`
 z-index: auto;
 content: "";
 background-color: #0000;
 position: absolute;
 left: 8px;
 right: 8px;
 top: 0;
 bottom: 0;
 pointer-events: none;
 border-radius: var(--n-border-radius);
 transition: background-color .3s var(--n-bezier);
 `),e(`disabled`,`
 opacity: .45;
 cursor: not-allowed;
 `),e(`collapsed`,[f(`arrow`,`transform: rotate(0);`)]),e(`selected`,[v(`&::before`,`background-color: var(--n-item-color-active);`),f(`arrow`,`color: var(--n-arrow-color-active);`),f(`icon`,`color: var(--n-item-icon-color-active);`),_(`menu-item-content-header`,`
 color: var(--n-item-text-color-active);
 `,[v(`a`,`color: var(--n-item-text-color-active);`),f(`extra`,`color: var(--n-item-text-color-active);`)])]),e(`child-active`,[_(`menu-item-content-header`,`
 color: var(--n-item-text-color-child-active);
 `,[v(`a`,`
 color: var(--n-item-text-color-child-active);
 `),f(`extra`,`
 color: var(--n-item-text-color-child-active);
 `)]),f(`arrow`,`
 color: var(--n-arrow-color-child-active);
 `),f(`icon`,`
 color: var(--n-item-icon-color-child-active);
 `)]),C(`disabled`,[C(`selected, child-active`,[v(`&:focus-within`,rt)]),e(`selected`,[$(null,[f(`arrow`,`color: var(--n-arrow-color-active-hover);`),f(`icon`,`color: var(--n-item-icon-color-active-hover);`),_(`menu-item-content-header`,`
 color: var(--n-item-text-color-active-hover);
 `,[v(`a`,`color: var(--n-item-text-color-active-hover);`),f(`extra`,`color: var(--n-item-text-color-active-hover);`)])])]),e(`child-active`,[$(null,[f(`arrow`,`color: var(--n-arrow-color-child-active-hover);`),f(`icon`,`color: var(--n-item-icon-color-child-active-hover);`),_(`menu-item-content-header`,`
 color: var(--n-item-text-color-child-active-hover);
 `,[v(`a`,`color: var(--n-item-text-color-child-active-hover);`),f(`extra`,`color: var(--n-item-text-color-child-active-hover);`)])])]),e(`selected`,[$(null,[v(`&::before`,`background-color: var(--n-item-color-active-hover);`)])]),$(null,rt)]),f(`icon`,`
 grid-area: icon;
 color: var(--n-item-icon-color);
 transition:
 color .3s var(--n-bezier),
 font-size .3s var(--n-bezier),
 margin-right .3s var(--n-bezier);
 box-sizing: content-box;
 display: inline-flex;
 align-items: center;
 justify-content: center;
 `),f(`arrow`,`
 grid-area: arrow;
 font-size: 16px;
 color: var(--n-arrow-color);
 transform: rotate(180deg);
 opacity: 1;
 transition:
 color .3s var(--n-bezier),
 transform 0.2s var(--n-bezier),
 opacity 0.2s var(--n-bezier);
 `),_(`menu-item-content-header`,`
 grid-area: content;
 transition:
 color .3s var(--n-bezier),
 opacity .3s var(--n-bezier);
 opacity: 1;
 white-space: nowrap;
 color: var(--n-item-text-color);
 `,[v(`a`,`
 outline: none;
 text-decoration: none;
 transition: color .3s var(--n-bezier);
 color: var(--n-item-text-color);
 `,[v(`&::before`,`
 content: "";
 position: absolute;
 left: 0;
 right: 0;
 top: 0;
 bottom: 0;
 `)]),f(`extra`,`
 font-size: .93em;
 color: var(--n-group-text-color);
 transition: color .3s var(--n-bezier);
 `)])]),_(`submenu`,`
 cursor: pointer;
 position: relative;
 margin-top: 6px;
 `,[_(`menu-item-content`,`
 height: var(--n-item-height);
 `),_(`submenu-children`,`
 overflow: hidden;
 padding: 0;
 `,[re({duration:`.2s`})])]),_(`menu-item-group`,[_(`menu-item-group-title`,`
 margin-top: 6px;
 color: var(--n-group-text-color);
 cursor: default;
 font-size: .93em;
 height: 36px;
 display: flex;
 align-items: center;
 transition:
 padding-left .3s var(--n-bezier),
 color .3s var(--n-bezier);
 `)])]),_(`menu-tooltip`,[v(`a`,`
 color: inherit;
 text-decoration: none;
 `)]),_(`menu-divider`,`
 transition: background-color .3s var(--n-bezier);
 background-color: var(--n-divider-color);
 height: 1px;
 margin: 6px 18px;
 `)]);function $(t,n){return[e(`hover`,t,n),v(`&:hover`,t,n)]}var ot=B({name:`MenuDivider`,setup(){let{mergedClsPrefixRef:e,isHorizontalRef:t}=d(Q);return()=>t.value?null:(p(),x(`div`,{key:1,class:P(`${e.value}-menu-divider`)},null,2))}}),st=B({name:`ChevronDownFilled`,render(){return(()=>{let e=k(`f3af82a2aab086a5`);return e[0]||=y(`svg`,{viewBox:`0 0 16 16`,fill:`none`,xmlns:`http://www.w3.org/2000/svg`},[y(`path`,{d:`M3.20041 5.73966C3.48226 5.43613 3.95681 5.41856 4.26034 5.70041L8 9.22652L11.7397 5.70041C12.0432 5.41856 12.5177 5.43613 12.7996 5.73966C13.0815 6.0432 13.0639 6.51775 12.7603 6.7996L8.51034 10.7996C8.22258 11.0668 7.77743 11.0668 7.48967 10.7996L3.23966 6.7996C2.93613 6.51775 2.91856 6.0432 3.20041 5.73966Z`,fill:`currentColor`})],-1)})()}}),ct=[`onClick`],lt=B({name:`MenuOptionContent`,props:{collapsed:Boolean,disabled:Boolean,title:[String,Function],icon:Function,extra:[String,Function],showArrow:Boolean,childActive:Boolean,hover:Boolean,paddingLeft:Number,selected:Boolean,maxIconSize:{type:Number,required:!0},activeIconSize:{type:Number,required:!0},iconMarginRight:{type:Number,required:!0},clsPrefix:{type:String,required:!0},onClick:Function,tmNode:{type:Object,required:!0},isEllipsisPlaceholder:Boolean},setup(e){let{props:t}=d(Q);return{menuProps:t,style:T(()=>{let{paddingLeft:t}=e;return{paddingLeft:t&&`${t}px`}}),iconStyle:T(()=>{let{maxIconSize:t,activeIconSize:n,iconMarginRight:r}=e;return{width:`${t}px`,height:`${t}px`,fontSize:`${n}px`,marginRight:`${r}px`}})}},render(){let{clsPrefix:e,tmNode:t,menuProps:{renderIcon:n,renderLabel:r,renderExtra:i,expandIcon:a}}=this,o=n?n(t.rawNode):K(this.icon);return(()=>{let n=k(`7bb10afc6caf8fa4`);return p(),x(`div`,{onClick:e=>{this.onClick?.(e)},role:`none`,class:P([`${e}-menu-item-content`,{[`${e}-menu-item-content--selected`]:this.selected,[`${e}-menu-item-content--collapsed`]:this.collapsed,[`${e}-menu-item-content--child-active`]:this.childActive,[`${e}-menu-item-content--disabled`]:this.disabled,[`${e}-menu-item-content--hover`]:this.hover}]),style:M(this.style)},[A(()=>o&&(p(),x(`div`,{class:P(`${e}-menu-item-content__icon`),style:M(this.iconStyle),role:`none`},[A(()=>[o])],6))),y(`div`,{class:P(`${e}-menu-item-content-header`),role:`none`},[this.isEllipsisPlaceholder?(p(),x(w,{key:0},[A(()=>this.title)],64)):(p(),x(w,{key:1},[r?(p(),x(w,{key:0},[A(()=>r(t.rawNode))],64)):(p(),x(w,{key:1},[A(()=>K(this.title))],64))],64)),this.extra||i?(p(),x(`span`,{key:2,class:P(`${e}-menu-item-content-header__extra`)},[n[0]||=A(` `,-1),i?(p(),x(w,{key:0},[A(()=>i(t.rawNode))],64)):(p(),x(w,{key:1},[A(()=>K(this.extra))],64))],2)):A(()=>null)],2),this.showArrow?(p(),R(te,{key:0,ariaHidden:!0,class:P(`${e}-menu-item-content__arrow`),clsPrefix:e},{default:()=>a?a(t.rawNode):(p(),R(st,{key:1}))},1032,[`class`,`clsPrefix`])):A(()=>null)],14,ct)})()}}),ut=8;function dt(e){let t=d(Q),{props:n,mergedCollapsedRef:r}=t,i=d(tt,null),a=d(nt,null),o=T(()=>n.mode===`horizontal`),s=T(()=>o.value?n.dropdownPlacement:`tmNodes`in e?`right-start`:`right`),c=T(()=>Math.max(n.collapsedIconSize??n.iconSize,n.iconSize));return{dropdownPlacement:s,activeIconSize:T(()=>!o.value&&e.root&&r.value?n.collapsedIconSize??n.iconSize:n.iconSize),maxIconSize:c,paddingLeft:T(()=>{if(o.value)return;let{collapsedWidth:t,indent:s,rootIndent:l}=n,{root:u,isGroup:d}=e,f=l===void 0?s:l;return u?r.value?t/2-c.value/2:f:a&&typeof a.paddingLeftRef.value==`number`?r.value?t/2-c.value/2:s/2+a.paddingLeftRef.value:i&&typeof i.paddingLeftRef.value==`number`?(d?s/2:s)+i.paddingLeftRef.value:0}),iconMarginRight:T(()=>{let{collapsedWidth:t,indent:i,rootIndent:a}=n,{value:s}=c,{root:l}=e;return o.value||!l||!r.value?ut:(a===void 0?i:a)+s+ut-(t+s)/2}),NMenu:t,NSubmenu:i,NMenuOptionGroup:a}}var ft={internalKey:{type:[String,Number],required:!0},root:Boolean,isGroup:Boolean,level:{type:Number,required:!0},title:[String,Function],extra:[String,Function]},pt={...ft,tmNode:{type:Object,required:!0},disabled:Boolean,icon:Function,onClick:Function},mt=E(pt),ht=B({name:`MenuOption`,props:pt,setup(e){let t=dt(e),{NSubmenu:n,NMenu:r,NMenuOptionGroup:i}=t,{props:a,mergedClsPrefixRef:o,mergedCollapsedRef:s}=r,c=n?n.mergedDisabledRef:i?i.mergedDisabledRef:{value:!1},l=T(()=>c.value||e.disabled);function u(t){let{onClick:n}=e;n&&n(t)}function d(t){l.value||(r.doSelect(e.internalKey,e.tmNode.rawNode),u(t))}return{mergedClsPrefix:o,dropdownPlacement:t.dropdownPlacement,paddingLeft:t.paddingLeft,iconMarginRight:t.iconMarginRight,maxIconSize:t.maxIconSize,activeIconSize:t.activeIconSize,mergedTheme:r.mergedThemeRef,menuProps:a,dropdownEnabled:be(()=>e.root&&s.value&&a.mode!==`horizontal`&&!l.value),selected:be(()=>r.mergedValueRef.value===e.internalKey),mergedDisabled:l,handleClick:d}},render(){let{mergedClsPrefix:e,mergedTheme:t,tmNode:r,menuProps:{renderLabel:i,nodeProps:a}}=this,o=a?.(r.rawNode);return p(),x(`div`,n(o,{role:`menuitem`,class:[`${e}-menu-item`,o?.class]}),[(p(),R(ke,{theme:t.peers.Tooltip,themeOverrides:t.peerOverrides.Tooltip,trigger:`hover`,placement:this.dropdownPlacement,disabled:!this.dropdownEnabled||this.title===void 0,internalExtraClass:[`menu-tooltip`]},{default:()=>i?i(r.rawNode):K(this.title),trigger:()=>(p(),R(lt,{tmNode:r,clsPrefix:e,paddingLeft:this.paddingLeft,iconMarginRight:this.iconMarginRight,maxIconSize:this.maxIconSize,activeIconSize:this.activeIconSize,selected:this.selected,title:this.title,extra:this.extra,disabled:this.mergedDisabled,icon:this.icon,onClick:this.handleClick},null,8,[`tmNode`,`clsPrefix`,`paddingLeft`,`iconMarginRight`,`maxIconSize`,`activeIconSize`,`selected`,`title`,`extra`,`disabled`,`icon`,`onClick`]))},1032,[`theme`,`themeOverrides`,`placement`,`disabled`]))],16)}}),gt={...ft,tmNode:{type:Object,required:!0},tmNodes:{type:Array,required:!0}},_t=E(gt),vt=B({name:`MenuOptionGroup`,props:gt,setup(e){let t=dt(e),{NSubmenu:r}=t,i=T(()=>r?.mergedDisabledRef.value?!0:e.tmNode.disabled);W(nt,{paddingLeftRef:t.paddingLeft,mergedDisabledRef:i});let{mergedClsPrefixRef:a,props:o}=d(Q);return function(){let{value:r}=a,i=t.paddingLeft.value,{nodeProps:s}=o,c=s?.(e.tmNode.rawNode);return(()=>{let t=k(`45eca6a63be5028b`);return p(),x(`div`,{class:P(`${r}-menu-item-group`),role:`group`},[y(`div`,n(c,{class:[`${r}-menu-item-group-title`,c?.class],style:[c?.style||``,i===void 0?``:`padding-left: ${i}px;`]}),[A(()=>K(e.title)),e.extra?(p(),x(w,{key:0},[t[0]||=A(` `,-1),A(()=>K(e.extra))],64)):A(()=>null)],16),y(`div`,null,[A(()=>e.tmNodes.map(e=>Et(e,o)))])],2)})()}}}),yt=[`aria-expanded`,`id`],bt=[`aria-expanded`,`id`],xt={...ft,rawNodes:{type:Array,default:()=>[]},tmNodes:{type:Array,default:()=>[]},tmNode:{type:Object,required:!0},disabled:Boolean,icon:Function,onClick:Function,domId:String,virtualChildActive:{type:Boolean,default:void 0},isEllipsisPlaceholder:Boolean},St=E(xt),Ct=B({name:`Submenu`,props:xt,setup(e){let t=dt(e),{NMenu:n,NSubmenu:r}=t,{props:i,mergedCollapsedRef:a,mergedThemeRef:o}=n,s=T(()=>{let{disabled:t}=e;return r?.mergedDisabledRef.value||i.disabled?!0:t}),c=N(!1);W(tt,{paddingLeftRef:t.paddingLeft,mergedDisabledRef:s}),W(nt,null);function l(){let{onClick:t}=e;t&&t()}function u(){s.value||(a.value||n.toggleExpand(e.internalKey),l())}function d(e){c.value=e}return{menuProps:i,mergedTheme:o,doSelect:n.doSelect,inverted:n.invertedRef,isHorizontal:n.isHorizontalRef,mergedClsPrefix:n.mergedClsPrefixRef,maxIconSize:t.maxIconSize,activeIconSize:t.activeIconSize,iconMarginRight:t.iconMarginRight,dropdownPlacement:t.dropdownPlacement,dropdownShow:c,paddingLeft:t.paddingLeft,mergedDisabled:s,mergedValue:n.mergedValueRef,childActive:be(()=>e.virtualChildActive??n.activePathRef.value.includes(e.internalKey)),collapsed:T(()=>i.mode===`horizontal`?!1:a.value?!0:!n.mergedExpandedKeysRef.value.includes(e.internalKey)),dropdownEnabled:T(()=>!s.value&&(i.mode===`horizontal`||a.value)),handlePopoverShowChange:d,handleClick:u}},render(){let{mergedClsPrefix:e,menuProps:{renderIcon:t,renderLabel:r}}=this,i=()=>{let{isHorizontal:e,paddingLeft:t,collapsed:r,mergedDisabled:i,maxIconSize:a,activeIconSize:o,title:s,childActive:c,icon:l,handleClick:u,menuProps:{nodeProps:d},dropdownShow:f,iconMarginRight:m,tmNode:h,mergedClsPrefix:g,isEllipsisPlaceholder:_,extra:v}=this,y=d?.(h.rawNode);return p(),x(`div`,n(y,{class:[`${g}-menu-item`,y?.class],role:`menuitem`}),[(p(),R(lt,{tmNode:h,paddingLeft:t,collapsed:r,disabled:i,iconMarginRight:m,maxIconSize:a,activeIconSize:o,title:s,extra:v,showArrow:!e,childActive:c,clsPrefix:g,icon:l,hover:f,onClick:u,isEllipsisPlaceholder:_},null,8,[`tmNode`,`paddingLeft`,`collapsed`,`disabled`,`iconMarginRight`,`maxIconSize`,`activeIconSize`,`title`,`extra`,`showArrow`,`childActive`,`clsPrefix`,`icon`,`hover`,`onClick`,`isEllipsisPlaceholder`]))],16)},a=()=>(p(),R(Se,null,{default:()=>{let{tmNodes:t,collapsed:n}=this;return n?null:(p(),x(`div`,{key:1,class:P(`${e}-submenu-children`),role:`menu`},[A(()=>t.map(e=>Et(e,this.menuProps)))],2))}},1024));return this.root?(p(),R(se,n({key:2,size:`large`,trigger:`hover`},this.menuProps?.dropdownProps,{themeOverrides:this.mergedTheme.peerOverrides.Dropdown,theme:this.mergedTheme.peers.Dropdown,builtinThemeOverrides:{fontSizeLarge:`14px`,optionIconSizeLarge:`18px`},value:this.mergedValue,disabled:!this.dropdownEnabled,placement:this.dropdownPlacement,keyField:this.menuProps.keyField,labelField:this.menuProps.labelField,childrenField:this.menuProps.childrenField,onUpdateShow:this.handlePopoverShowChange,options:this.rawNodes,onSelect:this.doSelect,inverted:this.inverted,renderIcon:t,renderLabel:r}),{default:()=>(p(),x(`div`,{class:P(`${e}-submenu`),role:`menu`,"aria-expanded":!this.collapsed,id:this.domId},[A(()=>i()),this.isHorizontal?A(()=>null):(p(),x(w,{key:1},[A(()=>a())],64))],10,yt))},1040,[`themeOverrides`,`theme`,`value`,`disabled`,`placement`,`keyField`,`labelField`,`childrenField`,`onUpdateShow`,`options`,`onSelect`,`inverted`,`renderIcon`,`renderLabel`])):(p(),x(`div`,{key:3,class:P(`${e}-submenu`),role:`menu`,"aria-expanded":!this.collapsed,id:this.domId},[A(()=>i()),A(()=>a())],10,bt))}});function wt(e){return e.type===`divider`||e.type===`render`}function Tt(e){return e.type===`divider`}function Et(e,t){let{rawNode:r}=e,{show:i}=r;if(i===!1)return null;if(wt(r))return Tt(r)?(p(),R(ot,n({key:e.key},r.props),null,16)):null;let{labelField:a}=t,{key:s,level:c,isGroup:l}=e,u={...r,title:r.title||r[a],extra:r.titleExtra||r.extra,key:s,internalKey:s,level:c,root:c===0,isGroup:l};return e.children?e.isGroup?o(vt,Oe(u,_t,{tmNode:e,tmNodes:e.children,key:s})):o(Ct,Oe(u,St,{key:s,rawNodes:r[t.childrenField],tmNodes:e.children,tmNode:e})):o(ht,Oe(u,mt,{key:s,tmNode:e}))}function Dt(e){s(()=>{e.items&&U(`menu`,"`items` is deprecated, please use `options` instead."),e.onOpenNamesChange&&U(`menu`,"`on-open-names-change` is deprecated, please use `on-update:expanded-keys` instead."),e.onSelect&&U(`menu`,"`on-select` is deprecated, please use `on-update:value` instead."),e.onExpandedNamesChange&&U(`menu`,"`on-expanded-names-change` is deprecated, please use `on-update:expanded-keys` instead."),e.expandedNames&&U(`menu`,"`expanded-names` is deprecated, please use `expanded-keys` instead."),e.defaultExpandedNames&&U(`menu`,"`default-expanded-names` is deprecated, please use `default-expanded-keys` instead.")})}var Ot={...a.props,options:{type:Array,default:()=>[]},collapsed:{type:Boolean,default:void 0},collapsedWidth:{type:Number,default:48},iconSize:{type:Number,default:20},collapsedIconSize:{type:Number,default:24},rootIndent:Number,indent:{type:Number,default:32},labelField:{type:String,default:`label`},keyField:{type:String,default:`key`},childrenField:{type:String,default:`children`},disabledField:{type:String,default:`disabled`},defaultExpandAll:Boolean,defaultExpandedKeys:Array,expandedKeys:Array,value:[String,Number],defaultValue:{type:[String,Number],default:null},mode:{type:String,default:`vertical`},watchProps:{type:Array,default:void 0},disabled:Boolean,show:{type:Boolean,default:!0},inverted:Boolean,"onUpdate:expandedKeys":[Function,Array],onUpdateExpandedKeys:[Function,Array],onUpdateValue:[Function,Array],"onUpdate:value":[Function,Array],expandIcon:Function,renderIcon:Function,renderLabel:Function,renderExtra:Function,dropdownProps:Object,accordion:Boolean,nodeProps:Function,dropdownPlacement:{type:String,default:`bottom`},responsive:Boolean,items:Array,onOpenNamesChange:[Function,Array],onSelect:[Function,Array],onExpandedNamesChange:[Function,Array],expandedNames:Array,defaultExpandedNames:Array},kt=B({name:`Menu`,inheritAttrs:!1,props:Ot,setup(e){Dt(e);let{mergedClsPrefixRef:t,inlineThemeDisabled:n}=S(e),r=a(`Menu`,`-menu`,at,ce,e,t),o=d(Fe,null),c=T(()=>{let{collapsed:t}=e;if(t!==void 0)return t;if(o){let{collapseModeRef:e,collapsedRef:t}=o;if(e.value===`width`)return t.value??!1}return!1}),l=T(()=>{let{keyField:t,childrenField:n,disabledField:r}=e;return J(e.items||e.options,{getIgnored(e){return wt(e)},getChildren(e){return e[n]},getDisabled(e){return e[r]},getKey(e){return e[t]??e.name}})}),u=T(()=>new Set(l.value.treeNodes.map(e=>e.key))),{watchProps:f}=e,m=N(null);f?.includes(`defaultValue`)?s(()=>{m.value=e.defaultValue}):m.value=e.defaultValue;let h=I(e,`value`),g=ae(h,m),_=N([]),v=()=>{_.value=e.defaultExpandAll?l.value.getNonLeafKeys():e.defaultExpandedNames||e.defaultExpandedKeys||l.value.getPath(g.value,{includeSelf:!1}).keyPath};f?.includes(`defaultExpandedKeys`)?s(v):v();let y=Ae(e,[`expandedNames`,`expandedKeys`]),b=ae(y,_),x=T(()=>l.value.treeNodes),C=T(()=>l.value.getPath(g.value).keyPath);W(Q,{props:e,mergedCollapsedRef:c,mergedThemeRef:r,mergedValueRef:g,mergedExpandedKeysRef:b,activePathRef:C,mergedClsPrefixRef:t,isHorizontalRef:T(()=>e.mode===`horizontal`),invertedRef:I(e,`inverted`),doSelect:w,toggleExpand:ee});function w(t,n){let{"onUpdate:value":r,onUpdateValue:i,onSelect:a}=e;i&&V(i,t,n),r&&V(r,t,n),a&&V(a,t,n),m.value=t}function E(t){let{"onUpdate:expandedKeys":n,onUpdateExpandedKeys:r,onExpandedNamesChange:i,onOpenNamesChange:a}=e;n&&V(n,t),r&&V(r,t),i&&V(i,t),a&&V(a,t),_.value=t}function ee(t){let n=Array.from(b.value),r=n.findIndex(e=>e===t);if(~r)n.splice(r,1);else{if(e.accordion&&u.value.has(t)){let e=n.findIndex(e=>u.value.has(e));e>-1&&n.splice(e,1)}n.push(t)}E(n)}let D=t=>{let n=l.value.getPath(t??g.value,{includeSelf:!1}).keyPath;if(!n.length)return;let r=Array.from(b.value),i=new Set([...r,...n]);e.accordion&&u.value.forEach(e=>{i.has(e)&&!n.includes(e)&&i.delete(e)}),E(Array.from(i))},O=T(()=>{let{inverted:t}=e,{common:{cubicBezierEaseInOut:n},self:i}=r.value,{borderRadius:a,borderColorHorizontal:o,fontSize:s,itemHeight:c,dividerColor:l}=i,u={"--n-divider-color":l,"--n-bezier":n,"--n-font-size":s,"--n-border-color-horizontal":o,"--n-border-radius":a,"--n-item-height":c};return t?(u[`--n-group-text-color`]=i.groupTextColorInverted,u[`--n-color`]=i.colorInverted,u[`--n-item-text-color`]=i.itemTextColorInverted,u[`--n-item-text-color-hover`]=i.itemTextColorHoverInverted,u[`--n-item-text-color-active`]=i.itemTextColorActiveInverted,u[`--n-item-text-color-child-active`]=i.itemTextColorChildActiveInverted,u[`--n-item-text-color-child-active-hover`]=i.itemTextColorChildActiveInverted,u[`--n-item-text-color-active-hover`]=i.itemTextColorActiveHoverInverted,u[`--n-item-icon-color`]=i.itemIconColorInverted,u[`--n-item-icon-color-hover`]=i.itemIconColorHoverInverted,u[`--n-item-icon-color-active`]=i.itemIconColorActiveInverted,u[`--n-item-icon-color-active-hover`]=i.itemIconColorActiveHoverInverted,u[`--n-item-icon-color-child-active`]=i.itemIconColorChildActiveInverted,u[`--n-item-icon-color-child-active-hover`]=i.itemIconColorChildActiveHoverInverted,u[`--n-item-icon-color-collapsed`]=i.itemIconColorCollapsedInverted,u[`--n-item-text-color-horizontal`]=i.itemTextColorHorizontalInverted,u[`--n-item-text-color-hover-horizontal`]=i.itemTextColorHoverHorizontalInverted,u[`--n-item-text-color-active-horizontal`]=i.itemTextColorActiveHorizontalInverted,u[`--n-item-text-color-child-active-horizontal`]=i.itemTextColorChildActiveHorizontalInverted,u[`--n-item-text-color-child-active-hover-horizontal`]=i.itemTextColorChildActiveHoverHorizontalInverted,u[`--n-item-text-color-active-hover-horizontal`]=i.itemTextColorActiveHoverHorizontalInverted,u[`--n-item-icon-color-horizontal`]=i.itemIconColorHorizontalInverted,u[`--n-item-icon-color-hover-horizontal`]=i.itemIconColorHoverHorizontalInverted,u[`--n-item-icon-color-active-horizontal`]=i.itemIconColorActiveHorizontalInverted,u[`--n-item-icon-color-active-hover-horizontal`]=i.itemIconColorActiveHoverHorizontalInverted,u[`--n-item-icon-color-child-active-horizontal`]=i.itemIconColorChildActiveHorizontalInverted,u[`--n-item-icon-color-child-active-hover-horizontal`]=i.itemIconColorChildActiveHoverHorizontalInverted,u[`--n-arrow-color`]=i.arrowColorInverted,u[`--n-arrow-color-hover`]=i.arrowColorHoverInverted,u[`--n-arrow-color-active`]=i.arrowColorActiveInverted,u[`--n-arrow-color-active-hover`]=i.arrowColorActiveHoverInverted,u[`--n-arrow-color-child-active`]=i.arrowColorChildActiveInverted,u[`--n-arrow-color-child-active-hover`]=i.arrowColorChildActiveHoverInverted,u[`--n-item-color-hover`]=i.itemColorHoverInverted,u[`--n-item-color-active`]=i.itemColorActiveInverted,u[`--n-item-color-active-hover`]=i.itemColorActiveHoverInverted,u[`--n-item-color-active-collapsed`]=i.itemColorActiveCollapsedInverted):(u[`--n-group-text-color`]=i.groupTextColor,u[`--n-color`]=i.color,u[`--n-item-text-color`]=i.itemTextColor,u[`--n-item-text-color-hover`]=i.itemTextColorHover,u[`--n-item-text-color-active`]=i.itemTextColorActive,u[`--n-item-text-color-child-active`]=i.itemTextColorChildActive,u[`--n-item-text-color-child-active-hover`]=i.itemTextColorChildActiveHover,u[`--n-item-text-color-active-hover`]=i.itemTextColorActiveHover,u[`--n-item-icon-color`]=i.itemIconColor,u[`--n-item-icon-color-hover`]=i.itemIconColorHover,u[`--n-item-icon-color-active`]=i.itemIconColorActive,u[`--n-item-icon-color-active-hover`]=i.itemIconColorActiveHover,u[`--n-item-icon-color-child-active`]=i.itemIconColorChildActive,u[`--n-item-icon-color-child-active-hover`]=i.itemIconColorChildActiveHover,u[`--n-item-icon-color-collapsed`]=i.itemIconColorCollapsed,u[`--n-item-text-color-horizontal`]=i.itemTextColorHorizontal,u[`--n-item-text-color-hover-horizontal`]=i.itemTextColorHoverHorizontal,u[`--n-item-text-color-active-horizontal`]=i.itemTextColorActiveHorizontal,u[`--n-item-text-color-child-active-horizontal`]=i.itemTextColorChildActiveHorizontal,u[`--n-item-text-color-child-active-hover-horizontal`]=i.itemTextColorChildActiveHoverHorizontal,u[`--n-item-text-color-active-hover-horizontal`]=i.itemTextColorActiveHoverHorizontal,u[`--n-item-icon-color-horizontal`]=i.itemIconColorHorizontal,u[`--n-item-icon-color-hover-horizontal`]=i.itemIconColorHoverHorizontal,u[`--n-item-icon-color-active-horizontal`]=i.itemIconColorActiveHorizontal,u[`--n-item-icon-color-active-hover-horizontal`]=i.itemIconColorActiveHoverHorizontal,u[`--n-item-icon-color-child-active-horizontal`]=i.itemIconColorChildActiveHorizontal,u[`--n-item-icon-color-child-active-hover-horizontal`]=i.itemIconColorChildActiveHoverHorizontal,u[`--n-arrow-color`]=i.arrowColor,u[`--n-arrow-color-hover`]=i.arrowColorHover,u[`--n-arrow-color-active`]=i.arrowColorActive,u[`--n-arrow-color-active-hover`]=i.arrowColorActiveHover,u[`--n-arrow-color-child-active`]=i.arrowColorChildActive,u[`--n-arrow-color-child-active-hover`]=i.arrowColorChildActiveHover,u[`--n-item-color-hover`]=i.itemColorHover,u[`--n-item-color-active`]=i.itemColorActive,u[`--n-item-color-active-hover`]=i.itemColorActiveHover,u[`--n-item-color-active-collapsed`]=i.itemColorActiveCollapsed),u}),k=n?i(`menu`,T(()=>e.inverted?`a`:`b`),O,e):void 0,A=De(),j=N(null),M=N(null),P=!0,F=()=>{P?P=!1:j.value?.sync({showAllItemsBeforeCalculate:!0})};function L(){return document.getElementById(A)}let z=N(-1);function te(t){z.value=e.options.length-t}function B(e){e||(z.value=-1)}let H=T(()=>{let t=z.value;return{children:t===-1?[]:e.options.slice(t)}}),U=T(()=>{let{childrenField:t,disabledField:n,keyField:r}=e;return J([H.value],{getIgnored(e){return wt(e)},getChildren(e){return e[t]},getDisabled(e){return e[n]},getKey(e){return e[r]??e.name}})}),ne=T(()=>J([{}]).treeNodes[0]);function G(){if(z.value===-1)return p(),R(Ct,{root:!0,level:0,key:`__ellpisisGroupPlaceholder__`,internalKey:`__ellpisisGroupPlaceholder__`,title:`···`,tmNode:ne.value,domId:A,isEllipsisPlaceholder:!0},null,8,[`tmNode`,`domId`]);let e=U.value.treeNodes[0],t=C.value,n=!!e.children?.some(e=>t.includes(e.key));return p(),R(Ct,{level:0,root:!0,key:`__ellpisisGroup__`,internalKey:`__ellpisisGroup__`,title:`···`,virtualChildActive:n,tmNode:e,domId:A,rawNodes:e.rawNode.children||[],tmNodes:e.children||[],isEllipsisPlaceholder:!0},null,8,[`virtualChildActive`,`tmNode`,`domId`,`rawNodes`,`tmNodes`])}return{mergedClsPrefix:t,controlledExpandedKeys:y,uncontrolledExpanededKeys:_,mergedExpandedKeys:b,uncontrolledValue:m,mergedValue:g,activePath:C,tmNodes:x,mergedTheme:r,mergedCollapsed:c,cssVars:n?void 0:O,themeClass:k?.themeClass,overflowRef:j,counterRef:M,updateCounter:()=>{},onResize:F,onUpdateOverflow:B,onUpdateCount:te,renderCounter:G,getCounter:L,onRender:k?.onRender,showOption:D,deriveResponsiveState:F}},render(){let{mergedClsPrefix:e,mode:t,themeClass:r,onRender:i}=this;i?.();let a=()=>this.tmNodes.map(e=>Et(e,this.$props)),s=t===`horizontal`&&this.responsive,c=()=>o(`div`,n(this.$attrs,{role:t===`horizontal`?`menubar`:`menu`,class:[`${e}-menu`,r,`${e}-menu--${t}`,s&&`${e}-menu--responsive`,this.mergedCollapsed&&`${e}-menu--collapsed`],style:this.cssVars}),s?(p(),R(ge,{key:2,ref:`overflowRef`,onUpdateOverflow:this.onUpdateOverflow,getCounter:this.getCounter,onUpdateCount:this.onUpdateCount,updateCounter:this.updateCounter,style:{width:`100%`,display:`flex`,overflow:`hidden`}},{default:a,counter:this.renderCounter},1032,[`onUpdateOverflow`,`getCounter`,`onUpdateCount`,`updateCounter`])):a());return s?(p(),R(ee,{key:3,onResize:this.onResize},{default:c},1032,[`onResize`])):c()}}),At=B({__name:`TeamSwitcher`,setup(e,{expose:t}){t();let n=ye(),r=q(),i=ve(),a=T(()=>n.memberships.map(e=>({label:e.teamName,value:e.teamId})));function o(e){e!==r.currentTeamId&&(r.switchTeam(e),i.success(`Now working in ${r.currentTeamName}`))}let s={session:n,team:r,message:i,options:a,onSelect:o,get NSelect(){return _e}};return Object.defineProperty(s,"__isScriptSetup",{enumerable:!1,value:!0}),s}}),jt={class:`team-switcher`},Mt={key:1,class:`name`,"data-testid":`team-name`},Nt={key:2,class:`name muted`,"data-testid":`team-name`};function Pt(e,t,n,r,i,a){return p(),x(`div`,jt,[t[0]||=y(`span`,{class:`caption`},`Team`,-1),H(` One team needs no menu; the name alone says where you are. `),r.options.length>1?(p(),R(r.NSelect,{key:0,class:`select`,size:`small`,value:r.team.currentTeamId,options:r.options,"consistent-menu-width":!1,"aria-label":`Switch team`,"data-testid":`team-name`,"onUpdate:value":r.onSelect},null,8,[`value`,`options`])):r.team.currentTeamName?(p(),x(`span`,Mt,D(r.team.currentTeamName),1)):(p(),x(`span`,Nt,`No team yet`))])}var Ft=L(At,[[`render`,Pt],[`__scopeId`,`data-v-f5afb669`],[`__file`,`/work/wt/client/src/components/app/TeamSwitcher.vue`]]),It=B({__name:`UserBadge`,setup(e,{expose:t}){t();let n=ye(),r=q(),i=Y(),a=ve(),o=T(()=>r.currentRole?Te[r.currentRole]:`No role`);async function s(){try{await n.signOut()}catch(e){a.warning(`Signed out on this device; the server did not confirm: ${e.message}`)}await i.replace(le)}let c={session:n,team:r,router:i,message:a,roleLabel:o,signOut:s,get NButton(){return Ce},get NTag(){return we},AreaIcon:Ee};return Object.defineProperty(c,"__isScriptSetup",{enumerable:!1,value:!0}),c}}),Lt={class:`user-badge`},Rt={class:`who`},zt={class:`name`,"data-testid":`user-name`};function Bt(e,t,n,i,a,o){return p(),x(`div`,Lt,[y(`div`,Rt,[y(`span`,zt,D(i.session.user?.name),1),r(i.NTag,{size:`small`,round:``,bordered:!1,type:`primary`,"data-testid":`user-role`},{default:c(()=>[m(D(i.roleLabel),1)]),_:1})]),r(i.NButton,{quaternary:``,size:`small`,"data-testid":`sign-out`,onClick:i.signOut},{icon:c(()=>[r(i.AreaIcon,{name:`signOut`})]),default:c(()=>[t[0]||=m(` Sign out `,-1)]),_:1})])}var Vt=L(It,[[`render`,Bt],[`__scopeId`,`data-v-3ea2662b`],[`__file`,`/work/wt/client/src/components/app/UserBadge.vue`]]),Ht=B({__name:`AppHeader`,setup(e,{expose:t}){t();let n={get RouterLink(){return G},get NDivider(){return Ne},get HOME_PATH(){return pe},PorelithMark:me,TeamSwitcher:Ft,ThemeToggle:he,UserBadge:Vt};return Object.defineProperty(n,"__isScriptSetup",{enumerable:!1,value:!0}),n}}),Ut={class:`app-header`};function Wt(e,t,n,i,a,o){return p(),x(`header`,Ut,[r(i.RouterLink,{to:i.HOME_PATH,class:`brand`,"aria-label":`Porelith home`},{default:c(()=>[r(i.PorelithMark,{size:28}),t[0]||=y(`span`,{class:`wordmark`},`Porelith`,-1)]),_:1},8,[`to`]),r(i.NDivider,{vertical:``,class:`divider`}),r(i.TeamSwitcher),t[1]||=y(`div`,{class:`spacer`},null,-1),r(i.ThemeToggle),r(i.UserBadge)])}var Gt=L(Ht,[[`render`,Wt],[`__scopeId`,`data-v-5b7d1c12`],[`__file`,`/work/wt/client/src/components/app/AppHeader.vue`]]),Kt=B({__name:`AppSideNav`,props:{collapsed:{type:Boolean,required:!0}},setup(e,{expose:t}){t();let n=q(),r=xe(),i=Y(),a=T(()=>fe(e=>n.can(e)));function s(e){return{key:e.key,label:()=>o(G,{to:e.path,"data-testid":`nav-${e.key}`,class:`nav-link`},()=>e.label),icon:()=>o(Ee,{name:e.key})}}let c=T(()=>{let e=a.value.filter(e=>e.section===`work`).map(s),t=a.value.filter(e=>e.section===`admin`).map(s),n=[];return e.length>0&&n.push({type:`group`,key:`work`,label:`Work`,children:e}),t.length>0&&n.push({type:`group`,key:`admin`,label:`Administration`,children:t}),n}),l=T(()=>typeof r.name==`string`?r.name:null);function u(e){let t=a.value.find(t=>t.key===e);t&&r.path!==t.path&&i.push(t.path)}let d={team:n,route:r,router:i,areas:a,toOption:s,options:c,active:l,onSelect:u,get NMenu(){return kt}};return Object.defineProperty(d,"__isScriptSetup",{enumerable:!1,value:!0}),d}}),qt={"aria-label":`Areas`},Jt={key:0,class:`empty`};function Yt(e,t,n,i,a,o){return p(),x(`nav`,qt,[r(i.NMenu,{value:i.active,options:i.options,collapsed:n.collapsed,"collapsed-width":64,"collapsed-icon-size":20,"icon-size":18,"onUpdate:value":i.onSelect},null,8,[`value`,`options`,`collapsed`]),i.areas.length===0&&!n.collapsed?(p(),x(`p`,Jt,`Your account is not in a team yet. A team admin can invite you.`)):H(`v-if`,!0)])}var Xt=L(Kt,[[`render`,Yt],[`__scopeId`,`data-v-996103ea`],[`__file`,`/work/wt/client/src/components/app/AppSideNav.vue`]]),Zt=B({__name:`SafetyNotice`,setup(e,{expose:t}){t();let n={team:q()};return Object.defineProperty(n,"__isScriptSetup",{enumerable:!1,value:!0}),n}}),Qt={class:`safety-notice`,role:`note`,"data-testid":`safety-notice`};function $t(e,t,n,r,i,a){return p(),x(`p`,Qt,[r.team.isDemoTeam?(p(),x(w,{key:0},[m(`Synthetic demo data. `)],64)):H(`v-if`,!0),t[0]||=m(`Predictions guide, they do not decide: verify with the responsible licensed engineer and local regulations. `,-1)])}var en=L(Zt,[[`render`,$t],[`__scopeId`,`data-v-6df53425`],[`__file`,`/work/wt/client/src/components/app/SafetyNotice.vue`]]),tn=B({__name:`AppShell`,setup(e,{expose:t}){t();let n=q(),r=xe(),i=Y(),a=N(!1);g(()=>n.currentTeamId,()=>{let e=r.meta.action;e&&!n.can(e)&&i.replace({path:de,query:{from:r.fullPath}})});let o={team:n,route:r,router:i,collapsed:a,get RouterView(){return ne},get NLayout(){return Be},get NLayoutFooter(){return Ue},get NLayoutHeader(){return Ke},get NLayoutSider(){return et},AppHeader:Gt,AppSideNav:Xt,SafetyNotice:en};return Object.defineProperty(o,"__isScriptSetup",{enumerable:!1,value:!0}),o}}),nn={class:`page`};function rn(e,t,n,i,a,o){return p(),R(i.NLayout,{class:`shell`,position:`absolute`},{default:c(()=>[r(i.NLayoutHeader,{bordered:``,class:`shell-header`},{default:c(()=>[r(i.AppHeader)]),_:1}),r(i.NLayout,{"has-sider":``,position:`absolute`,class:`shell-body`},{default:c(()=>[r(i.NLayoutSider,{bordered:``,"collapse-mode":`width`,"collapsed-width":64,width:224,collapsed:i.collapsed,"show-trigger":`arrow-circle`,"native-scrollbar":!1,onCollapse:t[0]||=e=>i.collapsed=!0,onExpand:t[1]||=e=>i.collapsed=!1},{default:c(()=>[r(i.AppSideNav,{collapsed:i.collapsed},null,8,[`collapsed`])]),_:1},8,[`collapsed`]),r(i.NLayout,{class:`shell-main`,"content-class":`shell-main-content`,"native-scrollbar":!0},{default:c(()=>[y(`main`,nn,[r(i.RouterView)]),r(i.NLayoutFooter,{bordered:``,class:`shell-footer`},{default:c(()=>[r(i.SafetyNotice)]),_:1})]),_:1})]),_:1})]),_:1})}var an=L(tn,[[`render`,rn],[`__scopeId`,`data-v-da516ce0`],[`__file`,`/work/wt/client/src/components/app/AppShell.vue`]]);export{an as default};