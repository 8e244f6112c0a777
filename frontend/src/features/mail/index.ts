export { FailedSendList, MessageList } from './components/message-list';
export { inboxQueryOptions, mailKeys, outboxQueryOptions } from './queries';
