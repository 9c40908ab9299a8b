// The package's "main" is a UMD bundle under "type": "module", which Node cannot load as ESM; its ES build sits
// beside it without a declaration file of its own, so borrow the package's types for it.
declare module 'maxrects-packer/dist/maxrects-packer.mjs' {
  export * from 'maxrects-packer';
}
