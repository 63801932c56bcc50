import{$t as e,A as t,An as n,D as r,E as i,Gn as a,Qt as o,Rn as s,Xt as c,Yt as l,Z as u,_n as d,bn as f,dt as p,en as m,et as h,g,gn as _,j as v,ot as y,pr as b,rr as x,rt as S,sr as C,tn as w,vn as T,wn as E,x as D,y as O,yt as k}from"./_plugin-vue_export-helper-C4XqT5Hd.js";import{f as A,l as j,s as M,u as N}from"./Button-CqYvzYpP.js";import{f as P}from"./index-KegDRDt8.js";import{m as F}from"./Suffix-CEyhj_Z0.js";function I(e){let{primaryColor:t,opacityDisabled:n,borderRadius:r,textColor3:i}=e;return{...P,iconColor:i,textColor:`white`,loadingColor:t,opacityDisabled:n,railColor:`rgba(0, 0, 0, .14)`,railColorActive:t,buttonBoxShadow:`0 1px 4px 0 rgba(0, 0, 0, 0.3), inset 0 0 1px 0 rgba(0, 0, 0, 0.05)`,buttonColor:`#FFF`,railBorderRadiusSmall:r,railBorderRadiusMedium:r,railBorderRadiusLarge:r,buttonBorderRadiusSmall:r,buttonBorderRadiusMedium:r,buttonBorderRadiusLarge:r,boxShadowFocus:`0 0 0 2px ${v(t,{alpha:.2})}`}}var L={name:`Switch`,common:t,self:I},R=c(`switch`,`
 height: var(--n-height);
 min-width: var(--n-width);
 vertical-align: middle;
 user-select: none;
 -webkit-user-select: none;
 display: inline-flex;
 outline: none;
 justify-content: center;
 align-items: center;
`,[o(`children-placeholder`,`
 height: var(--n-rail-height);
 display: flex;
 flex-direction: column;
 overflow: hidden;
 pointer-events: none;
 visibility: hidden;
 `),o(`rail-placeholder`,`
 display: flex;
 flex-wrap: none;
 `),o(`button-placeholder`,`
 width: calc(1.75 * var(--n-rail-height));
 height: var(--n-rail-height);
 `),c(`base-loading`,`
 position: absolute;
 top: 50%;
 left: 50%;
 transform: translateX(-50%) translateY(-50%);
 font-size: calc(var(--n-button-width) - 4px);
 color: var(--n-loading-color);
 transition: color .3s var(--n-bezier);
 `,[j({left:`50%`,top:`50%`,originalTransform:`translateX(-50%) translateY(-50%)`})]),o(`checked, unchecked`,`
 transition: color .3s var(--n-bezier);
 color: var(--n-text-color);
 box-sizing: border-box;
 position: absolute;
 white-space: nowrap;
 top: 0;
 bottom: 0;
 display: flex;
 align-items: center;
 line-height: 1;
 `),o(`checked`,`
 right: 0;
 padding-right: calc(1.25 * var(--n-rail-height) - var(--n-offset));
 `),o(`unchecked`,`
 left: 0;
 justify-content: flex-end;
 padding-left: calc(1.25 * var(--n-rail-height) - var(--n-offset));
 `),l(`&:focus`,[o(`rail`,`
 box-shadow: var(--n-box-shadow-focus);
 `)]),e(`round`,[o(`rail`,`border-radius: calc(var(--n-rail-height) / 2);`,[o(`button`,`border-radius: calc(var(--n-button-height) / 2);`)])]),m(`disabled`,[m(`icon`,[e(`rubber-band`,[e(`pressed`,[o(`rail`,[o(`button`,`max-width: var(--n-button-width-pressed);`)])]),o(`rail`,[l(`&:active`,[o(`button`,`max-width: var(--n-button-width-pressed);`)])]),e(`active`,[e(`pressed`,[o(`rail`,[o(`button`,`left: calc(100% - var(--n-offset) - var(--n-button-width-pressed));`)])]),o(`rail`,[l(`&:active`,[o(`button`,`left: calc(100% - var(--n-offset) - var(--n-button-width-pressed));`)])])])])])]),e(`active`,[o(`rail`,[o(`button`,`left: calc(100% - var(--n-button-width) - var(--n-offset))`)])]),o(`rail`,`
 overflow: hidden;
 height: var(--n-rail-height);
 min-width: var(--n-rail-width);
 border-radius: var(--n-rail-border-radius);
 cursor: pointer;
 position: relative;
 transition:
 opacity .3s var(--n-bezier),
 background .3s var(--n-bezier),
 box-shadow .3s var(--n-bezier);
 background-color: var(--n-rail-color);
 `,[o(`button-icon`,`
 color: var(--n-icon-color);
 transition: color .3s var(--n-bezier);
 font-size: calc(var(--n-button-height) - 4px);
 position: absolute;
 left: 0;
 right: 0;
 top: 0;
 bottom: 0;
 display: flex;
 justify-content: center;
 align-items: center;
 line-height: 1;
 `,[j()]),o(`button`,`
 align-items: center; 
 top: var(--n-offset);
 left: var(--n-offset);
 height: var(--n-button-height);
 width: var(--n-button-width-pressed);
 max-width: var(--n-button-width);
 border-radius: var(--n-button-border-radius);
 background-color: var(--n-button-color);
 box-shadow: var(--n-button-box-shadow);
 box-sizing: border-box;
 cursor: inherit;
 content: "";
 position: absolute;
 transition:
 background-color .3s var(--n-bezier),
 left .3s var(--n-bezier),
 opacity .3s var(--n-bezier),
 max-width .3s var(--n-bezier),
 box-shadow .3s var(--n-bezier);
 `)]),e(`active`,[o(`rail`,`background-color: var(--n-rail-color-active);`)]),e(`loading`,[o(`rail`,`
 cursor: wait;
 `)]),e(`disabled`,[o(`rail`,`
 cursor: not-allowed;
 opacity: .5;
 `)])]),z=[`aria-checked`,`tabindex`,`onClick`,`onFocus`,`onBlur`,`onKeyup`,`onKeydown`],B={...i.props,size:String,value:{type:[String,Number,Boolean],default:void 0},loading:Boolean,defaultValue:{type:[String,Number,Boolean],default:!1},disabled:{type:Boolean,default:void 0},round:{type:Boolean,default:!0},"onUpdate:value":[Function,Array],onUpdateValue:[Function,Array],checkedValue:{type:[String,Number,Boolean],default:!0},uncheckedValue:{type:[String,Number,Boolean],default:!1},railStyle:Function,rubberBand:{type:Boolean,default:!0},spinProps:Object,onChange:[Function,Array]},V,H=E({name:`Switch`,props:B,slots:Object,setup(e){a(()=>{e.onChange&&k(`switch`,"`on-change` is deprecated, please use `on-update:value` instead.")}),V===void 0&&(V=typeof CSS<`u`?CSS.supports!==void 0&&CSS.supports(`width`,`max(1px)`):!0);let{mergedClsPrefixRef:t,inlineThemeDisabled:n,mergedComponentPropsRef:o}=p(e),s=i(`Switch`,`-switch`,R,L,e,t),c=A(e,{mergedSize(t){return e.size===void 0?t?t.mergedSize.value:o?.value?.Switch?.size||`medium`:e.size}}),{mergedSizeRef:l,mergedDisabledRef:d}=c,f=x(e.defaultValue),m=C(e,`value`),g=F(m,f),v=_(()=>g.value===e.checkedValue),y=x(!1),b=x(!1),S=_(()=>{let{railStyle:t}=e;if(t)return t({focused:b.value,checked:v.value})});function T(t){let{"onUpdate:value":n,onChange:r,onUpdateValue:i}=e,{nTriggerFormInput:a,nTriggerFormChange:o}=c;n&&D(n,t),i&&D(i,t),r&&D(r,t),f.value=t,a(),o()}function E(){let{nTriggerFormFocus:e}=c;e()}function O(){let{nTriggerFormBlur:e}=c;e()}function j(){e.loading||d.value||(g.value===e.checkedValue?T(e.uncheckedValue):T(e.checkedValue))}function M(){b.value=!0,E()}function N(){b.value=!1,O(),y.value=!1}function P(t){e.loading||d.value||t.key===` `&&(g.value===e.checkedValue?T(e.uncheckedValue):T(e.checkedValue),y.value=!1)}function I(t){e.loading||d.value||t.key===` `&&(t.preventDefault(),y.value=!0)}let z=_(()=>{let{value:e}=l,{self:{opacityDisabled:t,railColor:n,railColorActive:r,buttonBoxShadow:i,buttonColor:a,boxShadowFocus:o,loadingColor:c,textColor:d,iconColor:f,[w(`buttonHeight`,e)]:p,[w(`buttonWidth`,e)]:m,[w(`buttonWidthPressed`,e)]:g,[w(`railHeight`,e)]:_,[w(`railWidth`,e)]:v,[w(`railBorderRadius`,e)]:y,[w(`buttonBorderRadius`,e)]:b},common:{cubicBezierEaseInOut:x}}=s.value,S,C,T;return V?(S=`calc((${_} - ${p}) / 2)`,C=`max(${_}, ${p})`,T=`max(${v}, calc(${v} + ${p} - ${_}))`):(S=h((u(_)-u(p))/2),C=h(Math.max(u(_),u(p))),T=u(_)>u(p)?v:h(u(v)+u(p)-u(_))),{"--n-bezier":x,"--n-button-border-radius":b,"--n-button-box-shadow":i,"--n-button-color":a,"--n-button-width":m,"--n-button-width-pressed":g,"--n-button-height":p,"--n-height":C,"--n-offset":S,"--n-opacity-disabled":t,"--n-rail-border-radius":y,"--n-rail-color":n,"--n-rail-color-active":r,"--n-rail-height":_,"--n-rail-width":v,"--n-width":T,"--n-box-shadow-focus":o,"--n-loading-color":c,"--n-text-color":d,"--n-icon-color":f}}),B=n?r(`switch`,_(()=>l.value[0]),z,e):void 0;return{handleClick:j,handleBlur:N,handleFocus:M,handleKeyup:P,handleKeydown:I,mergedRailStyle:S,pressed:y,mergedClsPrefix:t,mergedValue:g,checked:v,mergedDisabled:d,cssVars:n?void 0:z,themeClass:B?.themeClass,onRender:B?.onRender}},render(){let{mergedClsPrefix:e,mergedDisabled:t,checked:r,mergedRailStyle:i,onRender:a,$slots:o}=this;a?.();let{checked:c,unchecked:l,icon:u,"checked-icon":p,"unchecked-icon":m}=o,h=!(g(u)&&g(p)&&g(m));return s(),f(`div`,{role:`switch`,"aria-checked":r,class:S([`${e}-switch`,this.themeClass,h&&`${e}-switch--icon`,r&&`${e}-switch--active`,t&&`${e}-switch--disabled`,this.round&&`${e}-switch--round`,this.loading&&`${e}-switch--loading`,this.pressed&&`${e}-switch--pressed`,this.rubberBand&&`${e}-switch--rubber-band`]),tabindex:this.mergedDisabled?void 0:0,style:b(this.cssVars),onClick:this.handleClick,onFocus:this.handleFocus,onBlur:this.handleBlur,onKeyup:this.handleKeyup,onKeydown:this.handleKeydown},[d(`div`,{class:S(`${e}-switch__rail`),"aria-hidden":`true`,style:b(i)},[y(()=>O(c,t=>O(l,n=>t||n?(s(),f(`div`,{key:4,"aria-hidden":!0,class:S(`${e}-switch__children-placeholder`)},[d(`div`,{class:S(`${e}-switch__rail-placeholder`)},[d(`div`,{class:S(`${e}-switch__button-placeholder`)},null,2),y(()=>t)],2),d(`div`,{class:S(`${e}-switch__rail-placeholder`)},[d(`div`,{class:S(`${e}-switch__button-placeholder`)},null,2),y(()=>n)],2)],2)):null))),d(`div`,{class:S(`${e}-switch__button`)},[y(()=>O(u,t=>O(p,r=>O(m,i=>(s(),T(N,null,{default:()=>this.loading?(s(),T(M,n({key:`loading`,clsPrefix:e,strokeWidth:20},this.spinProps),null,16,[`clsPrefix`])):this.checked&&(r||t)?(s(),f(`div`,{class:S(`${e}-switch__button-icon`),key:r?`checked-icon`:`icon`},[y(()=>r||t)],2)):!this.checked&&(i||t)?(s(),f(`div`,{class:S(`${e}-switch__button-icon`),key:i?`unchecked-icon`:`icon`},[y(()=>i||t)],2)):null},1024)))))),y(()=>O(c,t=>t&&(s(),f(`div`,{key:`checked`,class:S(`${e}-switch__checked`)},[y(()=>t)],2)))),y(()=>O(l,t=>t&&(s(),f(`div`,{key:`unchecked`,class:S(`${e}-switch__unchecked`)},[y(()=>t)],2))))],2)],6)],46,z)}});export{H as t};