/**
 * Runs in the browser before the page hydrates (Next.js's client instrumentation hook). On the
 * design editor it starts the 3D scene's download at once (where WebGL is there), rather than when
 * hydration reaches the preview: the scene's chunk then loads while the page's own scripts start,
 * and the first frame comes sooner. Other pages load nothing more (this module and the loader it
 * imports are about a kilobyte; the scene's code is fetched on demand).
 */
import { preloadScene } from "@/components/preview/scene-loader";

// /projects/<project>/designs/<design>, the editor (not its /diff page).
if (/^\/projects\/[^/]+\/designs\/[^/]+\/?$/.test(window.location.pathname)) preloadScene();
