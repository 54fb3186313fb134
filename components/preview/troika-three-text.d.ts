// The one function of the text builder (a dependency of drei's <Text>) that the preview calls;
// the package ships no type declarations.
declare module "troika-three-text" {
  export function configureTextBuilder(config: { useWorker?: boolean }): void;
}
