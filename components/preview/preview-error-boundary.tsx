"use client";
import { Component, type ReactNode } from "react";

/**
 * Catches a failing 3D scene (no WebGL context, a lost context, a shader that will not compile) and
 * shows the fallback instead of breaking the page around it.
 */
export class PreviewErrorBoundary extends Component<{ fallback: ReactNode; onError?: () => void; children: ReactNode }, { failed: boolean }> {
  state = { failed: false };

  static getDerivedStateFromError(): { failed: boolean } {
    return { failed: true };
  }

  componentDidCatch(error: unknown): void {
    console.warn("3D preview failed; showing the 2D elevation instead.", error);
    this.props.onError?.();
  }

  render(): ReactNode {
    return this.state.failed ? this.props.fallback : this.props.children;
  }
}
