/** Photos and scanned documents attached to a day, a load, a lot or a recipe. */
export { AttachmentsPanel, type AttachmentsPanelProps } from './components/attachments-panel';
