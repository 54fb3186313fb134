/** Engine version: bump the minor on any change to a method or a default, the patch for fixes. */
export const ENGINE_VERSION = "0.1.1";
