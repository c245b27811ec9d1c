// The plan's tools (placing a rod, drawing a conductor, drawing a section cut): at most one is
// active, so a click on the plan belongs to one tool only. Each page script registers its tools on
// the one shared switch; choosing a tool ends the one that was active.

export class ToolSwitch {
  constructor() {
    this.tools = new Map();
    this.current = null;
  }

  /** Adds a tool: activate() and deactivate() are called as it is chosen and ended. */
  register(name, { activate = () => {}, deactivate = () => {} } = {}) {
    this.tools.set(name, { activate, deactivate });
  }

  get active() {
    return this.current;
  }

  isActive(name) {
    return this.current === name;
  }

  /** Makes name the active tool (null: none), ending the one active before. */
  choose(name) {
    if (name !== null && !this.tools.has(name)) {
      throw new Error('no tool named ' + name);
    }
    if (this.current === name) {
      return;
    }
    const before = this.current;
    this.current = null;
    if (before !== null) {
      this.tools.get(before).deactivate();
    }
    this.current = name;
    if (name !== null) {
      this.tools.get(name).activate();
    }
  }

  /** Chooses name, or ends it when it is the active tool. */
  toggle(name) {
    this.choose(this.current === name ? null : name);
  }

  /** Ends name if it is active. */
  end(name) {
    if (this.current === name) {
      this.choose(null);
    }
  }
}

/** The page's one switch, shared by every script that puts a tool on the plan. */
export const planTools = new ToolSwitch();
