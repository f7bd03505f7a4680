// Query modules (db/queries) import "server-only", which refuses to load outside the framework's
// server build. Scripts run with tsx (the seed) load this first: there it is an empty module.
import { register } from "node:module";

register("data:text/javascript,export async function resolve(s,c,n){ if(s==='server-only') return {url:'data:text/javascript,',shortCircuit:true}; return n(s,c); }");
