/**
 * Keeps a failure inside one region: if a panel throws while drawing, the region says so and offers a
 * retry, and the rest of the workbench (and the design) carries on.
 */
import { Component, type ErrorInfo, type ReactNode } from 'react';

interface Props {
  name: string;
  children: ReactNode;
}

export class PanelBoundary extends Component<Props, { error: Error | null }> {
  override state: { error: Error | null } = { error: null };

  static getDerivedStateFromError(error: Error) {
    return { error };
  }

  override componentDidCatch(error: Error, info: ErrorInfo): void {
    console.error(`Polewright: the ${this.props.name} panel failed`, error, info.componentStack);
  }

  override render() {
    const { error } = this.state;
    if (!error) return this.props.children;
    return (
      <div className="pw-panel pw-panel-failed" role="alert">
        <p>
          <strong>The {this.props.name} could not be drawn.</strong> Your design is unchanged; undo or edit
          it, then try again.
        </p>
        <p className="pw-hint">{error.message}</p>
        <button type="button" onClick={() => this.setState({ error: null })}>
          Try again
        </button>
      </div>
    );
  }
}
