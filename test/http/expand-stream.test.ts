// The streaming-expansion suite under Node.
import { describeExpandStream } from './expand-stream-suite.ts'

describeExpandStream()
