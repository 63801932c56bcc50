import{$ as e,$t as t,A as n,D as r,E as i,Gn as a,Qt as o,Rn as s,Xt as c,Yt as l,_n as u,bn as d,dt as f,en as p,gn as m,i as h,j as g,m as _,mt as v,o as y,ot as b,pr as x,rr as S,rt as C,sr as w,tn as T,vn as E,wn as D,x as O,y as k,yt as A,zn as j}from"./_plugin-vue_export-helper-C4XqT5Hd.js";import{H as M}from"./index-KegDRDt8.js";function N(e){let{textColor2:t,primaryColorHover:n,primaryColorPressed:r,primaryColor:i,infoColor:a,successColor:o,warningColor:s,errorColor:c,baseColor:l,borderColor:u,opacityDisabled:d,tagColor:f,closeIconColor:p,closeIconColorHover:m,closeIconColorPressed:h,borderRadiusSmall:_,fontSizeMini:v,fontSizeTiny:y,fontSizeSmall:b,fontSizeMedium:x,heightMini:S,heightTiny:C,heightSmall:w,heightMedium:T,closeColorHover:E,closeColorPressed:D,buttonColor2Hover:O,buttonColor2Pressed:k,fontWeightStrong:A}=e;return{...M,closeBorderRadius:_,heightTiny:S,heightSmall:C,heightMedium:w,heightLarge:T,borderRadius:_,opacityDisabled:d,fontSizeTiny:v,fontSizeSmall:y,fontSizeMedium:b,fontSizeLarge:x,fontWeightStrong:A,textColorCheckable:t,textColorHoverCheckable:t,textColorPressedCheckable:t,textColorChecked:l,colorCheckable:`#0000`,colorHoverCheckable:O,colorPressedCheckable:k,colorChecked:i,colorCheckedHover:n,colorCheckedPressed:r,border:`1px solid ${u}`,textColor:t,color:f,colorBordered:`rgb(250, 250, 252)`,closeIconColor:p,closeIconColorHover:m,closeIconColorPressed:h,closeColorHover:E,closeColorPressed:D,borderPrimary:`1px solid ${g(i,{alpha:.3})}`,textColorPrimary:i,colorPrimary:g(i,{alpha:.12}),colorBorderedPrimary:g(i,{alpha:.1}),closeIconColorPrimary:i,closeIconColorHoverPrimary:i,closeIconColorPressedPrimary:i,closeColorHoverPrimary:g(i,{alpha:.12}),closeColorPressedPrimary:g(i,{alpha:.18}),borderInfo:`1px solid ${g(a,{alpha:.3})}`,textColorInfo:a,colorInfo:g(a,{alpha:.12}),colorBorderedInfo:g(a,{alpha:.1}),closeIconColorInfo:a,closeIconColorHoverInfo:a,closeIconColorPressedInfo:a,closeColorHoverInfo:g(a,{alpha:.12}),closeColorPressedInfo:g(a,{alpha:.18}),borderSuccess:`1px solid ${g(o,{alpha:.3})}`,textColorSuccess:o,colorSuccess:g(o,{alpha:.12}),colorBorderedSuccess:g(o,{alpha:.1}),closeIconColorSuccess:o,closeIconColorHoverSuccess:o,closeIconColorPressedSuccess:o,closeColorHoverSuccess:g(o,{alpha:.12}),closeColorPressedSuccess:g(o,{alpha:.18}),borderWarning:`1px solid ${g(s,{alpha:.35})}`,textColorWarning:s,colorWarning:g(s,{alpha:.15}),colorBorderedWarning:g(s,{alpha:.12}),closeIconColorWarning:s,closeIconColorHoverWarning:s,closeIconColorPressedWarning:s,closeColorHoverWarning:g(s,{alpha:.12}),closeColorPressedWarning:g(s,{alpha:.18}),borderError:`1px solid ${g(c,{alpha:.23})}`,textColorError:c,colorError:g(c,{alpha:.1}),colorBorderedError:g(c,{alpha:.08}),closeIconColorError:c,closeIconColorHoverError:c,closeIconColorPressedError:c,closeColorHoverError:g(c,{alpha:.12}),closeColorPressedError:g(c,{alpha:.18})}}var P={name:`Tag`,common:n,self:N},F={color:Object,type:{type:String,default:`default`},round:Boolean,size:String,closable:Boolean,disabled:{type:Boolean,default:void 0}},I=c(`tag`,`
 --n-close-margin: var(--n-close-margin-top) var(--n-close-margin-right) var(--n-close-margin-bottom) var(--n-close-margin-left);
 white-space: nowrap;
 position: relative;
 box-sizing: border-box;
 cursor: default;
 display: inline-flex;
 align-items: center;
 flex-wrap: nowrap;
 padding: var(--n-padding);
 border-radius: var(--n-border-radius);
 color: var(--n-text-color);
 background-color: var(--n-color);
 transition: 
 border-color .3s var(--n-bezier),
 background-color .3s var(--n-bezier),
 color .3s var(--n-bezier),
 box-shadow .3s var(--n-bezier),
 opacity .3s var(--n-bezier);
 line-height: 1;
 height: var(--n-height);
 font-size: var(--n-font-size);
`,[t(`strong`,`
 font-weight: var(--n-font-weight-strong);
 `),o(`border`,`
 pointer-events: none;
 position: absolute;
 left: 0;
 right: 0;
 top: 0;
 bottom: 0;
 border-radius: inherit;
 border: var(--n-border);
 transition: border-color .3s var(--n-bezier);
 `),o(`icon`,`
 display: flex;
 margin: 0 4px 0 0;
 color: var(--n-text-color);
 transition: color .3s var(--n-bezier);
 font-size: var(--n-avatar-size-override);
 `),o(`avatar`,`
 display: flex;
 margin: 0 6px 0 0;
 `),o(`close`,`
 margin: var(--n-close-margin);
 transition:
 background-color .3s var(--n-bezier),
 color .3s var(--n-bezier);
 `),t(`round`,`
 padding: 0 calc(var(--n-height) / 3);
 border-radius: calc(var(--n-height) / 2);
 `,[o(`icon`,`
 margin: 0 4px 0 calc((var(--n-height) - 8px) / -2);
 `),o(`avatar`,`
 margin: 0 6px 0 calc((var(--n-height) - 8px) / -2);
 `),t(`closable`,`
 padding: 0 calc(var(--n-height) / 4) 0 calc(var(--n-height) / 3);
 `)]),t(`icon, avatar`,[t(`round`,`
 padding: 0 calc(var(--n-height) / 3) 0 calc(var(--n-height) / 2);
 `)]),t(`disabled`,`
 cursor: not-allowed !important;
 opacity: var(--n-opacity-disabled);
 `),t(`checkable`,`
 cursor: pointer;
 box-shadow: none;
 color: var(--n-text-color-checkable);
 background-color: var(--n-color-checkable);
 `,[p(`disabled`,[l(`&:hover`,`background-color: var(--n-color-hover-checkable);`,[p(`checked`,`color: var(--n-text-color-hover-checkable);`)]),l(`&:active`,`background-color: var(--n-color-pressed-checkable);`,[p(`checked`,`color: var(--n-text-color-pressed-checkable);`)])]),t(`checked`,`
 color: var(--n-text-color-checked);
 background-color: var(--n-color-checked);
 `,[p(`disabled`,[l(`&:hover`,`background-color: var(--n-color-checked-hover);`),l(`&:active`,`background-color: var(--n-color-checked-pressed);`)])])])]),L=[`onClick`,`onMouseenter`,`onMouseleave`],R={...i.props,...F,bordered:{type:Boolean,default:void 0},checked:Boolean,checkable:Boolean,strong:Boolean,triggerClickOnClose:Boolean,onClose:[Array,Function],onMouseenter:Function,onMouseleave:Function,"onUpdate:checked":Function,onUpdateChecked:Function,internalCloseFocusable:{type:Boolean,default:!0},internalCloseIsButtonTag:{type:Boolean,default:!0},onCheckedChange:Function},z=v(`n-tag`),B=D({name:`Tag`,props:R,slots:Object,setup(t){a(()=>{t.onCheckedChange!==void 0&&A(`tag`,"`on-checked-change` is deprecated, please use `on-update:checked` instead")});let n=S(null),{mergedBorderedRef:o,mergedClsPrefixRef:s,inlineThemeDisabled:c,mergedRtlRef:l,mergedComponentPropsRef:u}=f(t),d=m(()=>t.size||u?.value?.Tag?.size||`medium`),p=i(`Tag`,`-tag`,I,P,t,s);j(z,{roundRef:w(t,`round`)});function h(){if(!t.disabled&&t.checkable){let{checked:e,onCheckedChange:n,onUpdateChecked:r,"onUpdate:checked":i}=t;r&&r(!e),i&&i(!e),n&&n(!e)}}function g(e){if(t.triggerClickOnClose||e.stopPropagation(),!t.disabled){let{onClose:n}=t;n&&O(n,e)}}let v={setTextContent(e){let{value:t}=n;t&&(t.textContent=e)}},b=_(`Tag`,l,s),x=m(()=>{let{type:n,color:{color:r,textColor:i}={}}=t,a=d.value,{common:{cubicBezierEaseInOut:s},self:{padding:c,closeMargin:l,borderRadius:u,opacityDisabled:f,textColorCheckable:m,textColorHoverCheckable:h,textColorPressedCheckable:g,textColorChecked:_,colorCheckable:v,colorHoverCheckable:y,colorPressedCheckable:b,colorChecked:x,colorCheckedHover:S,colorCheckedPressed:C,closeBorderRadius:w,fontWeightStrong:E,[T(`colorBordered`,n)]:D,[T(`closeSize`,a)]:O,[T(`closeIconSize`,a)]:k,[T(`fontSize`,a)]:A,[T(`height`,a)]:j,[T(`color`,n)]:M,[T(`textColor`,n)]:N,[T(`border`,n)]:P,[T(`closeIconColor`,n)]:F,[T(`closeIconColorHover`,n)]:I,[T(`closeIconColorPressed`,n)]:L,[T(`closeColorHover`,n)]:R,[T(`closeColorPressed`,n)]:z}}=p.value,B=e(l);return{"--n-font-weight-strong":E,"--n-avatar-size-override":`calc(${j} - 8px)`,"--n-bezier":s,"--n-border-radius":u,"--n-border":P,"--n-close-icon-size":k,"--n-close-color-pressed":z,"--n-close-color-hover":R,"--n-close-border-radius":w,"--n-close-icon-color":F,"--n-close-icon-color-hover":I,"--n-close-icon-color-pressed":L,"--n-close-icon-color-disabled":F,"--n-close-margin-top":B.top,"--n-close-margin-right":B.right,"--n-close-margin-bottom":B.bottom,"--n-close-margin-left":B.left,"--n-close-size":O,"--n-color":r||(o.value?D:M),"--n-color-checkable":v,"--n-color-checked":x,"--n-color-checked-hover":S,"--n-color-checked-pressed":C,"--n-color-hover-checkable":y,"--n-color-pressed-checkable":b,"--n-font-size":A,"--n-height":j,"--n-opacity-disabled":f,"--n-padding":c,"--n-text-color":i||N,"--n-text-color-checkable":m,"--n-text-color-checked":_,"--n-text-color-hover-checkable":h,"--n-text-color-pressed-checkable":g}}),C=c?r(`tag`,m(()=>{let e=``,{type:n,color:{color:r,textColor:i}={}}=t;return e+=n[0],e+=d.value[0],r&&(e+=`a${y(r)}`),i&&(e+=`b${y(i)}`),o.value&&(e+=`c`),e}),x,t):void 0;return{...v,rtlEnabled:b,mergedClsPrefix:s,contentRef:n,mergedBordered:o,handleClick:h,handleCloseClick:g,cssVars:c?void 0:x,themeClass:C?.themeClass,onRender:C?.onRender}},render(){let{mergedClsPrefix:e,rtlEnabled:t,closable:n,color:{borderColor:r}={},round:i,onRender:a,$slots:o}=this;a?.();let c=k(o.avatar,t=>t&&(s(),d(`div`,{class:C(`${e}-tag__avatar`)},[b(()=>t)],2))),l=k(o.icon,t=>t&&(s(),d(`div`,{class:C(`${e}-tag__icon`)},[b(()=>t)],2)));return s(),d(`div`,{class:C([`${e}-tag`,this.themeClass,{[`${e}-tag--rtl`]:t,[`${e}-tag--strong`]:this.strong,[`${e}-tag--disabled`]:this.disabled,[`${e}-tag--checkable`]:this.checkable,[`${e}-tag--checked`]:this.checkable&&this.checked,[`${e}-tag--round`]:i,[`${e}-tag--avatar`]:c,[`${e}-tag--icon`]:l,[`${e}-tag--closable`]:n}]),style:x(this.cssVars),onClick:this.handleClick,onMouseenter:this.onMouseenter,onMouseleave:this.onMouseleave},[b(()=>l||c),u(`span`,{class:C(`${e}-tag__content`),ref:`contentRef`},[b(()=>this.$slots.default?.())],2),!this.checkable&&n?(s(),E(h,{key:0,clsPrefix:e,class:C(`${e}-tag__close`),disabled:this.disabled,onClick:this.handleCloseClick,focusable:this.internalCloseFocusable,round:i,isButtonTag:this.internalCloseIsButtonTag,absolute:!0},null,8,[`clsPrefix`,`class`,`disabled`,`onClick`,`focusable`,`round`,`isButtonTag`])):b(()=>null),!this.checkable&&this.mergedBordered?(s(),d(`div`,{key:2,class:C(`${e}-tag__border`),style:x({borderColor:r})},null,6)):b(()=>null)],46,L)}});export{B as t};