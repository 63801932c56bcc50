import{$t as e,An as t,C as n,D as r,E as i,En as a,Nn as o,On as s,Pn as c,Qt as l,Rn as u,S as d,Wn as f,Xt as p,Yt as m,_n as h,bn as g,c as _,dt as v,en as y,fn as b,gn as x,it as S,mt as C,nr as w,nt as T,on as E,ot as D,rr as O,rt as k,sr as A,tn as j,tr as M,vn as N,vt as P,wn as F,x as I,zn as L}from"./_plugin-vue_export-helper-C4XqT5Hd.js";import{C as R,D as z,_ as ee,a as te,t as ne,w as re,x as ie}from"./light-B367S0Uq.js";import{a as B,d as ae,f as oe,i as se,m as ce,o as le,s as ue,u as de}from"./Suffix-CEyhj_Z0.js";import{F as fe,I as V}from"./index-KegDRDt8.js";import{i as pe,l as H}from"./Select-IgK-wPm1.js";import{h as U}from"./Button-CqYvzYpP.js";function me(e={},t){let r=M({ctrl:!1,command:!1,win:!1,shift:!1,tab:!1}),{keydown:i,keyup:a}=e,s=e=>{switch(e.key){case`Control`:r.ctrl=!0;break;case`Meta`:r.command=!0,r.win=!0;break;case`Shift`:r.shift=!0;break;case`Tab`:r.tab=!0}i!==void 0&&Object.keys(i).forEach(t=>{if(t!==e.key)return;let n=i[t];if(typeof n==`function`)n(e);else{let{stop:t=!1,prevent:r=!1}=n;t&&e.stopPropagation(),r&&e.preventDefault(),n.handler(e)}})},l=e=>{switch(e.key){case`Control`:r.ctrl=!1;break;case`Meta`:r.command=!1,r.win=!1;break;case`Shift`:r.shift=!1;break;case`Tab`:r.tab=!1}a!==void 0&&Object.keys(a).forEach(t=>{if(t!==e.key)return;let n=a[t];if(typeof n==`function`)n(e);else{let{stop:t=!1,prevent:r=!1}=n;t&&e.stopPropagation(),r&&e.preventDefault(),n.handler(e)}})},u=()=>{(t===void 0||t.value)&&(n(`keydown`,document,s),n(`keyup`,document,l)),t!==void 0&&f(t,e=>{e?(n(`keydown`,document,s),n(`keyup`,document,l)):(d(`keydown`,document,s),d(`keyup`,document,l))})};return ie()?(o(u),c(()=>{(t===void 0||t.value)&&(d(`keydown`,document,s),d(`keyup`,document,l))})):u(),w(r)}var W=F({name:`ChevronRight`,render(){return(()=>{let e=T(`6ab04425f4fcb756`);return e[0]||=h(`svg`,{viewBox:`0 0 16 16`,fill:`none`,xmlns:`http://www.w3.org/2000/svg`},[h(`path`,{d:`M5.64645 3.14645C5.45118 3.34171 5.45118 3.65829 5.64645 3.85355L9.79289 8L5.64645 12.1464C5.45118 12.3417 5.45118 12.6583 5.64645 12.8536C5.84171 13.0488 6.15829 13.0488 6.35355 12.8536L10.8536 8.35355C11.0488 8.15829 11.0488 7.84171 10.8536 7.64645L6.35355 3.14645C6.15829 2.95118 5.84171 2.95118 5.64645 3.14645Z`,fill:`currentColor`})],-1)})()}});function G(e){return t=>{e.value=t?t.$el:null}}var he=p(`icon`,`
 height: 1em;
 width: 1em;
 line-height: 1em;
 text-align: center;
 display: inline-block;
 position: relative;
 fill: currentColor;
`,[e(`color-transition`,{transition:`color .3s var(--n-bezier)`}),e(`depth`,{color:`var(--n-color)`},[m(`svg`,{opacity:`var(--n-opacity)`,transition:`opacity .3s var(--n-bezier)`})]),m(`svg`,{height:`1em`,width:`1em`})]),ge={...i.props,depth:[String,Number],size:[Number,String],color:String,component:[Object,Function]},_e=F({_n_icon__:!0,name:`Icon`,inheritAttrs:!1,props:ge,setup(e){let{mergedClsPrefixRef:t,inlineThemeDisabled:n}=v(e),a=i(`Icon`,`-icon`,he,ne,e,t),o=x(()=>{let{depth:t}=e,{common:{cubicBezierEaseInOut:n},self:r}=a.value;if(t!==void 0){let{color:e,[`opacity${t}Depth`]:i}=r;return{"--n-bezier":n,"--n-color":e,"--n-opacity":i}}return{"--n-bezier":n,"--n-color":``,"--n-opacity":``}}),s=n?r(`icon`,x(()=>`${e.depth||`d`}`),o,e):void 0;return{mergedClsPrefix:t,mergedStyle:x(()=>{let{size:t,color:n}=e;return{fontSize:oe(t),color:n}}),cssVars:n?void 0:o,themeClass:s?.themeClass,onRender:s?.onRender}},render(){let{$parent:e,depth:n,mergedClsPrefix:r,component:i,onRender:o,themeClass:s}=this;return e?.$options?._n_icon__&&P(`icon`,"don't wrap `n-icon` inside `n-icon`"),o?.(),a(`i`,t(this.$attrs,{role:`img`,class:[`${r}-icon`,s,{[`${r}-icon--depth`]:n,[`${r}-icon--color-transition`]:n!==void 0}],style:[this.cssVars,this.mergedStyle]}),i?a(i):this.$slots.default?.())}}),K=C(`n-dropdown-menu`),q=C(`n-dropdown`),J=C(`n-dropdown-option`),Y=F({name:`DropdownDivider`,props:{clsPrefix:{type:String,required:!0}},render(){return u(),g(`div`,{class:k(`${this.clsPrefix}-dropdown-divider`)},null,2)}});function X(e,t){return e.type===`submenu`||e.type===void 0&&e[t]!==void 0}function ve(e){return e.type===`group`}function Z(e){return e.type===`divider`}function ye(e){return e.type===`render`}function be(e,t,n){if(!t)return e;let r=O(e.value),i=null;return f(e,e=>{i!==null&&window.clearTimeout(i),e===!0?n&&!n.value?r.value=!0:i=window.setTimeout(()=>{r.value=!0},t):r.value=!1}),r}var Q=F({name:`DropdownOption`,props:{clsPrefix:{type:String,required:!0},tmNode:{type:Object,required:!0},parentKey:{type:[String,Number],default:null},placement:{type:String,default:`right-start`},props:Object,scrollable:Boolean},setup(e){let t=s(q),{hoverKeyRef:n,keyboardKeyRef:r,lastToggledSubmenuKeyRef:i,pendingKeyPathRef:a,activeKeyPathRef:o,animatedRef:c,mergedShowRef:l,renderLabelRef:u,renderIconRef:d,labelFieldRef:f,childrenFieldRef:p,renderOptionRef:m,nodePropsRef:h,menuPropsRef:g}=t,_=s(J,null),v=s(K),y=s(R),b=x(()=>e.tmNode.rawNode),S=x(()=>{let{value:t}=p;return X(e.tmNode.rawNode,t)}),C=x(()=>{let{disabled:t}=e.tmNode;return t}),w=be(x(()=>{if(!S.value)return!1;let{key:t,disabled:o}=e.tmNode;if(o)return!1;let{value:s}=n,{value:c}=r,{value:l}=i,{value:u}=a;return s===null?c===null?l!==null&&u.includes(t):u.includes(t)&&u[u.length-1]!==t:u.includes(t)}),300,x(()=>r.value===null&&!c.value)),T=x(()=>!!_?.enteringSubmenuRef.value),E=O(!1);L(J,{enteringSubmenuRef:E});function D(){E.value=!0}function k(){E.value=!1}function A(){let{parentKey:t,tmNode:a}=e;a.disabled||l.value&&(i.value=t,r.value=null,n.value=a.key)}function j(){let{tmNode:t}=e;t.disabled||l.value&&n.value!==t.key&&A()}function M(t){if(e.tmNode.disabled||!l.value)return;let{relatedTarget:r}=t;r&&!H({target:r},`dropdownOption`)&&!H({target:r},`scrollbarRail`)&&(n.value=null)}function N(){let{value:n}=S,{tmNode:r}=e;l.value&&!n&&!r.disabled&&(t.doSelect(r.key,r.rawNode),t.doUpdateShow(!1))}return{labelField:f,renderLabel:u,renderIcon:d,siblingHasIcon:v.showIconRef,siblingHasSubmenu:v.hasSubmenuRef,menuProps:g,popoverBody:y,animated:c,mergedShowSubmenu:x(()=>w.value&&!T.value),rawNode:b,hasSubmenu:S,pending:U(()=>{let{value:t}=a,{key:n}=e.tmNode;return t.includes(n)}),childActive:U(()=>{let{value:t}=o,{key:n}=e.tmNode,r=t.findIndex(e=>n===e);return r!==-1&&r<t.length-1}),active:U(()=>{let{value:t}=o,{key:n}=e.tmNode,r=t.findIndex(e=>n===e);return r!==-1&&r===t.length-1}),mergedDisabled:C,renderOption:m,nodeProps:h,handleClick:N,handleMouseMove:j,handleMouseEnter:A,handleMouseLeave:M,handleSubmenuBeforeEnter:D,handleSubmenuAfterEnter:k}},render(){let{animated:e,rawNode:n,mergedShowSubmenu:r,clsPrefix:i,siblingHasIcon:o,siblingHasSubmenu:s,renderLabel:c,renderIcon:l,renderOption:d,nodeProps:f,props:p,scrollable:m}=this,h=null;if(r){let e=this.menuProps?.(n,n.children);h=(n=>(u(),N($,t({key:1},e,{clsPrefix:i,scrollable:this.scrollable,tmNodes:this.tmNode.children,parentKey:this.tmNode.key}),null,16,[`clsPrefix`,`scrollable`,`tmNodes`,`parentKey`])))(h)}let _={class:[`${i}-dropdown-option-body`,this.pending&&`${i}-dropdown-option-body--pending`,this.active&&`${i}-dropdown-option-body--active`,this.childActive&&`${i}-dropdown-option-body--child-active`,this.mergedDisabled&&`${i}-dropdown-option-body--disabled`],onMousemove:this.handleMouseMove,onMouseenter:this.handleMouseEnter,onMouseleave:this.handleMouseLeave,onClick:this.handleClick},v=f?.(n),y=(u(),g(`div`,t({class:[`${i}-dropdown-option`,v?.class],"data-dropdown-option":!0},v),[D(()=>a(`div`,t(_,p),[(u(),g(`div`,{class:k([`${i}-dropdown-option-body__prefix`,o&&`${i}-dropdown-option-body__prefix--show-icon`])},[D(()=>[l?l(n):V(n.icon)])],2)),(u(),g(`div`,{"data-dropdown-option":!0,class:k(`${i}-dropdown-option-body__label`)},[c?(u(),g(b,{key:0},[D(()=>c(n))],64)):(u(),g(b,{key:1},[D(()=>V(n[this.labelField]??n.title))],64))],2)),(u(),g(`div`,{"data-dropdown-option":!0,class:k([`${i}-dropdown-option-body__suffix`,s&&`${i}-dropdown-option-body__suffix--has-submenu`])},[this.hasSubmenu?(u(),N(_e,{key:0},{_:1,default:S(()=>(u(),N(W)))})):D(()=>null)],2))])),this.hasSubmenu?(u(),N(ae,{key:0},{default:()=>[(u(),N(de,null,{default:()=>(u(),g(`div`,{class:k(`${i}-dropdown-offset-container`)},[(u(),N(ue,{show:this.mergedShowSubmenu,placement:this.placement,to:m&&this.popoverBody||void 0,teleportDisabled:!m},{default:()=>(u(),g(`div`,{class:k(`${i}-dropdown-menu-wrapper`)},[e?(u(),N(E,{key:0,onBeforeEnter:this.handleSubmenuBeforeEnter,onAfterEnter:this.handleSubmenuAfterEnter,name:`fade-in-scale-up-transition`,appear:!0},{default:()=>h},1032,[`onBeforeEnter`,`onAfterEnter`])):(u(),g(b,{key:1},[D(()=>h)],64))],2))},1032,[`show`,`placement`,`to`,`teleportDisabled`]))],2))},1024))]},1024)):D(()=>null)],16));return d?d({node:y,option:n}):y}}),xe=F({name:`DropdownGroupHeader`,props:{clsPrefix:{type:String,required:!0},tmNode:{type:Object,required:!0}},setup(){let{showIconRef:e,hasSubmenuRef:t}=s(K),{renderLabelRef:n,labelFieldRef:r,nodePropsRef:i,renderOptionRef:a}=s(q);return{labelField:r,showIcon:e,hasSubmenu:t,renderLabel:n,nodeProps:i,renderOption:a}},render(){let{clsPrefix:e,hasSubmenu:n,showIcon:r,nodeProps:i,renderLabel:a,renderOption:o}=this,{rawNode:s}=this.tmNode,c=(u(),g(`div`,t({class:`${e}-dropdown-option`},i?.(s)),[h(`div`,{class:k(`${e}-dropdown-option-body ${e}-dropdown-option-body--group`)},[h(`div`,{"data-dropdown-option":!0,class:k([`${e}-dropdown-option-body__prefix`,r&&`${e}-dropdown-option-body__prefix--show-icon`])},[D(()=>V(s.icon))],2),h(`div`,{class:k(`${e}-dropdown-option-body__label`),"data-dropdown-option":!0},[a?(u(),g(b,{key:0},[D(()=>a(s))],64)):(u(),g(b,{key:1},[D(()=>V(s.title??s[this.labelField]))],64))],2),h(`div`,{class:k([`${e}-dropdown-option-body__suffix`,n&&`${e}-dropdown-option-body__suffix--has-submenu`]),"data-dropdown-option":!0},null,2)],2)],16));return o?o({node:c,option:s}):c}}),Se=F({name:`NDropdownGroup`,props:{clsPrefix:{type:String,required:!0},tmNode:{type:Object,required:!0},parentKey:{type:[String,Number],default:null}},render(){let{tmNode:e,parentKey:t,clsPrefix:n}=this,{children:r}=e;return u(),g(b,null,[(u(),N(xe,{clsPrefix:n,tmNode:e,key:e.key},null,8,[`clsPrefix`,`tmNode`])),D(()=>r?.map(e=>{let{rawNode:r}=e;return r.show===!1?null:Z(r)?a(Y,{clsPrefix:n,key:e.key}):e.isGroup?(P(`dropdown`,"`group` node is not allowed to be put in `group` node."),null):(u(),N(Q,{clsPrefix:n,tmNode:e,parentKey:t,key:e.key},null,8,[`clsPrefix`,`tmNode`,`parentKey`]))}))],64)}}),Ce=F({name:`DropdownRenderOption`,props:{tmNode:{type:Object,required:!0}},render(){let{rawNode:{render:e,props:t}}=this.tmNode;return a(`div`,t,[e?.()])}}),$=F({name:`DropdownMenu`,props:{scrollable:Boolean,showArrow:Boolean,arrowStyle:[String,Object],clsPrefix:{type:String,required:!0},tmNodes:{type:Array,default:()=>[]},parentKey:{type:[String,Number],default:null}},setup(e){let{renderIconRef:t,childrenFieldRef:n}=s(q);L(K,{showIconRef:x(()=>{let n=t.value;return e.tmNodes.some(e=>{if(e.isGroup)return e.children?.some(({rawNode:e})=>n?n(e):e.icon);let{rawNode:t}=e;return n?n(t):t.icon})}),hasSubmenuRef:x(()=>{let{value:t}=n;return e.tmNodes.some(e=>{if(e.isGroup)return e.children?.some(({rawNode:e})=>X(e,t));let{rawNode:n}=e;return X(n,t)})})});let r=O(null);return L(re,null),L(z,null),L(R,r),{bodyRef:r}},render(){let{parentKey:e,clsPrefix:t,scrollable:n}=this,r=this.tmNodes.map(r=>{let{rawNode:i}=r;return i.show===!1?null:ye(i)?(u(),N(Ce,{tmNode:r,key:r.key},null,8,[`tmNode`])):Z(i)?(u(),N(Y,{clsPrefix:t,key:r.key},null,8,[`clsPrefix`])):ve(i)?(u(),N(Se,{clsPrefix:t,tmNode:r,parentKey:e,key:r.key},null,8,[`clsPrefix`,`tmNode`,`parentKey`])):(u(),N(Q,{clsPrefix:t,tmNode:r,parentKey:e,key:r.key,props:i.props,scrollable:n},null,8,[`clsPrefix`,`tmNode`,`parentKey`,`props`,`scrollable`]))});return u(),g(`div`,{class:k([`${t}-dropdown-menu`,n&&`${t}-dropdown-menu--scrollable`]),ref:`bodyRef`},[n?(u(),N(_,{key:0,contentClass:`${t}-dropdown-menu__content`},{default:()=>r},1032,[`contentClass`])):(u(),g(b,{key:1},[D(()=>r)],64)),this.showArrow?(u(),g(b,{key:2},[D(()=>le({clsPrefix:t,arrowStyle:this.arrowStyle,arrowClass:void 0,arrowWrapperClass:void 0,arrowWrapperStyle:void 0}))],64)):D(()=>null)],2)}}),we=p(`dropdown-menu`,`
 transform-origin: var(--v-transform-origin);
 background-color: var(--n-color);
 border-radius: var(--n-border-radius);
 box-shadow: var(--n-box-shadow);
 position: relative;
 transition:
 background-color .3s var(--n-bezier),
 box-shadow .3s var(--n-bezier);
`,[fe(),p(`dropdown-option`,`
 position: relative;
 `,[m(`a`,`
 text-decoration: none;
 color: inherit;
 outline: none;
 `,[m(`&::before`,`
 content: "";
 position: absolute;
 left: 0;
 right: 0;
 top: 0;
 bottom: 0;
 `)]),p(`dropdown-option-body`,`
 display: flex;
 cursor: pointer;
 position: relative;
 height: var(--n-option-height);
 line-height: var(--n-option-height);
 font-size: var(--n-font-size);
 color: var(--n-option-text-color);
 transition: color .3s var(--n-bezier);
 `,[m(`&::before`,`
 content: "";
 position: absolute;
 top: 0;
 bottom: 0;
 left: 4px;
 right: 4px;
 transition: background-color .3s var(--n-bezier);
 border-radius: var(--n-border-radius);
 `),y(`disabled`,[e(`pending`,`
 color: var(--n-option-text-color-hover);
 `,[l(`prefix, suffix`,`
 color: var(--n-option-text-color-hover);
 `),m(`&::before`,`background-color: var(--n-option-color-hover);`)]),e(`active`,`
 color: var(--n-option-text-color-active);
 `,[l(`prefix, suffix`,`
 color: var(--n-option-text-color-active);
 `),m(`&::before`,`background-color: var(--n-option-color-active);`)]),e(`child-active`,`
 color: var(--n-option-text-color-child-active);
 `,[l(`prefix, suffix`,`
 color: var(--n-option-text-color-child-active);
 `)])]),e(`disabled`,`
 cursor: not-allowed;
 opacity: var(--n-option-opacity-disabled);
 `),e(`group`,`
 font-size: calc(var(--n-font-size) - 1px);
 color: var(--n-group-header-text-color);
 `,[l(`prefix`,`
 width: calc(var(--n-option-prefix-width) / 2);
 `,[e(`show-icon`,`
 width: calc(var(--n-option-icon-prefix-width) / 2);
 `)])]),l(`prefix`,`
 width: var(--n-option-prefix-width);
 display: flex;
 justify-content: center;
 align-items: center;
 color: var(--n-prefix-color);
 transition: color .3s var(--n-bezier);
 z-index: 1;
 `,[e(`show-icon`,`
 width: var(--n-option-icon-prefix-width);
 `),p(`icon`,`
 font-size: var(--n-option-icon-size);
 `)]),l(`label`,`
 white-space: nowrap;
 flex: 1;
 z-index: 1;
 `),l(`suffix`,`
 box-sizing: border-box;
 flex-grow: 0;
 flex-shrink: 0;
 display: flex;
 justify-content: flex-end;
 align-items: center;
 min-width: var(--n-option-suffix-width);
 padding: 0 8px;
 transition: color .3s var(--n-bezier);
 color: var(--n-suffix-color);
 z-index: 1;
 `,[e(`has-submenu`,`
 width: var(--n-option-icon-suffix-width);
 `),p(`icon`,`
 font-size: var(--n-option-icon-size);
 `)]),p(`dropdown-menu`,`pointer-events: all;`)]),p(`dropdown-offset-container`,`
 pointer-events: none;
 position: absolute;
 left: 0;
 right: 0;
 top: -4px;
 bottom: -4px;
 `)]),p(`dropdown-divider`,`
 transition: background-color .3s var(--n-bezier);
 background-color: var(--n-divider-color);
 height: 1px;
 margin: 4px 0;
 `),p(`dropdown-menu-wrapper`,`
 transform-origin: var(--v-transform-origin);
 width: fit-content;
 `),m(`>`,[p(`scrollbar`,`
 height: inherit;
 max-height: inherit;
 `)]),y(`scrollable`,`
 padding: var(--n-padding);
 `),e(`scrollable`,[l(`content`,`
 padding: var(--n-padding);
 `)])]),Te={animated:{type:Boolean,default:!0},keyboard:{type:Boolean,default:!0},size:String,inverted:Boolean,placement:{type:String,default:`bottom`},onSelect:[Function,Array],options:{type:Array,default:()=>[]},menuProps:Function,showArrow:Boolean,renderLabel:Function,renderIcon:Function,renderOption:Function,nodeProps:Function,labelField:{type:String,default:`label`},keyField:{type:String,default:`key`},childrenField:{type:String,default:`children`},value:[String,Number]},Ee=Object.keys(B),De={...B,...Te,...i.props},Oe=F({name:`Dropdown`,inheritAttrs:!1,props:De,setup(e){let t=O(!1),n=ce(A(e,`show`),t),a=x(()=>{let{keyField:t,childrenField:n}=e;return pe(e.options,{getKey(e){return e[t]},getDisabled(e){return e.disabled===!0},getIgnored(e){return e.type===`divider`||e.type===`render`},getChildren(e){return e[n]}})}),o=x(()=>a.value.treeNodes),s=O(null),c=O(null),l=O(null),u=x(()=>s.value??c.value??l.value??null),d=x(()=>a.value.getPath(u.value).keyPath),p=x(()=>a.value.getPath(e.value).keyPath),m=U(()=>e.keyboard&&n.value);me({keydown:{ArrowUp:{prevent:!0,handler:k},ArrowRight:{prevent:!0,handler:D},ArrowDown:{prevent:!0,handler:M},ArrowLeft:{prevent:!0,handler:E},Enter:{prevent:!0,handler:N},Escape:T}},m);let{mergedClsPrefixRef:h,inlineThemeDisabled:g,mergedComponentPropsRef:_}=v(e),y=x(()=>e.size||_?.value?.Dropdown?.size||`medium`),b=i(`Dropdown`,`-dropdown`,we,te,e,h);L(q,{labelFieldRef:A(e,`labelField`),childrenFieldRef:A(e,`childrenField`),renderLabelRef:A(e,`renderLabel`),renderIconRef:A(e,`renderIcon`),hoverKeyRef:s,keyboardKeyRef:c,lastToggledSubmenuKeyRef:l,pendingKeyPathRef:d,activeKeyPathRef:p,animatedRef:A(e,`animated`),mergedShowRef:n,nodePropsRef:A(e,`nodeProps`),renderOptionRef:A(e,`renderOption`),menuPropsRef:A(e,`menuProps`),doSelect:S,doUpdateShow:C}),f(n,t=>{!e.animated&&!t&&w()});function S(t,n){let{onSelect:r}=e;r&&I(r,t,n)}function C(n){let{"onUpdate:show":r,onUpdateShow:i}=e;r&&I(r,n),i&&I(i,n),t.value=n}function w(){s.value=null,c.value=null,l.value=null}function T(){C(!1)}function E(){F(`left`)}function D(){F(`right`)}function k(){F(`up`)}function M(){F(`down`)}function N(){let e=P();e?.isLeaf&&n.value&&(S(e.key,e.rawNode),C(!1))}function P(){let{value:e}=a,{value:t}=u;return!e||t===null?null:e.getNode(t)??null}function F(e){let{value:t}=u,{value:{getFirstAvailableNode:n}}=a,r=null;if(t===null){let e=n();e!==null&&(r=e.key)}else{let t=P();if(t){let n;switch(e){case`down`:n=t.getNext();break;case`up`:n=t.getPrev();break;case`right`:n=t.getChild();break;case`left`:n=t.getParent()}n&&(r=n.key)}}r!==null&&(s.value=null,c.value=r)}let R=x(()=>{let{inverted:t}=e,n=y.value,{common:{cubicBezierEaseInOut:r},self:i}=b.value,{padding:a,dividerColor:o,borderRadius:s,optionOpacityDisabled:c,[j(`optionIconSuffixWidth`,n)]:l,[j(`optionSuffixWidth`,n)]:u,[j(`optionIconPrefixWidth`,n)]:d,[j(`optionPrefixWidth`,n)]:f,[j(`fontSize`,n)]:p,[j(`optionHeight`,n)]:m,[j(`optionIconSize`,n)]:h}=i,g={"--n-bezier":r,"--n-font-size":p,"--n-padding":a,"--n-border-radius":s,"--n-option-height":m,"--n-option-prefix-width":f,"--n-option-icon-prefix-width":d,"--n-option-suffix-width":u,"--n-option-icon-suffix-width":l,"--n-option-icon-size":h,"--n-divider-color":o,"--n-option-opacity-disabled":c};return t?(g[`--n-color`]=i.colorInverted,g[`--n-option-color-hover`]=i.optionColorHoverInverted,g[`--n-option-color-active`]=i.optionColorActiveInverted,g[`--n-option-text-color`]=i.optionTextColorInverted,g[`--n-option-text-color-hover`]=i.optionTextColorHoverInverted,g[`--n-option-text-color-active`]=i.optionTextColorActiveInverted,g[`--n-option-text-color-child-active`]=i.optionTextColorChildActiveInverted,g[`--n-prefix-color`]=i.prefixColorInverted,g[`--n-suffix-color`]=i.suffixColorInverted,g[`--n-group-header-text-color`]=i.groupHeaderTextColorInverted):(g[`--n-color`]=i.color,g[`--n-option-color-hover`]=i.optionColorHover,g[`--n-option-color-active`]=i.optionColorActive,g[`--n-option-text-color`]=i.optionTextColor,g[`--n-option-text-color-hover`]=i.optionTextColorHover,g[`--n-option-text-color-active`]=i.optionTextColorActive,g[`--n-option-text-color-child-active`]=i.optionTextColorChildActive,g[`--n-prefix-color`]=i.prefixColor,g[`--n-suffix-color`]=i.suffixColor,g[`--n-group-header-text-color`]=i.groupHeaderTextColor),g}),z=g?r(`dropdown`,x(()=>`${y.value[0]}${e.inverted?`i`:``}`),R,e):void 0;return{mergedClsPrefix:h,mergedTheme:b,mergedSize:y,tmNodes:o,mergedShow:n,handleAfterLeave:()=>{e.animated&&w()},doUpdateShow:C,cssVars:g?void 0:R,themeClass:z?.themeClass,onRender:z?.onRender}},render(){let e=(e,n,r,i,o)=>{let{mergedClsPrefix:s,menuProps:c}=this;this.onRender?.();let l=c?.(void 0,this.tmNodes.map(e=>e.rawNode))||{},u={ref:G(n),class:[e,`${s}-dropdown`,`${s}-dropdown--${this.mergedSize}-size`,this.themeClass],clsPrefix:s,tmNodes:this.tmNodes,style:[...r,this.cssVars],showArrow:this.showArrow,arrowStyle:this.arrowStyle,scrollable:this.scrollable,onMouseenter:i,onMouseleave:o};return a($,t(this.$attrs,u,l))},{mergedTheme:n}=this,r={show:this.mergedShow,theme:n.peers.Popover,themeOverrides:n.peerOverrides.Popover,internalOnAfterLeave:this.handleAfterLeave,internalRenderBody:e,onUpdateShow:this.doUpdateShow,"onUpdate:show":void 0};return u(),N(se,ee(this.$props,Ee,r),{_:1,trigger:S(()=>this.$slots.default?.())},16)}});export{G as n,W as r,Oe as t};