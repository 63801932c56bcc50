import{$t as e,C as t,Cn as n,D as r,E as i,Gn as a,On as o,Qt as s,Rn as c,Xt as l,Yt as u,_n as d,bn as f,dt as p,fn as m,gn as h,m as g,mt as _,nn as v,nt as y,ot as b,pr as x,rn as S,rr as C,rt as w,sr as T,tn as E,vn as D,wn as O,x as k,y as A,yt as j,zn as M}from"./_plugin-vue_export-helper-C4XqT5Hd.js";import{f as N,h as P,l as F,u as I}from"./Button-CqYvzYpP.js";import{N as L}from"./index-KegDRDt8.js";import{P as R}from"./light-B367S0Uq.js";import{m as z}from"./Suffix-CEyhj_Z0.js";var B=()=>(()=>{let e=y(`75be776d8875fa17`);return e[0]||=d(`svg`,{viewBox:`0 0 64 64`,class:`check-icon`},[d(`path`,{d:`M50.42,16.76L22.34,39.45l-8.1-11.46c-1.12-1.58-3.3-1.96-4.88-0.84c-1.58,1.12-1.95,3.3-0.84,4.88l10.26,14.51  c0.56,0.79,1.42,1.31,2.38,1.45c0.16,0.02,0.32,0.03,0.48,0.03c0.8,0,1.57-0.27,2.2-0.78l30.99-25.03c1.5-1.21,1.74-3.42,0.52-4.92  C54.13,15.78,51.93,15.55,50.42,16.76z`})],-1)})(),V=()=>(()=>{let e=y(`c6eed899356c8404`);return e[0]||=d(`svg`,{viewBox:`0 0 100 100`,class:`line-icon`},[d(`path`,{d:`M80.2,55.5H21.4c-2.8,0-5.1-2.5-5.1-5.5l0,0c0-3,2.3-5.5,5.1-5.5h58.7c2.8,0,5.1,2.5,5.1,5.5l0,0C85.2,53.1,82.9,55.5,80.2,55.5z`})],-1)})(),H=u([l(`checkbox`,`
 font-size: var(--n-font-size);
 outline: none;
 cursor: pointer;
 display: inline-flex;
 flex-wrap: nowrap;
 align-items: flex-start;
 word-break: break-word;
 line-height: var(--n-size);
 --n-merged-color-table: var(--n-color-table);
 `,[e(`show-label`,`line-height: var(--n-label-line-height);`),u(`&:hover`,[l(`checkbox-box`,[s(`border`,`border: var(--n-border-checked);`)])]),u(`&:focus:not(:active)`,[l(`checkbox-box`,[s(`border`,`
 border: var(--n-border-focus);
 box-shadow: var(--n-box-shadow-focus);
 `)])]),e(`inside-table`,[l(`checkbox-box`,`
 background-color: var(--n-merged-color-table);
 `)]),e(`checked`,[l(`checkbox-box`,`
 background-color: var(--n-color-checked);
 `,[l(`checkbox-icon`,[u(`.check-icon`,`
 opacity: 1;
 transform: scale(1);
 `)])])]),e(`indeterminate`,[l(`checkbox-box`,[l(`checkbox-icon`,[u(`.check-icon`,`
 opacity: 0;
 transform: scale(.5);
 `),u(`.line-icon`,`
 opacity: 1;
 transform: scale(1);
 `)])])]),e(`checked, indeterminate`,[u(`&:focus:not(:active)`,[l(`checkbox-box`,[s(`border`,`
 border: var(--n-border-checked);
 box-shadow: var(--n-box-shadow-focus);
 `)])]),l(`checkbox-box`,`
 background-color: var(--n-color-checked);
 border-left: 0;
 border-top: 0;
 `,[s(`border`,{border:`var(--n-border-checked)`})])]),e(`disabled`,{cursor:`not-allowed`},[e(`checked`,[l(`checkbox-box`,`
 background-color: var(--n-color-disabled-checked);
 `,[s(`border`,{border:`var(--n-border-disabled-checked)`}),l(`checkbox-icon`,[u(`.check-icon, .line-icon`,{fill:`var(--n-check-mark-color-disabled-checked)`})])])]),l(`checkbox-box`,`
 background-color: var(--n-color-disabled);
 `,[s(`border`,`
 border: var(--n-border-disabled);
 `),l(`checkbox-icon`,[u(`.check-icon, .line-icon`,`
 fill: var(--n-check-mark-color-disabled);
 `)])]),s(`label`,`
 color: var(--n-text-color-disabled);
 `)]),l(`checkbox-box-wrapper`,`
 position: relative;
 width: var(--n-size);
 flex-shrink: 0;
 flex-grow: 0;
 user-select: none;
 -webkit-user-select: none;
 `),l(`checkbox-box`,`
 position: absolute;
 left: 0;
 top: 50%;
 transform: translateY(-50%);
 height: var(--n-size);
 width: var(--n-size);
 display: inline-block;
 box-sizing: border-box;
 border-radius: var(--n-border-radius);
 background-color: var(--n-color);
 transition: background-color 0.3s var(--n-bezier);
 `,[s(`border`,`
 transition:
 border-color .3s var(--n-bezier),
 box-shadow .3s var(--n-bezier);
 border-radius: inherit;
 position: absolute;
 left: 0;
 right: 0;
 top: 0;
 bottom: 0;
 border: var(--n-border);
 `),l(`checkbox-icon`,`
 display: flex;
 align-items: center;
 justify-content: center;
 position: absolute;
 left: 1px;
 right: 1px;
 top: 1px;
 bottom: 1px;
 `,[u(`.check-icon, .line-icon`,`
 width: 100%;
 fill: var(--n-check-mark-color);
 opacity: 0;
 transform: scale(0.5);
 transform-origin: center;
 transition:
 fill 0.3s var(--n-bezier),
 transform 0.3s var(--n-bezier),
 opacity 0.3s var(--n-bezier),
 border-color 0.3s var(--n-bezier);
 `),F({left:`1px`,top:`1px`})])]),s(`label`,`
 color: var(--n-text-color);
 transition: color .3s var(--n-bezier);
 user-select: none;
 -webkit-user-select: none;
 padding: var(--n-label-padding);
 font-weight: var(--n-label-font-weight);
 `,[u(`&:empty`,{display:`none`})])]),v(l(`checkbox`,`
 --n-merged-color-table: var(--n-color-table-modal);
 `)),S(l(`checkbox`,`
 --n-merged-color-table: var(--n-color-table-popover);
 `))]),U=[`id`],W=[`tabindex`,`aria-checked`,`aria-labelledby`,`onKeyup`,`onKeydown`,`onClick`],G={...i.props,size:String,checked:{type:[Boolean,String,Number],default:void 0},defaultChecked:{type:[Boolean,String,Number],default:!1},value:[String,Number],disabled:{type:Boolean,default:void 0},indeterminate:Boolean,label:String,focusable:{type:Boolean,default:!0},checkedValue:{type:[Boolean,String,Number],default:!0},uncheckedValue:{type:[Boolean,String,Number],default:!1},"onUpdate:checked":[Function,Array],onUpdateChecked:[Function,Array],privateInsideTable:Boolean,onChange:[Function,Array]},K=O({name:`Checkbox`,props:G,setup(e){a(()=>{e.onChange&&j(`checkbox`,"`on-change` is deprecated, please use `on-update:checked` instead.")});let t=o(q,null),n=C(null),{mergedClsPrefixRef:s,inlineThemeDisabled:c,mergedRtlRef:l,mergedComponentPropsRef:u}=p(e),d=C(e.defaultChecked),f=T(e,`checked`),m=z(f,d),_=P(()=>{if(t){let n=t.valueSetRef.value;return n&&e.value!==void 0?n.has(e.value):!1}return m.value===e.checkedValue}),v=N(e,{mergedSize(n){let{size:r}=e;if(r!==void 0)return r;if(t){let{value:e}=t.mergedSizeRef;if(e!==void 0)return e}if(n){let{mergedSize:e}=n;if(e!==void 0)return e.value}return u?.value?.Checkbox?.size||`medium`},mergedDisabled(n){let{disabled:r}=e;if(r!==void 0)return r;if(t){if(t.disabledRef.value)return!0;let{maxRef:{value:e},checkedCountRef:n}=t;if(e!==void 0&&n.value>=e&&!_.value)return!0;let{minRef:{value:r}}=t;if(r!==void 0&&n.value<=r&&_.value)return!0}return n?n.disabled.value:!1}}),{mergedDisabledRef:y,mergedSizeRef:b}=v,x=i(`Checkbox`,`-checkbox`,H,L,e,s);function S(n){if(t&&e.value!==void 0)t.toggleCheckbox(!_.value,e.value);else{let{onChange:t,"onUpdate:checked":r,onUpdateChecked:i}=e,{nTriggerFormInput:a,nTriggerFormChange:o}=v,s=_.value?e.uncheckedValue:e.checkedValue;r&&k(r,s,n),i&&k(i,s,n),t&&k(t,s,n),a(),o(),d.value=s}}function w(e){y.value||S(e)}function D(e){if(!y.value)switch(e.key){case` `:case`Enter`:S(e)}}function O(e){e.key===` `&&e.preventDefault()}let A={focus:()=>{n.value?.focus()},blur:()=>{n.value?.blur()}},M=g(`Checkbox`,l,s),F=h(()=>{let{value:e}=b,{common:{cubicBezierEaseInOut:t},self:{borderRadius:n,color:r,colorChecked:i,colorDisabled:a,colorTableHeader:o,colorTableHeaderModal:s,colorTableHeaderPopover:c,checkMarkColor:l,checkMarkColorDisabled:u,border:d,borderFocus:f,borderDisabled:p,borderChecked:m,boxShadowFocus:h,textColor:g,textColorDisabled:_,checkMarkColorDisabledChecked:v,colorDisabledChecked:y,borderDisabledChecked:S,labelPadding:C,labelLineHeight:w,labelFontWeight:T,[E(`fontSize`,e)]:D,[E(`size`,e)]:O}}=x.value;return{"--n-label-line-height":w,"--n-label-font-weight":T,"--n-size":O,"--n-bezier":t,"--n-border-radius":n,"--n-border":d,"--n-border-checked":m,"--n-border-focus":f,"--n-border-disabled":p,"--n-border-disabled-checked":S,"--n-box-shadow-focus":h,"--n-color":r,"--n-color-checked":i,"--n-color-table":o,"--n-color-table-modal":s,"--n-color-table-popover":c,"--n-color-disabled":a,"--n-color-disabled-checked":y,"--n-text-color":g,"--n-text-color-disabled":_,"--n-check-mark-color":l,"--n-check-mark-color-disabled":u,"--n-check-mark-color-disabled-checked":v,"--n-font-size":D,"--n-label-padding":C}}),I=c?r(`checkbox`,h(()=>b.value[0]),F,e):void 0;return Object.assign(v,A,{rtlEnabled:M,selfRef:n,mergedClsPrefix:s,mergedDisabled:y,renderedChecked:_,mergedTheme:x,labelId:R(),handleClick:w,handleKeyUp:D,handleKeyDown:O,cssVars:c?void 0:F,themeClass:I?.themeClass,onRender:I?.onRender})},render(){let{$slots:e,renderedChecked:r,mergedDisabled:i,indeterminate:a,privateInsideTable:o,cssVars:s,labelId:l,label:u,mergedClsPrefix:p,focusable:m,handleKeyUp:h,handleKeyDown:g,handleClick:_}=this;this.onRender?.();let v=A(e.default,e=>u||e?(c(),f(`span`,{key:1,class:w(`${p}-checkbox__label`),id:l},[b(()=>u||e)],10,U)):null);return(()=>{let e=y(`70be6e74cd27cb50`);return c(),f(`div`,{ref:`selfRef`,class:w([`${p}-checkbox`,this.themeClass,this.rtlEnabled&&`${p}-checkbox--rtl`,r&&`${p}-checkbox--checked`,i&&`${p}-checkbox--disabled`,a&&`${p}-checkbox--indeterminate`,o&&`${p}-checkbox--inside-table`,v&&`${p}-checkbox--show-label`]),tabindex:i||!m?void 0:0,role:`checkbox`,"aria-checked":a?`mixed`:r,"aria-labelledby":l,style:x(s),onKeyup:h,onKeydown:g,onClick:_,onMousedown:e[0]||=()=>{t(`selectstart`,window,e=>{e.preventDefault()},{once:!0})}},[d(`div`,{class:w(`${p}-checkbox-box-wrapper`)},[e[1]||=b(`\xA0`,-1),d(`div`,{class:w(`${p}-checkbox-box`)},[n(I,null,{default:()=>this.indeterminate?(c(),f(`div`,{key:`indeterminate`,class:w(`${p}-checkbox-icon`)},[b(()=>V())],2)):(c(),f(`div`,{key:`check`,class:w(`${p}-checkbox-icon`)},[b(()=>B())],2))},1024),d(`div`,{class:w(`${p}-checkbox-box__border`)},null,2)],2)],2),b(()=>v)],46,W)})()}}),q=_(`n-checkbox-group`),J=O({name:`CheckboxGroup`,props:{min:Number,max:Number,size:String,options:Array,labelField:{type:String,default:`label`},valueField:{type:String,default:`value`},value:Array,defaultValue:{type:Array,default:null},disabled:{type:Boolean,default:void 0},"onUpdate:value":[Function,Array],onUpdateValue:[Function,Array],onChange:[Function,Array]},setup(e){a(()=>{e.onChange!==void 0&&j(`checkbox-group`,"`on-change` is deprecated, please use `on-update:value` instead.")});let{mergedClsPrefixRef:t}=p(e),n=N(e),{mergedSizeRef:r,mergedDisabledRef:i}=n,o=C(e.defaultValue),s=h(()=>e.value),c=z(s,o),l=h(()=>c.value?.length||0),u=h(()=>Array.isArray(c.value)?new Set(c.value):new Set);function d(t,r){let{nTriggerFormInput:i,nTriggerFormChange:a}=n,{onChange:s,"onUpdate:value":l,onUpdateValue:u}=e;if(Array.isArray(c.value)){let e=Array.from(c.value),n=e.findIndex(e=>e===r);t?~n||(e.push(r),u&&k(u,e,{actionType:`check`,value:r}),l&&k(l,e,{actionType:`check`,value:r}),i(),a(),o.value=e,s&&k(s,e)):~n&&(e.splice(n,1),u&&k(u,e,{actionType:`uncheck`,value:r}),l&&k(l,e,{actionType:`uncheck`,value:r}),s&&k(s,e),o.value=e,i(),a())}else t?(u&&k(u,[r],{actionType:`check`,value:r}),l&&k(l,[r],{actionType:`check`,value:r}),s&&k(s,[r]),o.value=[r],i(),a()):(u&&k(u,[],{actionType:`uncheck`,value:r}),l&&k(l,[],{actionType:`uncheck`,value:r}),s&&k(s,[]),o.value=[],i(),a())}return M(q,{checkedCountRef:l,maxRef:T(e,`max`),minRef:T(e,`min`),valueSetRef:u,disabledRef:i,mergedSizeRef:r,toggleCheckbox:d}),{mergedClsPrefix:t}},render(){let{options:e,labelField:t,valueField:n}=this.$props;return c(),f(`div`,{class:w(`${this.mergedClsPrefix}-checkbox-group`),role:`group`},[e?(c(),f(m,{key:0},[b(()=>e.map(e=>{let r=e[n];return c(),D(K,{key:r,value:r,disabled:e.disabled,label:e[t]},null,8,[`value`,`disabled`,`label`])}))],64)):(c(),f(m,{key:1},[b(()=>this.$slots.default?.())],64))],2)}});export{K as n,J as t};