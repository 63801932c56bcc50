import{$t as e,D as t,E as n,Gn as r,On as i,Qt as a,Rn as o,Xt as s,Yt as c,_n as l,bn as u,dt as d,en as f,gn as p,m,mt as h,nt as g,ot as _,pr as v,rr as y,rt as b,sr as x,tn as S,vn as C,vt as w,wn as T,x as E,y as D,yt as O,zn as k}from"./_plugin-vue_export-helper-C4XqT5Hd.js";import{b as A,r as j}from"./light-B367S0Uq.js";import{f as M,h as N}from"./Button-CqYvzYpP.js";import{m as P}from"./Suffix-CEyhj_Z0.js";var F=s(`radio`,`
 line-height: var(--n-label-line-height);
 outline: none;
 position: relative;
 user-select: none;
 -webkit-user-select: none;
 display: inline-flex;
 align-items: flex-start;
 flex-wrap: nowrap;
 font-size: var(--n-font-size);
 word-break: break-word;
`,[e(`checked`,[a(`dot`,`
 background-color: var(--n-color-active);
 `)]),a(`dot-wrapper`,`
 position: relative;
 flex-shrink: 0;
 flex-grow: 0;
 width: var(--n-radio-size);
 `),s(`radio-input`,`
 position: absolute;
 border: 0;
 width: 0;
 height: 0;
 opacity: 0;
 margin: 0;
 `),a(`dot`,`
 position: absolute;
 top: 50%;
 left: 0;
 transform: translateY(-50%);
 height: var(--n-radio-size);
 width: var(--n-radio-size);
 background: var(--n-color);
 box-shadow: var(--n-box-shadow);
 border-radius: 50%;
 transition:
 background-color .3s var(--n-bezier),
 box-shadow .3s var(--n-bezier);
 `,[c(`&::before`,`
 content: "";
 opacity: 0;
 position: absolute;
 left: 4px;
 top: 4px;
 height: calc(100% - 8px);
 width: calc(100% - 8px);
 border-radius: 50%;
 transform: scale(.8);
 background: var(--n-dot-color-active);
 transition: 
 opacity .3s var(--n-bezier),
 background-color .3s var(--n-bezier),
 transform .3s var(--n-bezier);
 `),e(`checked`,{boxShadow:`var(--n-box-shadow-active)`},[c(`&::before`,`
 opacity: 1;
 transform: scale(1);
 `)])]),a(`label`,`
 color: var(--n-text-color);
 padding: var(--n-label-padding);
 font-weight: var(--n-label-font-weight);
 display: inline-block;
 transition: color .3s var(--n-bezier);
 `),f(`disabled`,`
 cursor: pointer;
 `,[c(`&:hover`,[a(`dot`,{boxShadow:`var(--n-box-shadow-hover)`})]),e(`focus`,[c(`&:not(:active)`,[a(`dot`,{boxShadow:`var(--n-box-shadow-focus)`})])])]),e(`disabled`,`
 cursor: not-allowed;
 `,[a(`dot`,{boxShadow:`var(--n-box-shadow-disabled)`,backgroundColor:`var(--n-color-disabled)`},[c(`&::before`,{backgroundColor:`var(--n-dot-color-disabled)`}),e(`checked`,`
 opacity: 1;
 `)]),a(`label`,{color:`var(--n-text-color-disabled)`}),s(`radio-input`,`
 cursor: not-allowed;
 `)])]),I={name:String,value:{type:[String,Number,Boolean],default:`on`},checked:{type:Boolean,default:void 0},defaultChecked:Boolean,disabled:{type:Boolean,default:void 0},label:String,size:String,onUpdateChecked:[Function,Array],"onUpdate:checked":[Function,Array],checkedValue:{type:Boolean,default:void 0}},L=h(`n-radio-group`);function R(e){r(()=>{e.checkedValue!==void 0&&O(`radio`,"`checked-value` is deprecated, please use `checked` instead.")});let t=i(L,null),{mergedClsPrefixRef:n,mergedComponentPropsRef:a}=d(e),o=M(e,{mergedSize(n){let{size:r}=e;if(r!==void 0)return r;if(t){let{mergedSizeRef:{value:e}}=t;if(e!==void 0)return e}return n?n.mergedSize.value:a?.value?.Radio?.size||`medium`},mergedDisabled(n){return!!(e.disabled||t?.disabledRef.value||n?.disabled.value)}}),{mergedSizeRef:s,mergedDisabledRef:c}=o,l=y(null),u=y(null),f=y(e.defaultChecked),p=x(e,`checked`),m=P(p,f),h=N(()=>t?t.valueRef.value===e.value:m.value),g=N(()=>{let{name:n}=e;if(n!==void 0)return n;if(t)return t.nameRef.value}),_=y(!1);function v(){if(t){let{doUpdateValue:n}=t,{value:r}=e;E(n,r)}else{let{onUpdateChecked:t,"onUpdate:checked":n}=e,{nTriggerFormInput:r,nTriggerFormChange:i}=o;t&&E(t,!0),n&&E(n,!0),r(),i(),f.value=!0}}function b(){c.value||h.value||v()}function S(){b(),l.value&&(l.value.checked=h.value)}function C(){_.value=!1}function w(){_.value=!0}return{mergedClsPrefix:t?t.mergedClsPrefixRef:n,inputRef:l,labelRef:u,mergedName:g,mergedDisabled:c,renderSafeChecked:h,focus:_,mergedSize:s,handleRadioInputChange:S,handleRadioInputBlur:C,handleRadioInputFocus:w}}var z=[`value`,`name`,`checked`,`disabled`,`onChange`,`onFocus`,`onBlur`],B={...n.props,...I},V=T({name:`Radio`,props:B,setup(e){let r=R(e),i=n(`Radio`,`-radio`,F,j,e,r.mergedClsPrefix),a=p(()=>{let{mergedSize:{value:e}}=r,{common:{cubicBezierEaseInOut:t},self:{boxShadow:n,boxShadowActive:a,boxShadowDisabled:o,boxShadowFocus:s,boxShadowHover:c,color:l,colorDisabled:u,colorActive:d,textColor:f,textColorDisabled:p,dotColorActive:m,dotColorDisabled:h,labelPadding:g,labelLineHeight:_,labelFontWeight:v,[S(`fontSize`,e)]:y,[S(`radioSize`,e)]:b}}=i.value;return{"--n-bezier":t,"--n-label-line-height":_,"--n-label-font-weight":v,"--n-box-shadow":n,"--n-box-shadow-active":a,"--n-box-shadow-disabled":o,"--n-box-shadow-focus":s,"--n-box-shadow-hover":c,"--n-color":l,"--n-color-active":d,"--n-color-disabled":u,"--n-dot-color-active":m,"--n-dot-color-disabled":h,"--n-font-size":y,"--n-radio-size":b,"--n-text-color":f,"--n-text-color-disabled":p,"--n-label-padding":g}}),{inlineThemeDisabled:o,mergedClsPrefixRef:s,mergedRtlRef:c}=d(e),l=m(`Radio`,c,s),u=o?t(`radio`,p(()=>r.mergedSize.value[0]),a,e):void 0;return Object.assign(r,{rtlEnabled:l,cssVars:o?void 0:a,themeClass:u?.themeClass,onRender:u?.onRender})},render(){let{$slots:e,mergedClsPrefix:t,onRender:n,label:r}=this;return n?.(),(()=>{let n=g(`f8c6901d8cd45c02`);return o(),u(`label`,{class:b([`${t}-radio`,this.themeClass,this.rtlEnabled&&`${t}-radio--rtl`,this.mergedDisabled&&`${t}-radio--disabled`,this.renderSafeChecked&&`${t}-radio--checked`,this.focus&&`${t}-radio--focus`]),style:v(this.cssVars)},[l(`div`,{class:b(`${t}-radio__dot-wrapper`)},[n[0]||=_(`\xA0`,-1),l(`div`,{class:b([`${t}-radio__dot`,this.renderSafeChecked&&`${t}-radio__dot--checked`])},null,2),l(`input`,{ref:`inputRef`,type:`radio`,class:b(`${t}-radio-input`),value:this.value,name:this.mergedName,checked:this.renderSafeChecked,disabled:this.mergedDisabled,onChange:this.handleRadioInputChange,onFocus:this.handleRadioInputFocus,onBlur:this.handleRadioInputBlur},null,42,z)],2),_(()=>D(e.default,e=>!e&&!r?null:(o(),u(`div`,{ref:`labelRef`,class:b(`${t}-radio__label`)},[_(()=>e||r)],2))))],6)})()}});function H(e,t=`default`,n=[]){let r=e.$slots[t];return r===void 0?n:r()}var U=s(`radio-group`,`
 display: inline-block;
 font-size: var(--n-font-size);
`,[a(`splitor`,`
 display: inline-block;
 vertical-align: bottom;
 width: 1px;
 transition:
 background-color .3s var(--n-bezier),
 opacity .3s var(--n-bezier);
 background: var(--n-button-border-color);
 `,[e(`checked`,{backgroundColor:`var(--n-button-border-color-active)`}),e(`disabled`,{opacity:`var(--n-opacity-disabled)`})]),e(`button-group`,`
 white-space: nowrap;
 height: var(--n-height);
 line-height: var(--n-height);
 `,[s(`radio-button`,{height:`var(--n-height)`,lineHeight:`var(--n-height)`}),a(`splitor`,{height:`var(--n-height)`})]),s(`radio-button`,`
 vertical-align: bottom;
 outline: none;
 position: relative;
 user-select: none;
 -webkit-user-select: none;
 display: inline-block;
 box-sizing: border-box;
 padding-left: 14px;
 padding-right: 14px;
 white-space: nowrap;
 transition:
 background-color .3s var(--n-bezier),
 opacity .3s var(--n-bezier),
 border-color .3s var(--n-bezier),
 color .3s var(--n-bezier);
 background: var(--n-button-color);
 color: var(--n-button-text-color);
 border-top: 1px solid var(--n-button-border-color);
 border-bottom: 1px solid var(--n-button-border-color);
 `,[s(`radio-input`,`
 pointer-events: none;
 position: absolute;
 border: 0;
 border-radius: inherit;
 left: 0;
 right: 0;
 top: 0;
 bottom: 0;
 opacity: 0;
 z-index: 1;
 `),a(`state-border`,`
 z-index: 1;
 pointer-events: none;
 position: absolute;
 box-shadow: var(--n-button-box-shadow);
 transition: box-shadow .3s var(--n-bezier);
 left: -1px;
 bottom: -1px;
 right: -1px;
 top: -1px;
 `),c(`&:first-child`,`
 border-top-left-radius: var(--n-button-border-radius);
 border-bottom-left-radius: var(--n-button-border-radius);
 border-left: 1px solid var(--n-button-border-color);
 `,[a(`state-border`,`
 border-top-left-radius: var(--n-button-border-radius);
 border-bottom-left-radius: var(--n-button-border-radius);
 `)]),c(`&:last-child`,`
 border-top-right-radius: var(--n-button-border-radius);
 border-bottom-right-radius: var(--n-button-border-radius);
 border-right: 1px solid var(--n-button-border-color);
 `,[a(`state-border`,`
 border-top-right-radius: var(--n-button-border-radius);
 border-bottom-right-radius: var(--n-button-border-radius);
 `)]),f(`disabled`,`
 cursor: pointer;
 `,[c(`&:hover`,[a(`state-border`,`
 transition: box-shadow .3s var(--n-bezier);
 box-shadow: var(--n-button-box-shadow-hover);
 `),f(`checked`,{color:`var(--n-button-text-color-hover)`})]),e(`focus`,[c(`&:not(:active)`,[a(`state-border`,{boxShadow:`var(--n-button-box-shadow-focus)`})])])]),e(`checked`,`
 background: var(--n-button-color-active);
 color: var(--n-button-text-color-active);
 border-color: var(--n-button-border-color-active);
 `),e(`disabled`,`
 cursor: not-allowed;
 opacity: var(--n-opacity-disabled);
 `)])]),W=[`onFocusin`,`onFocusout`];function G(e,t,n){let r=[],i=!1;for(let a=0;a<e.length;++a){let s=e[a],c=s.type?.name;if(c===`RadioButton`&&(i=!0),i&&c!==`RadioButton`){w(`radio-group`,"`n-radio-group` in button mode only takes `n-radio-button` as children.");continue}let l=s.props;if(c!==`RadioButton`)r.push(s);else if(a===0)r.push(s);else{let e=r[r.length-1].props,i=t===e.value,a=e.disabled,c=t===l.value,d=l.disabled,f=(i?2:0)+ +!a,p=(c?2:0)+ +!d,m={[`${n}-radio-group__splitor--disabled`]:a,[`${n}-radio-group__splitor--checked`]:i},h={[`${n}-radio-group__splitor--disabled`]:d,[`${n}-radio-group__splitor--checked`]:c},g=f<p?h:m;r.push((o(),u(`div`,{key:1,class:b([`${n}-radio-group__splitor`,g])},null,2)),s)}}return{children:r,isButtonGroup:i}}var K={...n.props,name:String,options:Array,labelField:{type:String,default:`label`},valueField:{type:String,default:`value`},value:[String,Number,Boolean],defaultValue:{type:[String,Number,Boolean],default:null},size:String,disabled:{type:Boolean,default:void 0},"onUpdate:value":[Function,Array],onUpdateValue:[Function,Array]},q=T({name:`RadioGroup`,props:K,setup(e){let r=y(null),{mergedSizeRef:i,mergedDisabledRef:a,nTriggerFormChange:o,nTriggerFormInput:s,nTriggerFormBlur:c,nTriggerFormFocus:l}=M(e),{mergedClsPrefixRef:u,inlineThemeDisabled:f,mergedRtlRef:h}=d(e),g=n(`Radio`,`-radio-group`,U,j,e,u),_=y(e.defaultValue),v=x(e,`value`),b=P(v,_);function C(t){let{onUpdateValue:n,"onUpdate:value":r}=e;n&&E(n,t),r&&E(r,t),_.value=t,o(),s()}function w(e){let{value:t}=r;t&&(t.contains(e.relatedTarget)||l())}function T(e){let{value:t}=r;t&&(t.contains(e.relatedTarget)||c())}k(L,{mergedClsPrefixRef:u,nameRef:x(e,`name`),valueRef:b,disabledRef:a,mergedSizeRef:i,doUpdateValue:C});let D=m(`Radio`,h,u),O=p(()=>{let{value:e}=i,{common:{cubicBezierEaseInOut:t},self:{buttonBorderColor:n,buttonBorderColorActive:r,buttonBorderRadius:a,buttonBoxShadow:o,buttonBoxShadowFocus:s,buttonBoxShadowHover:c,buttonColor:l,buttonColorActive:u,buttonTextColor:d,buttonTextColorActive:f,buttonTextColorHover:p,opacityDisabled:m,[S(`buttonHeight`,e)]:h,[S(`fontSize`,e)]:_}}=g.value;return{"--n-font-size":_,"--n-bezier":t,"--n-button-border-color":n,"--n-button-border-color-active":r,"--n-button-border-radius":a,"--n-button-box-shadow":o,"--n-button-box-shadow-focus":s,"--n-button-box-shadow-hover":c,"--n-button-color":l,"--n-button-color-active":u,"--n-button-text-color":d,"--n-button-text-color-hover":p,"--n-button-text-color-active":f,"--n-height":h,"--n-opacity-disabled":m}}),A=f?t(`radio-group`,p(()=>i.value[0]),O,e):void 0;return{selfElRef:r,rtlEnabled:D,mergedClsPrefix:u,mergedValue:b,handleFocusout:T,handleFocusin:w,cssVars:f?void 0:O,themeClass:A?.themeClass,onRender:A?.onRender}},render(){let{mergedValue:e,mergedClsPrefix:t,handleFocusin:n,handleFocusout:r}=this,{options:i,labelField:a,valueField:s}=this.$props,{children:c,isButtonGroup:l}=G(i?i.map(e=>{let t=e[s];return o(),C(V,{key:typeof t==`boolean`?`__n_${t}`:t,value:t,disabled:e.disabled,label:e[a]},null,8,[`value`,`disabled`,`label`])}):A(H(this)),e,t);return this.onRender?.(),o(),u(`div`,{onFocusin:n,onFocusout:r,ref:`selfElRef`,class:b([`${t}-radio-group`,this.rtlEnabled&&`${t}-radio-group--rtl`,this.themeClass,l&&`${t}-radio-group--button-group`]),style:v(this.cssVars)},[_(()=>c)],46,W)}});export{R as a,I as i,H as n,V as r,q as t};